package org.nodewright.physics.bars;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;
import org.nodewright.physics.Require;
import org.nodewright.physics.tuning.Cents;

/**
 * Measure the blank: from the frequencies of a tapped bar's bending modes, the Young's modulus
 * along the bar (and the shear modulus when the modes can tell it) that make the bar's own model
 * (geometry, density, ends, theory) sound the same. Least squares on the cents between measured and
 * model frequencies over ln E and ln G, by Hipparchus' Levenberg–Marquardt optimiser (Moré, "The
 * Levenberg–Marquardt algorithm: implementation and theory", 1978) with a forward-difference
 * Jacobian; E alone when only one mode is known or theory is Euler–Bernoulli (every frequency then
 * scales as √E, so the fit is the mean of the cents). Peaks from a recording are first matched to
 * the model's mode ratios ({@link #match}), not to a harmonic or stiff-string series.
 */
public final class BlankFitter {

    /** A mode must move by at least this many cents per e-fold of G (≈ 0.95 cent per 10 %) for G to be fitted. */
    public static final double SHEAR_SENSITIVITY_CENTS = 10.0;
    /** Half-width of the window (cents) in which a peak may sit around a predicted mode. */
    public static final double MATCH_WINDOW_CENTS = 150.0;
    /** Relative step of the forward differences in ln E and ln G. */
    private static final double STEP = 1e-4;
    /** Stops once the cents improve by less than this between iterations. */
    private static final double CENTS_TOLERANCE = 1e-6;
    /** Bound of the shear modulus relative to E during the fit: E/500 ≤ G ≤ E/2. */
    private static final double MIN_G_RATIO = 1.0 / 500;
    private static final double MAX_G_RATIO = 0.5;
    private static final int MAX_EVALUATIONS = 200;
    /** Strongest peaks tried as the first mode when matching a recording. */
    private static final int FIRST_MODE_CANDIDATES = 12;

    private BlankFitter() {
    }

    /**
     * @param bar       the blank, with a starting E and G (a catalogue value)
     * @param measured  bending modes, each number at most once
     * @param fitShear  also fit G when the modes allow it
     */
    public static BlankFit fit(Bar bar, BeamTheory theory, List<MeasuredMode> measured, boolean fitShear) {
        if (measured == null || measured.isEmpty()) {
            throw new IllegalArgumentException("at least one measured mode is needed");
        }
        List<MeasuredMode> modes = new ArrayList<>(measured);
        modes.sort(Comparator.comparingInt(MeasuredMode::n));
        for (int i = 1; i < modes.size(); i++) {
            if (modes.get(i).n() == modes.get(i - 1).n()) {
                throw new IllegalArgumentException("mode " + modes.get(i).n() + " is measured twice");
            }
        }
        int highest = modes.get(modes.size() - 1).n();
        Run run = new Run(bar, theory, modes, highest);
        double u = Math.log(bar.youngsModulus());
        double v = Math.log(bar.shearModulus());
        // E alone first: with G held, the frequencies scale nearly as √E; a few fixed-point steps.
        for (int it = 0; it < 30; it++) {
            double[] c = run.cents(u, v);
            double mean = 0;
            for (double x : c) {
                mean += x;
            }
            mean /= c.length;
            double du = 2 * mean / 1200 * Math.log(2);
            u += du;
            if (Math.abs(du) < 1e-12) {
                break;
            }
        }
        boolean shear = false;
        if (fitShear && theory == BeamTheory.TIMOSHENKO && modes.size() >= 2) {
            double[] base = run.cents(u, v);
            double[] moved = run.cents(u, v + STEP);
            double most = 0;
            for (int i = 0; i < base.length; i++) {
                most = Math.max(most, Math.abs(moved[i] - base[i]) / STEP);
            }
            shear = most >= SHEAR_SENSITIVITY_CENTS;
        }
        if (shear) {
            double[] p = both(run, u, v);
            u = p[0];
            v = p[1];
        }
        double e = Math.exp(u);
        double g = shear ? Math.exp(v) : bar.shearModulus();
        double[] hz = run.frequencies(u, Math.log(g));
        List<BlankFit.Match> matches = new ArrayList<>();
        double sum = 0;
        for (int i = 0; i < modes.size(); i++) {
            MeasuredMode m = modes.get(i);
            double model = hz[m.n() - 1];
            double c = Cents.between(m.frequencyHz(), model);
            sum += c * c;
            matches.add(new BlankFit.Match(m.n(), m.frequencyHz(), model, c));
        }
        return new BlankFit(e, g, shear, matches, Math.sqrt(sum / modes.size()), run.evaluations);
    }

