package org.nodewright.physics.strings;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;
import org.nodewright.physics.Require;

/**
 * The exact mode shape of a stiff string clamped at both ends, in ξ = x/L:
 * X(ξ) = C·cos bξ + D·sin bξ + E·e^{−aξ} + F·e^{−a(1−ξ)}, the beam-under-tension solution
 * (see {@link ClampedCharacteristic}) with cosh/sinh rewritten as decaying exponentials from each end
 * so nothing overflows. X(0) = X'(0) = 0 give C = −(E + F·e^{−a}) and D = (a/b)(E − F·e^{−a}); mode n is
 * symmetric about the middle for odd n and antisymmetric for even n, so F = (−1)^{n+1}·E.
 * Nodes and antinodes are found numerically: sign changes of X (and of X') on a grid, refined with
 * safeguarded Newton steps (rtsafe) to 1e-13 of the length.
 */
public final class ClampedShape implements ModeShape {

    private static final double XI_ACCURACY = 1e-13;
    /** Fraction of an end lobe skipped at a clamped end, where X' = 0 too. */
    private static final double END_INSET = 1e-3;
    private static final int MAX_EVALUATIONS = 200;
    private static final int SAMPLES_PER_LOBE = 4;
    private static final double DECAY_CUTOFF = 60;

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
        Require.positive("a", a);
        Require.positive("b", b);
        double ea = Math.exp(-a);
        double s = (n % 2 == 1) ? 1 : -1;
        double[] k = {-(1 + s * ea), (a / b) * (1 - s * ea), 1, s};
        double rough = 1 / Math.hypot(k[0], k[1]);
        for (int i = 0; i < 4; i++) {
            k[i] *= rough;
        }
        ClampedShape raw = new ClampedShape(n, a, b, k, new double[0], new double[0]);
        double[] interior = raw.findPredictedNodes();
        if (interior.length != n - 1 && n > 1) {
            interior = raw.findNodes(SAMPLES_PER_LOBE);
        }
        if (interior.length != n - 1 && n > 1) {
            interior = raw.findNodes(SAMPLES_PER_LOBE * 16);
        }
        if (interior.length != n - 1 && n > 1) {
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
        return c * Math.cos(b * xi) + d * Math.sin(b * xi) + e * decay(a * xi) + f * decay(a * (1 - xi));
    }

    /** dX/dξ. */
    public double slope(double xi) {
        return b * (d * Math.cos(b * xi) - c * Math.sin(b * xi)) - a * e * decay(a * xi) + a * f * decay(a * (1 - xi));
    }

