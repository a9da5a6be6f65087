package org.nodewright.templates;

import static org.nodewright.templates.TemplateResponses.NAME;
import static org.nodewright.templates.TemplateResponses.NAME_RULE;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Pattern;
import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.bars.BarAnalysisRequest;
import org.nodewright.bars.BarAnalysisResponse;
import org.nodewright.bars.BarAnalysisService;
import org.nodewright.inverse.BoreMapping;
import org.nodewright.physics.bars.BarEnds;
import org.nodewright.physics.bars.SectionShape;
import org.nodewright.physics.plates.GraduationTemplate;
import org.nodewright.physics.templates.Sheet;
import org.nodewright.physics.templates.UndercutTemplate;
import org.nodewright.plates.PlateAnalysisRequest;
import org.nodewright.plates.PlateMapping;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.Finite;
import org.nodewright.web.UserTexts;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/**
 * The templates drawn from a bench's own request, at 1:1 as SVG and tiled PDF (both answered by
 * {@link TemplateResponses}): tone-hole drilling along a bore, a bar's undercut with its cord holes, a plate's
 * graduation. A new drawn template adds its pair of endpoints here.
 */
@RestController
@Tag(name = "Templates")
class DrawnTemplatesController {

    /** Cord hole drawn when none is asked for: 4 mm (common practice for marimba and xylophone cord). */
    static final double DEFAULT_CORD_HOLE_MM = 4.0;
    /** The graduation's contour step when none is asked for, mm. */
    static final double DEFAULT_STEP_MM = 0.2;
    /** The graduation's caution lines (messages/plates.properties). */
    static final List<String> CAUTION_KEYS = List.of("plates.template.caution.1", "plates.template.caution.2",
            "plates.template.caution.3");

    private final BarAnalysisService analysis;
    private final UserTexts texts;

    DrawnTemplatesController(BarAnalysisService analysis, UserTexts texts) {
        this.analysis = analysis;
        this.texts = texts;
    }

    @PostMapping(path = "/api/v1/templates/tone-holes.svg", consumes = "application/json")
    @Operation(summary = "Tone-hole drilling template as SVG at 1:1",
            description = "Body: the air-column request (as for /api/v1/air-columns/analyze); ?name= is printed on it. "
                    + "Draws the bore profile, each hole as a circle of its diameter (<circle data-hole=\"N\" "
                    + "data-from-input-mm data-diameter-mm>), its centre cross and distance from the input end, and a "
                    + "100 mm calibration ruler.")
    ResponseEntity<String> toneHolesSvg(@Valid @RequestBody AirColumnRequest bore,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name) {
        return TemplateResponses.svg(BoreMapping.template(bore, name).draw(), "tone-holes");
    }

