package org.nodewright.physics.plates;

import java.util.List;

/**
 * Stiffness and mass matrices of a Rayleigh–Ritz plate model (upper triangles filled, then mirrored).
 * Kirchhoff bending energy ½∫[D11 w_xx² + 2 D12 w_xx w_yy + D22 w_yy² + 4 D66 w_xy²] dA and kinetic
 * energy ½ω²∫ρh w² dA (Leissa 1969, ch. 11), braces as Euler–Bernoulli beams along their line.
 */
final class RitzSystem {

    final int n;
    final double[][] k;
    final double[][] m;
    private final RitzBasis basis;
    private final double[] w;
    private final double[] wx;
    private final double[] wy;
    private final double[] wxx;
    private final double[] wyy;
    private final double[] wxy;
    private final double[] t1;
    private final double[] t2;
    private final double[] t3;
    private final double[] tm;
    private final double[] t1tmp;

    RitzSystem(RitzBasis basis) {
        this.basis = basis;
        n = basis.size();
        k = new double[n][n];
        m = new double[n][n];
        w = new double[n];
        wx = new double[n];
        wy = new double[n];
        wxx = new double[n];
        wyy = new double[n];
        wxy = new double[n];
        t1 = new double[n];
        t2 = new double[n];
        t3 = new double[n];
        tm = new double[n];
        t1tmp = new double[n];
    }

    /** Adds the plate's bending and kinetic energy by a cubature rule {x[], y[], weight[]}. */
    void addPlate(double[][] rule, PlateMaterial material, ThicknessField thickness) {
        for (int q = 0; q < rule[0].length; q++) {
            double x = rule[0][q];
            double y = rule[1][q];
            double weight = rule[2][q];
            double h = thickness.at(x, y);
            Rigidities d = material.rigidities(h);
            basis.evaluate(x, y, w, wx, wy, wxx, wyy, wxy);
            double mass = weight * material.densityKgPerM3() * h;
            for (int b = 0; b < n; b++) {
                t1[b] = weight * (d.d11() * wxx[b] + d.d12() * wyy[b]);
                t2[b] = weight * (d.d12() * wxx[b] + d.d22() * wyy[b]);
                t3[b] = weight * 4 * d.d66() * wxy[b];
                tm[b] = mass * w[b];
            }
            for (int a = 0; a < n; a++) {
                double[] ka = k[a];
                double[] ma = m[a];
                double xx = wxx[a];
                double yy = wyy[a];
                double xy = wxy[a];
                double ww = w[a];
                for (int b = a; b < n; b++) {
                    ka[b] += xx * t1[b] + yy * t2[b] + xy * t3[b];
                    ma[b] += ww * tm[b];
                }
            }
        }
    }

    /**
     * Adds a uniform plate's energies over a Legendre basis by rows of a Gauss–Green rule: along each row
     * the y-factors are constant, so the integrals are sums of 1-D x-integrals A_pq[i][k] = Σ w P_i^(p) P_k^(q)
     * times products of y-values, a few flops per matrix entry and row instead of per point.
     */
    void addUniformPlate(PolygonBasis pb, List<double[][]> rows, PlateMaterial material, double thickness) {
        Rigidities d = material.rigidities(thickness);
        double rhoH = material.densityKgPerM3() * thickness;
        int m = pb.degree + 1;
        double sx = 1 / pb.hx;
        double sy = 1 / pb.hy;
        double c11 = d.d11() * Math.pow(sx, 4);
        double c22 = d.d22() * Math.pow(sy, 4);
        double c12 = d.d12() * sx * sx * sy * sy;
        double c66 = 4 * d.d66() * sx * sx * sy * sy;
        double[] p = new double[m];
        double[] p1 = new double[m];
        double[] p2 = new double[m];
        double[] q = new double[m];
        double[] q1 = new double[m];
        double[] q2 = new double[m];
        double[][] a00 = new double[m][m];
        double[][] a11 = new double[m][m];
        double[][] a22 = new double[m][m];
        double[][] a20 = new double[m][m];
        int[] pi = pb.pi;
        int[] pj = pb.pj;
        for (double[][] row : rows) {
            for (double[] r : a00) {
                java.util.Arrays.fill(r, 0);
            }
            for (double[] r : a11) {
                java.util.Arrays.fill(r, 0);
            }
            for (double[] r : a22) {
                java.util.Arrays.fill(r, 0);
            }
            for (double[] r : a20) {
                java.util.Arrays.fill(r, 0);
            }
            for (int t = 0; t < row[1].length; t++) {
                Legendre.evaluate((row[1][t] - pb.cx) / pb.hx, m, p, p1, p2);
                double wt = row[2][t];
                for (int i = 0; i < m; i++) {
                    double wp = wt * p[i];
                    double wp1 = wt * p1[i];
                    double wp2 = wt * p2[i];
                    for (int k = 0; k < m; k++) {
                        a00[i][k] += wp * p[k];
                        a11[i][k] += wp1 * p1[k];
                        a22[i][k] += wp2 * p2[k];
                        a20[i][k] += wp2 * p[k];
                    }
                }
            }
            Legendre.evaluate((row[0][0] - pb.cy) / pb.hy, m, q, q1, q2);
            for (int a = 0; a < n; a++) {
                int i = pi[a];
                int j = pj[a];
                double qj = q[j];
                double q1j = q1[j];
                double q2j = q2[j];
                double[] ka = k[a];
                double[] ma = this.m[a];
                double[] r00 = a00[i];
                double[] r11 = a11[i];
                double[] r22 = a22[i];
                double[] r20 = a20[i];
                for (int b = a; b < n; b++) {
                    int kk = pi[b];
                    int l = pj[b];
                    ka[b] += c11 * r22[kk] * qj * q[l] + c22 * r00[kk] * q2j * q2[l]
                            + c12 * (r20[kk] * qj * q2[l] + a20[kk][i] * q2j * q[l]) + c66 * r11[kk] * q1j * q1[l];
                    ma[b] += rhoH * r00[kk] * qj * q[l];
                }
            }
        }
    }

