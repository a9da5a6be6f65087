package org.nodewright.inverse;

import static org.nodewright.physics.Units.MM;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import org.nodewright.bars.BarAnalysisRequest;
import org.nodewright.bars.BarMapper;
import org.nodewright.physics.bars.Bar;
import org.nodewright.physics.bars.TuningLimits;
import org.nodewright.physics.bars.TuningTargets;
import org.nodewright.physics.bars.UndercutTuner;
import org.nodewright.strings.StringRules;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** Tunes a bar's undercut to a fundamental and overtone ratios, as a polled, cancellable solve job. */
@RestController
@Tag(name = "Inverse design")
class BarTuningController {

    private final SolveJobs jobs;

    BarTuningController(SolveJobs jobs) {
        this.jobs = jobs;
    }

    @PostMapping(path = "/api/v1/inverse/bar-tuning", consumes = "application/json")
    @Operation(summary = "Start a bar tuning solve; 202 with the job (poll GET /api/v1/inverse/jobs/{id})",
            description = "Body: {bar, note or targetHz, ratios (default [4, 10]; [3, 6] for a xylophone), limits "
                    + "{minimumThicknessMm, flatEndMm, minLengthMm, maxLengthMm}, toleranceCents, maxEvaluations}. "
                    + "Unknowns: the depth, length and shape of a smooth symmetric undercut (and the bar's length when "
                    + "minLengthMm < maxLengthMm). Levenberg-Marquardt on the cents of each target by the bar core; the "
                    + "result gives each target's cents, the cut profile, the cord holes at mode 1's nodes and the "
                    + "grinding sensitivity of modes 1-3.")
    ResponseEntity<SolveJob.View> start(@Valid @RequestBody BarTuningRequest request) {
        BarAnalysisRequest barRequest = request.bar();
        Bar blank = BarMapper.toBar(barRequest);
        double f1 = StringRules.pitchHz(request.note(), request.targetHz(), barRequest.referenceA4OrDefault());
        double[] ratios = request.ratiosOrDefault().stream().mapToDouble(Double::doubleValue).toArray();
        TuningTargets targets = new TuningTargets(f1, ratios);
        TuningLimits limits = new TuningLimits(request.minimumThicknessMm() * MM, request.flatEndMm() * MM,
                request.minLengthMm() * MM, request.maxLengthMm() * MM);
        double tolerance = request.toleranceCents() == null ? BarTuningRequest.DEFAULT_TOLERANCE_CENTS
                : request.toleranceCents();
        int cap = request.maxEvaluations() == null ? BarTuningRequest.DEFAULT_MAX_EVALUATIONS : request.maxEvaluations();
        return jobs.accepted("bar-tuning", j -> BarTuningResult.of(new UndercutTuner(tolerance, cap).solve(
                blank, barRequest.theoryOrDefault(), targets, limits, null, j, j::cancelRequested), targets,
                barRequest.theoryOrDefault(), barRequest));
    }
}
