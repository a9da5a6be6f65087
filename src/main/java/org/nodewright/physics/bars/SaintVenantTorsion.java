package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/** Saint-Venant torsion constant of a solid rectangle. */
public final class SaintVenantTorsion {

    /** Odd terms of the series kept: the 19th term is below 1e-6 of the first for any aspect ratio. */
    private static final int TERMS = 10;

    private SaintVenantTorsion() {
    }

    /**
     * J = (a b³ / 3) [1 − (192 b / (π⁵ a)) Σ_{n odd} tanh(n π a / (2 b)) / n⁵], a ≥ b the long and short
     * sides (Timoshenko and Goodier, Theory of Elasticity, 1951, §109, eq. 163).
     */
    public static double rectangle(double side1, double side2) {
        Require.positive("side1", side1);
        Require.positive("side2", side2);
        double a = Math.max(side1, side2);
        double b = Math.min(side1, side2);
        double sum = 0;
        for (int k = 0; k < TERMS; k++) {
            int n = 2 * k + 1;
            sum += Math.tanh(n * Math.PI * a / (2 * b)) / Math.pow(n, 5);
        }
        return a * b * b * b / 3.0 * (1 - 192.0 * b / (Math.pow(Math.PI, 5) * a) * sum);
    }
}
