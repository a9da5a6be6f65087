package org.nodewright.plates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.nodewright.physics.measure.TestRecordings;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;

/**
 * Measure the plate over HTTP. The sample: 300 x 120 x 3 mm, 46.44 g (430 kg/m³), E along 12 GPa, E across 0.90 GPa,
 * G 0.70 GPa, nu 0.37, whose free-plate modes the independent numpy/scipy model src/test/python/free_plate_ritz.py
 * gives as 112.382184 Hz (twisting), 180.941927 Hz (long-grain), 290.805700 Hz (another), 311.315444 Hz (cross-grain).
 */
@StoreFreeWebTest
class PlateMeasureControllerTest {

    private static final String SAMPLE = """
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3.0, "massG": 46.44, "poissonAlongAcross": 0.37""";

    @Autowired
    MockMvc mvc;

    private static double number(String json, String path) {
        return ((Number) JsonPath.read(json, path)).doubleValue();
    }

    private void assertTheSample(String res) {
        assertThat(number(res, "$.densityKgPerM3")).isCloseTo(430.0, within(0.01));
        assertThat(number(res, "$.elasticAlongPa")).isCloseTo(12.0e9, within(0.005 * 12.0e9));
        assertThat(number(res, "$.elasticAcrossPa")).isCloseTo(0.90e9, within(0.005 * 0.90e9));
        assertThat(number(res, "$.shearPa")).isCloseTo(0.70e9, within(0.005 * 0.70e9));
        // speed of sound along the grain, sqrt(E/rho) = sqrt(12e9/430) = 5282.6 m/s
        assertThat(number(res, "$.soundSpeedAlongMPerS")).isCloseTo(5282.6, within(0.005 * 5282.6));
    }

    @Test
    void typedFrequenciesGiveTheSamplesConstants() throws Exception {
        String res = mvc.perform(post("/api/v1/plates/measure").contentType(MediaType.APPLICATION_JSON)
                .content("{" + SAMPLE + ", \"twistingHz\": 112.382184, \"alongHz\": 180.941927, \"acrossHz\": 311.315444}"))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        assertTheSample(res);
        List<String> kinds = JsonPath.read(res, "$.modes[*].kind");
        assertThat(kinds).containsExactlyInAnyOrder("twisting", "along", "across");
        assertThat(number(res, "$.closedForm.shearPa")).isLessThan(0.70e9);
    }

    @Test
    void aTapRecordingGoesThroughThePeaksToTheSamplesConstants() throws Exception {
        byte[] wav = TestRecordings.tap(new double[] {112.382184, 180.941927, 290.8057, 311.315444},
                new double[] {0.25, 0.18, 0.08, 0.12}, 3.0);
        String peaks = mvc.perform(multipart("/api/v1/measurements/peaks")
                .file(new MockMultipartFile("file", "tap.wav", "audio/wav", wav)).param("maxPeaks", "6").param("minHz", "40"))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        List<Number> hz = JsonPath.read(peaks, "$.peaks[*].frequencyHz");
        assertThat(hz).hasSizeGreaterThanOrEqualTo(4);
        assertThat(hz.get(0).doubleValue()).isCloseTo(112.382184, within(0.02));
        String list = hz.stream().map(Number::toString).reduce((x, y) -> x + ", " + y).orElseThrow();
        String res = mvc.perform(post("/api/v1/plates/measure").contentType(MediaType.APPLICATION_JSON)
                .content("{" + SAMPLE + ", \"peaksHz\": [" + list + "]}"))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        assertTheSample(res);
        // the caution sentences read as written (no MessageFormat quoting left in them)
        List<String> cautions = JsonPath.read(res, "$.cautions");
        assertThat(cautions).allSatisfy(c -> assertThat(c).doesNotContain("''"))
                .anySatisfy(c -> assertThat(c).contains("start material's prediction"));
        List<Integer> picked = JsonPath.read(res, "$.modes[*].peakIndex");
        assertThat(picked).hasSize(3).doesNotHaveDuplicates();
        List<Number> across = JsonPath.read(res, "$.modes[?(@.kind == 'across')].measuredHz");
        assertThat(across.get(0).doubleValue()).isCloseTo(311.315444, within(0.05));
    }

    @ParameterizedTest(name = "{index}: {1}")
    @CsvSource(delimiter = '|', textBlock = """
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3, "twistingHz": 112                                  | massG
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3, "massG": 46, "densityKgPerM3": 430, "alongHz": 180 | massG
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3, "massG": 46                                        | twistingHz
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3, "massG": 46, "alongHz": 180, "peaksHz": [112]      | peaksHz
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 0, "massG": 46, "alongHz": 180                        | thicknessMm
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3, "massG": 46, "alongHz": "NaN"                      | alongHz
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3, "massG": 46, "alongHz": 180, "material": "balsa"   | material
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3, "massG": 0.01, "alongHz": 180                      | massG
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3, "massG": 46, "peaksHz": [5000, 9000]               | peaksHz
            "lengthMm": 300, "widthMm": 120, "thicknessMm": 3, "massG": 46, "alongHz": 180, "poissonAlongAcross": 2 | poissonAlongAcross
            """)
    void badMeasurementsAreA400NamingTheField(String body, String field) throws Exception {
        String res = mvc.perform(post("/api/v1/plates/measure").contentType(MediaType.APPLICATION_JSON)
                .content("{" + body + "}")).andExpect(status().isBadRequest()).andReturn().getResponse()
                .getContentAsString();
        List<String> fields = JsonPath.read(res, "$.errors[*].field");
        assertThat(fields).as(res).contains(field);
    }
}
