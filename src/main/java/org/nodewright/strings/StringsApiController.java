package org.nodewright.strings;

import jakarta.validation.Valid;
import java.util.List;
import org.nodewright.physics.strings.Materials;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
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
    StringAnalysisResponse analyze(@Valid @RequestBody StringAnalysisRequest request) {
        return analysis.analyze(request);
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
