package org.nodewright.plates;

import org.nodewright.web.CsvTable;
import org.nodewright.web.DesignTable;
import org.springframework.context.annotation.Bean;
import org.springframework.http.ResponseEntity;

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

    /** One row per mode, without the shape grid and node-line polylines (README, CSV tables). */
    static final CsvTable<PlateAnalysisResponse.Mode> MODE_COLUMNS = CsvTable.of(
            CsvTable.column("n", PlateAnalysisResponse.Mode::n),
            CsvTable.column("frequencyHz", PlateAnalysisResponse.Mode::frequencyHz),
            CsvTable.column("note", m -> m.note() == null ? null : m.note().name()),
            CsvTable.column("noteCentsOff", m -> m.note() == null ? null : m.note().centsOff()),
            CsvTable.column("name", PlateAnalysisResponse.Mode::name),
            CsvTable.column("nodalLinesX", PlateAnalysisResponse.Mode::nodalLinesX),
            CsvTable.column("nodalLinesY", PlateAnalysisResponse.Mode::nodalLinesY));

    @PostMapping(path = "/api/v1/plates/modes.csv", consumes = MediaType.APPLICATION_JSON_VALUE)
    ResponseEntity<String> modesCsv(@Valid @RequestBody PlateAnalysisRequest request) {
        return MODE_COLUMNS.download(analysis.analyze(request).modes(), "plate-modes.csv");
    }

    /** The table of a saved plate design: the rows of {@code modes.csv}. */
    @Bean
    static DesignTable plateModesTable(PlateAnalysisService analysis) {
        return DesignTable.of(PlateAnalysisRequest.class,
                (r, name) -> MODE_COLUMNS.download(analysis.analyze(r).modes(), name));
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
