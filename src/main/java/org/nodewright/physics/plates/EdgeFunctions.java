package org.nodewright.physics.plates;

/**
 * One-dimensional trial functions on ξ in [-1, 1] meeting an edge condition at both ends, orthonormal:
 * the boundary factor b(ξ) times Legendre polynomials, b = 1 (free), 1 − ξ² (simply supported),
 * (1 − ξ²)² (clamped), made orthonormal by Gram–Schmidt (the characteristic orthogonal polynomials of
 * Bhat 1985, "Natural frequencies of rectangular plates using characteristic orthogonal polynomials in
 * Rayleigh-Ritz method", J. Sound Vib. 102). Orthonormalising keeps the parity of each function.
 */
final class EdgeFunctions {

    private final int count;
    private final int power;
    /** Lower-triangular Cholesky factor of the Gram matrix of b·P_k: φ = L⁻¹ g. */
    private final double[][] chol;

    EdgeFunctions(int count, EdgeCondition edge) {
        this.count = count;
        this.power = switch (edge) {
            case FREE -> 0;
            case SIMPLY_SUPPORTED -> 1;
            case CLAMPED -> 2;
        };
        double[][] rule = Legendre.gauss(count + 4);
        double[][] gram = new double[count][count];
        double[] g = new double[count];
        double[] g1 = new double[count];
        double[] g2 = new double[count];
        for (int q = 0; q < rule[0].length; q++) {
            raw(rule[0][q], g, g1, g2);
            for (int i = 0; i < count; i++) {
                for (int j = 0; j <= i; j++) {
                    gram[i][j] += rule[1][q] * g[i] * g[j];
                }
            }
        }
        chol = new double[count][count];
        for (int i = 0; i < count; i++) {
            for (int j = 0; j <= i; j++) {
                double s = gram[i][j];
                for (int k = 0; k < j; k++) {
                    s -= chol[i][k] * chol[j][k];
                }
                chol[i][j] = i == j ? Math.sqrt(s) : s / chol[j][j];
            }
        }
    }

    int count() {
        return count;
    }

    /** The boundary factor times Legendre polynomials and their first two derivatives, before orthonormalising. */
    private void raw(double xi, double[] g, double[] g1, double[] g2) {
        Legendre.evaluate(xi, count, g, g1, g2);
        double b;
        double b1;
        double b2;
        double u = 1 - xi * xi;
        switch (power) {
            case 0 -> {
                return;
            }
            case 1 -> {
                b = u;
                b1 = -2 * xi;
                b2 = -2;
            }
            default -> {
                b = u * u;
                b1 = -4 * xi * u;
                b2 = -4 * u + 8 * xi * xi;
            }
        }
        for (int k = 0; k < count; k++) {
            double p = g[k];
            double p1 = g1[k];
            double p2 = g2[k];
            g[k] = b * p;
            g1[k] = b1 * p + b * p1;
            g2[k] = b2 * p + 2 * b1 * p1 + b * p2;
        }
    }

    /** Values and ξ-derivatives of the orthonormal functions at ξ. */
    void evaluate(double xi, double[] f, double[] f1, double[] f2) {
        raw(xi, f, f1, f2);
        for (int i = 0; i < count; i++) {
            double s = f[i];
            double s1 = f1[i];
            double s2 = f2[i];
            for (int k = 0; k < i; k++) {
                s -= chol[i][k] * f[k];
                s1 -= chol[i][k] * f1[k];
                s2 -= chol[i][k] * f2[k];
            }
            f[i] = s / chol[i][i];
            f1[i] = s1 / chol[i][i];
            f2[i] = s2 / chol[i][i];
        }
    }

    /**
     * Integrals over [-1, 1] in ξ: {E1, E2, E20} with E1_ij = ∫φ_i'φ_j', E2_ij = ∫φ_i''φ_j'',
     * E20_ij = ∫φ_i''φ_j (and ∫φ_iφ_j = δ_ij), by Gauss–Legendre exact for these polynomials.
     */
    double[][][] integrals() {
        double[][] rule = Legendre.gauss(count + 4);
        double[][] e1 = new double[count][count];
        double[][] e2 = new double[count][count];
        double[][] e20 = new double[count][count];
        double[] f = new double[count];
        double[] f1 = new double[count];
        double[] f2 = new double[count];
        for (int q = 0; q < rule[0].length; q++) {
            evaluate(rule[0][q], f, f1, f2);
            double w = rule[1][q];
            for (int i = 0; i < count; i++) {
                for (int j = 0; j < count; j++) {
                    e1[i][j] += w * f1[i] * f1[j];
                    e2[i][j] += w * f2[i] * f2[j];
                    e20[i][j] += w * f2[i] * f[j];
                }
            }
        }
        return new double[][][] {e1, e2, e20};
    }
}