    /**
     * e^{−u}, taken as 0 beyond u = 60 (e^{−60} ≈ 1e-26, far below double resolution of the O(1)
     * trigonometric part); skipping the call keeps the hot node search fast.
     */
    private static double decay(double u) {
        return u > DECAY_CUTOFF ? 0 : Math.exp(-u);
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

    /**
     * Interior nodes bracketed around the zeros of the trigonometric part alone,
     * C·cos bξ + D·sin bξ = R·sin(bξ + φ), i.e. ξ_j = (jπ − φ)/b for j = 1..n−1; the decaying
     * exponentials only shift them slightly near the ends. Each bracket must show a sign change,
     * else this returns nothing and the grid search takes over.
     */
    private double[] findPredictedNodes() {
        int left = (n - 1) / 2;
        double phi = Math.atan2(c, d);
        double half = Math.PI / (4 * b);
        double[] out = new double[n - 1];
        double previous = 0;
        for (int j = 1; j <= left; j++) {
            double guess = (j * Math.PI - phi) / b;
            double lo = Math.max(guess - half, previous + 1e-12);
            double hi = Math.min(guess + half, 0.5 - 1e-12);
            if (!(lo < hi) || value(lo) * value(hi) >= 0) {
                return new double[0];
            }
            double z = rtsafe(0, lo, hi);
            out[j - 1] = z;
            out[n - 1 - j] = 1 - z;
            previous = z;
        }
        if (n % 2 == 0) {
            out[left] = 0.5;
        }
        return out;
    }

    /**
     * Interior nodes: sign changes of X on a grid over the left half, refined, then mirrored
     * (mode n is symmetric or antisymmetric about ξ = 1/2; an even mode has a node exactly there).
     */
    private double[] findNodes(int samplesPerLobe) {
        int m = 2 * samplesPerLobe * (n + 1);
        int left = (n - 1) / 2;
        double[] found = new double[left];
        int count = 0;
        double prevXi = 1.0 / m;
        double prev = value(prevXi);
        for (int j = 2; j < m / 2; j++) {
            double xi = (double) j / m;
            double v = value(xi);
            if (prev == 0 || prev * v < 0) {
                if (count == left) {
                    return new double[0]; // more sign changes than mode n can have: caller refines
                }
                found[count++] = prev == 0 ? prevXi : rtsafe(0, prevXi, xi);
            }
            prevXi = xi;
            prev = v;
        }
        if (count != left) {
            return new double[0];
        }
        double[] out = new double[n - 1];
        for (int i = 0; i < left; i++) {
            out[i] = found[i];
            out[n - 2 - i] = 1 - found[i];
        }
        if (n % 2 == 0) {
            out[left] = 0.5;
        }
        return out;
    }

    /**
     * One antinode per lobe: the zero of X' between two nodes (X' changes sign between consecutive
     * simple zeros of X; at a clamped end X' = 0 too, so the bracket starts a little inside). Found
     * for the left half and mirrored; an odd mode peaks exactly at ξ = 1/2.
     */
    private double[] findAntinodes(double[] allNodes) {
        double[] out = new double[n];
        for (int k = 0; k < n / 2; k++) {
            double lo = allNodes[k];
            double hi = allNodes[k + 1];
            double inset = (hi - lo) * END_INSET;
            double leftEnd = k == 0 ? lo + inset : lo;
            double x;
            if (slope(leftEnd) * slope(hi) < 0) {
                x = rtsafe(1, leftEnd, hi);
            } else {
                x = maximiseAbs(lo + inset, hi - inset);
            }
            out[k] = x;
            out[n - 1 - k] = 1 - x;
        }
        if (n % 2 == 1) {
            out[n / 2] = 0.5;
        }
        return out;
    }

    /**
     * Zero of X^(k) (k = 0: a node, k = 1: an antinode) inside a bracket with a sign change:
     * Newton steps with X^(k+1), falling back to bisection whenever a step leaves the bracket or
     * converges too slowly ("rtsafe", Press et al., Numerical Recipes, 3rd ed. §9.4). Our own
     * rather than a Hipparchus solver because it runs ~50 times per mode in the hot path and the
     * analytic derivative, evaluated with the same sines and exponentials, halves the work.
     */
    private double rtsafe(int k, double lo, double hi) {
        double[] fd = new double[2];
        derivatives(k, lo, fd);
        double fLo = fd[0];
        double xl = lo;
        double xh = hi;
        if (fLo > 0) {
            xl = hi;
            xh = lo;
        }
        double x = (lo + hi) / 2;
        double dxOld = Math.abs(hi - lo);
        double dx = dxOld;
        derivatives(k, x, fd);
        for (int i = 0; i < MAX_EVALUATIONS; i++) {
            double f0 = fd[0];
            double f1 = fd[1];
            if ((((x - xh) * f1 - f0) * ((x - xl) * f1 - f0) > 0) || (Math.abs(2 * f0) > Math.abs(dxOld * f1))) {
                dxOld = dx;
                dx = (xh - xl) / 2;
                x = xl + dx;
            } else {
                dxOld = dx;
                dx = f0 / f1;
                x -= dx;
            }
            if (Math.abs(dx) < XI_ACCURACY) {
                return x;
            }
            derivatives(k, x, fd);
            if (fd[0] < 0) {
                xl = x;
            } else {
                xh = x;
            }
        }
        return x;
    }

    /** out[0] = X^(k)(ξ), out[1] = X^(k+1)(ξ) for k = 0 or 1, sharing one set of sines and exponentials. */
    private void derivatives(int k, double xi, double[] out) {
        double cs = Math.cos(b * xi);
        double sn = Math.sin(b * xi);
        double e0 = e * decay(a * xi);
        double f0 = f * decay(a * (1 - xi));
        double trig = c * cs + d * sn;
        double trigSlope = b * (d * cs - c * sn);
        double expSlope = a * (f0 - e0);
        if (k == 0) {
            out[0] = trig + e0 + f0;
            out[1] = trigSlope + expSlope;
        } else {
            out[0] = trigSlope + expSlope;
            out[1] = -b * b * trig + a * a * (e0 + f0);
        }
    }

    private double maximiseAbs(double lo, double hi) {
        UnivariateFunction absX = xi -> Math.abs(value(xi));
        BrentOptimizer optimizer = new BrentOptimizer(1e-10, 1e-14);
        return optimizer.optimize(new MaxEval(MAX_EVALUATIONS), new UnivariateObjectiveFunction(absX),
                GoalType.MAXIMIZE, new SearchInterval(lo, hi)).getPoint();
    }
}
