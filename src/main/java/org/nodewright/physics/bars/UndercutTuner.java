package org.nodewright.physics.bars;

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
 * Finds the undercut ({@link UndercutShape}: depth, length and shape) whose bending modes sound the
 * targets: Levenberg–Marquardt (Hipparchus {@link LevenbergMarquardtOptimizer}, after Moré 1978) on
 * the targets' cents errors, with a forward-difference Jacobian and the parameters kept inside the
 * maker's limits by clamping. Parameters are scaled to order one: depth as a share of the grindable
 * depth, half-length as a share of the room between the flat ends, and the shape c. When the limits
 * let the length vary, the maker's length is tried first and then lengths stepping outwards across
 * the range ({@link #LENGTH_STEPS} steps), each solved as above, until one reaches the targets.
 */
public final class UndercutTuner {

    /** Forward-difference step of the scaled parameters (their range is about 1). */
    static final double STEP = 1e-4;
    /** Shape parameter range: g stays positive on the cut for c > −1. */
    static final double C_MIN = -0.9;
    static final double C_MAX = 3.0;
    /** Shortest undercut, as a share of the room between the flat ends. */
    static final double A_MIN = 0.15;
    /** Steps across the length range when the length is free. */
    static final int LENGTH_STEPS = 6;

    private final double toleranceCents;
    private final int maxEvaluations;

    /**
     * @param toleranceCents stop when every target is this close
     * @param maxEvaluations evaluation cap (each evaluation is one bar analysis)
     */
    public UndercutTuner(double toleranceCents, int maxEvaluations) {
        this.toleranceCents = Require.positive("toleranceCents", toleranceCents);
        this.maxEvaluations = Require.atLeastOne("maxEvaluations", maxEvaluations);
    }

    /**
     * @param blank    the uncut bar (rectangle; its length is the start when the length is free)
     * @param start    the undercut to start from, or null for a middle guess
     * @throws SolveCancelledException when {@code cancelled} turns true
     */
    public UndercutSolution solve(Bar blank, BeamTheory theory, TuningTargets targets, TuningLimits limits,
            UndercutShape start, SolveProgress progress, BooleanSupplier cancelled) {
        if (!(blank.section() instanceof RectangleSection rect)) {
            throw new IllegalArgumentException("only a rectangular bar can be undercut");
        }
        double t0 = rect.profile().maximumThickness();
        if (!(limits.minimumThickness() < t0)) {
            throw new IllegalArgumentException("minimumThickness must be below the blank's " + t0 + ", got "
                    + limits.minimumThickness());
        }
        double len0 = Math.min(limits.maxLength(), Math.max(limits.minLength(), blank.length()));
        UndercutSolution best = null;
        int used = 0;
        for (double len : lengthsToTry(len0, limits)) {
            TuningLimits fixed = new TuningLimits(limits.minimumThickness(), limits.flatEnd(), len, len);
            Run run = new Run(blank, rect.width(), t0, theory, targets, fixed, progress, cancelled, used);
            double[] p0 = start == null
                    ? run.scaled(0.5 * (t0 - limits.minimumThickness()), 0.8 * (len / 2 - limits.flatEnd()), 0.0)
                    : run.scaled(start.depth(), start.halfLength(), start.shape());
            optimise(run, p0, targets);
            used = run.evaluations;
            if (run.best != null) {
                UndercutSolution s = run.solution(toleranceCents);
                if (best == null || s.worstCents() < best.worstCents()) {
                    best = s;
                }
                if (s.converged()) {
                    break;
                }
            }
            if (used >= maxEvaluations) {
                break;
            }
        }
        if (best == null) {
            throw new IllegalArgumentException("the tuning solve found no usable undercut");
        }
        return new UndercutSolution(best.bar(), best.shape(), best.frequencies(), best.cents(), used, best.converged());
    }

    /** The maker's length first, then outwards across the range. */
    static double[] lengthsToTry(double len0, TuningLimits limits) {
        if (!limits.lengthFree()) {
            return new double[] {len0};
        }
        double step = (limits.maxLength() - limits.minLength()) / LENGTH_STEPS;
        java.util.List<Double> out = new java.util.ArrayList<>();
        out.add(len0);
        for (int k = 1; k <= LENGTH_STEPS; k++) {
            for (double len : new double[] {len0 + k * step, len0 - k * step}) {
                if (len >= limits.minLength() - 1e-12 && len <= limits.maxLength() + 1e-12) {
                    out.add(Math.max(limits.minLength(), Math.min(limits.maxLength(), len)));
                }
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private void optimise(Run run, double[] p0, TuningTargets targets) {
        BestKeptFit.run(run::valueAndJacobian, targets.modes(), run.clamp(p0),
                v -> new ArrayRealVector(run.clamp(v.toArray())), () -> run.best != null && run.bestWorst <= toleranceCents);
    }

    private final class Run {
        final Bar blank;
        final double width;
        final double t0;
        final BeamTheory theory;
        final TuningTargets targets;
        final TuningLimits limits;
        final SolveProgress progress;
        final BooleanSupplier cancelled;
        int evaluations;
        double[] best;
        double bestWorst = Double.POSITIVE_INFINITY;
        double[] bestFrequencies;

        Run(Bar blank, double width, double t0, BeamTheory theory, TuningTargets targets, TuningLimits limits,
                SolveProgress progress, BooleanSupplier cancelled, int evaluationsBefore) {
            this.blank = blank;
            this.evaluations = evaluationsBefore;
            this.width = width;
            this.t0 = t0;
            this.theory = theory;
            this.targets = targets;
            this.limits = limits;
            this.progress = progress;
            this.cancelled = cancelled;
        }

        double grindable() {
            return t0 - limits.minimumThickness();
        }

        double room(double length) {
            return length / 2 - limits.flatEnd();
        }

        double[] scaled(double depth, double halfLength, double c) {
            return new double[] {depth / grindable(), halfLength / room(limits.maxLength()), c};
        }

        double lengthOf(double[] p) {
            return limits.maxLength();
        }

        UndercutShape shapeOf(double[] p) {
            double len = lengthOf(p);
            return new UndercutShape(p[0] * grindable(), p[1] * room(len), p[2]);
        }

        double[] clamp(double[] in) {
            double[] p = in.clone();
            p[2] = Math.max(C_MIN, Math.min(C_MAX, p[2]));
            p[0] = Math.max(0, Math.min(1 / UndercutShape.gMax(p[2]), p[0]));
            p[1] = Math.max(A_MIN, Math.min(1, p[1]));
            return p;
        }

        Bar barOf(double[] p) {
            double len = lengthOf(p);
            ThicknessProfile profile = shapeOf(p).profile(len, t0);
            return blank.withSection(new RectangleSection(width, profile), len);
        }

        double[] residuals(double[] p) {
            BestKeptFit.spend(evaluations, maxEvaluations, cancelled);
            evaluations++;
            double[] f = BarAnalyzer.bendingFrequencies(barOf(p), theory, targets.modes());
            double[] r = new double[targets.modes()];
            double worst = 0;
            for (int n = 1; n <= r.length; n++) {
                r[n - 1] = Cents.between(f[n - 1], targets.targetHz(n));
                worst = Math.max(worst, Math.abs(r[n - 1]));
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
                double[] q = p.clone();
                double h = STEP;
                q[j] += h;
                double[] qc = clamp(q);
                if (qc[j] == p[j]) {
                    q[j] = p[j] - h;
                    qc = clamp(q);
                }
                double dh = qc[j] - p[j];
                double[] r1 = residuals(qc);
                for (int i = 0; i < r0.length; i++) {
                    jac[i][j] = (r1[i] - r0[i]) / dh;
                }
                if (bestWorst <= toleranceCents) {
                    break;
                }
            }
            return new Pair<>(new ArrayRealVector(r0), new Array2DRowRealMatrix(jac, false));
        }

        UndercutSolution solution(double tolerance) {
            double[] cents = new double[targets.modes()];
            for (int n = 1; n <= cents.length; n++) {
                cents[n - 1] = Cents.between(bestFrequencies[n - 1], targets.targetHz(n));
            }
            return new UndercutSolution(barOf(best), shapeOf(best), bestFrequencies.clone(), cents, evaluations,
                    bestWorst <= tolerance);
        }
    }
}
