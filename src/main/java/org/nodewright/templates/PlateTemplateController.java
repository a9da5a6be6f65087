package org.nodewright.templates;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Pattern;
import java.util.List;
import org.nodewright.physics.plates.GraduationTemplate;
import org.nodewright.physics.templates.Sheet;
import org.nodewright.plates.PlateAnalysisRequest;
import org.nodewright.plates.PlateMapping;
import org.nodewright.web.Finite;
import org.nodewright.web.UserTexts;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/** A plate's graduation template at 1:1: outline, thickness contours in mm, braces, ruler and cautions; SVG and tiled PDF. */
@RestController
@Tag(name = "Templates")
class PlateTemplateController {

    private static final String NAME = "[\\p{L}\\p{N} .,'()/+-]{1,60}";
    private static final String NAME_RULE = "must be 1 to 60 letters, digits, spaces or .,'()/+-";
    static final double DEFAULT_STEP_MM = 0.2;
    static final List<String> CAUTION_KEYS = List.of("plates.template.caution.1", "plates.template.caution.2",
            "plates.template.caution.3");

    private final UserTexts texts;

    PlateTemplateController(UserTexts texts) {
        this.texts = texts;
    }

    private Sheet sheet(PlateAnalysisRequest plate, String name, Double stepMm) {
        return GraduationTemplate.draw(PlateMapping.toPlate(plate), name == null ? "plate" : name,
                stepMm == null ? DEFAULT_STEP_MM : stepMm, CAUTION_KEYS.stream().map(texts::get).toList());
    }

    @PostMapping(path = "/api/v1/templates/plate-graduation.svg", consumes = "application/json")
    @Operation(summary = "A plate's graduation template as SVG at 1:1",
            description = "Body: the plate request (as for /api/v1/plates/analyze); ?name= is printed on it, ?stepMm= "
                    + "the contour step (default 0.2 mm). Lines carry class outline, contour (data-level-mm), brace "
                    + "(data-brace, data-height-mm); a 100 mm ruler and the cautions for carving and dust.")
    ResponseEntity<String> svg(@Valid @RequestBody PlateAnalysisRequest plate,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) @Finite @DecimalMin("0.05") @DecimalMax("5") Double stepMm) {
        return TemplateResponses.svg(sheet(plate, name, stepMm), "plate-graduation");
    }

    @PostMapping(path = "/api/v1/templates/plate-graduation.pdf", consumes = "application/json")
    @Operation(summary = "A plate's graduation template as PDF at 1:1, tiled over A4 or Letter (?paper=a4|letter)")
    ResponseEntity<byte[]> pdf(@Valid @RequestBody PlateAnalysisRequest plate,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) @Finite @DecimalMin("0.05") @DecimalMax("5") Double stepMm,
            @RequestParam(required = false) String paper) {
        return TemplateResponses.pdf(sheet(plate, name, stepMm), paper, "plate-graduation");
    }
}
