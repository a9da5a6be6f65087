package org.nodewright.inverse;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import org.nodewright.physics.inverse.BlankTubeSolver;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** Holes for a blank tube: a closed-form first layout, then the tone-hole solver from several starts, as a polled job. */
@RestController
@Tag(name = "Inverse design")
class BlankTubeController {

    private final SolveJobs jobs;

    BlankTubeController(SolveJobs jobs) {
        this.jobs = jobs;
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
    ResponseEntity<SolveJob.View> start(@Valid @RequestBody BlankTubeRequest request) {
        BlankTubeSetup setup = BlankTubeSetup.of(request);
        double tolerance = request.toleranceOrDefault();
        int cap = request.evaluationsOrDefault();
        return jobs.accepted("blank-tube", j -> BlankTubeResult.of(new BlankTubeSolver(tolerance, cap).solve(
                setup.model(), setup.tube(), setup.chimneysMm(), setup.model().lengthBeforeFootMm(), setup.fingerings(),
                setup.limits(), setup.freedom(), setup.startDiametersMm(), j, j::cancelRequested), setup.tube(), tolerance,
                setup.bore()));
    }

    @GetMapping("/api/v1/inverse/blank-tube/demo")
    @Operation(summary = "The workshop's blank for a six-hole D whistle (13 x 280 mm, window) with its two-register chart")
    BlankTubeRequest demo() {
        return DemoRequests.blankWhistle();
    }
}
