package org.nodewright.physics.aircolumn;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;
import org.hipparchus.optim.univariate.UnivariatePointValuePair;

/**
 * Finds the playing resonances on a sampled input-impedance curve and refines each beyond the grid:
 * a peak at least {@link #WIDE_PEAK_CELLS} cells wide by the vertex of the parabola through the
 * three samples of ln|Z| around it; a sharper one by Brent's method (Hipparchus
 * {@link BrentOptimizer}) on ln|Z| (closed input, maxima) or -ln|Z| (open input, minima) within
 * the two grid cells around the sampled extremum. The quality factor
 * is f0 / (f+ - f-), f+- the half-power points where |Z|^2 (or |Y|^2) falls to half its extreme,
 * interpolated on the grid when the bandwidth spans several cells, else solved with Hipparchus
 * {@link BrentSolver}.
 */
public final class ResonanceFinder {

    /** Minimum prominence of a peak of ln|Z| over its higher neighbouring valley (about 0.9 dB). */
    static final double MIN_PROMINENCE = 0.1;
    private static final double HALF_POWER = 0.5 * Math.log(2);
    private static final int MAX_EVAL = 60;
    private static final double MAX_Q = 1e7;
    /** Peaks whose half-power half-width spans at least this many cells are refined on the grid. */
    static final int WIDE_PEAK_CELLS = 8;

    private final TransferMatrixSolver solver;
    private final double sign;

    public ResonanceFinder(TransferMatrixSolver solver) {
        this.solver = solver;
        this.sign = solver.column().inputEnd() == InputEnd.CLOSED ? 1 : -1;
    }

    /** Objective: +-ln|Z| at one frequency. */
    double objective(double f) {
        double[] z = solver.inputImpedance(f);
        return sign * 0.5 * Math.log(z[0] * z[0] + z[1] * z[1]);
    }

    /**
     * Resonances from a sampled curve on the uniform grid f0 + i df.
     *
     * @param limit at most this many resonances (lowest first)
     */
    public List<Resonance> find(double f0, double df, double[] re, double[] im, int limit) {
        int n = re.length;
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            h[i] = sign * 0.5 * Math.log(re[i] * re[i] + im[i] * im[i]);
        }
        List<Resonance> out = new ArrayList<>();
        for (int i = 1; i < n - 1 && out.size() < limit; i++) {
            if (!(h[i] > h[i - 1] && h[i] >= h[i + 1])) {
                continue;
            }
            int l = i;
            while (l > 0 && h[l - 1] <= h[l]) {
                l--;
            }
            int r = i;
            while (r < n - 1 && h[r + 1] <= h[r]) {
                r++;
            }
            double valley = Math.max(h[l], h[r]);
            if (h[i] - valley < MIN_PROMINENCE) {
                continue;
            }
            double lo = f0 + (i - 1) * df;
            double hi = f0 + (i + 1) * df;
            double fr = f0 + i * df;
            double peak = h[i];
            double width = halfWidthInCells(h, i, l, r);
            if (width >= WIDE_PEAK_CELLS) {
                // A peak many cells wide: the parabola through ln|Z| at the three samples locates it
                // to a small fraction of a cell (error ~ (df / bandwidth)^2 of the offset), with no
                // further evaluations; Q from the grid-interpolated half-power points.
                double den = h[i - 1] - 2 * h[i] + h[i + 1];
                double t = den < 0 ? 0.5 * (h[i - 1] - h[i + 1]) / den : 0;
                fr = f0 + (i + t) * df;
                peak = h[i] - 0.25 * (h[i - 1] - h[i + 1]) * t;
                double q = quality(f0, df, h, i, l, r, fr, peak);
                out.add(new Resonance(out.size() + 1, fr, q, Math.exp(sign * peak)));
                continue;
            }
            try {
                UnivariatePointValuePair best = new BrentOptimizer(1e-12, 1e-9).optimize(new MaxEval(MAX_EVAL),
                        new UnivariateObjectiveFunction(this::objective), GoalType.MAXIMIZE,
                        new SearchInterval(lo, hi, f0 + i * df));
                if (best.getValue() >= peak || Double.isNaN(peak)) {
                    fr = best.getPoint();
                    peak = best.getValue();
                }
            } catch (RuntimeException e) {
                // Brent did not converge within its evaluation cap: keep the grid extremum.
            }
            double q = quality(f0, df, h, i, l, r, fr, peak);
            out.add(new Resonance(out.size() + 1, fr, q, Math.exp(sign * peak)));
        }
        return out;
    }

    /** Cells from the sample peak to the nearer half-power crossing (0 when not bracketed). */
    private static int halfWidthInCells(double[] h, int i, int l, int r) {
        double target = h[i] - HALF_POWER;
        int left = i;
        while (left > l && h[left] >= target) {
            left--;
        }
        int right = i;
        while (right < r && h[right] >= target) {
            right++;
        }
        if (h[left] >= target || h[right] >= target) {
            return 0;
        }
        return Math.min(i - left, right - i);
    }

    private double quality(double f0, double df, double[] h, int i, int l, int r, double fr, double peak) {
        if (!Double.isFinite(peak)) {
            return Double.NaN;
        }
        double target = peak - HALF_POWER;
        double lower = crossing(f0, df, h, i, l, -1, target);
        double upper = crossing(f0, df, h, i, r, +1, target);
        if (Double.isNaN(lower) || Double.isNaN(upper) || !(upper > lower)) {
            return Double.NaN;
        }
        double q = fr / (upper - lower);
        return q > MAX_Q ? Double.NaN : q;
    }

    /** The half-power frequency on one side of the peak at grid index i, or NaN if not within the valley. */
    private double crossing(double f0, double df, double[] h, int i, int end, int dir, double target) {
        int j = i;
        while (j != end && h[j] >= target) {
            j += dir;
        }
        if (h[j] >= target) {
            return Double.NaN;
        }
        int inside = j - dir; // h[inside] >= target > h[j]
        double fa = f0 + inside * df;
        double fb = f0 + j * df;
        if (Math.abs(inside - i) >= 3) {
            // Several cells from the peak: linear interpolation of ln|Z| is ample for Q.
            double t = (h[inside] - target) / (h[inside] - h[j]);
            return fa + t * (fb - fa);
        }
        // Close to the peak: solve ln|Z| = target between the refined samples.
        double a = Math.min(fa, fb);
        double b = Math.max(fa, fb);
        try {
            return new BrentSolver(1e-9).solve(MAX_EVAL, f -> objective(f) - target, a, b);
        } catch (RuntimeException e) {
            return Double.NaN;
        }
    }
}
