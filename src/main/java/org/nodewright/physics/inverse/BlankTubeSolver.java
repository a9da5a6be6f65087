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
 */
public final class BlankTubeSolver {

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
        if (startDiametersMm.length == 0) {
            throw new IllegalArgumentException("at least one start is needed");
        }
        int holes = chimneysMm.length;
        int cap = maxEvaluationsPerStart * startDiametersMm.length;
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
                        lengthBeforeFootMm, fingerings, limits, overall, cancelled);
            } catch (IllegalArgumentException noResonance) {
                lastFailure = noResonance;
                continue;
            }
            spent += solution.evaluations();
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
