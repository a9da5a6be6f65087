package org.nodewright.physics.plates;

/** Legendre polynomials and Gauss–Legendre rules on [-1, 1]. */
final class Legendre {

    private Legendre() {
    }

    /**
     * Fills p[k], d1[k], d2[k] with P_k(x), P_k'(x), P_k''(x) for k &lt; count, by Bonnet's recursion
     * (k+1) P_{k+1} = (2k+1) x P_k − k P_{k−1} and P'_{k+1} = P'_{k−1} + (2k+1) P_k (Abramowitz &amp; Stegun 22.7, 22.8).
     */
    static void evaluate(double x, int count, double[] p, double[] d1, double[] d2) {
        p[0] = 1;
        d1[0] = 0;
        d2[0] = 0;
        if (count == 1) {
            return;
        }
        p[1] = x;
        d1[1] = 1;
        d2[1] = 0;
        for (int k = 1; k + 1 < count; k++) {
            p[k + 1] = ((2 * k + 1) * x * p[k] - k * p[k - 1]) / (k + 1);
            d1[k + 1] = d1[k - 1] + (2 * k + 1) * p[k];
            d2[k + 1] = d2[k - 1] + (2 * k + 1) * d1[k];
        }
    }

    /** Nodes (row 0) and weights (row 1) of the n-point Gauss–Legendre rule, by Newton's method on P_n. */
    static double[][] gauss(int n) {
        double[] x = new double[n];
        double[] w = new double[n];
        for (int i = 0; i < (n + 1) / 2; i++) {
            double z = Math.cos(Math.PI * (i + 0.75) / (n + 0.5));
            double dp = 0;
            for (int it = 0; it < 100; it++) {
                double p0 = 1;
                double p1 = z;
                for (int k = 1; k < n; k++) {
                    double p2 = ((2 * k + 1) * z * p1 - k * p0) / (k + 1);
                    p0 = p1;
                    p1 = p2;
                }
                double pn = n == 0 ? 1 : p1;
                double pm = n == 1 ? 1 : p0;
                dp = n * (z * pn - pm) / (z * z - 1);
                double dz = pn / dp;
                z -= dz;
                if (Math.abs(dz) < 1e-15) {
                    break;
                }
            }
            x[i] = -z;
            x[n - 1 - i] = z;
            w[i] = 2 / ((1 - z * z) * dp * dp);
            w[n - 1 - i] = w[i];
        }
        return new double[][] {x, w};
    }
}
