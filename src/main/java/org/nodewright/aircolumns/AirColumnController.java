package org.nodewright.aircolumns;

import jakarta.validation.Valid;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/** The air-column analysis endpoint: a validated bore in, impedance and resonances out. */
@RestController
@RequestMapping("/api/v1/air-columns")
class AirColumnController {

    @PostMapping(path = "/analyze", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    AirColumnResponse analyze(@Valid @RequestBody AirColumnRequest request) {
        return AirColumnMapper.response(request, AirColumnMapper.analyzer(request).analyze(AirColumnMapper.column(request),
                request.fMinHz(), request.fMaxHz(), request.pointsOrDefault(), AirColumnMapper.fingerings(request)));
    }
}
