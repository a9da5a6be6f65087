package org.nodewright.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.delete;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

@StoreFreeWebTest
class ToneHoleSolveControllerTest {


    @Autowired
    MockMvc mvc;

    String demo() throws Exception {
        return mvc.perform(get("/api/v1/inverse/tone-holes/demo")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
    }

    String waitFor(String id) throws Exception {
        for (int i = 0; i < 600; i++) {
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
    void theDemoWhistleSolvesToWithinThreeCentsAndHandsBackTheAdjustedBore() throws Exception {
        String created = mvc.perform(post("/api/v1/inverse/tone-holes").contentType(MediaType.APPLICATION_JSON)
                        .content(demo()))
                .andExpect(status().isAccepted())
                .andExpect(header().string("Location", org.hamcrest.Matchers.startsWith("/api/v1/inverse/jobs/")))
                .andReturn().getResponse().getContentAsString();
        String done = waitFor(JsonPath.read(created, "$.id"));
        assertThat((String) JsonPath.read(done, "$.status")).isEqualTo("succeeded");
        List<Double> cents = numbers(done, "$.result.notes[*].achievedCents");
        assertThat(cents).hasSize(7).allSatisfy(c -> assertThat(Math.abs(c)).isLessThan(3.0));
        List<Double> moved = numbers(done, "$.result.holes[*].movedMm");
        List<Double> solved = numbers(done, "$.result.holes[*].positionMm");
        List<Double> inBore = numbers(done, "$.result.bore.holes[*].positionMm");
        assertThat(inBore).isEqualTo(solved);
        assertThat(moved).anySatisfy(m -> assertThat(Math.abs(m)).isGreaterThan(1.0));
        // The adjusted bore is a valid air-column request: the bore bench's analysis accepts it.
        String bore = com.jayway.jsonpath.JsonPath.parse(done).read("$.result.bore", net.minidev.json.JSONObject.class)
                .toJSONString();
        mvc.perform(post("/api/v1/air-columns/analyze").contentType(MediaType.APPLICATION_JSON).content(bore))
                .andExpect(status().isOk());
    }

    static List<Double> numbers(String json, String path) {
        List<Number> raw = JsonPath.read(json, path);
        return raw.stream().map(Number::doubleValue).toList();
    }

    @Test
    void aCancelledJobSaysSo() throws Exception {
        String body = demo().replace("\"toleranceCents\":null", "\"toleranceCents\":0.001")
                .replace("\"maxEvaluations\":null", "\"maxEvaluations\":5000");
        String created = mvc.perform(post("/api/v1/inverse/tone-holes").contentType(MediaType.APPLICATION_JSON)
                        .content(body)).andExpect(status().isAccepted()).andReturn().getResponse().getContentAsString();
        String id = JsonPath.read(created, "$.id");
        mvc.perform(delete("/api/v1/inverse/jobs/" + id)).andExpect(status().isAccepted());
        String done = waitFor(id);
        assertThat((String) JsonPath.read(done, "$.status")).isIn("cancelled", "succeeded");
    }

    @Test
    void unknownJobIsA404ProblemDocument() throws Exception {
        mvc.perform(get("/api/v1/inverse/jobs/no-such-job")).andExpect(status().isNotFound())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"positionMm\":148.0 | \"positionMm\":100.0 | bore.holes[1].positionMm",
        "\"maxDiameterMm\":9.0 | \"maxDiameterMm\":1.0 | limits.maxDiameterMm",
        "\"maxEvaluations\":null | \"maxEvaluations\":1000000000 | maxEvaluations",
        "\"toleranceCents\":null | \"toleranceCents\":\"abc\" | toleranceCents",
        "\"minWallMm\":3.0 | \"minWallMm\":-1 | limits.minWallMm",
        "\"targetNote\":\"E5\" | \"targetNote\":\"H5\" | bore.fingerings[1].targetNote"
    })
    void badSolveRequestsNameTheField(String from, String to, String field) throws Exception {
        String body = demo();
        assertThat(body).contains(from);
        mvc.perform(post("/api/v1/inverse/tone-holes").contentType(MediaType.APPLICATION_JSON)
                        .content(body.replaceFirst(java.util.regex.Pattern.quote(from), to)))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"))
                .andExpect(jsonPath("$.errors[0].field").value(field));
    }
}
