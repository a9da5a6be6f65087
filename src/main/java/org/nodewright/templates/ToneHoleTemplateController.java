package org.nodewright.templates;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.Pattern;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.inverse.BoreMapping;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/** Tone-hole drilling templates at 1:1 along a bore, as SVG and tiled PDF. */
@RestController
@Tag(name = "Templates")
class ToneHoleTemplateController {

    private static final String NAME = "[\\p{L}\\p{N} .,'()/+-]{1,60}";
    private static final String NAME_RULE = "must be 1 to 60 letters, digits, spaces or .,'()/+-";

    @PostMapping(path = "/api/v1/templates/tone-holes.svg", consumes = "application/json")
    @Operation(summary = "Tone-hole drilling template as SVG at 1:1",
            description = "Body: the air-column request (as for /api/v1/air-columns/analyze); ?name= is printed on it. "
                    + "Draws the bore profile, each hole as a circle of its diameter (<circle data-hole=\"N\" "
                    + "data-from-input-mm data-diameter-mm>), its centre cross and distance from the input end, and a "
                    + "100 mm calibration ruler.")
    ResponseEntity<String> svg(@Valid @RequestBody AirColumnRequest bore,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name) {
        return TemplateResponses.svg(BoreMapping.template(bore, name).draw(), "tone-holes");
    }

    @PostMapping(path = "/api/v1/templates/tone-holes.pdf", consumes = "application/json")
    @Operation(summary = "Tone-hole drilling template as PDF at 1:1, tiled over A4 or Letter (?paper=a4|letter)")
    ResponseEntity<byte[]> pdf(@Valid @RequestBody AirColumnRequest bore,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) String paper) {
        return TemplateResponses.pdf(BoreMapping.template(bore, name).draw(), paper,
                "tone-holes");
    }
}
