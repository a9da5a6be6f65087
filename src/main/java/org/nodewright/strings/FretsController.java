package org.nodewright.strings;

import static org.nodewright.physics.Units.MM;

import org.springframework.http.ResponseEntity;
import org.nodewright.web.CsvTable;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import java.util.List;
import org.nodewright.physics.strings.Frets;
import org.nodewright.web.LengthMm;
import org.springframework.http.MediaType;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/** Fret positions for equal divisions of the octave. */
@RestController
class FretsController {

    static final int MAX_COUNT = 200;
    static final int MAX_DIVISIONS = 200;

    /** The columns of {@code GET /api/v1/frets.csv} (README, CSV tables). */
    static final CsvTable<FretJson> FRET_COLUMNS = CsvTable.of(
            CsvTable.column("fret", FretJson::fret),
            CsvTable.column("fromNutMm", FretJson::fromNutMm),
            CsvTable.column("fromPreviousMm", FretJson::fromPreviousMm));

    @GetMapping(path = "/api/v1/frets.csv")
    ResponseEntity<String> fretsCsv(
            @RequestParam @LengthMm double scaleLengthMm,
            @RequestParam(defaultValue = "24") @Min(1) @Max(MAX_COUNT) int count,
            @RequestParam(defaultValue = "12") @Min(1) @Max(MAX_DIVISIONS) int divisionsPerOctave) {
        return FRET_COLUMNS.download(frets(scaleLengthMm, count, divisionsPerOctave), "frets.csv");
    }

    @GetMapping(path = "/api/v1/frets", produces = MediaType.APPLICATION_JSON_VALUE)
    List<FretJson> frets(
            @RequestParam @LengthMm double scaleLengthMm,
            @RequestParam(defaultValue = "24") @Min(1) @Max(MAX_COUNT) int count,
            @RequestParam(defaultValue = "12") @Min(1) @Max(MAX_DIVISIONS) int divisionsPerOctave) {
        return Frets.equalDivisions(scaleLengthMm * MM, count, divisionsPerOctave).stream()
                .map(f -> new FretJson(f.fret(), f.fromNutM() * 1e3, f.fromPreviousM() * 1e3))
                .toList();
    }

    /** One fret: distances in mm from the nut and from the previous fret. */
    record FretJson(int fret, double fromNutMm, double fromPreviousMm) {
    }
}
