package org.nodewright.physics.measure;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds the maxima (or minima) of an impedance curve that stand out by a topographic prominence
 * of at least a given number of dB (the drop to the higher of the lowest points met before a
 * higher point on either side; common practice in peak picking), refines each with a parabola
 * through three points in log magnitude, and estimates Q = f0/Δf from the half-power
 * (−3 dB) points, linearly interpolated (common practice for a resonance curve).
 */
public final class ImpedancePeakFinder {

    private ImpedancePeakFinder() {
    }

    /**
     * @param curve          the curve
     * @param minima         false for maxima (closed input end), true for minima (open input end)
     * @param minProminenceDb at least this prominence, dB, non-negative
     * @return extrema in ascending frequency
     */
    public static List<ImpedancePeak> find(ImpedanceCurve curve, boolean minima, double minProminenceDb) {
        if (!(minProminenceDb >= 0) || Double.isInfinite(minProminenceDb)) {
            throw new IllegalArgumentException("prominence must be a non-negative number of dB, got " + minProminenceDb);
        }
        double[] f = curve.frequencyHz();
        double[] mag = curve.magnitude();
        int n = f.length;
        double[] y = new double[n]; // dB, sign-flipped for minima so that we always look for maxima
        for (int i = 0; i < n; i++) {
            y[i] = (minima ? -20 : 20) * Math.log10(mag[i]);
        }
        List<ImpedancePeak> out = new ArrayList<>();
        for (int i = 1; i < n - 1; i++) {
            if (!(y[i] > y[i - 1] && y[i] >= y[i + 1])) {
                continue;
            }
            double leftBase = y[i];
            int j = i - 1;
            while (j >= 0 && y[j] <= y[i]) {
                leftBase = Math.min(leftBase, y[j]);
                j--;
            }
            double rightBase = y[i];
            int k = i + 1;
            while (k < n && y[k] <= y[i]) {
                rightBase = Math.min(rightBase, y[k]);
                k++;
            }
            double prominence = y[i] - Math.max(j < 0 ? rightBase : leftBase, k >= n ? leftBase : rightBase);
            if (j < 0 && k >= n) {
                prominence = y[i] - Math.min(leftBase, rightBase);
            }
            if (prominence < minProminenceDb) {
                continue;
            }
            double[] vertex = parabolaVertex(f[i - 1], y[i - 1], f[i], y[i], f[i + 1], y[i + 1]);
            double level = (minima ? -1 : 1) * vertex[1];
            double q = halfPowerQ(f, y, i, vertex[0], vertex[1]);
            out.add(new ImpedancePeak(vertex[0], Math.pow(10, level / 20), prominence, q));
        }
        return List.copyOf(out);
    }

    /** Vertex of the parabola through three points (x, y); falls back to the middle point. */
    static double[] parabolaVertex(double x0, double y0, double x1, double y1, double x2, double y2) {
        double d = (x0 - x1) * (x0 - x2) * (x1 - x2);
        double a = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / d;
        double b = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / d;
        double c = (x1 * x2 * (x1 - x2) * y0 + x2 * x0 * (x2 - x0) * y1 + x0 * x1 * (x0 - x1) * y2) / d;
        if (!(a < 0)) {
            return new double[] {x1, y1};
        }
        double xv = -b / (2 * a);
        if (xv < x0 || xv > x2) {
            return new double[] {x1, y1};
        }
        return new double[] {xv, c - b * b / (4 * a)};
    }

    private static double halfPowerQ(double[] f, double[] y, int i, double f0, double top) {
        double target = top - 10 * Math.log10(2); // half power: 3.01 dB down
        double lo = Double.NaN;
        for (int j = i; j > 0; j--) {
            if (y[j - 1] > y[j] + 1e-12 && y[j - 1] > target) {
                return Double.NaN; // rose again before falling 3 dB: another resonance
            }
            if (y[j - 1] <= target) {
                lo = f[j - 1] + (target - y[j - 1]) / (y[j] - y[j - 1]) * (f[j] - f[j - 1]);
                break;
            }
        }
        double hi = Double.NaN;
        for (int j = i; j < f.length - 1; j++) {
            if (y[j + 1] > y[j] + 1e-12 && y[j + 1] > target) {
                return Double.NaN;
            }
            if (y[j + 1] <= target) {
                hi = f[j] + (y[j] - target) / (y[j] - y[j + 1]) * (f[j + 1] - f[j]);
                break;
            }
        }
        return Double.isNaN(lo) || Double.isNaN(hi) || hi <= lo ? Double.NaN : f0 / (hi - lo);
    }
}
