package org.nodewright.physics.plates;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.util.Pair;
import org.nodewright.physics.Require;
import org.nodewright.physics.inverse.BestKeptFit;
import org.nodewright.physics.inverse.SolveCancelledException;
import org.nodewright.physics.inverse.SolveProgress;
import org.nodewright.physics.tuning.Cents;

/**
 * Finds the thicknesses (uniform, or chosen graduation control points) and brace heights that put chosen modes of
 * a plate on target frequencies: Levenberg–Marquardt (Hipparchus {@link LevenbergMarquardtOptimizer}, after Moré
 * 1978) on the targets' cents errors, each evaluation one Rayleigh–Ritz analysis ({@link PlateSolver#shapes}),
 * with a forward-difference Jacobian and the unknowns kept inside the maker's limits by clamping. One extra row per
 * unknown, {@link #STAY_CENTS_PER_MM} cents per mm moved from the start (Tikhonov regularisation), makes the
 * problem well posed when there are more unknowns than targets: of all the carvings that reach the targets the
 * one closest to the plate as it is wins. A target names the n-th lowest flexural mode of the plate as it is; while
 * the plate changes, each target follows the mode whose shape is most like that mode's shape at the start (the modal
 * assurance criterion of the shape grids, Allemang &amp; Brown 1982), so that two modes swapping order do not swap
 * targets.
 * After the solve, the sensitivities: how many Hz each target mode moves when 0.1 mm is removed from each unknown
 * (and from the whole plate at once), by a one-sided difference at the solution.
 */
public final class ThicknessTuner {

    /** Forward-difference step of the unknowns, m (10 µm: far above rounding, far below a plane's shaving). */
    static final double STEP_M = 1e-5;
    /** Weight of the stay-near-the-start rows: 0.1 cent per mm, negligible against the ~100–1000 cents per mm of a target. */
    static final double STAY_CENTS_PER_MM = 0.1;
    /** The maker's unit of removal for the sensitivities: 0.1 mm. */
    public static final double TENTH_MM = 1e-4;

    /** What an unknown is. */
    public enum Kind { THICKNESS, THICKNESS_POINT, BRACE_HEIGHT }

    /**
     * One unknown: the uniform thickness (index 0), a graduation control point's thickness, or a brace's height,
     * kept within [min, max] metres.
     */
    public record Unknown(Kind kind, int index, double min, double max) {
        public Unknown {
            if (kind == null) {
                throw new IllegalArgumentException("kind is required");
            }
            if (index < 0) {
                throw new IllegalArgumentException("index must be >= 0, got " + index);
            }
            Require.positive("min", min);
            Require.positive("max", max);
            if (!(max >= min)) {
                throw new IllegalArgumentException("max must be at least min, got " + min + " .. " + max);
            }
        }
    }

    /** The n-th lowest flexural mode (from 1) should sound at targetHz. */
    public record Target(int mode, double targetHz) {
        public Target {
            Require.between("mode", mode, 1, PlateSolver.MAX_MODES);
            Require.positive("targetHz", targetHz);
        }
    }

    /**
     * @param plate        the plate with the solved unknowns
     * @param values       the unknowns' values, m, in the order given
     * @param frequencies  each target mode's frequency, Hz
     * @param cents        each target's error, cents (positive: sharp of the target)
     * @param hzPerTenthMm per target, per unknown, then the whole plate last: Hz moved when 0.1 mm is removed
     * @param modesNow     each target's mode rank (from 1) on the solved plate
     */
    public record Solution(Plate plate, double[] values, double[] frequencies, double[] cents, double worstCents,
            int evaluations, boolean converged, double[][] hzPerTenthMm, int[] modesNow) {
    }

    private final PlateSolver solver = new PlateSolver();
    private final double toleranceCents;
    private final int maxEvaluations;

    public ThicknessTuner(double toleranceCents, int maxEvaluations) {
        this.toleranceCents = Require.positive("toleranceCents", toleranceCents);
        this.maxEvaluations = Require.atLeastOne("maxEvaluations", maxEvaluations);
    }

