package org.nodewright.physics.strings;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;

/**
 * The exact mode shape of a stiff string clamped at both ends, in ξ = x/L:
 * X(ξ) = C·cos bξ + D·sin bξ + E·e^{−aξ} + F·e^{−a(1−ξ)}, the beam-under-tension solution
 * (see {@link ClampedCharacteristic}) with cosh/sinh rewritten as decaying exponentials from each end
 * so nothing overflows. X(0) = X'(0) = 0 give C = −(E + F·e^{−a}) and D = (a/b)(E − F·e^{−a}); mode n is
 * symmetric about the middle for odd n and antisymmetric for even n, so F = (−1)^{n+1}·E.
 * Nodes and antinodes are found numerically: sign changes of X (and of X') on a grid, refined with
 * a bracketing Brent solver to 1e-13 of the length.
 */
public final class ClampedShape implements ModeShape {

    private static final double XI_ACCURACY = 1e-13;
    private static final int MAX_EVALUATIONS = 200;
    private static final int SAMPLES_PER_LOBE = 8;

    private final int n;
    private final double a;
    private final double b;
    private final double c;
    private final double d;
    private final double e;
    private final double f;
    private final double[] nodes;
    private final double[] antinodes;

    private ClampedShape(int n, double a, double b, double[] coefficients, double[] nodes, double[] antinodes) {
        this.n = n;
        this.a = a;
        this.b = b;
        this.c = coefficients[0];
        this.d = coefficients[1];
        this.e = coefficients[2];
        this.f = coefficients[3];
        this.nodes = nodes;
        this.antinodes = antinodes;
    }

    /**
     * The shape of mode n for the root b = β·L and a = α·L = √(b² + τ).
     *
     * @throws IllegalArgumentException for a non-positive a or b
     */
    public static ClampedShape of(int n, double a, double b) {
        Checks.positive("a", a);
        Checks.positive("b", b);
        double ea = Math.exp(-a);
        double s = (n % 2 == 1) ? 1 : -1;
        double[] k = {-(1 + s * ea), (a / b) * (1 - s * ea), 1, s};
        double rough = 1 / Math.hypot(k[0], k[1]);
        for (int i = 0; i < 4; i++) {
            k[i] *= rough;
        }
        ClampedShape raw = new ClampedShape(n, a, b, k, new double[0], new double[0]);
        double[] interior = raw.findNodes(SAMPLES_PER_LOBE);
        if (interior.length != n - 1) {
            interior = raw.findNodes(SAMPLES_PER_LOBE * 16);
        }
        if (interior.length != n - 1) {
            throw new IllegalStateException("clamped mode " + n + ": found " + interior.length + " interior nodes");
        }
        double[] allNodes = new double[n + 1];
        System.arraycopy(interior, 0, allNodes, 1, n - 1);
        allNodes[n] = 1.0;
        double[] peaks = raw.findAntinodes(allNodes);
        double peak = 0;
        for (double p : peaks) {
            peak = Math.max(peak, Math.abs(raw.value(p)));
        }
        double scale = Math.signum(raw.value(peaks[0])) / peak;
        for (int i = 0; i < 4; i++) {
            k[i] *= scale;
        }
        return new ClampedShape(n, a, b, k, allNodes, peaks);
    }

    @Override
    public double value(double xi) {
        return c * Math.cos(b * xi) + d * Math.sin(b * xi) + e * Math.exp(-a * xi) + f * Math.exp(-a * (1 - xi));
    }

    /** dX/dξ. */
    public double slope(double xi) {
        return b * (d * Math.cos(b * xi) - c * Math.sin(b * xi)) - a * e * Math.exp(-a * xi)
                + a * f * Math.exp(-a * (1 - xi));
    }

    /** Closed-form mean over [lo, hi]: trigonometric part times sinc, exponentials by expm1. */
    @Override
    public double average(double lo, double hi) {
        double m = (lo + hi) / 2;
        double h = (hi - lo) / 2;
        double w = hi - lo;
        double trig = (c * Math.cos(b * m) + d * Math.sin(b * m)) * SineShape.sinc(b * h);
        return trig + e * expAverage(lo, w) + f * expAverage(1 - hi, w);
    }

    /** Mean of e^{−aξ} over [lo, lo + w]. */
    private double expAverage(double lo, double w) {
        double aw = a * w;
        if (aw < 1e-8) {
            return Math.exp(-a * lo) * (1 - aw / 2);
        }
        return Math.exp(-a * lo) * (-Math.expm1(-aw)) / aw;
    }

    @Override
    public double[] nodes() {
        return nodes.clone();
    }

    @Override
    public double[] antinodes() {
        return antinodes.clone();
    }

    public int n() {
        return n;
    }

    private double[] findNodes(int samplesPerLobe) {
        int m = samplesPerLobe * (n + 1);
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(XI_ACCURACY, XI_ACCURACY, 5);
        double[] found = new double[n + 8];
        int count = 0;
        double prevXi = 1.0 / m;
        double prev = value(prevXi);
        for (int j = 2; j < m; j++) {
            double xi = (double) j / m;
            double v = value(xi);
            if (prev == 0 || prev * v < 0) {
                if (count == found.length) {
                    return new double[count + 1]; // more sign changes than a mode n can have
                }
                found[count++] = prev == 0 ? prevXi
                        : solver.solve(MAX_EVALUATIONS, this::value, prevXi, xi, AllowedSolution.ANY_SIDE);
            }
            prevXi = xi;
            prev = v;
        }
        double[] out = new double[count];
        System.arraycopy(found, 0, out, 0, count);
        return out;
    }

    /** One antinode per lobe: the zero of X' at the lobe's peak, bracketed from grid samples. */
    private double[] findAntinodes(double[] allNodes) {
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(XI_ACCURACY, XI_ACCURACY, 5);
        double[] out = new double[n];
        for (int k = 0; k < n; k++) {
            double lo = allNodes[k];
            double hi = allNodes[k + 1];
            int m = 4 * SAMPLES_PER_LOBE;
            double step = (hi - lo) / m;
            int best = 1;
            double bestAbs = -1;
            for (int j = 1; j < m; j++) {
                double v = Math.abs(value(lo + j * step));
                if (v > bestAbs) {
                    bestAbs = v;
                    best = j;
                }
            }
            double left = lo + (best - 1) * step;
            double right = lo + (best + 1) * step;
            if (best == 1) {
                left = lo + step / 2;
            }
            if (best == m - 1) {
                right = hi - step / 2;
            }
            double sl = slope(left);
            double sr = slope(right);
            if (sl * sr < 0) {
                out[k] = solver.solve(MAX_EVALUATIONS, this::slope, left, right, AllowedSolution.ANY_SIDE);
            } else {
                out[k] = maximiseAbs(left, right);
            }
        }
        return out;
    }

    private double maximiseAbs(double lo, double hi) {
        UnivariateFunction absX = xi -> Math.abs(value(xi));
        BrentOptimizer optimizer = new BrentOptimizer(1e-10, 1e-14);
        return optimizer.optimize(new MaxEval(MAX_EVALUATIONS), new UnivariateObjectiveFunction(absX),
                GoalType.MAXIMIZE, new SearchInterval(lo, hi)).getPoint();
    }
}
