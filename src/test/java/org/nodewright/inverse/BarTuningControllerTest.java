package org.nodewright.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.nodewright.physics.tuning.Cents;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

/** The bar tuning job: F3 at 1:4:10 (common marimba practice) on a rosewood-like blank, and its 400s. */
@StoreFreeWebTest
class BarTuningControllerTest {

    private static final String BAR = """
            {"lengthMm": 440, "section": "rectangle", "widthMm": 60, "thicknessMm": 22, "material": "rosewood",
             "ends": "free-free", "theory": "timoshenko", "modeCount": 3}""";

    @Autowired
    MockMvc mvc;

    String waitFor(String id) throws Exception {
        for (int i = 0; i < 1200; i++) {
            String body = mvc.perform(get("/api/v1/inverse/jobs/" + id)).andExpect(status().isOk())
                    .andReturn().getResponse().getContentAsString();
            String s = JsonPath.read(body, "$.status");
            if (!"queued".equals(s) && !"running".equals(s)) {
                return body;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("the job did not finish");
    }

    @Test
    void marimbaBarReachesF3AtOneFourTenAndTheCutBarAnalysesAsSolved() throws Exception {
        String created = mvc.perform(post("/api/v1/inverse/bar-tuning").contentType(MediaType.APPLICATION_JSON)
                .content("{\"bar\": " + BAR + ", \"note\": \"F3\", \"ratios\": [4, 10],"
                        + " \"limits\": {\"minimumThicknessMm\": 4, \"flatEndMm\": 60}}"))
                .andExpect(status().isAccepted()).andReturn().getResponse().getContentAsString();
        String done = waitFor(JsonPath.read(created, "$.id"));
        assertThat((String) JsonPath.read(done, "$.status")).as(done).isEqualTo("succeeded");
        assertThat((Boolean) JsonPath.read(done, "$.result.converged")).isTrue();
        List<Double> cents = ToneHoleSolveControllerTest.numbers(done, "$.result.targets[*].cents");
        assertThat(cents).hasSize(3).allSatisfy(c -> assertThat(Math.abs(c)).isLessThanOrEqualTo(0.5));
        assertThat(ToneHoleSolveControllerTest.numbers(done, "$.result.cordHolesMm")).hasSize(2);
        assertThat(ToneHoleSolveControllerTest.numbers(done, "$.result.sensitivity.positionsMm")).hasSize(121);
        String bar = JsonPath.parse(done).read("$.result.bar", net.minidev.json.JSONObject.class).toJSONString();
        String analysed = mvc.perform(post("/api/v1/bars/analyze").contentType(MediaType.APPLICATION_JSON).content(bar))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        double f1 = ((Number) JsonPath.read(analysed, "$.modes[0].frequencyHz")).doubleValue();
        // F3 = MIDI 53 at A4 = 440 Hz: 174.614 Hz (equal temperament)
        assertThat(Math.abs(Cents.between(f1, 174.614116))).isLessThan(1.0);
    }

    @ParameterizedTest(name = "{index}: {1}")
    @CsvSource(delimiter = '|', textBlock = """
            {"bar": {"lengthMm": 440, "section": "round", "diameterMm": 20, "material": "steel"}, "note": "F3"}      | bar.section
            {"bar": BAR, "note": "H9"}                                                                                  | note
            {"bar": BAR}                                                                                                | targetHz
            {"bar": BAR, "targetHz": 174.6, "limits": {"minimumThicknessMm": 25}}                                       | limits.minimumThicknessMm
            {"bar": BAR, "targetHz": 174.6, "limits": {"flatEndMm": 230}}                                               | limits.flatEndMm
            {"bar": BAR, "targetHz": 174.6, "ratios": [4, 3]}                                                           | ratios[1]
            {"bar": BAR, "targetHz": 174.6, "ratios": [0.5]}                                                            | ratios[0]
            {"bar": BAR, "targetHz": 174.6, "limits": {"minLengthMm": 450, "maxLengthMm": 500}}                         | limits.maxLengthMm
            {"bar": BAR, "targetHz": "NaN"}                                                                             | targetHz
            """)
    void badTuningRequestsAreA400NamingTheField(String body, String field) throws Exception {
        String res = mvc.perform(post("/api/v1/inverse/bar-tuning").contentType(MediaType.APPLICATION_JSON)
                .content(body.replace("BAR", BAR))).andExpect(status().isBadRequest()).andReturn().getResponse()
                .getContentAsString();
        List<String> fields = JsonPath.read(res, "$.errors[*].field");
        assertThat(fields).as(res).contains(field);
    }
}
