package org.nodewright.physics.bars;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.hipparchus.analysis.solvers.BrentSolver;

/**
 * A mode's displacement along the bar as the finite elements interpolate it: one polynomial per
 * element in the local coordinate ξ = (x − x_e)/h_e. Nodes (w = 0) and antinodes (local maxima of
 * |w|) are found by root finding on these polynomials (Brent's method, Hipparchus), not by
 * sampling a grid.
 */
public final class ModeLine {

    /** Sub-intervals per element searched for a sign change (an element holds at most a cubic). */
    private static final int BRACKETS = 6;
    /** Brent's absolute accuracy in ξ (1e-13 of an element: far below a micrometre). */
    private static final double XI_ACCURACY = 1e-13;
    /** Evaluation cap per root. */
    private static final int MAX_EVAL = 200;
    /** Two roots closer than this share of the length are one. */
    private static final double SAME_ROOT = 1e-9;
    /** Two maxima of |w| closer than this share of the length are one antinode (far closer than any two real ones). */
    private static final double SAME_ANTINODE = 2e-3;

    private final double[] x;
    private final double[][] coef;

    ModeLine(double[] boundaries, double[][] coefficients) {
        this.x = boundaries;
        this.coef = coefficients;
    }

    public double length() {
        return x[x.length - 1];
    }

    /** w(x). */
    public double valueAt(double pos) {
        int e = element(pos);
        return horner(coef[e], (pos - x[e]) / (x[e + 1] - x[e]));
    }

    /** dw/dx inside the element holding pos (from the right at a boundary). */
    public double slopeAt(double pos) {
        int e = element(pos);
        double h = x[e + 1] - x[e];
        return derivative(coef[e], (pos - x[e]) / h) / h;
    }

    /** The same line scaled by a factor. */
    ModeLine scaled(double factor) {
        double[][] c = new double[coef.length][];
        for (int e = 0; e < coef.length; e++) {
            c[e] = coef[e].clone();
            for (int j = 0; j < c[e].length; j++) {
                c[e][j] *= factor;
            }
        }
        return new ModeLine(x, c);
    }

    /** Interior zeros of w (sign changes), ascending; the ends are left to the caller. */
    List<Double> interiorZeros() {
        List<Double> roots = new ArrayList<>();
        BrentSolver brent = new BrentSolver(XI_ACCURACY);
        double len = length();
        for (int e = 0; e < coef.length; e++) {
            double[] c = coef[e];
            addRoots(roots, brent, c, e, false);
        }
        return clean(roots, len, true);
    }

    /**
     * Interior points where |w| has a local maximum: zeros of dw/dx inside an element, and element
     * boundaries where the slope changes sign (a Timoshenko element's dw/dx may jump there).
     */
    List<Double> interiorMaxima() {
        List<Double> found = new ArrayList<>();
        BrentSolver brent = new BrentSolver(XI_ACCURACY);
        for (int e = 0; e < coef.length; e++) {
            double[] d = derivativeCoefficients(coef[e]);
            addRoots(found, brent, d, e, true);
            if (e + 1 < coef.length) {
                double left = derivative(coef[e], 1.0);
                double right = derivative(coef[e + 1], 0.0);
                if (left * right < 0) {
                    found.add(x[e + 1]);
                }
            }
        }
        double len = length();
        List<Double> maxima = new ArrayList<>();
        double delta = 1e-6 * len;
        for (double p : clean(found, len, true)) {
            double w = Math.abs(valueAt(p));
            if (w > Math.abs(valueAt(p - delta)) && w > Math.abs(valueAt(p + delta))) {
                maxima.add(p);
            }
        }
        return mergeClusters(maxima, SAME_ANTINODE * len);
    }

    /**
     * Maxima closer than {@code gap} are one antinode at their mean position: a C⁰ Timoshenko
     * element's slope may jump at a boundary lying on the crest and split it in two.
     */
    private static List<Double> mergeClusters(List<Double> maxima, double gap) {
        List<Double> out = new ArrayList<>();
        int i = 0;
        while (i < maxima.size()) {
            int j = i;
            double sum = maxima.get(i);
            while (j + 1 < maxima.size() && maxima.get(j + 1) - maxima.get(j) < gap) {
                j++;
                sum += maxima.get(j);
            }
            out.add(sum / (j - i + 1));
            i = j + 1;
        }
        return out;
    }

    /** The largest |w| over the bar, from the element polynomials' ends and stationary points. */
    double maximumMagnitude() {
        double max = 0;
        for (double[] c : coef) {
            max = Math.max(max, Math.max(Math.abs(c[0]), Math.abs(horner(c, 1.0))));
        }
        for (double p : interiorMaxima()) {
            max = Math.max(max, Math.abs(valueAt(p)));
        }
        return max;
    }

    private void addRoots(List<Double> roots, BrentSolver brent, double[] c, int e, boolean skipEnds) {
        double h = x[e + 1] - x[e];
        double a = 0;
        double fa = horner(c, 0);
        for (int j = 1; j <= BRACKETS; j++) {
            double b = (double) j / BRACKETS;
            double fb = horner(c, b);
            if (fa * fb < 0) {
                double r = brent.solve(MAX_EVAL, xi -> horner(c, xi), a, b);
                roots.add(x[e] + r * h);
            } else if (fb == 0 && !(skipEnds && j == BRACKETS)) {
                roots.add(x[e] + b * h);
            }
            a = b;
            fa = fb;
        }
    }

    private static List<Double> clean(List<Double> roots, double len, boolean dropEnds) {
        double[] r = roots.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        List<Double> out = new ArrayList<>();
        for (double v : r) {
            if (dropEnds && (v <= SAME_ROOT * len || v >= len * (1 - SAME_ROOT))) {
                continue;
            }
            if (!out.isEmpty() && v - out.get(out.size() - 1) < SAME_ROOT * len) {
                continue;
            }
            out.add(v);
        }
        return out;
    }

    /** Samples of w at {@code count} evenly spaced points 0..L. */
    double[] sample(double[] positions) {
        double[] w = new double[positions.length];
        for (int i = 0; i < positions.length; i++) {
            w[i] = valueAt(positions[i]);
        }
        return w;
    }

    private int element(double pos) {
        if (pos <= x[0]) {
            return 0;
        }
        if (pos >= x[x.length - 1]) {
            return coef.length - 1;
        }
        int i = Arrays.binarySearch(x, pos);
        if (i >= 0) {
            return Math.min(i, coef.length - 1);
        }
        return -i - 2;
    }

    static double horner(double[] c, double t) {
        double s = 0;
        for (int j = c.length - 1; j >= 0; j--) {
            s = s * t + c[j];
        }
        return s;
    }

    static double derivative(double[] c, double t) {
        double s = 0;
        for (int j = c.length - 1; j >= 1; j--) {
            s = s * t + j * c[j];
        }
        return s;
    }

    private static double[] derivativeCoefficients(double[] c) {
        double[] d = new double[Math.max(1, c.length - 1)];
        for (int j = 1; j < c.length; j++) {
            d[j - 1] = j * c[j];
        }
        return d;
    }
}
