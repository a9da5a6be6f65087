package org.nodewright.inverse;

import static org.nodewright.inverse.ToneHoleSolveSetup.finite;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Function;
import org.nodewright.aircolumns.AirColumnMapper;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.inverse.AirCoreFrequencyModel;
import org.nodewright.physics.inverse.BlankTubeSolver;
import org.nodewright.physics.inverse.FirstLayout;
import org.nodewright.physics.aircolumn.MouthKind;
import org.nodewright.physics.inverse.HoleLayout;
import org.nodewright.physics.inverse.ModelFreedom;
import org.nodewright.physics.inverse.MouthFreedom;
import org.nodewright.physics.inverse.SolverLimits;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;

/**
 * A validated blank-tube request turned into the solver's inputs: the bore with placeholder holes
 * (so that the one mapper, {@link AirColumnMapper}, builds the model and reads the chart), the
 * blank as the closed form sees it, the limits and the starting diameters.
 */
record BlankTubeSetup(AirColumnRequest bore, AirCoreFrequencyModel model, FirstLayout.Tube tube, double[] chimneysMm,
        List<Fingering> fingerings, SolverLimits limits, double[] startDiametersMm, ModelFreedom freedom) {

    /** Levine &amp; Schwinger 1948: end correction 0.6133 a of an unflanged pipe at low ka. */
    static final double UNFLANGED_END = 0.6133;
    /** Norris &amp; Sheng 1989: 0.8216 a in an infinite flange. */
    static final double FLANGED_END = 0.8216;

    /** The blank's limits: the tone-hole defaults, but diameters vary and the foot may only be cut. */
    static ToneHoleSolveSetup.Bounds bounds(BlankTubeRequest r) {
        ToneHoleSolveRequest.Limits l = r.limitsOrNone();
        ToneHoleSolveSetup.Bounds b = ToneHoleSolveSetup.Bounds.of(r.bore(), l);
        return new ToneHoleSolveSetup.Bounds(b.minPositionMm(), b.endMarginMm(), b.minWallMm(), b.minDiameterMm(),
                b.maxDiameterMm(), l.varyDiameters() == null || l.varyDiameters(), l.varyFoot() == null || l.varyFoot(),
                b.minFootMm(), l.maxFootMm() == null ? b.footMm() : l.maxFootMm(), b.footMm());
    }

    static void problems(List<FieldProblem> out, BlankTubeRequest r) {
        if (!usable(r.bore())) {
            return;
        }
        ToneHoleSolveSetup.Bounds b = bounds(r);
        if (b.maxDiameterMm() < b.minDiameterMm()) {
            out.add(new FieldProblem("limits.maxDiameterMm", "must not be below minDiameterMm (" + b.minDiameterMm() + ")"));
        }
        if (b.maxFootMm() < b.minFootMm()) {
            out.add(new FieldProblem("limits.maxFootMm", "must not be below minFootMm (" + b.minFootMm() + ")"));
        }
        if (b.varyFoot() && (b.footMm() < b.minFootMm() || b.footMm() > b.maxFootMm())) {
            out.add(new FieldProblem("limits.minFootMm", "the blank's last section (" + b.footMm()
                    + " mm) must lie within minFootMm..maxFootMm"));
        }
        if (b.minPositionMm() >= BoreMapping.lengthMm(r.bore()) - b.endMarginMm()) {
            out.add(new FieldProblem("limits.minPositionMm", "leaves no room for holes on a "
                    + BoreMapping.lengthMm(r.bore()) + " mm tube"));
        }
        List<Double> starts = r.startDiametersMm();
        if (starts != null) {
            for (int i = 0; i < starts.size(); i++) {
                Double d = starts.get(i);
                if (d != null && Double.isFinite(d) && (d < b.minDiameterMm() || d > b.maxDiameterMm())) {
                    out.add(new FieldProblem("startDiametersMm[" + i + "]", "must lie within the diameter limits ("
                            + b.minDiameterMm() + ".." + b.maxDiameterMm() + " mm)"));
                }
            }
        }
    }

    /** The headspace's bounds (mm) when it may move, else null; defaults in {@link BlankTubeRequest.MouthLimits}. */
    static MouthFreedom.Range headspaceRange(BlankTubeRequest r) {
        BlankTubeRequest.MouthLimits m = r.mouthLimits();
        if (m == null || !Boolean.TRUE.equals(m.varyHeadspace())) {
            return null;
        }
        AirColumnRequest.MouthSpec mouth = r.bore().mouth();
        double given = mouth == null || mouth.headspaceMm() == null ? 0 : mouth.headspaceMm();
        double input = r.bore().segments().get(0).inputDiameterMm();
        return new MouthFreedom.Range(m.minHeadspaceMm() == null ? 0 : m.minHeadspaceMm(),
                m.maxHeadspaceMm() == null ? Math.max(given, input) : m.maxHeadspaceMm());
    }

    /** The window length's bounds (mm) when it may move, else null. */
    static MouthFreedom.Range windowRange(BlankTubeRequest r) {
        BlankTubeRequest.MouthLimits m = r.mouthLimits();
        if (m == null || !Boolean.TRUE.equals(m.varyWindowLength())) {
            return null;
        }
        double given = r.bore().mouth().windowLengthMm();
        return new MouthFreedom.Range(m.minWindowLengthMm() == null ? 0.5 * given : m.minWindowLengthMm(),
                m.maxWindowLengthMm() == null ? 1.5 * given : m.maxWindowLengthMm());
    }

    /** The mouth limits against the bore's mouth: what may move must exist, bounds must hold the given figure. */
    static void mouthProblems(List<FieldProblem> out, BlankTubeRequest r) {
        BlankTubeRequest.MouthLimits m = r.mouthLimits();
        if (m == null) {
            return;
        }
        AirColumnRequest.MouthSpec mouth = r.bore().mouth();
        MouthKind kind = mouth == null ? null : mouth.kind();
        boolean head = Boolean.TRUE.equals(m.varyHeadspace());
        boolean window = Boolean.TRUE.equals(m.varyWindowLength());
        if (!head && (m.minHeadspaceMm() != null || m.maxHeadspaceMm() != null)) {
            out.add(new FieldProblem("mouthLimits.varyHeadspace", "set it to true for the headspace bounds to count"));
        }
        if (!window && (m.minWindowLengthMm() != null || m.maxWindowLengthMm() != null)) {
            out.add(new FieldProblem("mouthLimits.varyWindowLength", "set it to true for the window bounds to count"));
        }
        if (head && kind != MouthKind.WINDOW && kind != MouthKind.EMBOUCHURE) {
            out.add(new FieldProblem("mouthLimits.varyHeadspace", "only a window or embouchure mouth has a headspace"
                    + (kind == null ? "; the bore has no mouth" : "; the bore's mouth is " + kind)));
            head = false;
        }
        if (window && kind != MouthKind.WINDOW) {
            out.add(new FieldProblem("mouthLimits.varyWindowLength", "only a window mouth has a window length"
                    + (kind == null ? "; the bore has no mouth" : "; the bore's mouth is " + kind)));
            window = false;
        }
        if (!usable(r.bore())) {
            return;
        }
        if (head) {
            MouthFreedom.Range h = headspaceRange(r);
            double given = mouth.headspaceMm() == null ? 0 : mouth.headspaceMm();
            if (h.maxMm() < h.minMm()) {
                out.add(new FieldProblem("mouthLimits.maxHeadspaceMm", "must not be below minHeadspaceMm (" + h.minMm() + ")"));
            } else if (given < h.minMm() || given > h.maxMm()) {
                out.add(new FieldProblem("mouthLimits.minHeadspaceMm", "the bore's headspace (" + given
                        + " mm) must lie within minHeadspaceMm..maxHeadspaceMm"));
            }
        }
        if (window && mouth.windowLengthMm() != null) {
            MouthFreedom.Range w = windowRange(r);
            if (w.maxMm() < w.minMm()) {
                out.add(new FieldProblem("mouthLimits.maxWindowLengthMm", "must not be below minWindowLengthMm ("
                        + w.minMm() + ")"));
            } else if (mouth.windowLengthMm() < w.minMm() || mouth.windowLengthMm() > w.maxMm()) {
                out.add(new FieldProblem("mouthLimits.minWindowLengthMm", "the window's length ("
                        + mouth.windowLengthMm() + " mm) must lie within minWindowLengthMm..maxWindowLengthMm"));
            }
        }
    }

    private static boolean usable(AirColumnRequest bore) {
        if (bore.segments() == null || bore.segments().isEmpty()) {
            return false;
        }
        for (AirColumnRequest.Segment s : bore.segments()) {
            if (s == null || !finite(s.lengthMm()) || !finite(s.inputDiameterMm()) || !finite(s.outputDiameterMm())
                    || s.lengthMm() <= 0 || s.inputDiameterMm() <= 0 || s.outputDiameterMm() <= 0) {
                return false;
            }
        }
        return true;
    }

    /** Length-weighted mean diameter of the bore, mm (the closed form's cylinder). */
    static double meanDiameterMm(AirColumnRequest bore) {
        double sum = 0;
        double length = 0;
        for (AirColumnRequest.Segment s : bore.segments()) {
            sum += s.lengthMm() * (s.inputDiameterMm() + s.outputDiameterMm()) / 2;
            length += s.lengthMm();
        }
        return sum / length;
    }

    /** The job's work for {@link SolveJobs#accepted}: the blank-tube solve of a request that passed validation. */
    static Function<SolveJob, Object> work(BlankTubeRequest request) {
        BlankTubeSetup setup = of(request);
        double tolerance = request.toleranceOrDefault();
        int cap = request.evaluationsOrDefault();
        return j -> BlankTubeResult.of(new BlankTubeSolver(tolerance, cap).solve(setup.model(), setup.tube(),
                setup.chimneysMm(), setup.model().lengthBeforeFootMm(), setup.fingerings(), setup.limits(),
                setup.freedom(), setup.startDiametersMm(), j, j::cancelRequested), setup.tube(), tolerance,
                setup.bore());
    }

    /** The solver's inputs for a request that passed validation. */
    static BlankTubeSetup of(BlankTubeRequest r) {
        AirColumnRequest blank = r.bore();
        int n = r.holeCount();
        double length = BoreMapping.lengthMm(blank);
        double diameter = meanDiameterMm(blank);
        ToneHoleSolveSetup.Bounds b = bounds(r);
        // placeholder holes, evenly spread; the first layout replaces them before any solve
        List<AirColumnRequest.Hole> holes = new ArrayList<>();
        for (int h = 0; h < n; h++) {
            double x = b.minPositionMm() + (length - b.endMarginMm() - b.minPositionMm()) * (h + 0.5) / n;
            holes.add(new AirColumnRequest.Hole(x, Math.min(b.maxDiameterMm(), Math.max(b.minDiameterMm(), diameter / 2)),
                    r.chimneyMm(), true));
        }
        AirColumnRequest bore = new AirColumnRequest(blank.segments(), blank.inputEnd(), blank.outputEnd(), holes,
                blank.temperatureC(), blank.relativeHumidityPct(), blank.losses(), blank.fMinHz(), blank.fMaxHz(),
                blank.points(), blank.referenceA4Hz(), blank.profileSamples(), r.fingerings(), blank.mouth(),
                blank.breath());
        List<Fingering> fingerings = ToneHoleSolveSetup.namedFingerings(bore);
        double[] chimneys = new double[n];
        Arrays.fill(chimneys, r.chimneyMm());
        double[] starts = r.startDiametersMm() != null
                ? r.startDiametersMm().stream().mapToDouble(Double::doubleValue).toArray()
                : Arrays.stream(BlankTubeRequest.DEFAULT_START_FRACTIONS)
                        .map(f -> Math.min(b.maxDiameterMm(), Math.max(b.minDiameterMm(), f * diameter))).toArray();
        AirCoreFrequencyModel model = BoreMapping.model(bore);
        return new BlankTubeSetup(bore, model, tube(blank, length, diameter), chimneys, fingerings,
                b.toCore(), starts, MouthFreedom.of(model, headspaceRange(r), windowRange(r)));
    }

    /**
     * The blank as the closed form sees it; its input end correction is what the model's own blank
     * tube says: the lowest resonance f0 of the tube without holes gives the effective length
     * c / 2f0 (or c / 4f0), less the tube and its output end correction.
     */
    static FirstLayout.Tube tube(AirColumnRequest blank, double lengthMm, double diameterMm) {
        boolean conical = blank.segments().stream().anyMatch(s -> !s.inputDiameterMm().equals(s.outputDiameterMm()));
        boolean quarter = !conical && ((blank.inputEnd() == InputEnd.CLOSED) != (blank.outputEnd() == OutputEnd.CLOSED));
        double a = blank.segments().get(blank.segments().size() - 1).outputDiameterMm() / 2;
        double outCorrection = switch (blank.outputEnd()) {
            case OPEN_UNFLANGED -> UNFLANGED_END * a;
            case OPEN_FLANGED -> FLANGED_END * a;
            default -> 0.0;
        };
        double c = AirColumnMapper.air(blank).speedOfSound();
        double waves = quarter ? 4 : 2;
        // a first guess with an input correction of 1.5 diameters (common practice for a flue mouth)
        double guess = c * 1e3 / (waves * (lengthMm + outCorrection + 1.5 * diameterMm));
        AirCoreFrequencyModel bare = BoreMapping.model(blank);
        double f0 = bare.soundingHz(new HoleLayout(new double[0], new double[0],
                blank.segments().get(blank.segments().size() - 1).lengthMm()),
                new Fingering("blank", java.util.Set.of(), guess, 1), guess);
        if (!Double.isFinite(f0)) {
            throw new BadRequestException("bore", "the blank tube has no playing resonance near " + Math.round(guess)
                    + " Hz; check its ends and mouth");
        }
        double inCorrection = c * 1e3 / (waves * f0) - lengthMm - outCorrection;
        return new FirstLayout.Tube(lengthMm, diameterMm, c, inCorrection, outCorrection, quarter);
    }
}
