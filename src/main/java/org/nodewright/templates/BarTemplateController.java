package org.nodewright.templates;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Pattern;
import java.util.List;
import org.nodewright.bars.BarAnalysisRequest;
import org.nodewright.bars.BarAnalysisResponse;
import org.nodewright.bars.BarAnalysisService;
import org.nodewright.physics.bars.BarEnds;
import org.nodewright.physics.bars.SectionShape;
import org.nodewright.physics.templates.UndercutTemplate;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.Finite;
import org.nodewright.web.UserTexts;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/** A bar's undercut template at 1:1 (side view, profile, cord holes at the nodes of mode 1), as SVG and tiled PDF. */
@RestController
@Tag(name = "Templates")
class BarTemplateController {

    private static final String NAME = "[\\p{L}\\p{N} .,'()/+-]{1,60}";
    private static final String NAME_RULE = "must be 1 to 60 letters, digits, spaces or .,'()/+-";
    /** Cord hole drawn when none is asked for: 4 mm (common practice for marimba and xylophone cord). */
    static final double DEFAULT_CORD_HOLE_MM = 4.0;

    private final BarAnalysisService analysis;
    private final UserTexts texts;

    BarTemplateController(BarAnalysisService analysis, UserTexts texts) {
        this.analysis = analysis;
        this.texts = texts;
    }

    @PostMapping(path = "/api/v1/templates/bar-undercut.svg", consumes = "application/json")
    @Operation(summary = "Undercut template of a rectangular bar as SVG at 1:1",
            description = "Body: the bar request (as for /api/v1/bars/analyze, section rectangle, free-free). Draws "
                    + "the side view with the top face up: outline, the undercut profile on the underside with the "
                    + "thickness at each profile point (<line class=\"position\" data-from-start-mm data-thickness-mm>), "
                    + "the cord holes at the nodes of mode 1 (<circle data-cord-hole=\"N\" data-from-start-mm>), the "
                    + "grinding-dust and drilling cautions and a 100 mm calibration ruler. ?name= is printed on it, "
                    + "?cordHoleMm= the hole's diameter (default 4).")
    ResponseEntity<String> svg(@Valid @RequestBody BarAnalysisRequest bar,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) @Finite @DecimalMin("0.5") @DecimalMax("20") Double cordHoleMm) {
        return TemplateResponses.svg(template(bar, name, cordHoleMm).draw(), "bar-undercut");
    }

    @PostMapping(path = "/api/v1/templates/bar-undercut.pdf", consumes = "application/json")
    @Operation(summary = "Undercut template as PDF at 1:1, tiled over A4 or Letter (?paper=a4|letter)")
    ResponseEntity<byte[]> pdf(@Valid @RequestBody BarAnalysisRequest bar,
            @RequestParam(required = false) @Pattern(regexp = NAME, message = NAME_RULE) String name,
            @RequestParam(required = false) @Finite @DecimalMin("0.5") @DecimalMax("20") Double cordHoleMm,
            @RequestParam(required = false) String paper) {
        return TemplateResponses.pdf(template(bar, name, cordHoleMm).draw(), paper, "bar-undercut");
    }

    private UndercutTemplate template(BarAnalysisRequest bar, String name, Double cordHoleMm) {
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
}
