package org.nodewright.physics.inverse;

import static org.nodewright.physics.Units.MM;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;
import org.nodewright.physics.aircolumn.AirColumn;
import org.nodewright.physics.aircolumn.AirProperties;
import org.nodewright.physics.aircolumn.BoreSegment;
import org.nodewright.physics.aircolumn.Breath;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.Mouth;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.aircolumn.ToneHole;
import org.nodewright.physics.aircolumn.TransferMatrixSolver;

/**
 * The sounding frequency of a fingering by the air-column core's own model: the transfer matrix
 * method with its tone-hole, radiation and wall-loss models, the playing resonance being the
 * input-impedance maximum (closed input end) or minimum (open input end), as the bore bench
 * finds it. Here the extremum of ln|Z| is tracked from a guess: walk uphill (on +-ln|Z|) in steps
 * of {@link #STEP_RATIO}, then Brent's method (Hipparchus {@link BrentOptimizer}) in the last two
 * steps. A search that runs farther than {@link #MAX_RATIO} from the guess gives NaN.
 *
 * <p>Changing the foot keeps the last section's end diameters (a cone's taper changes with it).
 */
public final class AirCoreFrequencyModel implements PlayingFrequencyModel {

    /** Uphill step: 0.25 % (4.3 cents), well inside a resonance peak of Q below 200. */
    static final double STEP_RATIO = 1.0025;
    /** Give up beyond a factor 1.4 (about 580 cents) from the guess. */
    static final double MAX_RATIO = 1.4;

    private final List<BoreSegment> segments;
    private final double[] chimneysMm;
    private final InputEnd inputEnd;
    private final OutputEnd outputEnd;
    private final AirProperties air;
    private final boolean losses;
    private final double sign;
    /** The player's end and the breath, taken along into every fingering (null: none). */
    private final Mouth mouth;
    private final Breath breath;

    /**
     * @param segments   the bore from the input end, metres (the last one's length is replaced by the foot)
     * @param chimneysMm chimney height of each hole, mm
     */
    public AirCoreFrequencyModel(List<BoreSegment> segments, double[] chimneysMm, InputEnd inputEnd,
            OutputEnd outputEnd, AirProperties air, boolean losses) {
        this(segments, chimneysMm, inputEnd, outputEnd, air, losses, null, null);
    }

    /** The same with the player's end and the breath (either may be null). */
    public AirCoreFrequencyModel(List<BoreSegment> segments, double[] chimneysMm, InputEnd inputEnd,
            OutputEnd outputEnd, AirProperties air, boolean losses, Mouth mouth, Breath breath) {
        if (segments == null || segments.isEmpty() || inputEnd == null || outputEnd == null || air == null) {
            throw new IllegalArgumentException("segments, ends and air are required");
        }
        this.segments = List.copyOf(segments);
        this.chimneysMm = chimneysMm.clone();
        this.inputEnd = inputEnd;
        this.outputEnd = outputEnd;
        this.air = air;
        this.losses = losses;
        this.sign = inputEnd == InputEnd.CLOSED ? 1 : -1;
        this.mouth = mouth;
        this.breath = breath;
    }

    /** The same bore, holes, ends, air and breath with another player's end (null: none). */
    public AirCoreFrequencyModel withMouth(Mouth other) {
        return new AirCoreFrequencyModel(segments, chimneysMm, inputEnd, outputEnd, air, losses, other, breath);
    }

    /** The player's end, or null. */
    public Mouth mouth() {
        return mouth;
    }

    /** Bore length up to the last section, mm. */
    public double lengthBeforeFootMm() {
        double m = 0;
        for (int i = 0; i + 1 < segments.size(); i++) {
            m += segments.get(i).length();
        }
        return m / MM;
    }

    public AirColumn column(HoleLayout layout, Fingering fingering) {
        if (layout.holeCount() != chimneysMm.length) {
            throw new IllegalArgumentException("layout has " + layout.holeCount() + " holes, the bore "
                    + chimneysMm.length);
        }
        List<BoreSegment> segs = new ArrayList<>(segments);
        BoreSegment foot = segs.get(segs.size() - 1);
        segs.set(segs.size() - 1, new BoreSegment(layout.footLengthMm() * MM, foot.inputRadius(), foot.outputRadius()));
        List<ToneHole> holes = new ArrayList<>();
        for (int h = 0; h < layout.holeCount(); h++) {
            holes.add(new ToneHole(layout.position(h) * MM, layout.diameter(h) * MM / 2, chimneysMm[h] * MM,
                    !fingering.closedHoles().contains(h)));
        }
        return new AirColumn(segs, holes, inputEnd, outputEnd, air, losses, mouth, breath);
    }

    @Override
    public double soundingHz(HoleLayout layout, Fingering fingering, double guessHz) {
        TransferMatrixSolver tmm = new TransferMatrixSolver(column(layout, fingering));
        java.util.function.DoubleUnaryOperator g = f -> {
            double[] z = tmm.inputImpedance(f);
            return sign * 0.5 * Math.log(z[0] * z[0] + z[1] * z[1]);
        };
        double here = g.applyAsDouble(guessHz);
        double up = g.applyAsDouble(guessHz * STEP_RATIO);
        double down = g.applyAsDouble(guessHz / STEP_RATIO);
        if (here >= up && here >= down) {
            return refine(g, guessHz / STEP_RATIO, guessHz * STEP_RATIO, guessHz);
        }
        double ratio = up > down ? STEP_RATIO : 1 / STEP_RATIO;
        double f = guessHz * ratio;
        double value = Math.max(up, down);
        while (f / guessHz < MAX_RATIO && guessHz / f < MAX_RATIO) {
            double next = f * ratio;
            double nextValue = g.applyAsDouble(next);
            if (nextValue <= value) {
                double a = Math.min(f / ratio, next);
                double b = Math.max(f / ratio, next);
                return refine(g, a, b, f);
            }
            f = next;
            value = nextValue;
        }
        return Double.NaN;
    }

    private static double refine(java.util.function.DoubleUnaryOperator g, double a, double b, double start) {
        return new BrentOptimizer(1e-13, 1e-10).optimize(new MaxEval(200),
                new UnivariateObjectiveFunction(g::applyAsDouble), GoalType.MAXIMIZE,
                new SearchInterval(a, b, start)).getPoint();
    }
}
