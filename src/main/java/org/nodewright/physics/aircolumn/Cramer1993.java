package org.nodewright.physics.aircolumn;

/**
 * Cramer's fits for the zero-frequency speed of sound and ratio of specific heats of humid air,
 * J. Acoust. Soc. Am. 93(5), 2510-2516 (1993), eqs. (15) and (16) with the coefficients of his
 * Table III (valid 0..30 C, 75..102 kPa, xw up to 0.06, xc up to 0.01). Coefficients from memory of
 * that table; the check value 343.36 m/s at 20 C dry is the one usually quoted for the formula.
 */
final class Cramer1993 {

    private static final double[] A = {331.5024, 0.603055, -0.000528, 51.471935, 0.1495874, -0.000782, -1.82e-7,
        3.73e-8, -2.93e-10, -85.20931, -0.228525, 5.91e-5, -2.835149, -2.15e-13, 29.179762, 0.000486};
    private static final double[] B = {1.400822, -1.75e-5, -1.73e-7, -0.0873629, -0.0001665, -3.26e-6, 2.047e-8,
        -1.26e-10, 5.939e-14, -0.1199717, -0.0008693, 1.979e-6, -0.01104, -3.478e-16, 0.0450616, 1.82e-6};

    private Cramer1993() {
    }

    /** Speed of sound, m/s: Cramer 1993 eq. (15); t in C, p in Pa, xw and xc mole fractions. */
    static double speedOfSound(double t, double p, double xw, double xc) {
        return poly(A, t, p, xw, xc);
    }

    /** Ratio of specific heats: Cramer 1993 eq. (16). */
    static double ratioOfSpecificHeats(double t, double p, double xw, double xc) {
        return poly(B, t, p, xw, xc);
    }

    // Cramer 1993: a0 + a1 t + a2 t^2 + (a3 + a4 t + a5 t^2) xw + (a6 + a7 t + a8 t^2) p
    //   + (a9 + a10 t + a11 t^2) xc + a12 xw^2 + a13 p^2 + a14 xc^2 + a15 xw p xc
    private static double poly(double[] a, double t, double p, double xw, double xc) {
        double t2 = t * t;
        return a[0] + a[1] * t + a[2] * t2 + (a[3] + a[4] * t + a[5] * t2) * xw + (a[6] + a[7] * t + a[8] * t2) * p
                + (a[9] + a[10] * t + a[11] * t2) * xc + a[12] * xw * xw + a[13] * p * p + a[14] * xc * xc
                + a[15] * xw * p * xc;
    }
}
