package org.nodewright.inverse;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.List;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ProblemDetail;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/**
 * Every solve job's endpoints in one place: one start per kind (its work built by the kind's setup,
 * {@code *Setup.work(request)}, answered 202 by {@link SolveJobs#accepted}), the shared poll and
 * cancel, and the ready demo requests. A new solve adds its setup and one start method here.
 */
@RestController
@Tag(name = "Inverse design")
class SolveController {

    private final SolveJobs jobs;

    SolveController(SolveJobs jobs) {
        this.jobs = jobs;
    }

    @PostMapping(path = "/api/v1/inverse/tone-holes", consumes = "application/json")
    @Operation(summary = "Start a tone-hole solve; 202 with the job (poll GET /api/v1/inverse/jobs/{id})",
            description = "Body: {bore, limits, toleranceCents, maxEvaluations}. bore is the air-column request; its "
                    + "holes are the starting layout and its fingerings (closedHoles = indices into holes, targetNote "
                    + "or targetHz) the targets. Levenberg-Marquardt on the cents errors by the air-column core's "
                    + "transfer matrix model; the job's result lists achieved cents per fingering, the distance each "
                    + "hole moved, and the adjusted bore.")
    ResponseEntity<SolveJob.View> toneHoles(@Valid @RequestBody ToneHoleSolveRequest request) {
        return jobs.accepted("tone-holes", ToneHoleSolveSetup.work(request));
    }

    @PostMapping(path = "/api/v1/inverse/blank-tube", consumes = "application/json")
    @Operation(summary = "Start a blank-tube hole solve; 202 with the job (poll GET /api/v1/inverse/jobs/{id})",
            description = "Body: {bore (no holes, no fingerings), holeCount, chimneyMm, fingerings (closedHoles index "
                    + "the holes to be made, 0 nearest the input; register 2 for the second register), "
                    + "startDiametersMm, limits, toleranceCents (default 3), maxEvaluationsPerStart, mouthLimits "
                    + "{varyHeadspace, minHeadspaceMm, maxHeadspaceMm, varyWindowLength, minWindowLengthMm, "
                    + "maxWindowLengthMm}}. The result's "
                    + "solution is a tone-hole result (notes, holes, footMovedMm, bore); firstLayout is the closed "
                    + "form's layout; starts lists every start tried; mouth lists what moved at the player's end.")
    ResponseEntity<SolveJob.View> blankTube(@Valid @RequestBody BlankTubeRequest request) {
        return jobs.accepted("blank-tube", BlankTubeSetup.work(request));
    }

    @PostMapping(path = "/api/v1/inverse/calibration", consumes = "application/json")
    @Operation(summary = "Start a calibration from measured pitches; 202 with the job (poll GET /api/v1/inverse/jobs/{id})",
            description = "Body: {bore (holes, fingerings, mouth as built), measured [{fingering, measuredHz}], fit "
                    + "[\"mouth\" | \"air-temperature\"], impedance {fingering, csv (frequencyHz,magnitude,phase), "
                    + "phaseUnit, minProminenceDb, maxPeaks}} (measured, impedance or both). Levenberg-Marquardt on the "
                    + "cents between the model and each measured pitch and each measured impedance resonance (matched to "
                    + "the model's nearest); the result gives the fitted values, each note's cents before and after, the "
                    + "rms, the curve's resonances and whether each was used, and the calibrated bore.")
    ResponseEntity<SolveJob.View> calibration(@Valid @RequestBody CalibrationRequest request) {
        return jobs.accepted("calibration", CalibrationSetup.work(request));
    }

    @PostMapping(path = "/api/v1/inverse/bar-tuning", consumes = "application/json")
    @Operation(summary = "Start a bar tuning solve; 202 with the job (poll GET /api/v1/inverse/jobs/{id})",
            description = "Body: {bar, note or targetHz, ratios (default [4, 10]; [3, 6] for a xylophone), limits "
                    + "{minimumThicknessMm, flatEndMm, minLengthMm, maxLengthMm}, toleranceCents, maxEvaluations}. "
                    + "Unknowns: the depth, length and shape of a smooth symmetric undercut (and the bar's length when "
                    + "minLengthMm < maxLengthMm). Levenberg-Marquardt on the cents of each target by the bar core; the "
                    + "result gives each target's cents, the cut profile, the cord holes at mode 1's nodes and the "
                    + "grinding sensitivity of modes 1-3.")
    ResponseEntity<SolveJob.View> barTuning(@Valid @RequestBody BarTuningRequest request) {
        return jobs.accepted("bar-tuning", BarTuningSetup.work(request));
    }

    @PostMapping(path = "/api/v1/inverse/plate-thickness", consumes = "application/json")
    @Operation(summary = "Start a plate thickness solve; 202 with the job (poll GET /api/v1/inverse/jobs/{id})",
            description = "Body: {plate (as for /api/v1/plates/analyze), targets [{mode, note or targetHz}], unknowns "
                    + "{thickness, thicknessPoints [indexes], braceHeights [indexes]}, limits {minThicknessMm, "
                    + "maxThicknessMm, minBraceHeightMm, maxBraceHeightMm}, toleranceCents, maxEvaluations}. "
                    + "Levenberg-Marquardt on the targets' cents by the Rayleigh-Ritz plate model; the result gives each "
                    + "target's cents, the values to carve to, Hz per 0.1 mm removed and the solved plate request.")
    ResponseEntity<SolveJob.View> plateThickness(@Valid @RequestBody PlateThicknessRequest request) {
        return jobs.accepted("plate-thickness", PlateThicknessSetup.work(request));
    }

    @GetMapping("/api/v1/inverse/jobs/{id}")
    @Operation(summary = "A solve job: status (queued, running, succeeded, failed, cancelled), progress, result")
    ResponseEntity<?> job(@PathVariable String id) {
        return jobs.find(id).<ResponseEntity<?>>map(j -> ResponseEntity.ok(j.view())).orElseGet(() -> notFound(id));
    }

    @DeleteMapping("/api/v1/inverse/jobs/{id}")
    @Operation(summary = "Cancel a solve job (a waiting job at once, a running one at its next evaluation)")
    ResponseEntity<?> cancel(@PathVariable String id) {
        return jobs.cancel(id).<ResponseEntity<?>>map(j -> ResponseEntity.accepted().body(j.view()))
                .orElseGet(() -> notFound(id));
    }

    @GetMapping("/api/v1/inverse/tone-holes/demo")
    @Operation(summary = "The workshop's six-hole whistle as a ready solve request")
    ToneHoleSolveRequest toneHolesDemo() {
        return DemoRequests.whistle();
    }

    @GetMapping("/api/v1/inverse/blank-tube/demo")
    @Operation(summary = "The workshop's blank for a six-hole D whistle (13 x 280 mm, window) with its two-register chart")
    BlankTubeRequest blankTubeDemo() {
        return DemoRequests.blankWhistle();
    }

    private static ResponseEntity<ProblemDetail> notFound(String id) {
        ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.NOT_FOUND, "no solve job " + id.replaceAll(
                "[^A-Za-z0-9-]", "?"));
        pd.setTitle("Not found");
        pd.setProperty("errors", List.of());
        return ResponseEntity.status(HttpStatus.NOT_FOUND).contentType(MediaType.APPLICATION_PROBLEM_JSON).body(pd);
    }
}
