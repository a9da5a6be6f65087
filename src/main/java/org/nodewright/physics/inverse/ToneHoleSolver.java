package org.nodewright.physics.inverse;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealVector;
import org.hipparchus.util.Pair;
import org.nodewright.physics.Require;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.tuning.Cents;

/**
 * Moves tone holes (and optionally resizes them and trims the foot) so that every fingering
 * sounds its target: Levenberg–Marquardt (Hipparchus {@code LevenbergMarquardtOptimizer}, after
 * Moré 1978) on the residuals r_i = 1200 log2(f_i / f_target,i) in cents, with
 *
 * <ul>
 *   <li>a forward-difference Jacobian (steps {@link #STEP_MM});</li>
 *   <li>bounds (the maker's limits) enforced by clamping each trial point;</li>
 *   <li>a spacing residual {@link #SPACING_WEIGHT} cents per mm of overlap when neighbouring holes
 *       come closer than the minimum wall;</li>
 *   <li>a weak pull back to the starting layout ({@link #STAY_WEIGHT} cents per mm), which keeps
 *       the problem well posed when there are more unknowns than notes and changes the achieved
 *       cents by far less than the tolerance.</li>
 * </ul>
 *
 * <p>Besides the holes and the foot, a {@link ModelFreedom} may let figures of the model itself move
 * (the player's end's headspace or window length): they are more parameters with their bounds,
 * and the frequencies come from the model at their values.
 */
public final class ToneHoleSolver {

    /** Finite-difference step: small against a hole, large against rounding of a frequency search. */
    public static final double STEP_MM = 1e-2;
    public static final double SPACING_WEIGHT = 50.0;
    public static final double STAY_WEIGHT = 1e-3;

    private final double toleranceCents;
    private final int maxEvaluations;

    /**
     * @param toleranceCents stop once every fingering is this close (e.g. 0.1 cents)
     * @param maxEvaluations cap on model evaluations (each evaluates every fingering)
     */
    public ToneHoleSolver(double toleranceCents, int maxEvaluations) {
        Require.positive("toleranceCents", toleranceCents);
        Require.atLeastOne("maxEvaluations", maxEvaluations);
        this.toleranceCents = toleranceCents;
        this.maxEvaluations = maxEvaluations;
    }

    /**
     * @param lengthBeforeFootMm bore length up to the last section (positions beyond it lie in the foot)
     * @throws SolveCancelledException when {@code cancelled} turns true
     */
    public ToneHoleSolution solve(PlayingFrequencyModel model, HoleLayout start, double lengthBeforeFootMm,
            List<Fingering> fingerings, SolverLimits limits, SolveProgress progress, BooleanSupplier cancelled) {
        return solve(model, start, lengthBeforeFootMm, fingerings, limits, ModelFreedom.NONE, progress, cancelled);
    }

    /**
     * The same, also moving the model's own figures in {@code freedom} (from their starts, within
     * their bounds); {@code model} is used when {@code freedom} moves nothing.
     */
    public ToneHoleSolution solve(PlayingFrequencyModel model, HoleLayout start, double lengthBeforeFootMm,
            List<Fingering> fingerings, SolverLimits limits, ModelFreedom freedom, SolveProgress progress,
            BooleanSupplier cancelled) {
        return solve(model, start, lengthBeforeFootMm, fingerings, limits, freedom, null, progress, cancelled);
    }

