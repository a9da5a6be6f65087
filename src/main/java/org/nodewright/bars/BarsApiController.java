package org.nodewright.bars;

import io.swagger.v3.oas.annotations.Operation;
import io.swagger.v3.oas.annotations.tags.Tag;
import jakarta.validation.Valid;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import java.util.List;
import org.nodewright.measurements.Uploads;
import org.nodewright.physics.bars.BarAnalyzer;
import org.nodewright.physics.bars.BarMaterial;
import org.nodewright.physics.bars.BarMaterials;
import org.nodewright.physics.measure.SpectralPeak;
import org.nodewright.web.CsvTable;
import org.nodewright.web.DesignTable;
import org.nodewright.web.EnumWords;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RequestPart;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.multipart.MultipartFile;

/** JSON API of the bar bench: the analysis, its CSV, the materials catalogue and measuring the blank (typed or
 * recorded). */
@RestController
@Tag(name = "Bars")
class BarsApiController {

    /** Spectral peaks kept from a recording before they are numbered as the bar's modes. */
    static final int PEAKS = 64;

    private final BarAnalysisService analysis;
    private final BlankFitService fits;

    BarsApiController(BarAnalysisService analysis, BlankFitService fits) {
        this.analysis = analysis;
        this.fits = fits;
    }

    @PostMapping(path = "/api/v1/bars/analyze", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Bending (and twisting, lateral) modes of a bar, rod, tube or tine",
            description = "Body: lengthMm, section (rectangle: widthMm, thicknessMm or a piecewise-linear profile "
                    + "[{positionMm, thicknessMm}] covering 0..lengthMm; round: diameterMm; tube: diameterMm, boreMm), "
                    + "material (GET /api/v1/bar-materials) or densityKgPerM3 + youngsModulusPa + shearModulusPa, ends "
                    + "(free-free, clamped-free, pinned-pinned, clamped-clamped), theory (timoshenko, euler-bernoulli), "
                    + "modeCount (1..16). Finite elements: cubic Hermite (Euler-Bernoulli) or four-node cubic Lagrange "
                    + "with reduced shear integration (Timoshenko, Cowper's shear coefficient, reported as "
                    + "shearCoefficient); Saint-Venant twisting. modes: the modeCount bending modes ascending (kind "
                    + "bending), then twisting and lateral-bending modes up to the highest of them. Positions in mm "
                    + "from x = 0; nodes by root finding on the element interpolation; max |shape| = 1.")
    BarAnalysisResponse analyze(@Valid @RequestBody BarAnalysisRequest request) {
        return analysis.analyze(request);
    }

    /** One row per mode, without the chart samples of the shapes (README, CSV tables). */
    static final CsvTable<BarAnalysisResponse.ModeJson> MODE_COLUMNS = CsvTable.of(
            CsvTable.column("n", BarAnalysisResponse.ModeJson::n),
            CsvTable.column("kind", m -> EnumWords.word(m.kind())),
            CsvTable.column("frequencyHz", BarAnalysisResponse.ModeJson::frequencyHz),
            CsvTable.column("ratioToFirst", BarAnalysisResponse.ModeJson::ratioToFirst),
            CsvTable.column("note", m -> m.note() == null ? null : m.note().name()),
            CsvTable.column("noteCentsOff", m -> m.note() == null ? null : m.note().centsOff()),
            CsvTable.column("nodesMm", BarAnalysisResponse.ModeJson::nodesMm),
            CsvTable.column("antinodesMm", BarAnalysisResponse.ModeJson::antinodesMm));

    @PostMapping(path = "/api/v1/bars/modes.csv", consumes = MediaType.APPLICATION_JSON_VALUE)
    ResponseEntity<String> modesCsv(@Valid @RequestBody BarAnalysisRequest request) {
        return MODE_COLUMNS.download(analysis.analyze(request).modes(), "bar-modes.csv");
    }

    /** The table of a saved bar design: the rows of {@code modes.csv}. */
    @org.springframework.context.annotation.Bean
    static DesignTable barModesTable(BarAnalysisService analysis) {
        return DesignTable.of(BarAnalysisRequest.class,
                (r, name) -> MODE_COLUMNS.download(analysis.analyze(r).modes(), name));
    }

    @Operation(summary = "Bar materials: density, Young's modulus along the bar, shear modulus and a source each")
    @GetMapping(path = "/api/v1/bar-materials", produces = MediaType.APPLICATION_JSON_VALUE)
    List<MaterialJson> materials() {
        return BarMaterials.all().stream().map(MaterialJson::of).toList();
    }

    /** One catalogue entry. */
    record MaterialJson(String id, String name, double densityKgPerM3, double youngsModulusPa, double shearModulusPa,
            boolean wood, String source) {
        static MaterialJson of(BarMaterial m) {
            return new MaterialJson(m.id(), m.name(), m.density(), m.youngsModulus(), m.shearModulus(), m.isWood(),
                    m.source());
        }
    }

    @PostMapping(path = "/api/v1/bars/measure-blank", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "Fit Young's modulus (and the shear modulus) of a tapped blank to its measured bending modes",
            description = "Body: bar (as for /api/v1/bars/analyze: its geometry, density, ends and theory; its material "
                    + "or moduli are the fit's start), modes [{n, frequencyHz}] (bending modes through the thickness, "
                    + "1 = lowest), fitShear (default true: G is fitted when two or more modes are given, theory is "
                    + "timoshenko and the modes move by 10 cents or more per e-fold of G). Levenberg-Marquardt on the "
                    + "cents over ln E, ln G. Answer: the moduli, each mode beside the fitted model, and bar with the "
                    + "fitted youngsModulusPa and shearModulusPa written in.")
    BlankFitResponse typed(@Valid @RequestBody BlankFitRequest request) {
        return fits.fit(request);
    }

    @PostMapping(path = "/api/v1/bars/measure-blank/recording", consumes = MediaType.MULTIPART_FORM_DATA_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    @Operation(summary = "As measure-blank, from a WAV recording of the tapped blank",
            description = "multipart/form-data: file (PCM WAV, as for /api/v1/measurements/partials), bar (JSON, "
                    + "application/json part). The recording's spectral peaks are numbered by the bar's own mode ratios "
                    + "(not a harmonic series), then fitted; ?modeCount= bending modes looked for (2..16, default 4), "
                    + "?fitShear= (default true).")
    BlankFitResponse recorded(@RequestPart("file") MultipartFile file,
            @Valid @RequestPart("bar") BarAnalysisRequest bar,
            @RequestParam(required = false) @Min(2) @Max(BarAnalyzer.MAX_MODES) Integer modeCount,
            @RequestParam(required = false) Boolean fitShear) {
        List<SpectralPeak> peaks = Uploads.peaks(file, PEAKS);
        return fits.fitPeaks(bar, peaks, modeCount == null ? 4 : modeCount, fitShear == null || fitShear);
    }
}
