package org.nodewright.physics.inverse;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;
import org.nodewright.physics.Require;
import org.nodewright.physics.aircolumn.Fingering;

/**
 * Holes for a blank tube: for each starting hole diameter, the closed-form {@link FirstLayout},
 * then the {@link ToneHoleSolver} (Levenberg–Marquardt, Hipparchus) from it; several such starts
 * (a multi-start search, since one start can settle in a local minimum or stall against a limit),
 * stopping at the first start that reaches the tolerance and otherwise keeping the best.
 *
 * <p>A start that ends outside the tolerance is refined: least squares spreads the error over
 * every note, while the maker asks that the worst note be within the tolerance (a minimax aim).
 * Up to {@link #REFINE_ROUNDS} more runs of the tone-hole solver from where it stopped (together
 * at most one more start's evaluations), each with
 * the notes reweighted after Lawson's iteratively reweighted least squares for the smallest
 * maximum error (Lawson 1961, from memory): w_i &larr; w_i (1/2 + |r_i| / max |r|), normalised to a
 * mean of 1, so that the notes outside lean harder and the notes well inside give way; a round that
 * does not lower the worst note ends the refinement.
 */
public final class BlankTubeSolver {

    /** At most this many reweighted runs after a start that ended outside the tolerance. */
    public static final int REFINE_ROUNDS = 4;
    /** The refinement of one start shares one more start's evaluations; a round needs at least this many. */
    static final int MIN_REFINE = 20;

    private final double toleranceCents;
    private final int maxEvaluationsPerStart;

    public BlankTubeSolver(double toleranceCents, int maxEvaluationsPerStart) {
        Require.positive("toleranceCents", toleranceCents);
        Require.atLeastOne("maxEvaluationsPerStart", maxEvaluationsPerStart);
        this.toleranceCents = toleranceCents;
        this.maxEvaluationsPerStart = maxEvaluationsPerStart;
    }

    /** One start: its hole diameter, the first layout, how that sounded, and where the optimiser took it. */
    public record Start(int index, double startDiameterMm, HoleLayout firstLayout, double firstWorstCents,
            ToneHoleSolution solution) {
    }

    /** Every start tried, in order, and the chosen one (the first within tolerance, else the best). */
    public record Result(List<Start> starts, int chosen) {

        public Result {
            starts = List.copyOf(starts);
        }

        public Start best() {
            return starts.get(chosen);
        }
    }

    /**
     * @param model           the frequency model of the tube with its holes (chimneys fixed)
     * @param tube            the blank as the closed form sees it
     * @param chimneysMm      each hole's chimney height
     * @param lengthBeforeFootMm bore length before the last section (the section the solver may cut)
     * @param startDiametersMm one start per diameter (all holes the same), tried in this order
     * @throws SolveCancelledException when {@code cancelled} turns true
     * @throws IllegalArgumentException when no start gives a layout whose every fingering has a resonance near its target
     */
    public Result solve(PlayingFrequencyModel model, FirstLayout.Tube tube, double[] chimneysMm,
            double lengthBeforeFootMm, List<Fingering> fingerings, SolverLimits limits, double[] startDiametersMm,
            SolveProgress progress, BooleanSupplier cancelled) {
        return solve(model, tube, chimneysMm, lengthBeforeFootMm, fingerings, limits, ModelFreedom.NONE,
                startDiametersMm, progress, cancelled);
    }

    /**
     * The same, every start also moving the model's own figures in {@code freedom} (the player's
     * end's headspace or window length), each start from the figures as given.
     */
    public Result solve(PlayingFrequencyModel model, FirstLayout.Tube tube, double[] chimneysMm,
            double lengthBeforeFootMm, List<Fingering> fingerings, SolverLimits limits, ModelFreedom freedom,
            double[] startDiametersMm, SolveProgress progress, BooleanSupplier cancelled) {
        if (startDiametersMm.length == 0) {
            throw new IllegalArgumentException("at least one start is needed");
        }
        int holes = chimneysMm.length;
        int cap = 2 * maxEvaluationsPerStart * startDiametersMm.length;
        List<Start> starts = new ArrayList<>();
        int chosen = -1;
        double bestWorst = Double.POSITIVE_INFINITY;
        int spent = 0;
        IllegalArgumentException lastFailure = null;
        for (int s = 0; s < startDiametersMm.length; s++) {
            double d = Math.min(limits.maxDiameterMm(), Math.max(limits.minDiameterMm(), startDiametersMm[s]));
            double[] diameters = new double[holes];
            java.util.Arrays.fill(diameters, d);
            HoleLayout first = within(FirstLayout.estimate(tube, lengthBeforeFootMm, diameters, chimneysMm, fingerings, limits.varyFoot()),
                    lengthBeforeFootMm, limits);
            final int before = spent;
            final double bestSoFar = bestWorst;
            SolveProgress overall = (e, m, w) -> progress.update(before + e, cap, Math.min(bestSoFar, w));
            ToneHoleSolution solution;
            try {
                solution = new ToneHoleSolver(toleranceCents, maxEvaluationsPerStart).solve(model, first,
                        lengthBeforeFootMm, fingerings, limits, freedom, overall, cancelled);
            } catch (IllegalArgumentException noResonance) {
                lastFailure = noResonance;
                continue;
            }
            spent += solution.evaluations();
            double[] weights = new double[fingerings.size()];
            java.util.Arrays.fill(weights, 1.0);
            int refineBudget = maxEvaluationsPerStart;
            for (int round = 0; round < REFINE_ROUNDS && !solution.withinTolerance() && refineBudget >= MIN_REFINE;
                    round++) {
                weights = lawson(weights, solution);
                final int done = spent;
                SolveProgress refining = (e, m, w) -> progress.update(done + e, cap, Math.min(bestSoFar, w));
                ToneHoleSolution next;
                try {
                    next = new ToneHoleSolver(toleranceCents, refineBudget).solve(model, solution.layout(),
                            lengthBeforeFootMm, fingerings, limits, freedom.startingAt(values(solution)), weights,
                            refining, cancelled);
                } catch (IllegalArgumentException lost) {
                    break;
                }
                spent += next.evaluations();
                refineBudget -= next.evaluations();
                if (!(next.worstAbsCents() < solution.worstAbsCents())) {
                    break;
                }
                solution = chained(solution, next, first);
            }
            double firstWorst = solution.notes().stream().mapToDouble(n -> Math.abs(n.startCents())).max().orElse(0);
            starts.add(new Start(s, d, first, firstWorst, solution));
            if (solution.worstAbsCents() < bestWorst) {
                bestWorst = solution.worstAbsCents();
                chosen = starts.size() - 1;
            }
            if (solution.withinTolerance()) {
                break;
            }
        }
        if (chosen < 0) {
            throw lastFailure;
        }
        progress.update(spent, cap, bestWorst);
        return new Result(starts, chosen);
    }

