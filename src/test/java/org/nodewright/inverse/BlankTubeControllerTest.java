package org.nodewright.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

@StoreFreeWebTest
class BlankTubeControllerTest {

    @Autowired
    MockMvc mvc;

    String demo() throws Exception {
        return mvc.perform(get("/api/v1/inverse/blank-tube/demo")).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
    }

    String waitFor(String id) throws Exception {
        for (int i = 0; i < 1200; i++) {
            String body = mvc.perform(get("/api/v1/inverse/jobs/" + id)).andReturn().getResponse().getContentAsString();
            String s = JsonPath.read(body, "$.status");
            if (!"queued".equals(s) && !"running".equals(s)) {
                return body;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("the job did not finish");
    }

    String run(String url, String body) throws Exception {
        String created = mvc.perform(post(url).contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isAccepted()).andReturn().getResponse().getContentAsString();
        return waitFor(JsonPath.read(created, "$.id"));
    }

    @Test
    void theWorkshopBlankGetsSixHolesAndEveryNoteItsCentsReportedHonestly() throws Exception {
        String done = run("/api/v1/inverse/blank-tube", demo());
        assertThat((String) JsonPath.read(done, "$.status")).isEqualTo("succeeded");
        List<Double> first = ToneHoleSolveControllerTest.numbers(done, "$.result.firstLayout.holes[*].positionMm");
        assertThat(first).hasSize(6).isSorted();
        List<Double> cents = ToneHoleSolveControllerTest.numbers(done, "$.result.solution.notes[*].achievedCents");
        assertThat(cents).hasSize(13);
        double worst = ((Number) JsonPath.read(done, "$.result.solution.worstCents")).doubleValue();
        assertThat(worst).isEqualTo(cents.stream().mapToDouble(Math::abs).max().orElseThrow());
        assertThat((Boolean) JsonPath.read(done, "$.result.solution.withinTolerance")).isEqualTo(worst <= 3.0);
        // the optimiser improved on the closed form it started from
        double firstWorst = ((Number) JsonPath.read(done, "$.result.firstLayout.worstCents")).doubleValue();
        assertThat(worst).isLessThan(firstWorst);
        // the demo lets the headspace move; the bore handed back carries where it went
        assertThat((String) JsonPath.read(done, "$.result.mouth[0].field")).isEqualTo("mouth.headspaceMm");
        double head = ((Number) JsonPath.read(done, "$.result.mouth[0].solvedMm")).doubleValue();
        assertThat(head).isBetween(0.0, 13.0);
        assertThat(((Number) JsonPath.read(done, "$.result.solution.bore.mouth.headspaceMm")).doubleValue()).isEqualTo(head);
        // the holed bore is a valid air-column request: the bore bench analyses it
        String bore = JsonPath.parse(done).read("$.result.solution.bore", net.minidev.json.JSONObject.class)
                .toJSONString();
        mvc.perform(post("/api/v1/air-columns/analyze").contentType(MediaType.APPLICATION_JSON).content(bore))
                .andExpect(status().isOk());
    }

    @Test
    void aBlankWithHolesOrAChartNamingAHoleNotMadeIsRefusedByField() throws Exception {
        String body = demo().replace("\"holeCount\":6", "\"holeCount\":4");
        mvc.perform(post("/api/v1/inverse/blank-tube").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[*].field", org.hamcrest.Matchers.hasItem("fingerings[0].closedHoles[4]")));
        String holed = demo().replace("\"holes\":null", "\"holes\":[{\"positionMm\":100,\"diameterMm\":6,\"chimneyMm\":2.5}]");
        assertThat(holed).isNotEqualTo(demo());
        mvc.perform(post("/api/v1/inverse/blank-tube").contentType(MediaType.APPLICATION_JSON).content(holed))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[*].field", org.hamcrest.Matchers.hasItem("bore.holes")));
        String bigStart = demo().replace("\"startDiametersMm\":null", "\"startDiametersMm\":[20.0]");
        mvc.perform(post("/api/v1/inverse/blank-tube").contentType(MediaType.APPLICATION_JSON).content(bigStart))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[*].field", org.hamcrest.Matchers.hasItem("startDiametersMm[0]")));
    }

    void refused(String body, String field) throws Exception {
        mvc.perform(post("/api/v1/inverse/blank-tube").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[*].field", org.hamcrest.Matchers.hasItem(field)));
    }

    String demoWith(String path, Object value) throws Exception {
        return JsonPath.parse(demo()).set(path, value).jsonString();
    }

    @Test
    void mouthLimitsTheMouthCannotFollowAreRefusedByField() throws Exception {
        // the demo lets the headspace move: without a mouth there is none
        refused(demoWith("$.bore.mouth", null), "mouthLimits.varyHeadspace");
        refused(demoWith("$.mouthLimits.varyWindowLength", true).replace("\"kind\":\"window\"", "\"kind\":\"reed\","
                + "\"equivalentVolumeMm3\":500"), "mouthLimits.varyWindowLength");
        refused(demoWith("$.mouthLimits.maxHeadspaceMm", -1), "mouthLimits.maxHeadspaceMm");
        refused(JsonPath.parse(demo()).set("$.mouthLimits.minHeadspaceMm", 8).set("$.mouthLimits.maxHeadspaceMm", 4)
                .jsonString(), "mouthLimits.maxHeadspaceMm");
        // the blank's headspace (0 mm) outside the bounds would be a changed value: refused
        refused(demoWith("$.mouthLimits.minHeadspaceMm", 2), "mouthLimits.minHeadspaceMm");
        refused(JsonPath.parse(demo()).set("$.mouthLimits.varyWindowLength", true)
                .set("$.mouthLimits.minWindowLengthMm", 5).jsonString(), "mouthLimits.minWindowLengthMm");
        refused(JsonPath.parse(demo()).set("$.mouthLimits.varyWindowLength", true)
                .set("$.mouthLimits.minWindowLengthMm", 3).set("$.mouthLimits.maxWindowLengthMm", 2).jsonString(),
                "mouthLimits.maxWindowLengthMm");
        refused(demoWith("$.mouthLimits.maxWindowLengthMm", 6), "mouthLimits.varyWindowLength");
        refused(JsonPath.parse(demo()).set("$.mouthLimits.varyHeadspace", false).jsonString(), "mouthLimits.varyHeadspace");
        refused(demoWith("$.mouthLimits.maxWindowLengthMm", "long"), "mouthLimits.maxWindowLengthMm");
    }

    /** The workshop whistle as built (window preset), with a window 1.0 mm longer than the model's 4.0 mm. */
    static String calibrationBody(String measured, String fit) {
        String holes = "[{\"positionMm\":113.7,\"diameterMm\":6.5,\"chimneyMm\":2.5},{\"positionMm\":133.7,\"diameterMm\":7.0,"
                + "\"chimneyMm\":2.5},{\"positionMm\":154.2,\"diameterMm\":7.0,\"chimneyMm\":2.5}]";
        return "{\"bore\":{\"segments\":[{\"lengthMm\":260,\"inputDiameterMm\":13,\"outputDiameterMm\":13}],"
                + "\"inputEnd\":\"open\",\"outputEnd\":\"open-unflanged\",\"holes\":" + holes
                + ",\"temperatureC\":20,\"relativeHumidityPct\":50,\"fMinHz\":300,\"fMaxHz\":3000,"
                + "\"mouth\":{\"kind\":\"window\",\"windowLengthMm\":4.0,\"windowWidthMm\":8.0,\"wallMm\":1.5,\"headspaceMm\":0},"
                + "\"fingerings\":[{\"name\":\"D5\",\"closedHoles\":[0,1,2],\"targetNote\":\"D5\"},"
                + "{\"name\":\"E5\",\"closedHoles\":[0,1],\"targetNote\":\"E5\"}]},"
                + "\"measured\":" + measured + (fit == null ? "" : ",\"fit\":" + fit) + "}";
    }

    @Test
    void calibrationMovesTheWindowSoTheModelMeetsTheMeasuredPitches() throws Exception {
        // measured a flat prototype: 20 cents below what the model says at 4 mm would be, read back by the fit
        String done = run("/api/v1/inverse/calibration", calibrationBody(
                "[{\"fingering\":\"D5\",\"measuredHz\":560.0},{\"fingering\":\"E5\",\"measuredHz\":628.0}]", null));
        assertThat((String) JsonPath.read(done, "$.status")).isEqualTo("succeeded");
        assertThat((String) JsonPath.read(done, "$.result.parameters[0].field")).isEqualTo("mouth.windowLengthMm");
        double fitted = ((Number) JsonPath.read(done, "$.result.parameters[0].fittedValue")).doubleValue();
        double before = ((Number) JsonPath.read(done, "$.result.rmsCentsBefore")).doubleValue();
        double after = ((Number) JsonPath.read(done, "$.result.rmsCentsAfter")).doubleValue();
        assertThat(after).isLessThan(before);
        // a window's inertance grows as it shortens (Ingerslev & Frobenius 1947): flatter pitches need a shorter window
        assertThat(fitted).isLessThan(4.0);
        assertThat(((Number) JsonPath.read(done, "$.result.bore.mouth.windowLengthMm")).doubleValue()).isEqualTo(fitted);
    }

    @Test
    void calibrationRefusesUnknownFingeringsAndAMouthFitWithoutAMouth() throws Exception {
        mvc.perform(post("/api/v1/inverse/calibration").contentType(MediaType.APPLICATION_JSON).content(calibrationBody(
                        "[{\"fingering\":\"G5\",\"measuredHz\":780.0}]", "[\"mouth\",\"mouth\"]")))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[*].field", org.hamcrest.Matchers.hasItems("measured[0].fingering", "fit")));
        mvc.perform(post("/api/v1/inverse/calibration").contentType(MediaType.APPLICATION_JSON).content(calibrationBody(
                        "[{\"fingering\":\"D5\",\"measuredHz\":-1}]", "[\"warmth\"]")))
                .andExpect(status().isBadRequest());
    }
}
