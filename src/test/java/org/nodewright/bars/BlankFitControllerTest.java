package org.nodewright.bars;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.multipart;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.nodewright.physics.measure.TestRecordings;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockHttpServletResponse;
import org.springframework.mock.web.MockMultipartFile;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.RequestBuilder;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/** Measure the blank over HTTP: typed modes and a recording, fitted E against Blevins' closed form, and the 400s. */
@StoreFreeWebTest
class BlankFitControllerTest {

    /** A uniform 400 x 50 x 20 mm maple-like blank of 650 kg/m³, Euler–Bernoulli, free–free. */
    private static final String BAR = """
            {"lengthMm": 400.0, "section": "rectangle", "widthMm": 50.0, "thicknessMm": 20.0,
             "material": "maple", "densityKgPerM3": 650.0, "ends": "free-free", "theory": "euler-bernoulli"}""";
    private static final double L = 0.400;
    private static final double T = 0.020;
    private static final double RHO = 650;
    /** Blevins, Formulas for Natural Frequency and Mode Shape, 1979, Table 8-1, free–free β_nL. */
    private static final double[] ROOTS = {4.73004, 7.85320, 10.9956};

    @Autowired
    MockMvc mvc;

    private final ObjectMapper json = new ObjectMapper();

    /** f_n = (β_nL)²/(2πL²) · √(E t² / (12 ρ)) (Euler–Bernoulli, rectangle: I/A = t²/12). */
    private static double hz(int n, double e) {
        double b = ROOTS[n - 1];
        return b * b / (2 * Math.PI * L * L) * Math.sqrt(e * T * T / 12 / RHO);
    }

    private JsonNode ok(RequestBuilder req) throws Exception {
        MockHttpServletResponse res = mvc.perform(req).andReturn().getResponse();
        assertThat(res.getStatus()).as(res.getContentAsString()).isEqualTo(200);
        return json.readTree(res.getContentAsString());
    }

    private JsonNode problem(RequestBuilder req) throws Exception {
        MockHttpServletResponse res = mvc.perform(req).andReturn().getResponse();
        assertThat(res.getStatus()).as(res.getContentAsString()).isEqualTo(400);
        assertThat(res.getContentType()).startsWith("application/problem+json");
        return json.readTree(res.getContentAsString());
    }

    @Test
    void typedModesGiveBackTheModulusOfTheClosedForm() throws Exception {
        double e = 10.5e9;
        String body = "{\"bar\": " + BAR + ", \"modes\": [{\"n\": 1, \"frequencyHz\": " + hz(1, e) + "}, "
                + "{\"n\": 2, \"frequencyHz\": " + hz(2, e) + "}]}";
        JsonNode r = ok(post("/api/v1/bars/measure-blank").contentType(MediaType.APPLICATION_JSON).content(body));
        // tolerance 2e-4: the roots' six digits and the elements' 0.05-cent bound
        assertThat(r.get("youngsModulusPa").asDouble()).isCloseTo(e, within(2e-4 * e));
        assertThat(r.get("shearFitted").asBoolean()).isFalse();
        assertThat(r.get("densityKgPerM3").asDouble()).isEqualTo(650.0);
        assertThat(r.get("matches")).hasSize(2);
        assertThat(r.get("bar").get("youngsModulusPa").asDouble()).isEqualTo(r.get("youngsModulusPa").asDouble());
        assertThat(r.get("bar").get("material").asText()).isEqualTo("maple");
        assertThat(r.get("cautions").toString()).contains("weigh-the-blank").doesNotContain("exact-fit");
    }