    @PostMapping(path = "/api/v1/templates/tone-holes.pdf", consumes = "application/json")
    @Operation(summary = "Tone-hole drilling template as PDF at 1:1, tiled over A4 or Letter (?paper=a4|letter)")
    ResponseEntity<byte[]> toneHolesPdf(@Valid @RequestBody AirColumnRequest bore,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) String paper) {
        return TemplateResponses.pdf(BoreMapping.template(bore, name).draw(), paper,
                "tone-holes");
    }

    @PostMapping(path = "/api/v1/templates/bar-undercut.svg", consumes = "application/json")
    @Operation(summary = "Undercut template of a rectangular bar as SVG at 1:1",
            description = "Body: the bar request (as for /api/v1/bars/analyze, section rectangle, free-free). Draws "
                    + "the side view with the top face up: outline, the undercut profile on the underside with the "
                    + "thickness at each profile point (<line class=\"position\" data-from-start-mm data-thickness-mm>), "
                    + "the cord holes at the nodes of mode 1 (<circle data-cord-hole=\"N\" data-from-start-mm>), the "
                    + "grinding-dust and drilling cautions and a 100 mm calibration ruler. ?name= is printed on it, "
                    + "?cordHoleMm= the hole's diameter (default 4).")
    ResponseEntity<String> barUndercutSvg(@Valid @RequestBody BarAnalysisRequest bar,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) @Finite @DecimalMin("0.5") @DecimalMax("20") Double cordHoleMm) {
        return TemplateResponses.svg(undercut(bar, name, cordHoleMm).draw(), "bar-undercut");
    }

    @PostMapping(path = "/api/v1/templates/bar-undercut.pdf", consumes = "application/json")
    @Operation(summary = "Undercut template as PDF at 1:1, tiled over A4 or Letter (?paper=a4|letter)")
    ResponseEntity<byte[]> barUndercutPdf(@Valid @RequestBody BarAnalysisRequest bar,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) @Finite @DecimalMin("0.5") @DecimalMax("20") Double cordHoleMm,
            @RequestParam(required = false) String paper) {
        return TemplateResponses.pdf(undercut(bar, name, cordHoleMm).draw(), paper, "bar-undercut");
    }

    private UndercutTemplate undercut(BarAnalysisRequest bar, String name, Double cordHoleMm) {
        if (bar.section() != SectionShape.RECTANGLE) {
            throw new BadRequestException("section", "must be \"rectangle\": only a rectangular bar has an undercut");
        }
        if (bar.endsOrDefault() != BarEnds.FREE_FREE) {
            throw new BadRequestException("ends", "must be \"free-free\": cord holes are for a bar hung on its cords");
        }
        List<UndercutTemplate.Point> profile = bar.profile() == null
                ? List.of(new UndercutTemplate.Point(0, bar.thicknessMm()),
                        new UndercutTemplate.Point(bar.lengthMm(), bar.thicknessMm()))
                : bar.profile().stream().map(p -> new UndercutTemplate.Point(p.positionMm(), p.thicknessMm())).toList();
        BarAnalysisResponse answer = analysis.analyze(bar);
        List<String> cautions = List.of(texts.get("bars.template.caution.dust"), texts.get("bars.template.caution.drill"),
                texts.get("bars.template.caution.check"));
        return new UndercutTemplate(name == null ? "bar" : name, bar.widthMm(), profile, answer.cordHolesMm(),
                cordHoleMm == null ? DEFAULT_CORD_HOLE_MM : cordHoleMm, cautions);
    }

    private Sheet graduation(PlateAnalysisRequest plate, String name, Double stepMm) {
        return GraduationTemplate.draw(PlateMapping.toPlate(plate), name == null ? "plate" : name,
                stepMm == null ? DEFAULT_STEP_MM : stepMm, CAUTION_KEYS.stream().map(texts::get).toList());
    }

    @PostMapping(path = "/api/v1/templates/plate-graduation.svg", consumes = "application/json")
    @Operation(summary = "A plate's graduation template as SVG at 1:1",
            description = "Body: the plate request (as for /api/v1/plates/analyze); ?name= is printed on it, ?stepMm= "
                    + "the contour step (default 0.2 mm). Lines carry class outline, contour (data-level-mm), brace "
                    + "(data-brace, data-height-mm); a 100 mm ruler and the cautions for carving and dust.")
    ResponseEntity<String> plateGraduationSvg(@Valid @RequestBody PlateAnalysisRequest plate,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) @Finite @DecimalMin("0.05") @DecimalMax("5") Double stepMm) {
        return TemplateResponses.svg(graduation(plate, name, stepMm), "plate-graduation");
    }

    @PostMapping(path = "/api/v1/templates/plate-graduation.pdf", consumes = "application/json")
    @Operation(summary = "A plate's graduation template as PDF at 1:1, tiled over A4 or Letter (?paper=a4|letter)")
    ResponseEntity<byte[]> plateGraduationPdf(@Valid @RequestBody PlateAnalysisRequest plate,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) @Finite @DecimalMin("0.05") @DecimalMax("5") Double stepMm,
            @RequestParam(required = false) String paper) {
        return TemplateResponses.pdf(graduation(plate, name, stepMm), paper, "plate-graduation");
    }
}
