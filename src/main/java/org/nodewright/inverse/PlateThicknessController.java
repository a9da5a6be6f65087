package org.nodewright.inverse;

import static org.nodewright.physics.Units.MM;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.plates.Plate;
import org.nodewright.physics.plates.ThicknessTuner;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.plates.PlateAnalysisRequest;
import org.nodewright.plates.PlateMapping;
import org.nodewright.strings.StringRules;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** Tunes chosen modes of a plate by its thickness, graduation points or brace heights, as a polled, cancellable job. */
@RestController
@Tag(name = "Inverse design")
class PlateThicknessController {

    private final SolveJobs jobs;

    PlateThicknessController(SolveJobs jobs) {
        this.jobs = jobs;
    }

    @PostMapping(path = "/api/v1/inverse/plate-thickness", consumes = "application/json")
    @Operation(summary = "Start a plate thickness solve; 202 with the job (poll GET /api/v1/inverse/jobs/{id})",
            description = "Body: {plate (as for /api/v1/plates/analyze), targets [{mode, note or targetHz}], unknowns "
                    + "{thickness, thicknessPoints [indexes], braceHeights [indexes]}, limits {minThicknessMm, "
                    + "maxThicknessMm, minBraceHeightMm, maxBraceHeightMm}, toleranceCents, maxEvaluations}. "
                    + "Levenberg-Marquardt on the targets' cents by the Rayleigh-Ritz plate model; the result gives each "
                    + "target's cents, the values to carve to, Hz per 0.1 mm removed and the solved plate request.")
    ResponseEntity<SolveJob.View> start(@Valid @RequestBody PlateThicknessRequest request) {
        PlateAnalysisRequest p = request.plate();
        Plate plate = PlateMapping.toPlate(p);
        List<ThicknessTuner.Target> targets = request.targets().stream()
                .map(t -> new ThicknessTuner.Target(t.mode(),
                        StringRules.pitchHz(t.note(), t.targetHz(), EqualTemperament.ISO_16_A4_HZ)))
                .toList();
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
        return jobs.accepted("plate-thickness", j -> PlateThicknessResult.of(tuner.solve(plate, targets, unknowns,
                p.modeCountOrDefault(), j, j::cancelRequested), targets, unknowns, start, p));
    }
}
