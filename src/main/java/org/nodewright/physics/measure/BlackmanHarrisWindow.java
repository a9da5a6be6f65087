package org.nodewright.physics.measure;

/**
 * Analysis window for a decaying recording: the falling half of the four-term Blackman–Harris
 * window (F. J. Harris, "On the use of windows for harmonic analysis with the discrete Fourier
 * transform", Proc. IEEE 66(1), 1978, table I: a0 0.35875, a1 0.48829, a2 0.14128, a3 0.01168),
 * so that the loud start of a pluck, where the fast-dying high partials live, has full weight,
 * preceded by a short raised-cosine rise so that the cut at the onset does not leak far.
 * The magnitude spectrum of any real envelope times e^{iωt} is symmetric about ω, so a one-sided
 * window keeps each peak centred on its partial.
 */
public final class BlackmanHarrisWindow {

    private static final double A0 = 0.35875;
    private static final double A1 = 0.48829;
    private static final double A2 = 0.14128;
    private static final double A3 = 0.01168;

    private BlackmanHarrisWindow() {
    }

    /**
     * The full, symmetric window's n coefficients (Harris 1978, eq. 33).
     */
    public static double[] symmetric(int n) {
        if (n < 2) {
            throw new IllegalArgumentException("a window needs at least 2 points, got " + n);
        }
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = value((double) i / n);
        }
        return w;
    }

    /**
     * Falling half of the window over n points, with a raised-cosine rise over the first
     * {@code rise} points.
     */
    public static double[] decaying(int n, int rise) {
        if (n < 2 || rise < 0 || rise >= n) {
            throw new IllegalArgumentException("need n >= 2 and 0 <= rise < n, got n " + n + ", rise " + rise);
        }
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            w[i] = value(0.5 + 0.5 * (double) i / n);
            if (i < rise) {
                w[i] *= 0.5 - 0.5 * Math.cos(Math.PI * i / rise);
            }
        }
        return w;
    }

    /**
     * w(x) = a0 − a1 cos 2πx + a2 cos 4πx − a3 cos 6πx for x in [0, 1) (Harris 1978, eq. 33), with
     * cos 2θ = 2c² − 1 and cos 3θ = 4c³ − 3c so that one cosine serves all three terms (this runs
     * once per sample of a recording: a third of the cost).
     */
    private static double value(double x) {
        double c = Math.cos(2 * Math.PI * x);
        double c2 = 2 * c * c - 1;
        double c3 = (4 * c * c - 3) * c;
        return A0 - A1 * c + A2 * c2 - A3 * c3;
    }
}
