package org.nodewright.strings;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.Parameter;
import jakarta.validation.Valid;
import java.util.List;
import org.nodewright.physics.strings.Materials;
import org.nodewright.web.BadRequestException;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/** JSON API of the string designer: analysis, sets and the materials catalogue. */
@RestController
class StringsApiController {

    private final StringAnalysisService analysis;
    private final StringSetService sets;

    StringsApiController(StringAnalysisService analysis, StringSetService sets) {
        this.analysis = analysis;
        this.sets = sets;
    }

    @PostMapping(path = "/api/v1/strings/analyze", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Modes of one string: frequencies, nodes, pluck and pickup spectra, chart-sampled shapes",
            description = "Mode shapes are sampled for a chart (mode n at max(24, min(200, 6n)) equal intervals, "
                    + "or shapeSamples points when given) and written to six significant digits; frequencies, "
                    + "nodes and gains at full precision. The answer is gzip-compressed when the client sends "
                    + "Accept-Encoding: gzip.")
    StringAnalysisResponse analyze(@Valid @RequestBody StringAnalysisRequest request,
            @Parameter(description = "chart (default): each mode's shapeX and shape; none: leave them out (null), "
                    + "the lighter answer for a pluck or pickup move, which changes no shape")
            @RequestParam(name = "shapes", required = false) String shapes) {
        return analysis.analyze(request, shapesWanted(shapes, request));
    }

    /**
     * The {@code shapes} query option: {@code chart} (the default) sends each mode's shape samples,
     * {@code none} leaves shapeX and shape out (null) — a pluck or pickup move changes no shape, so
     * the bench asks for that lighter answer while a marker is dragged.
     */
    static boolean shapesWanted(String shapes, StringAnalysisRequest request) {
        if (shapes == null || shapes.equals("chart")) {
            return true;
        }
        if (!shapes.equals("none")) {
            throw new BadRequestException("shapes", "must be \"chart\" or \"none\"");
        }
        if (request.shapeSamples() != null) {
            throw new BadRequestException("shapeSamples", "asks for shapes that shapes=none leaves out");
        }
        return false;
    }

    @PostMapping(path = "/api/v1/string-sets/analyze", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    StringSetResponse analyzeSet(@Valid @RequestBody StringSetRequest request) {
        return sets.analyze(request);
    }

    @GetMapping(path = "/api/v1/materials", produces = MediaType.APPLICATION_JSON_VALUE)
    List<MaterialJson> materials() {
        return Materials.all().stream().map(MaterialJson::of).toList();
    }

    /** One catalogue entry as the contract spells it. */
    record MaterialJson(String id, String name, double densityKgPerM3, double youngsModulusPa,
            double tensileStrengthPa, String source) {
        static MaterialJson of(org.nodewright.physics.strings.Material m) {
            return new MaterialJson(m.id(), m.name(), m.densityKgPerM3(), m.youngsModulusPa(),
                    m.tensileStrengthPa(), m.source());
        }
    }
}