    private static double[] both(Run run, double u0, double v0) {
        LeastSquaresProblem problem = new LeastSquaresBuilder()
                .model(point -> {
                    double u = point.getEntry(0);
                    double v = point.getEntry(1);
                    double[] c = run.cents(u, v);
                    double[] cu = run.cents(u + STEP, v);
                    double[] cv = run.cents(u, v + STEP);
                    double[][] jac = new double[c.length][2];
                    for (int i = 0; i < c.length; i++) {
                        // residual = model − measured in cents = −c (c is measured relative to model)
                        jac[i][0] = -(cu[i] - c[i]) / STEP;
                        jac[i][1] = -(cv[i] - c[i]) / STEP;
                        c[i] = -c[i];
                    }
                    RealVector value = new ArrayRealVector(c, false);
                    return new Pair<>(value, new Array2DRowRealMatrix(jac, false));
                })
                .target(new double[run.modes.size()])
                .start(new double[] {u0, v0})
                .parameterValidator(point -> {
                    double u = point.getEntry(0);
                    double v = Math.max(u + Math.log(MIN_G_RATIO), Math.min(u + Math.log(MAX_G_RATIO), point.getEntry(1)));
                    return new ArrayRealVector(new double[] {u, v});
                })
                .checker((iteration, previous, current) -> iteration > 1
                        && Math.abs(previous.getCost() - current.getCost()) < CENTS_TOLERANCE)
                .maxEvaluations(MAX_EVALUATIONS)
                .maxIterations(MAX_EVALUATIONS)
                .build();
        try {
            LeastSquaresOptimizer.Optimum optimum = new LevenbergMarquardtOptimizer().optimize(problem);
            return optimum.getPoint().toArray();
        } catch (org.hipparchus.exception.MathIllegalStateException stalled) {
            return run.best;
        }
    }

    /**
     * Numbers peaks of a recording as the bar's bending modes: each of the strongest peaks is tried as
     * mode 1, the model's ratios (at its starting E and G) predict modes 2.., and the peak nearest each
     * prediction within {@link #MATCH_WINDOW_CENTS} is taken. The candidate matching most modes wins
     * (then the louder matches, then the lower mode 1).
     *
     * @param peaksHz     peak frequencies
     * @param peakLevels  their levels (dB), same order
     * @param modeCount   bending modes of the model to match (2..{@link BarAnalyzer#MAX_MODES})
     */
    public static List<MeasuredMode> match(Bar bar, BeamTheory theory, double[] peaksHz, double[] peakLevels,
            int modeCount) {
        Require.between("modeCount", modeCount, 1, BarAnalyzer.MAX_MODES);
        if (peaksHz.length != peakLevels.length) {
            throw new IllegalArgumentException("peaks and levels differ in length");
        }
        if (peaksHz.length == 0) {
            return List.of();
        }
        double[] model = BarAnalyzer.bendingFrequencies(bar, theory, modeCount);
        Integer[] byLevel = new Integer[peaksHz.length];
        for (int i = 0; i < byLevel.length; i++) {
            byLevel[i] = i;
        }
        java.util.Arrays.sort(byLevel, (a, b) -> Double.compare(peakLevels[b], peakLevels[a]));
        List<MeasuredMode> best = List.of();
        double bestScore = Double.NEGATIVE_INFINITY;
        for (int c = 0; c < Math.min(FIRST_MODE_CANDIDATES, byLevel.length); c++) {
            double f1 = peaksHz[byLevel[c]];
            List<MeasuredMode> found = new ArrayList<>();
            found.add(new MeasuredMode(1, f1));
            double score = peakLevels[byLevel[c]];
            for (int n = 2; n <= model.length; n++) {
                double predicted = f1 * model[n - 1] / model[0];
                int nearest = -1;
                for (int i = 0; i < peaksHz.length; i++) {
                    double off = Math.abs(Cents.between(peaksHz[i], predicted));
                    if (off <= MATCH_WINDOW_CENTS && (nearest < 0
                            || off < Math.abs(Cents.between(peaksHz[nearest], predicted)))) {
                        nearest = i;
                    }
                }
                if (nearest >= 0) {
                    found.add(new MeasuredMode(n, peaksHz[nearest]));
                    score += peakLevels[nearest];
                }
            }
            double total = 1e6 * found.size() + score - 1e-3 * f1;
            if (total > bestScore) {
                bestScore = total;
                best = found;
            }
        }
        return best;
    }

    /** The model evaluated at ln E, ln G. */
    private static final class Run {
        final Bar bar;
        final BeamTheory theory;
        final List<MeasuredMode> modes;
        final int highest;
        int evaluations;
        double[] best;
        double bestCost = Double.POSITIVE_INFINITY;

        Run(Bar bar, BeamTheory theory, List<MeasuredMode> modes, int highest) {
            this.bar = bar;
            this.theory = theory;
            this.modes = modes;
            this.highest = highest;
        }

        double[] frequencies(double u, double v) {
            evaluations++;
            return BarAnalyzer.bendingFrequencies(bar.withModuli(Math.exp(u), Math.exp(v)), theory, highest);
        }

        /** Cents of each measured mode above the model's. */
        double[] cents(double u, double v) {
            double[] f = frequencies(u, v);
            double[] c = new double[modes.size()];
            double cost = 0;
            for (int i = 0; i < c.length; i++) {
                c[i] = Cents.between(modes.get(i).frequencyHz(), f[modes.get(i).n() - 1]);
                cost += c[i] * c[i];
            }
            if (cost < bestCost) {
                bestCost = cost;
                best = new double[] {u, v};
            }
            return c;
        }
    }
}
