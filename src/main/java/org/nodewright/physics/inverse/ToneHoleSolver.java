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
 * sounds its target: Levenberg–Marquardt (Hipparchus {@link LevenbergMarquardtOptimizer}, after
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
        Run run = new Run(model, start, lengthBeforeFootMm, fingerings, limits, progress, cancelled);
        double[] startHz = run.frequencies(start, null);
        run.guess = startHz.clone();
        // keeps the best layout seen so far when the cap ends the run or the optimiser stalls
        int iterations = BestKeptFit.run(run::value, run.residualCount(), run.encode(start), run::clamp,
                () -> run.bestWorst <= toleranceCents);
        HoleLayout best = run.best == null ? start : run.best;
        double[] endHz = run.frequencies(best, run.bestHz);
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
        return new ToneHoleSolution(best, notes, holes, best.footLengthMm() - start.footLengthMm(), iterations,
                run.evaluations, worst <= toleranceCents);
    }

    /** State of one solve: the parameter encoding, the best layout seen, counters. */
    private final class Run {
        private final PlayingFrequencyModel model;
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
        HoleLayout best;
        double[] bestHz;
        double bestWorst = Double.POSITIVE_INFINITY;

        Run(PlayingFrequencyModel model, HoleLayout start, double lengthBeforeFoot, List<Fingering> fingerings,
                SolverLimits limits, SolveProgress progress, BooleanSupplier cancelled) {
            this.model = model;
            this.start = start;
            this.lengthBeforeFoot = lengthBeforeFoot;
            this.fingerings = fingerings;
            this.limits = limits;
            this.progress = progress;
            this.cancelled = cancelled;
            this.holes = start.holeCount();
            this.parameters = holes + (limits.varyDiameters() ? holes : 0) + (limits.varyFoot() ? 1 : 0);
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
                lower[parameters - 1] = limits.minFootMm();
                upper[parameters - 1] = limits.maxFootMm();
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
                x[parameters - 1] = layout.footLengthMm();
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
            return new HoleLayout(pos, dia, limits.varyFoot() ? x[parameters - 1] : start.footLengthMm());
        }

        /** Box limits, then no hole centre nearer the (possibly moved) output end than the margin. */
        RealVector clamp(RealVector point) {
            double[] x = point.toArray();
            for (int p = 0; p < parameters; p++) {
                x[p] = Math.min(upper[p], Math.max(lower[p], x[p]));
            }
            double foot = limits.varyFoot() ? x[parameters - 1] : start.footLengthMm();
            double last = lengthBeforeFoot + foot - limits.maxPositionMargin();
            for (int h = 0; h < holes; h++) {
                x[h] = Math.max(lower[h], Math.min(last, x[h]));
            }
            return new ArrayRealVector(x, false);
        }

        double[] frequencies(HoleLayout layout, double[] guesses) {
            if (cancelled.getAsBoolean()) {
                throw new SolveCancelledException();
            }
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
                r[k++] = Cents.between(hz[i], fingerings.get(i).targetHz());
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
            HoleLayout layout = decode(x);
            double[] hz = count(frequencies(layout, guess));
            guess = hz;
            double[] r0 = residuals(x, hz);
            double worst = 0;
            for (int i = 0; i < fingerings.size(); i++) {
                worst = Math.max(worst, Math.abs(r0[i]));
            }
            if (worst < bestWorst) {
                bestWorst = worst;
                best = layout;
                bestHz = hz.clone();
            }
            double[][] jacobian = new double[r0.length][parameters];
            for (int p = 0; p < parameters && bestWorst > toleranceCents; p++) {
                double[] xp = x.clone();
                double step = xp[p] + STEP_MM > upper[p] ? -STEP_MM : STEP_MM;
                xp[p] += step;
                double[] rp = residuals(xp, count(frequencies(decode(xp), hz)));
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