    /**
     * @param modeCount modes analysed per evaluation (the bench's own count, so that the basis is the bench's)
     * @throws IllegalArgumentException when an unknown does not fit the plate, or a start lies outside its limits
     * @throws SolveCancelledException  when {@code cancelled} turns true
     */
    public Solution solve(Plate plate, List<Target> targets, List<Unknown> unknowns, int modeCount,
            SolveProgress progress, BooleanSupplier cancelled) {
        if (targets.isEmpty() || unknowns.isEmpty()) {
            throw new IllegalArgumentException("at least one target and one unknown are needed");
        }
        int count = Math.max(modeCount, targets.stream().mapToInt(Target::mode).max().orElseThrow());
        Require.between("modeCount", count, 1, PlateSolver.MAX_MODES);
        for (Unknown u : unknowns) {
            check(plate, u);
        }
        Tracker tracker = new Tracker(solver.shapes(plate, count), targets);
        Run run = new Run(plate, targets, unknowns, count, tracker, progress, cancelled);
        BestKeptFit.run(run::valueAndJacobian, targets.size() + unknowns.size(), run.start.clone(),
                v -> new ArrayRealVector(run.clamp(v.toArray())), () -> run.bestWorst <= toleranceCents);
        if (run.best == null) {
            throw new IllegalArgumentException("the thickness solve found no usable plate");
        }
        Plate solved = apply(plate, unknowns, run.best);
        double[] cents = new double[targets.size()];
        for (int i = 0; i < cents.length; i++) {
            cents[i] = Cents.between(run.bestFrequencies[i], targets.get(i).targetHz());
        }
        int[] modesNow = tracker.match(solver.shapes(solved, count)).ranks();
        double[][] sensitivity = sensitivities(solved, targets, unknowns, run.best, count, run.bestFrequencies,
                tracker, cancelled);
        return new Solution(solved, run.best.clone(), run.bestFrequencies.clone(), cents, run.bestWorst,
                run.evaluations, run.bestWorst <= toleranceCents, sensitivity, modesNow);
    }

    /**
     * Hz moved per 0.1 mm removed: for each unknown (clamped at its lower limit it is taken upwards and the sign
     * turned), and for the whole plate's thickness (every control point, or the uniform thickness) at once.
     */
    private double[][] sensitivities(Plate solved, List<Target> targets, List<Unknown> unknowns, double[] values,
            int count, double[] base, Tracker tracker, BooleanSupplier cancelled) {
        double[][] out = new double[targets.size()][unknowns.size() + 1];
        for (int j = 0; j <= unknowns.size(); j++) {
            if (cancelled.getAsBoolean()) {
                throw new SolveCancelledException();
            }
            double[] f;
            if (j < unknowns.size()) {
                double[] q = values.clone();
                q[j] -= TENTH_MM;
                if (q[j] <= 0) {
                    q[j] = values[j] + 2 * TENTH_MM;
                    f = tracker.frequencies(apply(solved, List.of(unknowns.get(j)), new double[] {q[j]}), count);
                    for (int i = 0; i < targets.size(); i++) {
                        out[i][j] = -(f[i] - base[i]) / 2;
                    }
                    continue;
                }
                f = tracker.frequencies(apply(solved, List.of(unknowns.get(j)), new double[] {q[j]}), count);
            } else {
                f = tracker.frequencies(thinnedEverywhere(solved, TENTH_MM), count);
            }
            for (int i = 0; i < targets.size(); i++) {
                out[i][j] = f[i] - base[i];
            }
        }
        return out;
    }

    /** The plate with every thickness (uniform or each control point) less by {@code removed}, m. */
    static Plate thinnedEverywhere(Plate plate, double removed) {
        ThicknessField t = plate.thickness();
        ThicknessField thinner;
        if (t.controlPoints().isEmpty()) {
            thinner = ThicknessField.uniform(Math.max(t.minimum() - removed, t.minimum() / 2));
        } else {
            thinner = ThicknessField.graduated(t.controlPoints().stream()
                    .map(p -> new ThicknessPoint(p.x(), p.y(), Math.max(p.thicknessM() - removed, p.thicknessM() / 2)))
                    .toList());
        }
        return new Plate(plate.outline(), plate.material(), thinner, plate.edges(), plate.braces());
    }

