package org.nodewright.plates;

import jakarta.validation.Valid;
import java.util.List;
import org.nodewright.physics.plates.CatalogueMaterial;
import org.nodewright.physics.plates.PlateMaterials;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/** JSON API of the plate bench: analysis and the sheet-material catalogue. */
@RestController
class PlatesApiController {

    private final PlateAnalysisService analysis;

    PlatesApiController(PlateAnalysisService analysis) {
        this.analysis = analysis;
    }

    @PostMapping(path = "/api/v1/plates/analyze", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    PlateAnalysisResponse analyze(@Valid @RequestBody PlateAnalysisRequest request) {
        return analysis.analyze(request);
    }

    @GetMapping(path = "/api/v1/plate-materials", produces = MediaType.APPLICATION_JSON_VALUE)
    List<MaterialJson> materials() {
        return PlateMaterials.all().stream().map(MaterialJson::of).toList();
    }

    /** The workshop's ready-made plates (invented instruments), each a complete analysis request. */
    @GetMapping(path = "/api/v1/plate-presets", produces = MediaType.APPLICATION_JSON_VALUE)
    List<PlatePresets.Preset> presets() {
        return PlatePresets.all();
    }

    /** A catalogue entry as JSON (SI units, x along the grain). */
    record MaterialJson(String id, String name, double densityKgPerM3, double elasticAlongPa, double elasticAcrossPa,
                        double shearPa, double poissonAlongAcross, String source) {
        static MaterialJson of(CatalogueMaterial c) {
            var m = c.material();
            return new MaterialJson(c.id(), c.name(), m.densityKgPerM3(), m.elasticAlongPa(), m.elasticAcrossPa(),
                    m.shearPa(), m.poissonAlongAcross(), c.source());
        }
    }
}