    /**
     * The same with a weight on each fingering's residual (null: all 1): least squares on
     * w_i r_i, so that a refinement can lean on the notes still outside the tolerance (Lawson's
     * reweighting towards the smallest worst error, Lawson 1961). The tolerance and the result
     * stay in plain cents.
     */
    public ToneHoleSolution solve(PlayingFrequencyModel model, HoleLayout start, double lengthBeforeFootMm,
            List<Fingering> fingerings, SolverLimits limits, ModelFreedom freedom, double[] weights,
            SolveProgress progress, BooleanSupplier cancelled) {
        if (weights != null && weights.length != fingerings.size()) {
            throw new IllegalArgumentException("one weight per fingering is needed");
        }
        if (fingerings.isEmpty()) {
            throw new IllegalArgumentException("at least one fingering is needed");
        }
        for (Fingering f : fingerings) {
            for (int h : f.closedHoles()) {
                if (h < 0 || h >= start.holeCount()) {
                    throw new IllegalArgumentException("fingering " + f.name() + " closes hole " + h
                            + ", the bore has " + start.holeCount());
                }
            }
        }
        Run run = new Run(model, freedom, start, lengthBeforeFootMm, fingerings, limits, progress, cancelled);
        run.weights = weights;
        double[] startHz = run.frequencies(run.encode(start), null);
        run.guess = startHz.clone();
        // keeps the best layout seen so far when the cap ends the run or the optimiser stalls
        int iterations = BestKeptFit.run(run::value, run.residualCount(), run.encode(start), run::clamp,
                () -> run.bestWorst <= toleranceCents);
        double[] bestX = run.best == null ? run.encode(start) : run.best;
        HoleLayout best = run.decode(bestX);
        double[] endHz = run.frequencies(bestX, run.bestHz);
        List<ToneHoleSolution.Note> notes = new ArrayList<>();
        double worst = 0;
        for (int i = 0; i < fingerings.size(); i++) {
            Fingering f = fingerings.get(i);
            double c = Cents.between(endHz[i], f.targetHz());
            worst = Math.max(worst, Math.abs(c));
            notes.add(new ToneHoleSolution.Note(f.name(), f.targetHz(), startHz[i], endHz[i],
                    Cents.between(startHz[i], f.targetHz()), c));
        }
        List<ToneHoleSolution.HoleChange> holes = new ArrayList<>();
        for (int h = 0; h < start.holeCount(); h++) {
            holes.add(new ToneHoleSolution.HoleChange(h, best.position(h), best.position(h) - start.position(h),
                    best.diameter(h), best.diameter(h) - start.diameter(h)));
        }
        List<ModelFreedom.Change> moved = new ArrayList<>();
        for (int v = 0; v < freedom.size(); v++) {
            moved.add(new ModelFreedom.Change(freedom.variables().get(v).name(), run.startPoint[run.firstExtra + v],
                    bestX[run.firstExtra + v]));
        }
        return new ToneHoleSolution(best, notes, holes, best.footLengthMm() - start.footLengthMm(), iterations,
                run.evaluations, worst <= toleranceCents, moved);
    }

    /** State of one solve: the parameter encoding, the best layout seen, counters. */
    private final class Run {
        private final PlayingFrequencyModel model;
        private final ModelFreedom freedom;
        /** Index of the foot parameter (when it varies) and of the first model figure. */
        private final int footIndex;
        final int firstExtra;
        /** The model at the last figures asked for (a cache: most evaluations move holes only). */
        private double[] figuresAt;
        private PlayingFrequencyModel modelThere;
        private final HoleLayout start;
        private final double lengthBeforeFoot;
        private final List<Fingering> fingerings;
        private final SolverLimits limits;
        private final SolveProgress progress;
        private final BooleanSupplier cancelled;
        private final int holes;
        private final int parameters;
        private final double[] lower;
        private final double[] upper;
        private final double[] startPoint;
        double[] guess;
        int evaluations;
        double[] weights;
        double[] best;
        double[] bestHz;
        double bestWorst = Double.POSITIVE_INFINITY;

        Run(PlayingFrequencyModel model, ModelFreedom freedom, HoleLayout start, double lengthBeforeFoot,
                List<Fingering> fingerings, SolverLimits limits, SolveProgress progress, BooleanSupplier cancelled) {
            this.model = model;
            this.freedom = freedom;
            this.start = start;
            this.lengthBeforeFoot = lengthBeforeFoot;
            this.fingerings = fingerings;
            this.limits = limits;
            this.progress = progress;
            this.cancelled = cancelled;
            this.holes = start.holeCount();
            this.footIndex = holes + (limits.varyDiameters() ? holes : 0);
            this.firstExtra = footIndex + (limits.varyFoot() ? 1 : 0);
            this.parameters = firstExtra + freedom.size();
            this.lower = new double[parameters];
            this.upper = new double[parameters];
            double longestBore = lengthBeforeFoot + (limits.varyFoot() ? limits.maxFootMm() : start.footLengthMm());
            for (int h = 0; h < holes; h++) {
                lower[h] = limits.minPositionMm();
                upper[h] = longestBore - limits.maxPositionMargin();
                if (limits.varyDiameters()) {
                    lower[holes + h] = limits.minDiameterMm();
                    upper[holes + h] = limits.maxDiameterMm();
                }
            }
            if (limits.varyFoot()) {
                lower[footIndex] = limits.minFootMm();
                upper[footIndex] = limits.maxFootMm();
            }
            for (int v = 0; v < freedom.size(); v++) {
                lower[firstExtra + v] = freedom.variables().get(v).min();
                upper[firstExtra + v] = freedom.variables().get(v).max();
            }
            for (int p = 0; p < parameters; p++) {
                if (!(lower[p] <= upper[p])) {
                    throw new IllegalArgumentException("the limits leave no room for parameter " + p);
                }
            }
            this.startPoint = clamp(new ArrayRealVector(encode(start))).toArray();
        }

        int residualCount() {
            return fingerings.size() + parameters + Math.max(0, holes - 1);
        }

        double[] encode(HoleLayout layout) {
            double[] x = new double[parameters];
            for (int h = 0; h < holes; h++) {
                x[h] = layout.position(h);
                if (limits.varyDiameters()) {
                    x[holes + h] = layout.diameter(h);
                }
            }
            if (limits.varyFoot()) {
                x[footIndex] = layout.footLengthMm();
            }
            for (int v = 0; v < freedom.size(); v++) {
                x[firstExtra + v] = freedom.variables().get(v).start();
            }
            return x;
        }

