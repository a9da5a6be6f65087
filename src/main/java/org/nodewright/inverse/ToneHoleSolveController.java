package org.nodewright.inverse;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.List;
import org.nodewright.physics.inverse.ToneHoleSolver;
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

/** Tone-hole positions (and optionally diameters and foot) for target notes, solved as a polled job. */
@RestController
@Tag(name = "Inverse design")
class ToneHoleSolveController {

    private final SolveJobs jobs;

    ToneHoleSolveController(SolveJobs jobs) {
        this.jobs = jobs;
    }

    @PostMapping(path = "/api/v1/inverse/tone-holes", consumes = "application/json")
    @Operation(summary = "Start a tone-hole solve; 202 with the job (poll GET /api/v1/inverse/jobs/{id})",
            description = "Body: {bore, limits, toleranceCents, maxEvaluations}. bore is the air-column request; its "
                    + "holes are the starting layout and its fingerings (closedHoles = indices into holes, targetNote "
                    + "or targetHz) the targets. Levenberg-Marquardt on the cents errors by the air-column core's "
                    + "transfer matrix model; the job's result lists achieved cents per fingering, the distance each "
                    + "hole moved, and the adjusted bore.")
    ResponseEntity<SolveJob.View> start(@Valid @RequestBody ToneHoleSolveRequest request) {
        ToneHoleSolveSetup setup = ToneHoleSolveSetup.of(request);
        double tolerance = request.toleranceOrDefault();
        int cap = request.maxEvaluationsOrDefault();
        return jobs.accepted("tone-holes", j -> ToneHoleResult.of(new ToneHoleSolver(tolerance, cap).solve(
                setup.model(), setup.start(), setup.model().lengthBeforeFootMm(), setup.fingerings(), setup.limits(),
                j, j::cancelRequested), tolerance, setup.bore()));
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
    ToneHoleSolveRequest demo() {
        return DemoRequests.whistle();
    }

    private static ResponseEntity<ProblemDetail> notFound(String id) {
        ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.NOT_FOUND, "no solve job " + id.replaceAll(
                "[^A-Za-z0-9-]", "?"));
        pd.setTitle("Not found");
        pd.setProperty("errors", List.of());
        return ResponseEntity.status(HttpStatus.NOT_FOUND).contentType(MediaType.APPLICATION_PROBLEM_JSON).body(pd);
    }
}
