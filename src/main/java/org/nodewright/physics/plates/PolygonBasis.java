package org.nodewright.physics.plates;

/**
 * Products P_i(ξ) P_j(η) of Legendre polynomials of total degree i + j ≤ degree over the outline's
 * bounding box mapped to [-1, 1]²: a complete polynomial Ritz basis for any outline.
 */
final class PolygonBasis implements RitzBasis {

    final int degree;
    final double cx;
    final double cy;
    final double hx;
    final double hy;
    final int[] pi;
    final int[] pj;

    PolygonBasis(double[] bounds, int degree) {
        this.degree = degree;
        cx = (bounds[0] + bounds[2]) / 2;
        cy = (bounds[1] + bounds[3]) / 2;
        hx = (bounds[2] - bounds[0]) / 2;
        hy = (bounds[3] - bounds[1]) / 2;
        int n = (degree + 1) * (degree + 2) / 2;
        pi = new int[n];
        pj = new int[n];
        int a = 0;
        for (int total = 0; total <= degree; total++) {
            for (int i = total; i >= 0; i--) {
                pi[a] = i;
                pj[a] = total - i;
                a++;
            }
        }
    }

    @Override
    public int size() {
        return pi.length;
    }

    @Override
    public void evaluate(double x, double y, double[] w, double[] wx, double[] wy, double[] wxx, double[] wyy,
                         double[] wxy) {
        int m = degree + 1;
        double[][] px = RitzBasis.axis(m);
        double[][] qy = RitzBasis.axis(m);
        Legendre.evaluate((x - cx) / hx, m, px[0], px[1], px[2]);
        Legendre.evaluate((y - cy) / hy, m, qy[0], qy[1], qy[2]);
        double sx = 1 / hx;
        double sy = 1 / hy;
        for (int a = 0; a < pi.length; a++) {
            RitzBasis.product(a, px, pi[a], sx, qy, pj[a], sy, w, wx, wy, wxx, wyy, wxy);
        }
    }
}
