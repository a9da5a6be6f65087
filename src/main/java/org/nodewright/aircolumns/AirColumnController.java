package org.nodewright.aircolumns;

import jakarta.validation.Valid;
import org.nodewright.physics.aircolumn.AirColumnAnalysis;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/** The air-column analysis endpoint: a validated bore in, impedance and resonances out. */
@RestController
@RequestMapping("/api/v1/air-columns")
class AirColumnController {

    private final AirColumnWording wording;

    AirColumnController(AirColumnWording wording) {
        this.wording = wording;
    }

    @PostMapping(path = "/analyze", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    AirColumnResponse analyze(@Valid @RequestBody AirColumnRequest request) {
        AirColumnAnalysis analysis = AirColumnMapper.analyzer(request).analyze(AirColumnMapper.column(request),
                request.fMinHz(), request.fMaxHz(), request.pointsOrDefault(), AirColumnMapper.fingerings(request));
        return AirColumnMapper.response(request, analysis, wording.warnings(analysis.warnings()));
    }
}
