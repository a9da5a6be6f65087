package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * A smooth symmetric undercut of a few parameters, centred on the bar: over |x − L/2| ≤ a the
 * thickness is t(u) = t0 − d · g(u), u = |x − L/2| / a, with g(u) = (1 − u²)(1 + c u²); outside it
 * the bar keeps its blank thickness t0 (the flat ends that carry the cords). c = 0 is a parabola;
 * c > 0 widens the cut towards a flat bottom, c < 0 narrows it to the centre.
 *
 * @param depth      d, the depth at the centre, m
 * @param halfLength a, half the undercut's length, m
 * @param shape      c, dimensionless (−0.9 .. 3)
 */
public record UndercutShape(double depth, double halfLength, double shape) {

    /** Straight pieces per half of the undercut when it is drawn as a piecewise-linear profile. */
    public static final int PIECES_PER_HALF = 8;

    public UndercutShape {
        Require.nonNegative("depth", depth);
        Require.positive("halfLength", halfLength);
        Require.finite("shape", shape);
    }

    /** g(u) = (1 − u²)(1 + c u²). */
    public double g(double u) {
        double u2 = u * u;
        return (1 - u2) * (1 + shape * u2);
    }

    /** The largest g over 0 ≤ u ≤ 1: 1, or 1 + (c − 1)²/(4c) when c > 1 (the crest moves off centre). */
    public static double gMax(double c) {
        return c > 1 ? 1 + (c - 1) * (c - 1) / (4 * c) : 1.0;
    }

    /** The thinnest point of the cut bar. */
    public double minimumThickness(double blank) {
        return blank - depth * gMax(shape);
    }

    /** The undercut as a piecewise-linear profile over 0..length from a blank of thickness {@code blank}. */
    public ThicknessProfile profile(double length, double blank) {
        double mid = length / 2;
        double a = Math.min(halfLength, mid);
        int k = PIECES_PER_HALF;
        boolean flat = a < mid * (1 - 1e-9);
        int n = 2 * k + 1 + (flat ? 2 : 0);
        double[] x = new double[n];
        double[] t = new double[n];
        int i = 0;
        if (flat) {
            x[i] = 0;
            t[i++] = blank;
        }
        for (int j = k; j >= 1; j--) {
            double u = (double) j / k;
            x[i] = mid - u * a;
            t[i++] = blank - depth * g(u);
        }
        x[i] = mid;
        t[i++] = blank - depth;
        for (int j = 1; j <= k; j++) {
            double u = (double) j / k;
            x[i] = mid + u * a;
            t[i++] = blank - depth * g(u);
        }
        if (flat) {
            x[i] = length;
            t[i] = blank;
        } else {
            x[0] = 0;
            x[n - 1] = length;
        }
        return ThicknessProfile.of(x, t);
    }
}