    /** The model figures a solution ended at, in the freedom's order. */
    private static double[] values(ToneHoleSolution s) {
        return s.modelChanges().stream().mapToDouble(ModelFreedom.Change::value).toArray();
    }

    /** Lawson's reweighting: w_i (1/2 + |r_i| / max |r|), normalised to a mean of 1. */
    static double[] lawson(double[] weights, ToneHoleSolution s) {
        double worst = Math.max(1e-12, s.worstAbsCents());
        double[] w = new double[weights.length];
        double sum = 0;
        for (int i = 0; i < w.length; i++) {
            w[i] = weights[i] * (0.5 + Math.abs(s.notes().get(i).achievedCents()) / worst);
            sum += w[i];
        }
        for (int i = 0; i < w.length; i++) {
            w[i] *= w.length / sum;
        }
        return w;
    }

    /** A refinement's end told from the first run's start: start pitches, moves and figures from where it all began. */
    private static ToneHoleSolution chained(ToneHoleSolution from, ToneHoleSolution to, HoleLayout first) {
        List<ToneHoleSolution.Note> notes = new ArrayList<>();
        for (int i = 0; i < to.notes().size(); i++) {
            ToneHoleSolution.Note a = from.notes().get(i);
            ToneHoleSolution.Note b = to.notes().get(i);
            notes.add(new ToneHoleSolution.Note(b.fingering(), b.targetHz(), a.startHz(), b.achievedHz(), a.startCents(),
                    b.achievedCents()));
        }
        HoleLayout end = to.layout();
        List<ToneHoleSolution.HoleChange> holes = new ArrayList<>();
        for (int h = 0; h < end.holeCount(); h++) {
            holes.add(new ToneHoleSolution.HoleChange(h, end.position(h), end.position(h) - first.position(h),
                    end.diameter(h), end.diameter(h) - first.diameter(h)));
        }
        List<ModelFreedom.Change> figures = new ArrayList<>();
        for (int v = 0; v < to.modelChanges().size(); v++) {
            figures.add(new ModelFreedom.Change(to.modelChanges().get(v).name(), from.modelChanges().get(v).start(),
                    to.modelChanges().get(v).value()));
        }
        return new ToneHoleSolution(end, notes, holes, end.footLengthMm() - first.footLengthMm(),
                from.iterations() + to.iterations(), from.evaluations() + to.evaluations(), to.withinTolerance(), figures);
    }

    /**
     * The first layout moved inside the maker's limits: foot and diameters clamped, holes kept in
     * order from the input with at least the minimum wall between them (pushed up the tube from the
     * bottom if they crowd), none before the minimum position or past the end margin.
     */
    static HoleLayout within(HoleLayout layout, double lengthBeforeFootMm, SolverLimits limits) {
        double foot = limits.varyFoot() ? Math.min(limits.maxFootMm(), Math.max(limits.minFootMm(), layout.footLengthMm()))
                : layout.footLengthMm();
        double[] dia = layout.diametersMm();
        for (int i = 0; i < dia.length; i++) {
            dia[i] = Math.min(limits.maxDiameterMm(), Math.max(limits.minDiameterMm(), dia[i]));
        }
        double[] x = layout.positionsMm();
        double last = lengthBeforeFootMm + foot - limits.maxPositionMargin();
        for (int i = x.length - 1; i >= 0; i--) {
            double ceiling = i == x.length - 1 ? last : x[i + 1] - (dia[i] + dia[i + 1]) / 2 - limits.minSpacingMm();
            x[i] = Math.min(x[i], ceiling);
        }
        for (int i = 0; i < x.length; i++) {
            double floor = i == 0 ? limits.minPositionMm() : x[i - 1] + (dia[i - 1] + dia[i]) / 2 + limits.minSpacingMm();
            x[i] = Math.max(x[i], floor);
        }
        return new HoleLayout(x, dia, foot);
    }
}
