package org.nodewright.plates;

import static org.nodewright.physics.Units.MM;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.nodewright.physics.plates.CatalogueMaterial;
import org.nodewright.physics.plates.ElasticFit;
import org.nodewright.physics.plates.PlateMaterial;
import org.nodewright.physics.plates.PlateMaterials;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.CsvTable;
import org.nodewright.web.DesignTable;
import org.nodewright.web.UserTexts;
import org.springframework.context.annotation.Bean;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RestController;

/**
 * JSON API of the plate bench: analysis, its CSV, the sheet-material catalogue, the presets, and measuring a sample:
 * the elastic constants of a rectangular sample from its tap tones (McIntyre &amp; Woodhouse 1988).
 */
@RestController
class PlatesApiController {

    static final String METHOD = "McIntyre & Woodhouse (1988): twisting (1,1), long-grain (2,0) and cross-grain (0,2)"
            + " modes of the free rectangle; closed-form estimates (free-free beam, Rayleigh w = xy), then E along,"
            + " E across and G fitted by Levenberg-Marquardt to the Rayleigh-Ritz model of the same plate";

    private final PlateAnalysisService analysis;
    private final UserTexts texts;

    PlatesApiController(PlateAnalysisService analysis, UserTexts texts) {
        this.analysis = analysis;
        this.texts = texts;
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

    @Tag(name = "Plates")
    @PostMapping(path = "/api/v1/plates/measure", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Fit E along, E across and G of a rectangular sample from its free-plate tap frequencies",
            description = "Body: lengthMm (along the grain), widthMm, thicknessMm, massG or densityKgPerM3, material "
                    + "(start, default spruce), poissonAlongAcross (default the start's), and twistingHz / alongHz / "
                    + "acrossHz, or peaksHz from a recording (POST /api/v1/measurements/peaks).")
    PlateMeasureResponse measure(@Valid @RequestBody PlateMeasureRequest r) {
        double a = r.lengthMm() * MM;
        double b = r.widthMm() * MM;
        double h = r.thicknessMm() * MM;
        double rho = r.density();
        if (!(rho >= 10 && rho <= 30000)) {
            throw new BadRequestException("massG", texts.get("plates.measure.density", Math.round(rho)));
        }
        PlateMaterial s = r.start();
        PlateMaterial start = new PlateMaterial(rho, s.elasticAlongPa(), s.elasticAcrossPa(), s.shearPa(),
                r.poisson());
        ElasticFit fit = new ElasticFit();
        Map<ElasticFit.Kind, Double> measured = new EnumMap<>(ElasticFit.Kind.class);
        Map<ElasticFit.Kind, Integer> peakOf = new EnumMap<>(ElasticFit.Kind.class);
        List<String> cautions = new ArrayList<>();
        if (r.named()) {
            put(measured, ElasticFit.Kind.TWISTING, r.twistingHz());
            put(measured, ElasticFit.Kind.ALONG, r.alongHz());
            put(measured, ElasticFit.Kind.ACROSS, r.acrossHz());
        } else {
            double[] peaks = r.peaksHz().stream().mapToDouble(Double::doubleValue).toArray();
            peakOf.putAll(fit.assignPeaks(a, b, h, start, peaks));
            if (peakOf.isEmpty()) {
                throw new BadRequestException("peaksHz", texts.get("plates.measure.noPeaks"));
            }
            peakOf.forEach((k, i) -> measured.put(k, peaks[i]));
            for (ElasticFit.Kind k : ElasticFit.Kind.values()) {
                if (!peakOf.containsKey(k)) {
                    cautions.add(texts.get("plates.measure.missing", word(k)));
                }
            }
            cautions.add(texts.get("plates.measure.matched"));
        }
        ElasticFit.Result result = fit.fit(a, b, h, rho, r.poisson(), start, measured);
        List<PlateMeasureResponse.Mode> modes = new ArrayList<>();
        for (ElasticFit.Kind k : measured.keySet()) {
            double match = result.shapeMatch().get(k);
            modes.add(new PlateMeasureResponse.Mode(k, measured.get(k), peakOf.get(k), result.computedHz().get(k),
                    result.cents().get(k), match));
            if (match < ElasticFit.MIXED_BELOW) {
                cautions.add(texts.get("plates.measure.mixed", word(k)));
            }
            if (Math.abs(result.cents().get(k)) > 1) {
                cautions.add(texts.get("plates.measure.missed", word(k), Math.round(result.cents().get(k))));
            }
        }
        PlateMaterial m = result.material();
        if (m.poissonAlongAcross() != r.poisson()) {
            cautions.add(texts.get("plates.measure.poisson"));
        }
        return new PlateMeasureResponse(m.densityKgPerM3(), m.elasticAlongPa(), m.elasticAcrossPa(), m.shearPa(),
                m.poissonAlongAcross(), new PlateMeasureResponse.ClosedForm(result.closedForm().elasticAlongPa(),
                        result.closedForm().elasticAcrossPa(), result.closedForm().shearPa()), modes,
                Math.sqrt(m.elasticAlongPa() / rho), Math.sqrt(m.elasticAcrossPa() / rho), METHOD, cautions);
    }

    private static void put(Map<ElasticFit.Kind, Double> map, ElasticFit.Kind k, Double v) {
        if (v != null) {
            map.put(k, v);
        }
    }

    private String word(ElasticFit.Kind k) {
        return texts.get("plates.measure.kind." + k.name().toLowerCase(java.util.Locale.ROOT));
    }
}
