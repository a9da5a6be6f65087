package org.nodewright.physics.aircolumn;

/**
 * Cosine and sine of small angles by their Taylor series (Abramowitz &amp; Stegun 4.3.65-66), used in
 * the hot loops where the angles are known to be small; exact library calls otherwise.
 */
final class SmallAngle {

    /** Below this |x| the series to x^13 is exact to double precision (next term &lt; 1e-16). */
    static final double LIMIT = 0.5;

    private static final double C2 = 1.0 / 2, C4 = 1.0 / 24, C6 = 1.0 / 720, C8 = 1.0 / 40320,
            C10 = 1.0 / 3628800, C12 = 1.0 / 479001600;
    private static final double S3 = 1.0 / 6, S5 = 1.0 / 120, S7 = 1.0 / 5040, S9 = 1.0 / 362880,
            S11 = 1.0 / 39916800, S13 = 1.0 / 6227020800.0;

    private SmallAngle() {
    }

    static double cos(double x) {
        if (Math.abs(x) >= LIMIT) {
            return Math.cos(x);
        }
        double x2 = x * x;
        return 1 - x2 * (C2 - x2 * (C4 - x2 * (C6 - x2 * (C8 - x2 * (C10 - x2 * C12)))));
    }

    static double sin(double x) {
        if (Math.abs(x) >= LIMIT) {
            return Math.sin(x);
        }
        double x2 = x * x;
        return x * (1 - x2 * (S3 - x2 * (S5 - x2 * (S7 - x2 * (S9 - x2 * (S11 - x2 * S13))))));
    }

    /** e^{-x} for small |x| by its series to x^9 (A&amp;S 4.2.1), else the library. */
    static double expNeg(double x) {
        if (Math.abs(x) >= 0.1) {
            return Math.exp(-x);
        }
        return 1 - x * (1 - x * (0.5 - x * (S3 - x * (C4 - x * (S5 - x * (C6 - x * (S7 - x * (C8 - x * S9))))))));
    }
}