        HoleLayout decode(double[] x) {
            double[] pos = new double[holes];
            double[] dia = start.diametersMm();
            for (int h = 0; h < holes; h++) {
                pos[h] = x[h];
                if (limits.varyDiameters()) {
                    dia[h] = x[holes + h];
                }
            }
            return new HoleLayout(pos, dia, limits.varyFoot() ? x[footIndex] : start.footLengthMm());
        }

        /** Box limits, then no hole centre nearer the (possibly moved) output end than the margin. */
        RealVector clamp(RealVector point) {
            double[] x = point.toArray();
            for (int p = 0; p < parameters; p++) {
                x[p] = Math.min(upper[p], Math.max(lower[p], x[p]));
            }
            double foot = limits.varyFoot() ? x[footIndex] : start.footLengthMm();
            double last = lengthBeforeFoot + foot - limits.maxPositionMargin();
            for (int h = 0; h < holes; h++) {
                x[h] = Math.max(lower[h], Math.min(last, x[h]));
            }
            return new ArrayRealVector(x, false);
        }

        /** The model at the figures in x (the solver's own when nothing of the model moves). */
        private PlayingFrequencyModel modelAt(double[] x) {
            if (freedom.size() == 0) {
                return model;
            }
            double[] figures = java.util.Arrays.copyOfRange(x, firstExtra, parameters);
            if (!java.util.Arrays.equals(figures, figuresAt)) {
                figuresAt = figures;
                modelThere = freedom.family().apply(figures);
            }
            return modelThere;
        }

        double[] frequencies(double[] x, double[] guesses) {
            if (cancelled.getAsBoolean()) {
                throw new SolveCancelledException();
            }
            HoleLayout layout = decode(x);
            PlayingFrequencyModel model = modelAt(x);
            double[] hz = new double[fingerings.size()];
            for (int i = 0; i < hz.length; i++) {
                Fingering f = fingerings.get(i);
                double g = guesses == null ? f.targetHz() : guesses[i];
                hz[i] = model.soundingHz(layout, f, g);
                if (Double.isNaN(hz[i]) && guesses != null) {
                    hz[i] = model.soundingHz(layout, f, f.targetHz());
                }
                if (Double.isNaN(hz[i])) {
                    throw new IllegalArgumentException("fingering " + f.name()
                            + " has no resonance near its target for the layout " + layout);
                }
            }
            return hz;
        }

        double[] residuals(double[] x, double[] hz) {
            double[] r = new double[residualCount()];
            int k = 0;
            for (int i = 0; i < fingerings.size(); i++) {
                r[k++] = (weights == null ? 1 : weights[i]) * Cents.between(hz[i], fingerings.get(i).targetHz());
            }
            for (int p = 0; p < parameters; p++) {
                r[k++] = STAY_WEIGHT * (x[p] - startPoint[p]);
            }
            double[] dia = decode(x).diametersMm();
            for (int h = 0; h + 1 < holes; h++) {
                double gap = (x[h + 1] - dia[h + 1] / 2) - (x[h] + dia[h] / 2) - limits.minSpacingMm();
                r[k++] = SPACING_WEIGHT * Math.min(0.0, gap);
            }
            return r;
        }

        Pair<RealVector, org.hipparchus.linear.RealMatrix> value(RealVector point) {
            double[] x = point.toArray();
            double[] hz = count(frequencies(x, guess));
            guess = hz;
            double[] r0 = residuals(x, hz);
            double worst = 0;
            for (int i = 0; i < fingerings.size(); i++) {
                worst = Math.max(worst, Math.abs(r0[i] / (weights == null ? 1 : weights[i])));
            }
            if (worst < bestWorst) {
                bestWorst = worst;
                best = x.clone();
                bestHz = hz.clone();
            }
            double[][] jacobian = new double[r0.length][parameters];
            for (int p = 0; p < parameters && bestWorst > toleranceCents; p++) {
                double[] xp = x.clone();
                double step = xp[p] + STEP_MM > upper[p] ? -STEP_MM : STEP_MM;
                xp[p] += step;
                double[] rp = residuals(xp, count(frequencies(xp, hz)));
                for (int i = 0; i < r0.length; i++) {
                    jacobian[i][p] = (rp[i] - r0[i]) / step;
                }
            }
            return new Pair<>(new ArrayRealVector(r0, false), new Array2DRowRealMatrix(jacobian, false));
        }

        private double[] count(double[] hz) {
            evaluations++;
            progress.update(evaluations, maxEvaluations, bestWorst);
            if (evaluations >= maxEvaluations) {
                throw new BestKeptFit.EvaluationCap();
            }
            return hz;
        }
    }
}
