package org.nodewright.templates;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.Positive;
import java.util.List;
import java.util.Locale;
import org.nodewright.physics.templates.FretTemplate;
import org.nodewright.web.Finite;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/** Fret slotting templates at 1:1, as SVG and as PDF tiled over A4 or Letter pages. */
@RestController
@Tag(name = "Templates", description = "Printable 1:1 templates: fret slots and tone-hole drilling")
class FretTemplateController {

    @GetMapping("/api/v1/frets.svg")
    @Operation(summary = "Fret slotting template as SVG at 1:1",
            description = "width/height in mm, viewBox in mm user units, one <line data-fret=\"N\"> per fret, "
                    + "the nut line data-fret=\"0\", the saddle line, fret numbers and a 100 mm calibration ruler.")
    ResponseEntity<String> svg(
            @RequestParam @Finite @Positive @DecimalMax("3000") double scaleLengthMm,
            @RequestParam(defaultValue = "22") @Min(1) @Max(FretTemplate.MAX_FRETS) int count,
            @RequestParam(defaultValue = "12") @Min(1) @Max(FretTemplate.MAX_DIVISIONS) int divisionsPerOctave,
            @RequestParam(defaultValue = "50") @Finite @Positive @DecimalMax("200") double lineLengthMm) {
        FretTemplate t = new FretTemplate(scaleLengthMm, count, divisionsPerOctave, lineLengthMm, List.of());
        return TemplateResponses.svg(t.draw(), stem(t));
    }

    @GetMapping("/api/v1/frets.pdf")
    @Operation(summary = "Fret slotting template as PDF at 1:1, tiled over A4 or Letter",
            description = "paper = a4 (default) or letter. Pages overlap by 12 mm with alignment crosses; each page "
                    + "carries its label and a 100 mm ruler. Print at 100 % (actual size).")
    ResponseEntity<byte[]> pdf(
            @RequestParam @Finite @Positive @DecimalMax("3000") double scaleLengthMm,
            @RequestParam(defaultValue = "22") @Min(1) @Max(FretTemplate.MAX_FRETS) int count,
            @RequestParam(defaultValue = "12") @Min(1) @Max(FretTemplate.MAX_DIVISIONS) int divisionsPerOctave,
            @RequestParam(defaultValue = "50") @Finite @Positive @DecimalMax("200") double lineLengthMm,
            @RequestParam(required = false) String paper) {
        FretTemplate t = new FretTemplate(scaleLengthMm, count, divisionsPerOctave, lineLengthMm, List.of());
        return TemplateResponses.pdf(t.draw(), paper, stem(t));
    }

    @PostMapping(path = "/api/v1/templates/frets.svg", consumes = "application/json")
    @Operation(summary = "Fret template with marked positions (pickups, bridge, supports) as SVG")
    ResponseEntity<String> svgWithPositions(@Valid @RequestBody FretTemplateRequest request) {
        FretTemplate t = request.toTemplate();
        return TemplateResponses.svg(t.draw(), stem(t));
    }

    @PostMapping(path = "/api/v1/templates/frets.pdf", consumes = "application/json")
    @Operation(summary = "Fret template with marked positions as tiled PDF; ?paper=a4|letter")
    ResponseEntity<byte[]> pdfWithPositions(@Valid @RequestBody FretTemplateRequest request,
            @RequestParam(required = false) String paper) {
        FretTemplate t = request.toTemplate();
        return TemplateResponses.pdf(t.draw(), paper, stem(t));
    }

    private static String stem(FretTemplate t) {
        return String.format(Locale.ROOT, "frets-%.1fmm-%d", t.scaleLengthMm(), t.count()).replace('.', '_');
    }
}
