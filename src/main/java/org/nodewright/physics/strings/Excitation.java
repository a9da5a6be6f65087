package org.nodewright.physics.strings;

/**
 * Modal displacement amplitudes of a flexible string set in motion at one point, from its sine
 * (Fourier) series.
 */
public final class Excitation {

    private Excitation() {
    }

    /**
     * Triangular pluck of height h at x_p: b_n/h = 2L²/(n²π²·x_p(L − x_p))·sin(nπx_p/L)
     * (the Fourier sine series of the plucked string; e.g. Fletcher &amp; Rossing, eq. 2.21).
     */
    public static double pluck(int n, double lengthM, double positionM) {
        double l = lengthM;
        double x = positionM;
        return 2 * l * l / (n * n * Math.PI * Math.PI * x * (l - x)) * Math.sin(n * Math.PI * x / l);
    }

    /** Point impulse (hammer strike) at x_h: displacement amplitude ∝ sin(nπx_h/L)/n (ω_n ∝ n). */
    public static double strike(int n, double lengthM, double positionM) {
        return Math.sin(n * Math.PI * positionM / lengthM) / n;
    }
}
