package org.nodewright.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
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

/** The plate thickness job over HTTP: a supported plate thinned to a target against Leissa's closed form, and its 400s. */
@StoreFreeWebTest
class PlateThicknessControllerTest {

    private static final String ALU = """
            {"outline": "rectangle", "lengthMm": 400, "widthMm": 300, "thicknessMm": 3.0, "densityKgPerM3": 2700,
             "elasticAlongPa": 69e9, "elasticAcrossPa": 69e9, "shearPa": 25.939849624e9, "poissonAlongAcross": 0.33,
             "edges": "simply-supported", "modeCount": 4}""";

    private static final String BRACED = """
            {"outline": "rectangle", "lengthMm": 400, "widthMm": 300, "thicknessMm": 3.0, "material": "spruce",
             "braces": [{"fromMm": [50, 150], "toMm": [350, 150], "widthMm": 8, "heightMm": 12}], "modeCount": 6}""";

    private static final String GRADUATED = """
            {"outline": "rectangle", "lengthMm": 300, "widthMm": 200, "material": "spruce",
             "thicknessPoints": [{"xMm": 150, "yMm": 100, "thicknessMm": 3.0}, {"xMm": 150, "yMm": 30, "thicknessMm": 2.8}]}""";

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

    /**
     * Simply supported aluminium 400 x 300 mm: f11 = (π/2)(1/a² + 1/b²) · h · √(E/(12ρ(1 − ν²))) (Leissa 1969,
     * eq. 4.20), so mode 1 at 110 Hz needs h = 110 / ((π/2)(1/0.16 + 1/0.09) √(69e9/(12·2700·(1 − 0.33²)))) m.
     * Carving only removes wood (the default upper limit is 3 mm): the plate must be thinned to it.
     */
    @Test
    void aSupportedPlateIsThinnedToItsTargetAsTheClosedFormSays() throws Exception {
        String created = mvc.perform(post("/api/v1/inverse/plate-thickness").contentType(MediaType.APPLICATION_JSON)
                .content("{\"plate\": " + ALU + ", \"targets\": [{\"mode\": 1, \"targetHz\": 110}],"
                        + " \"unknowns\": {\"thickness\": true}, \"toleranceCents\": 0.05}"))
                .andExpect(status().isAccepted()).andReturn().getResponse().getContentAsString();
        assertThat((String) JsonPath.read(created, "$.kind")).isEqualTo("plate-thickness");
        String done = waitFor(JsonPath.read(created, "$.id"));
        assertThat((String) JsonPath.read(done, "$.status")).as(done).isEqualTo("succeeded");
        assertThat((Boolean) JsonPath.read(done, "$.result.converged")).isTrue();
        double h = 110 / (Math.PI / 2 * (1 / 0.16 + 1 / 0.09) * Math.sqrt(69e9 / (12 * 2700 * (1 - 0.33 * 0.33))));
        double valueMm = ((Number) JsonPath.read(done, "$.result.unknowns[0].valueMm")).doubleValue();
        assertThat(valueMm).isCloseTo(h * 1e3, within(0.002));
        assertThat((String) JsonPath.read(done, "$.result.unknowns[0].kind")).isEqualTo("thickness");
        assertThat(((Number) JsonPath.read(done, "$.result.unknowns[0].removeMm")).doubleValue())
                .isCloseTo(3.0 - h * 1e3, within(0.002));
        // f ∝ h: 0.1 mm removed lowers mode 1 by 110 Hz · 0.1 mm / h
        double sens = ((Number) JsonPath.read(done, "$.result.sensitivities[0].hzPerTenthMmRemoved[0]")).doubleValue();
        assertThat(sens).isCloseTo(-110 * 1e-4 / h, within(0.002 * 110 * 1e-4 / h));
        String plate = JsonPath.parse(done).read("$.result.plate", net.minidev.json.JSONObject.class).toJSONString();
        String analysed = mvc.perform(post("/api/v1/plates/analyze").contentType(MediaType.APPLICATION_JSON).content(plate))
                .andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        double f1 = ((Number) JsonPath.read(analysed, "$.modes[0].frequencyHz")).doubleValue();
        // the answer's plate is written to 0.001 mm: up to 0.0005 / 2.27 of f, 0.4 cent
        assertThat(Math.abs(Cents.between(f1, 110))).isLessThan(0.4);
    }

