package org.nodewright.physics.plates;

import java.util.ArrayList;
import java.util.List;

/**
 * Product Gauss cubature over a polygon from Green's theorem (Sommariva &amp; Vianello 2007, "Product Gauss
 * cubature over polygons based on Green's integration formula", BIT 47): ∫∫ f dA = ∮ F dy with
 * F(x, y) = ∫ from x0 to x of f(t, y) dt, Gauss–Legendre along each edge and along each horizontal
 * segment to the line x = x0. Exact for polynomials of the given degree; no triangulation needed and
 * the work grows with the outline's length, not its number of corners (short edges of a finely drawn
 * outline get fewer points, see {@link #edgePoints}). Edges run along the {@link SmoothBoundary} (Gauss–Green
 * holds on curved pieces too: Sommariva &amp; Vianello 2009 for spline boundaries). Weights may be negative.
 */
final class PolygonQuadrature {

    private PolygonQuadrature() {
    }

    /**
     * The same rule grouped by rows: each row {y, x[], weight[]} shares one y (one Gauss point along an edge),
     * which lets a uniform plate's integrals factor into 1-D sums along x.
     */
    static List<double[][]> rows(Outline outline, int degree) {
        double[][] all = rule(outline, degree, 0);
        int inner = (degree + 2) / 2;
        List<double[][]> rows = new ArrayList<>();
        for (int start = 0; start < all[0].length; start += inner) {
            double[][] row = new double[3][];
            row[0] = new double[] {all[1][start]};
            row[1] = java.util.Arrays.copyOfRange(all[0], start, start + inner);
            row[2] = java.util.Arrays.copyOfRange(all[2], start, start + inner);
            rows.add(row);
        }
        return rows;
    }

    /** {x[], y[], weight[]} for integrands of total degree {@code degree} (plus {@code extra} inner points). */
    static double[][] rule(Outline outline, int degree, int extra) {
        double[] b = outline.bounds();
        double x0 = (b[0] + b[2]) / 2;
        double half = Math.max(b[2] - b[0], b[3] - b[1]) / 2;
        int inner = (degree + 2) / 2 + extra;
        double[][] gi = Legendre.gauss(inner);
        List<double[]> pts = new ArrayList<>();
        SmoothBoundary boundary = new SmoothBoundary(outline);
        for (int e = 0; e < boundary.size(); e++) {
            int along = edgePoints(boundary.chord(e) / half, boundary.curved(e) ? 3 * degree + 3 : degree + 1) + extra;
            double[][] ge = Legendre.gauss(along);
            for (int s = 0; s < along; s++) {
                double[] p = boundary.at(e, (ge[0][s] + 1) / 2);
                double dy = p[3] / 2;
                double half2 = (p[0] - x0) / 2;
                if (dy == 0 || half2 == 0) {
                    continue;
                }
                for (int r = 0; r < inner; r++) {
                    double xt = x0 + half2 * (1 + gi[0][r]);
                    pts.add(new double[] {xt, p[1], ge[1][s] * dy * half2 * gi[1][r]});
                }
            }
        }
        double[][] out = new double[3][pts.size()];
        for (int i = 0; i < pts.size(); i++) {
            out[0][i] = pts.get(i)[0];
            out[1][i] = pts.get(i)[1];
            out[2][i] = pts.get(i)[2];
        }
        return out;
    }

    /**
     * Gauss points along an edge for a polynomial of the given degree: exact ((degree + 2)/2) on long
     * edges; on an edge of length ℓ (relative to the half-size of the box) a polynomial of degree d varies
     * like a wave of about d·ℓ/2 radians, so fewer points reach rounding error there.
     */
    static int edgePoints(double relativeLength, int degree) {
        int exact = (degree + 2) / 2;
        int enough = (int) Math.ceil(0.6 * degree * relativeLength) + 4;
        return Math.max(1, Math.min(exact, enough));
    }

    /** Gauss–Legendre points along a segment: {x[], y[], weight[]} with weights in metres. */
    static double[][] line(double xa, double ya, double xb, double yb, int count) {
        double[][] g = Legendre.gauss(count);
        double half = Math.hypot(xb - xa, yb - ya) / 2;
        double[][] out = new double[3][count];
        for (int i = 0; i < count; i++) {
            out[0][i] = (xa + xb) / 2 + g[0][i] * (xb - xa) / 2;
            out[1][i] = (ya + yb) / 2 + g[0][i] * (yb - ya) / 2;
            out[2][i] = g[1][i] * half;
        }
        return out;
    }
}