    /** Follows each target's mode by its shape: the start's shape grids, matched to each analysis by MAC. */
    private final class Tracker {
        final double[][][] reference;

        record Match(double[] frequencies, int[] ranks) {
        }

        Tracker(PlateAnalysis start, List<Target> targets) {
            reference = new double[targets.size()][][];
            for (int i = 0; i < targets.size(); i++) {
                int m = targets.get(i).mode();
                if (m > start.modes().size()) {
                    throw new IllegalArgumentException("the plate has only " + start.modes().size()
                            + " modes in its basis, mode " + m + " was asked for");
                }
                reference[i] = start.modes().get(m - 1).shape().w();
            }
        }

        double[] frequencies(Plate plate, int count) {
            return match(solver.shapes(plate, count)).frequencies();
        }

        /** Greedy: the best (target, mode) pair first, each mode to one target. */
        Match match(PlateAnalysis a) {
            List<PlateMode> modes = a.modes();
            int t = reference.length;
            double[][] mac = new double[t][modes.size()];
            for (int i = 0; i < t; i++) {
                for (int j = 0; j < modes.size(); j++) {
                    mac[i][j] = mac(reference[i], modes.get(j).shape().w());
                }
            }
            double[] f = new double[t];
            int[] ranks = new int[t];
            boolean[] targetDone = new boolean[t];
            boolean[] modeTaken = new boolean[modes.size()];
            for (int round = 0; round < t; round++) {
                int bi = -1;
                int bj = -1;
                for (int i = 0; i < t; i++) {
                    for (int j = 0; j < modes.size(); j++) {
                        if (!targetDone[i] && !modeTaken[j] && (bi < 0 || mac[i][j] > mac[bi][bj])) {
                            bi = i;
                            bj = j;
                        }
                    }
                }
                targetDone[bi] = true;
                modeTaken[bj] = true;
                f[bi] = modes.get(bj).frequencyHz();
                ranks[bi] = bj + 1;
            }
            return new Match(f, ranks);
        }
    }

