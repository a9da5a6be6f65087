package org.nodewright.physics.strings;

import org.nodewright.physics.Require;

/**
 * X(ξ) = sin(nπξ): the exact mode shape of a flexible string, and of a stiff string with pinned
 * (hinged) ends, whose beam-under-tension equation is solved exactly by sines.
 *
 * @param n mode number, 1 or more
 */
public record SineShape(int n) implements ModeShape {

    public SineShape {
        Require.atLeastOne("mode number", n);
    }

    @Override
    public double value(double xi) {
        return Math.sin(n * Math.PI * xi);
    }

    /** Mean of sin(kξ) over [m−h, m+h] = sin(k·m)·sin(k·h)/(k·h), exact and free of cancellation. */
    @Override
    public double average(double lo, double hi) {
        double k = n * Math.PI;
        double m = (lo + hi) / 2;
        double h = (hi - lo) / 2;
        return Math.sin(k * m) * sinc(k * h);
    }

    static double sinc(double u) {
        if (Math.abs(u) < 1e-4) {
            return 1 - u * u / 6; // Taylor series, error below u⁴/120 ≈ 1e-18
        }
        return Math.sin(u) / u;
    }

    /** Nodes at ξ = k/n, k = 0..n. */
    @Override
    public double[] nodes() {
        double[] xs = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            xs[k] = (double) k / n;
        }
        return xs;
    }

    /** Antinodes at ξ = (2k − 1)/(2n), k = 1..n. */
    @Override
    public double[] antinodes() {
        double[] xs = new double[n];
        for (int k = 1; k <= n; k++) {
            xs[k - 1] = (2.0 * k - 1) / (2.0 * n);
        }
        return xs;
    }
}
