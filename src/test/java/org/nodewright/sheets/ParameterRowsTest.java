package org.nodewright.sheets;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tools.jackson.databind.json.JsonMapper;

/** Parameters labelled as a maker reads them: words, units from the field names, items and holes from 1. */
class ParameterRowsTest {

    private final JsonMapper json = JsonMapper.builder().build();

    private List<BenchSheet.Entry> rows(String parameters) {
        return ParameterRows.of(json.readTree(parameters));
    }

    @Test
    void nestedListsAreNumberedFromOneAndCarryTheirUnits() {
        assertThat(rows("""
                {"lengthMm": 650.0, "tensionN": 70, "referenceA4Hz": 440, "material": "plain-steel",
                 "pickups": [{"positionMm": 600.5}, {"positionMm": 500}], "stiffness": true, "targetHz": null}"""))
                .containsExactly(new BenchSheet.Entry("Length (mm)", "650.0"), new BenchSheet.Entry("Tension (N)", "70"),
                        new BenchSheet.Entry("Reference A4 (Hz)", "440"), new BenchSheet.Entry("Material", "plain-steel"),
                        new BenchSheet.Entry("Pickup 1 position (mm)", "600.5"),
                        new BenchSheet.Entry("Pickup 2 position (mm)", "500"), new BenchSheet.Entry("Stiffness", "true"));
    }

    @Test
    void closedHolesAreShownFromOneAsTheBenchNumbersThem() {
        assertThat(rows("{\"fingerings\": [{\"name\": \"D5\", \"closedHoles\": [0, 1, 5], \"targetHz\": 587.33}]}"))
                .containsExactly(new BenchSheet.Entry("Fingering 1 name", "D5"),
                        new BenchSheet.Entry("Fingering 1 closed holes", "1, 2, 6"),
                        new BenchSheet.Entry("Fingering 1 target (Hz)", "587.33"));
    }

    // Unit suffixes of the contract's field names (its header: lengths mm, frequencies Hz, tension N, SI).
    @ParameterizedTest
    @CsvSource({
        "diameterMm, diameter, mm",
        "linearDensityKgPerM, linear density, kg/m",
        "densityKgPerM3, density, kg/m³",
        "youngsModulusPa, youngs modulus, Pa",
        "temperatureC, temperature, °C",
        "relativeHumidityPct, relative humidity, %",
        "toleranceCents, tolerance, cents",
        "modeCount, mode count, ''",
    })
    void unitsComeFromTheFieldNamesSuffix(String field, String words, String unit) {
        String[] w = ParameterRows.words(field);
        assertThat(w[0]).isEqualTo(words);
        assertThat(w[1] == null ? "" : w[1]).isEqualTo(unit);
    }
}