    /**
     * A synthetic recording of the same blank (E = 9.8 GPa) with an unrelated louder peak at 333 Hz:
     * the peaks are numbered by the bar's ratios and E comes back within 0.3 % (the spectral peaks'
     * interpolation in a 48 kHz, 2 s recording is good to a small fraction of a cent; 0.3 % in E is
     * 2.6 cents in frequency).
     */
    @Test
    void recordingOfATapGivesBackTheModulus() throws Exception {
        double e = 9.8e9;
        byte[] wav = TestRecordings.tap(new double[] {hz(1, e), 333.0, hz(2, e), hz(3, e)},
                new double[] {0.3, 0.4, 0.2, 0.1}, 2.0);
        MockMultipartFile file = new MockMultipartFile("file", "tap.wav", "audio/wav", wav);
        MockMultipartFile bar = new MockMultipartFile("bar", "", MediaType.APPLICATION_JSON_VALUE,
                BAR.getBytes(StandardCharsets.UTF_8));
        JsonNode r = ok(multipart("/api/v1/bars/measure-blank/recording").file(file).file(bar).param("modeCount", "3"));
        assertThat(r.get("youngsModulusPa").asDouble()).isCloseTo(e, within(3e-3 * e));
        assertThat(r.get("matches")).hasSize(3);
        for (int n = 1; n <= 3; n++) {
            assertThat(r.get("matches").get(n - 1).get("measuredHz").asDouble()).isCloseTo(hz(n, e),
                    within(0.002 * hz(n, e)));
        }
        assertThat(r.get("peaks").size()).isGreaterThanOrEqualTo(4);
        assertThat(r.get("cautions").toString()).doesNotContain("exact-fit");
    }

    @Test
    void oneModeIsAnExactFitAndSaysSo() throws Exception {
        String body = "{\"bar\": " + BAR + ", \"modes\": [{\"n\": 1, \"frequencyHz\": " + hz(1, 11e9) + "}]}";
        JsonNode r = ok(post("/api/v1/bars/measure-blank").contentType(MediaType.APPLICATION_JSON).content(body));
        assertThat(r.get("cautions").toString()).contains("exact-fit");
        assertThat(r.get("youngsModulusPa").asDouble()).isCloseTo(11e9, within(2e-4 * 11e9));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            {"bar": BAR, "modes": []}                                                          | modes
            {"bar": BAR, "modes": [{"n": 0, "frequencyHz": 100.0}]}                            | modes[0].n
            {"bar": BAR, "modes": [{"n": 1, "frequencyHz": -5.0}]}                             | modes[0].frequencyHz
            {"bar": BAR, "modes": [{"n": 1, "frequencyHz": 100.0}, {"n": 1, "frequencyHz": 300.0}]} | modes[1].n
            {"bar": BAR, "modes": [{"n": 1, "frequencyHz": 300.0}, {"n": 2, "frequencyHz": 100.0}]} | modes[1].frequencyHz
            {"modes": [{"n": 1, "frequencyHz": 100.0}]}                                        | bar
            """)
    void badInputIsAProblemNamingTheField(String body, String field) throws Exception {
        JsonNode p = problem(post("/api/v1/bars/measure-blank").contentType(MediaType.APPLICATION_JSON)
                .content(body.replace("BAR", BAR)));
        assertThat(p.get("errors").findValuesAsString("field")).contains(field);
    }

    @Test
    void badBarInTheRecordingFormIsNamed() throws Exception {
        MockMultipartFile file = new MockMultipartFile("file", "tap.wav", "audio/wav", TestRecordings.silence(48_000));
        MockMultipartFile bar = new MockMultipartFile("bar", "", MediaType.APPLICATION_JSON_VALUE,
                BAR.replace("\"thicknessMm\": 20.0", "\"thicknessMm\": -1.0").getBytes(StandardCharsets.UTF_8));
        JsonNode p = problem(multipart("/api/v1/bars/measure-blank/recording").file(file).file(bar));
        assertThat(p.get("errors").toString()).contains("thicknessMm");
    }

    @Test
    void modeCountOutOfRangeIsNamed() throws Exception {
        MockMultipartFile file = new MockMultipartFile("file", "tap.wav", "audio/wav", TestRecordings.silence(48_000));
        MockMultipartFile bar = new MockMultipartFile("bar", "", MediaType.APPLICATION_JSON_VALUE,
                BAR.getBytes(StandardCharsets.UTF_8));
        JsonNode p = problem(multipart("/api/v1/bars/measure-blank/recording").file(file).file(bar).param("modeCount", "1"));
        assertThat(p.get("errors").toString()).contains("modeCount");
    }

    @Test
    void unreadableRecordingIsAProblemOnFile() throws Exception {
        MockMultipartFile file = new MockMultipartFile("file", "tap.wav", "audio/wav", "not a wav".getBytes());
        MockMultipartFile bar = new MockMultipartFile("bar", "", MediaType.APPLICATION_JSON_VALUE,
                BAR.getBytes(StandardCharsets.UTF_8));
        JsonNode p = problem(multipart("/api/v1/bars/measure-blank/recording").file(file).file(bar));
        assertThat(p.get("errors").findValuesAsString("field")).contains("file");
    }
}