    /**
     * Adds a brace glued on one face: bending ½∫EI (w_ss)² ds about the plate's mid-plane (own second moment
     * b·c³/12 plus the parallel-axis term b·c·(h/2 + c/2)², Steiner), twisting ½∫GJ (w_sn)² ds with
     * J ≈ (1/3)·t³·b·(1 − 0.63 t/b) for a rectangle of sides t ≤ b (Roark's Formulas, table 10.7), and
     * mass ∫ρ·b·c·w² ds, by Gauss–Legendre along its line. A brace is cut with its grain along its length,
     * so its E is the material's E along the grain whatever its angle on the plate.
     */
    void addBrace(Brace brace, PlateMaterial material, ThicknessField thickness, int points) {
        double len = brace.length();
        double c = (brace.x2() - brace.x1()) / len;
        double s = (brace.y2() - brace.y1()) / len;
        double e = material.elasticAlongPa();
        double bw = brace.widthM();
        double bh = brace.heightM();
        double thin = Math.min(bw, bh);
        double thick = Math.max(bw, bh);
        double gj = material.shearPa() * thin * thin * thin * thick / 3 * (1 - 0.63 * thin / thick);
        double massPerLength = material.densityKgPerM3() * bw * bh;
        double[][] rule = PolygonQuadrature.line(brace.x1(), brace.y1(), brace.x2(), brace.y2(), points);
        for (int q = 0; q < points; q++) {
            double x = rule[0][q];
            double y = rule[1][q];
            double h = thickness.at(x, y);
            double arm = h / 2 + bh / 2;
            double ei = e * (bw * bh * bh * bh / 12 + bw * bh * arm * arm);
            basis.evaluate(x, y, w, wx, wy, wxx, wyy, wxy);
            double weight = rule[2][q];
            for (int b = 0; b < n; b++) {
                t1[b] = c * c * wxx[b] + 2 * c * s * wxy[b] + s * s * wyy[b];
                t2[b] = c * s * (wyy[b] - wxx[b]) + (c * c - s * s) * wxy[b];
            }
            rankOne(k, t1, weight * ei);
            rankOne(k, t2, weight * gj);
            rankOne(m, w, weight * massPerLength);
        }
    }

    /**
     * Adds artificial springs along the boundary (the penalty method for Ritz bases that do not meet the
     * edge condition; Courant 1943; used for plates by e.g. Cheung &amp; Zhou 2000, Computers &amp; Structures 77):
     * translational springs kw·∮w² ds, and for a clamped edge rotational springs kr·∮(∂w/∂n)² ds, along
     * the {@link SmoothBoundary}.
     */
    void addEdgeSprings(SmoothBoundary boundary, double half, double kw, double kr, int degree) {
        for (int e = 0; e < boundary.size(); e++) {
            int points = PolygonQuadrature.edgePoints(boundary.chord(e) / half, boundary.curved(e) ? 2 * degree : degree);
            double[][] g = Legendre.gauss(points);
            for (int q = 0; q < points; q++) {
                double[] p = boundary.at(e, (g[0][q] + 1) / 2);
                double speed = Math.hypot(p[2], p[3]);
                double weight = g[1][q] / 2 * speed;
                double nx = p[3] / speed;
                double ny = -p[2] / speed;
                basis.evaluate(p[0], p[1], w, wx, wy, wxx, wyy, wxy);
                rankOne(k, w, weight * kw);
                if (kr > 0) {
                    for (int b = 0; b < n; b++) {
                        t1tmp[b] = nx * wx[b] + ny * wy[b];
                    }
                    rankOne(k, t1tmp, weight * kr);
                }
            }
        }
    }

    private void rankOne(double[][] target, double[] v, double factor) {
        for (int a = 0; a < n; a++) {
            double va = factor * v[a];
            if (va == 0) {
                continue;
            }
            double[] row = target[a];
            for (int b = a; b < n; b++) {
                row[b] += va * v[b];
            }
        }
    }

    /** Copies the upper triangles into the lower ones. */
    void symmetrize() {
        for (int a = 0; a < n; a++) {
            for (int b = a + 1; b < n; b++) {
                k[b][a] = k[a][b];
                m[b][a] = m[a][b];
            }
        }
    }
}
