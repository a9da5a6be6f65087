package org.nodewright.aircolumns;

import org.springframework.http.ResponseEntity;
import org.nodewright.web.CsvTable;
import jakarta.validation.Valid;
import org.nodewright.physics.aircolumn.AirColumnAnalysis;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RestController;

/** The air-column analysis endpoint: a validated bore in, impedance and resonances out. */
@RestController
@RequestMapping("/api/v1/air-columns")
class AirColumnController {

    private final AirColumnWording wording;

    AirColumnController(AirColumnWording wording) {
        this.wording = wording;
    }

    /** One row per resonance (README, CSV tables). */
    static final CsvTable<AirColumnResponse.ResonanceItem> RESONANCE_COLUMNS = CsvTable.of(
            CsvTable.column("n", AirColumnResponse.ResonanceItem::n),
            CsvTable.column("frequencyHz", AirColumnResponse.ResonanceItem::frequencyHz),
            CsvTable.column("q", AirColumnResponse.ResonanceItem::q),
            CsvTable.column("magnitude", AirColumnResponse.ResonanceItem::magnitude),
            CsvTable.column("note", r -> r.note().name()),
            CsvTable.column("noteCentsOff", r -> r.note().centsOff()),
            CsvTable.column("ratioToFirst", AirColumnResponse.ResonanceItem::ratioToFirst),
            CsvTable.column("seriesMember", AirColumnResponse.ResonanceItem::seriesMember),
            CsvTable.column("centsFromSeries", AirColumnResponse.ResonanceItem::centsFromSeries),
            CsvTable.column("pressureNodesMm", AirColumnResponse.ResonanceItem::pressureNodesMm),
            CsvTable.column("pressureAntinodesMm", AirColumnResponse.ResonanceItem::pressureAntinodesMm),
            CsvTable.column("mouthCents", AirColumnResponse.ResonanceItem::mouthCents));

    @PostMapping(path = "/resonances.csv", consumes = MediaType.APPLICATION_JSON_VALUE)
    ResponseEntity<String> resonancesCsv(@Valid @RequestBody AirColumnRequest request) {
        return RESONANCE_COLUMNS.download(analyze(request).resonances(), "resonances.csv");
    }

    @PostMapping(path = "/analyze", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = MediaType.APPLICATION_JSON_VALUE)
    AirColumnResponse analyze(@Valid @RequestBody AirColumnRequest request) {
        AirColumnAnalysis analysis = AirColumnMapper.analyzer(request).analyze(AirColumnMapper.column(request),
                request.fMinHz(), request.fMaxHz(), request.pointsOrDefault(), AirColumnMapper.fingerings(request));
        return AirColumnMapper.response(request, analysis, wording.warnings(analysis.warnings()));
    }
}