    /** Modal assurance criterion of two shape grids over their common finite nodes: (a·b)² / ((a·a)(b·b)). */
    static double mac(double[][] a, double[][] b) {
        double ab = 0;
        double aa = 0;
        double bb = 0;
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < a[i].length; j++) {
                double x = a[i][j];
                double y = b[i][j];
                if (Double.isFinite(x) && Double.isFinite(y)) {
                    ab += x * y;
                    aa += x * x;
                    bb += y * y;
                }
            }
        }
        return aa == 0 || bb == 0 ? 0 : ab * ab / (aa * bb);
    }

    private static void check(Plate plate, Unknown u) {
        boolean graduated = !plate.thickness().controlPoints().isEmpty();
        switch (u.kind()) {
            case THICKNESS -> {
                if (graduated) {
                    throw new IllegalArgumentException("a graduated plate has no single thickness: choose its points");
                }
            }
            case THICKNESS_POINT -> {
                if (u.index() >= plate.thickness().controlPoints().size()) {
                    throw new IllegalArgumentException("no thickness point " + u.index());
                }
            }
            case BRACE_HEIGHT -> {
                if (u.index() >= plate.braces().size()) {
                    throw new IllegalArgumentException("no brace " + u.index());
                }
            }
            default -> throw new IllegalStateException();
        }
        double v = value(plate, u);
        if (v < u.min() - 1e-12 || v > u.max() + 1e-12) {
            throw new IllegalArgumentException(u.kind() + " " + u.index() + " starts at " + v
                    + " m, outside its limits " + u.min() + " .. " + u.max());
        }
    }

    /** An unknown's value on a plate, m. */
    static double value(Plate plate, Unknown u) {
        return switch (u.kind()) {
            case THICKNESS -> plate.thickness().minimum();
            case THICKNESS_POINT -> plate.thickness().controlPoints().get(u.index()).thicknessM();
            case BRACE_HEIGHT -> plate.braces().get(u.index()).heightM();
        };
    }

    /** The plate with the unknowns set to the values (m). */
    static Plate apply(Plate plate, List<Unknown> unknowns, double[] values) {
        ThicknessField thickness = plate.thickness();
        List<ThicknessPoint> points = new ArrayList<>(thickness.controlPoints());
        List<Brace> braces = new ArrayList<>(plate.braces());
        boolean pointsChanged = false;
        for (int k = 0; k < unknowns.size(); k++) {
            Unknown u = unknowns.get(k);
            switch (u.kind()) {
                case THICKNESS -> thickness = ThicknessField.uniform(values[k]);
                case THICKNESS_POINT -> {
                    ThicknessPoint p = points.get(u.index());
                    points.set(u.index(), new ThicknessPoint(p.x(), p.y(), values[k]));
                    pointsChanged = true;
                }
                case BRACE_HEIGHT -> braces.set(u.index(), braces.get(u.index()).withHeight(values[k]));
                default -> throw new IllegalStateException();
            }
        }
        if (pointsChanged) {
            thickness = ThicknessField.graduated(points);
        }
        return new Plate(plate.outline(), plate.material(), thickness, plate.edges(), braces);
    }

    private final class Run {
        final Plate plate;
        final List<Target> targets;
        final List<Unknown> unknowns;
        final int count;
        final Tracker tracker;
        final SolveProgress progress;
        final BooleanSupplier cancelled;
        final double[] start;
        int evaluations;
        double[] best;
        double bestWorst = Double.POSITIVE_INFINITY;
        double[] bestFrequencies;

        Run(Plate plate, List<Target> targets, List<Unknown> unknowns, int count, Tracker tracker,
                SolveProgress progress, BooleanSupplier cancelled) {
            this.plate = plate;
            this.tracker = tracker;
            this.targets = targets;
            this.unknowns = unknowns;
            this.count = count;
            this.progress = progress;
            this.cancelled = cancelled;
            this.start = new double[unknowns.size()];
            for (int k = 0; k < start.length; k++) {
                start[k] = value(plate, unknowns.get(k));
            }
        }

        double[] clamp(double[] in) {
            double[] p = in.clone();
            for (int k = 0; k < p.length; k++) {
                Unknown u = unknowns.get(k);
                p[k] = Double.isFinite(p[k]) ? Math.max(u.min(), Math.min(u.max(), p[k])) : start[k];
            }
            return p;
        }

        double[] residuals(double[] p) {
            BestKeptFit.spend(evaluations, maxEvaluations, cancelled);
            evaluations++;
            double[] f = tracker.frequencies(apply(plate, unknowns, p), count);
            double[] r = new double[targets.size() + unknowns.size()];
            double worst = 0;
            for (int i = 0; i < targets.size(); i++) {
                r[i] = Cents.between(f[i], targets.get(i).targetHz());
                worst = Math.max(worst, Math.abs(r[i]));
            }
            for (int k = 0; k < unknowns.size(); k++) {
                r[targets.size() + k] = STAY_CENTS_PER_MM * (p[k] - start[k]) * 1e3;
            }
            if (worst < bestWorst) {
                bestWorst = worst;
                best = p.clone();
                bestFrequencies = f;
            }
            progress.update(evaluations, maxEvaluations, bestWorst);
            return r;
        }

        Pair<RealVector, RealMatrix> valueAndJacobian(RealVector point) {
            double[] p = clamp(point.toArray());
            double[] r0 = residuals(p);
            double[][] jac = new double[r0.length][p.length];
            for (int j = 0; j < p.length; j++) {
                if (bestWorst <= toleranceCents) {
                    break;
                }
                double[] q = p.clone();
                q[j] += STEP_M;
                double[] qc = clamp(q);
                if (qc[j] == p[j]) {
                    q[j] = p[j] - STEP_M;
                    qc = clamp(q);
                }
                double dh = qc[j] - p[j];
                if (dh == 0) {
                    continue; // min == max: the unknown is pinned
                }
                double[] r1 = residuals(qc);
                for (int i = 0; i < r0.length; i++) {
                    jac[i][j] = (r1[i] - r0[i]) / dh;
                }
            }
            return new Pair<>(new ArrayRealVector(r0), new Array2DRowRealMatrix(jac, false));
        }
    }
}
