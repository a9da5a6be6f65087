package org.nodewright.inverse;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.List;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.inverse.Calibrator;
import org.nodewright.web.BadRequestException;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** Calibration from measured pitches, as a polled solve job like the others. */
@RestController
@Tag(name = "Inverse design")
class CalibrationController {

    static final int MAX_EVALUATIONS = 400;

    private final SolveJobs jobs;

    CalibrationController(SolveJobs jobs) {
        this.jobs = jobs;
    }

    @PostMapping(path = "/api/v1/inverse/calibration", consumes = "application/json")
    @Operation(summary = "Start a calibration from measured pitches; 202 with the job (poll GET /api/v1/inverse/jobs/{id})",
            description = "Body: {bore (holes, fingerings, mouth as built), measured [{fingering, measuredHz}], fit "
                    + "[\"mouth\" | \"air-temperature\"], impedance {fingering, csv (frequencyHz,magnitude,phase), "
                    + "phaseUnit, minProminenceDb, maxPeaks}} (measured, impedance or both). Levenberg-Marquardt on the "
                    + "cents between the model and each measured pitch and each measured impedance resonance (matched to "
                    + "the model's nearest); the result gives the fitted values, each note's cents before and after, the "
                    + "rms, the curve's resonances and whether each was used, and the calibrated bore.")
    ResponseEntity<SolveJob.View> start(@Valid @RequestBody CalibrationRequest request) {
        List<CalibrationSetup.Parameter> ps = CalibrationSetup.parameters(request);
        List<Fingering> measured = new java.util.ArrayList<>(CalibrationSetup.measured(request));
        double[] start = ps.stream().mapToDouble(CalibrationSetup.Parameter::start).toArray();
        double[] lower = ps.stream().mapToDouble(CalibrationSetup.Parameter::lower).toArray();
        double[] upper = ps.stream().mapToDouble(CalibrationSetup.Parameter::upper).toArray();
        Calibrator.Family family = CalibrationSetup.family(request.bore(), ps);
        CalibrationSetup.Matched matched = CalibrationSetup.match(request, family, start);
        if (request.impedance() != null && matched.fingerings().isEmpty()) {
            throw new BadRequestException("impedance.csv", "none of the curve's resonances lies near one of the model's");
        }
        measured.addAll(matched.fingerings());
        return jobs.accepted("calibration", j -> {
            int[] n = {0};
            Calibrator.Family watched = (x, f, g) -> {
                if (j.cancelRequested()) {
                    throw new org.nodewright.physics.inverse.SolveCancelledException();
                }
                j.update(++n[0] / Math.max(1, measured.size()), MAX_EVALUATIONS, Double.NaN);
                return family.soundingHz(x, f, g);
            };
            return CalibrationResult.of(new Calibrator(MAX_EVALUATIONS).fit(watched, start, lower, upper, measured), ps,
                    measured, request.bore(), matched.peaks());
        });
    }
}
