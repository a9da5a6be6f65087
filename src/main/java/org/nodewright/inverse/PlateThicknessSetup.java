package org.nodewright.inverse;

import static org.nodewright.physics.Units.MM;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.nodewright.physics.plates.Plate;
import org.nodewright.physics.plates.ThicknessTuner;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.plates.PlateAnalysisRequest;
import org.nodewright.plates.PlateMapping;
import org.nodewright.strings.StringRules;

/** A validated plate-thickness request turned into the thickness solve's work: targets, unknowns and their starts. */
final class PlateThicknessSetup {

    private PlateThicknessSetup() {
    }

    /** The job's work for {@link SolveJobs#accepted}: the thickness solve of a request that passed validation. */
    static Function<SolveJob, Object> work(PlateThicknessRequest request) {
        PlateAnalysisRequest p = request.plate();
        Plate plate = PlateMapping.toPlate(p);
        List<ThicknessTuner.Target> targets = request.targets().stream()
                .map(t -> new ThicknessTuner.Target(t.mode(),
                        StringRules.pitchHz(t.note(), t.targetHz(), EqualTemperament.ISO_16_A4_HZ)))
                .toList();
        List<ThicknessTuner.Unknown> unknowns = unknowns(request);
        double[] start = new double[unknowns.size()];
        for (int k = 0; k < start.length; k++) {
            ThicknessTuner.Unknown u = unknowns.get(k);
            start[k] = switch (u.kind()) {
                case THICKNESS -> p.thicknessMm() * MM;
                case THICKNESS_POINT -> p.thicknessPoints().get(u.index()).thicknessMm() * MM;
                case BRACE_HEIGHT -> p.bracesOrEmpty().get(u.index()).heightMm() * MM;
            };
        }
        ThicknessTuner tuner = new ThicknessTuner(request.toleranceOrDefault(), request.maxEvaluationsOrDefault());
        return j -> PlateThicknessResult.of(tuner.solve(plate, targets, unknowns, p.modeCountOrDefault(), j,
                j::cancelRequested), targets, unknowns, start, p);
    }

    /** The unknowns asked for, each within its limits (defaults from the plate's own thicknesses and heights). */
    private static List<ThicknessTuner.Unknown> unknowns(PlateThicknessRequest request) {
        List<ThicknessTuner.Unknown> unknowns = new ArrayList<>();
        List<Double> thick = request.thicknessesNow();
        if (!thick.isEmpty()) {
            double lo = request.minThicknessMm(thick.stream().mapToDouble(Double::doubleValue).min().orElseThrow()) * MM;
            double hi = request.maxThicknessMm(thick.stream().mapToDouble(Double::doubleValue).max().orElseThrow()) * MM;
            if (Boolean.TRUE.equals(request.unknowns().thickness())) {
                unknowns.add(new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS, 0, lo, hi));
            }
            for (int i : request.unknowns().pointsOrEmpty()) {
                unknowns.add(new ThicknessTuner.Unknown(ThicknessTuner.Kind.THICKNESS_POINT, i, lo, hi));
            }
        }
        List<Double> heights = request.braceHeightsNow();
        if (!heights.isEmpty()) {
            double lo = request.minBraceHeightMm(heights.stream().mapToDouble(Double::doubleValue).min().orElseThrow())
                    * MM;
            double hi = request.maxBraceHeightMm(heights.stream().mapToDouble(Double::doubleValue).max().orElseThrow())
                    * MM;
            for (int i : request.unknowns().bracesOrEmpty()) {
                unknowns.add(new ThicknessTuner.Unknown(ThicknessTuner.Kind.BRACE_HEIGHT, i, lo, hi));
            }
        }
        return unknowns;
    }
}