    @Test
    void aBraceHeightIsLoweredToTuneTheFirstMode() throws Exception {
        String created = mvc.perform(post("/api/v1/inverse/plate-thickness").contentType(MediaType.APPLICATION_JSON)
                .content("{\"plate\": " + BRACED + ", \"targets\": [{\"mode\": 2, \"note\": \"A2\"}],"
                        + " \"unknowns\": {\"braceHeights\": [0]}, \"limits\": {\"minBraceHeightMm\": 2}}"))
                .andExpect(status().isAccepted()).andReturn().getResponse().getContentAsString();
        String done = waitFor(JsonPath.read(created, "$.id"));
        assertThat((String) JsonPath.read(done, "$.status")).as(done).isEqualTo("succeeded");
        // A2 = MIDI 45 at A4 = 440 Hz: 110 Hz exactly (equal temperament)
        assertThat(((Number) JsonPath.read(done, "$.result.targets[0].targetHz")).doubleValue()).isEqualTo(110.0);
        assertThat((String) JsonPath.read(done, "$.result.unknowns[0].kind")).isEqualTo("brace-height");
        List<Double> cents = ToneHoleSolveControllerTest.numbers(done, "$.result.targets[*].cents");
        if (JsonPath.<Boolean>read(done, "$.result.converged")) {
            assertThat(Math.abs(cents.get(0))).isLessThanOrEqualTo(0.5);
        }
        assertThat(((Number) JsonPath.read(done, "$.result.plate.braces[0].heightMm")).doubleValue())
                .isBetween(2.0, 12.0);
    }

    @ParameterizedTest(name = "{index}: {1}")
    @CsvSource(delimiter = '|', textBlock = """
            {"plate": ALU, "targets": [{"mode": 1, "targetHz": 110}, {"mode": 1, "targetHz": 120}], "unknowns": {"thickness": true}} | targets[1].mode
            {"plate": ALU, "targets": [{"mode": 1}], "unknowns": {"thickness": true}}                                           | targets[0].targetHz
            {"plate": ALU, "targets": [{"mode": 1, "note": "H2"}], "unknowns": {"thickness": true}}                             | targets[0].note
            {"plate": ALU, "targets": [{"mode": 0, "targetHz": 110}], "unknowns": {"thickness": true}}                         | targets[0].mode
            {"plate": ALU, "targets": [{"mode": 1, "targetHz": 110}], "unknowns": {}}                                           | unknowns
            {"plate": ALU, "targets": [{"mode": 1, "targetHz": 110}], "unknowns": {"braceHeights": [0]}}                        | unknowns.braceHeights[0]
            {"plate": GRADUATED, "targets": [{"mode": 1, "targetHz": 60}], "unknowns": {"thickness": true}}                     | unknowns.thickness
            {"plate": GRADUATED, "targets": [{"mode": 1, "targetHz": 60}], "unknowns": {"thicknessPoints": [1, 1]}}             | unknowns.thicknessPoints[1]
            {"plate": GRADUATED, "targets": [{"mode": 1, "targetHz": 60}], "unknowns": {"thicknessPoints": [2]}}                | unknowns.thicknessPoints[0]
            {"plate": ALU, "targets": [{"mode": 1, "targetHz": 110}], "unknowns": {"thickness": true}, "limits": {"maxThicknessMm": 2.5}} | limits.minThicknessMm
            {"plate": ALU, "targets": [{"mode": 1, "targetHz": 110}], "unknowns": {"thickness": true}, "limits": {"minThicknessMm": 4, "maxThicknessMm": 3.5}} | limits.maxThicknessMm
            {"plate": ALU, "targets": [], "unknowns": {"thickness": true}}                                                       | targets
            {"plate": {"outline": "rectangle", "lengthMm": 400, "widthMm": 300, "thicknessMm": 0, "material": "spruce"}, "targets": [{"mode": 1, "targetHz": 110}], "unknowns": {"thickness": true}} | plate.thicknessMm
            """)
    void badThicknessRequestsAreA400NamingTheField(String body, String field) throws Exception {
        String res = mvc.perform(post("/api/v1/inverse/plate-thickness").contentType(MediaType.APPLICATION_JSON)
                .content(body.replace("ALU", ALU).replace("GRADUATED", GRADUATED))).andExpect(status().isBadRequest())
                .andReturn().getResponse().getContentAsString();
        List<String> fields = JsonPath.read(res, "$.errors[*].field");
        assertThat(fields).as(res).contains(field);
    }
}
