package org.nodewright.bars;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import org.junit.jupiter.api.Test;
import org.nodewright.StoreFreeWebTest;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockHttpServletResponse;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/** The bar bench's JSON API as the HTTP contract spells it, and its 400s. */
@StoreFreeWebTest
class BarsApiTest {

    /** The contract's example request (a rosewood-like marimba bar blank). */
    private static final String BASE = """
            {"lengthMm": 380.0, "section": "rectangle",
             "widthMm": 60.0, "thicknessMm": 22.0, "diameterMm": null, "boreMm": null,
             "profile": null, "material": "rosewood",
             "densityKgPerM3": null, "youngsModulusPa": null, "shearModulusPa": null,
             "ends": "free-free", "theory": "timoshenko", "modeCount": 6}""";


    @Autowired
    MockMvc mvc;

    private final ObjectMapper json = new ObjectMapper();

    private JsonNode post200(String body) throws Exception {
        MockHttpServletResponse res = mvc.perform(post("/api/v1/bars/analyze").contentType(MediaType.APPLICATION_JSON)
                .content(body)).andReturn().getResponse();
        assertThat(res.getStatus()).as(res.getContentAsString()).isEqualTo(200);
        return json.readTree(res.getContentAsString());
    }

    @Test
    void contractExampleAnswersTheContractFields() throws Exception {
        JsonNode r = post200(BASE);
        assertThat(r.get("shearCoefficient").asDouble()).isCloseTo(5.0 / 6.0, within(1e-12));
        JsonNode modes = r.get("modes");
        double previous = 0;
        for (int i = 0; i < 6; i++) {
            JsonNode m = modes.get(i);
            assertThat(m.get("n").asInt()).isEqualTo(i + 1);
            assertThat(m.get("kind").asText()).isEqualTo("bending");
            assertThat(m.get("frequencyHz").asDouble()).isGreaterThan(previous);
            previous = m.get("frequencyHz").asDouble();
            assertThat(m.get("note").get("name").asText()).isNotBlank();
            assertThat(m.get("note").has("centsOff")).isTrue();
            assertThat(m.get("nodesMm")).hasSize(i + 2);
            assertThat(m.get("nodesMm").get(0).asDouble()).isGreaterThan(0);
            assertThat(m.get("nodesMm").get(i + 1).asDouble()).isLessThan(380.0);
            assertThat(m.get("antinodesMm").get(0).asDouble()).isZero();
            double max = 0;
            for (JsonNode s : m.get("shape")) {
                max = Math.max(max, Math.abs(s.asDouble()));
            }
            assertThat(max).isEqualTo(1.0);
            assertThat(m.get("shapeX")).hasSameSizeAs(m.get("shape"));
        }
        assertThat(modes.get(0).get("ratioToFirst").asDouble()).isEqualTo(1.0);
        // the other families follow the bending modes, each with its own kind
        assertThat(modes.size()).isGreaterThan(6);
        for (int i = 6; i < modes.size(); i++) {
            assertThat(modes.get(i).get("kind").asText()).isIn("twisting", "lateral-bending");
        }
        // mode 1's nodes are the cord holes, near 0.224 L (common practice)
        assertThat(r.get("cordHolesMm").get(0).asDouble() / 380).isCloseTo(0.224, within(0.003));
        assertThat(r.get("cautions").toString()).contains("wood-dust");
    }

    @Test
    void tubeAndHeldEnds() throws Exception {
        JsonNode r = post200("""
                {"lengthMm": 600, "section": "tube", "diameterMm": 25.4, "boreMm": 22.0, "material": "brass",
                 "ends": "clamped-free", "theory": "euler-bernoulli", "modeCount": 3}""");
        JsonNode first = r.get("modes").get(0);
        assertThat(first.get("nodesMm").get(0).asDouble()).isZero();
        assertThat(first.get("antinodesMm").get(first.get("antinodesMm").size() - 1).asDouble()).isEqualTo(600.0);
        assertThat(r.get("modes").get(3).get("kind").asText()).isEqualTo("twisting");
    }

    @Test
    void materialsCatalogueHasSources() throws Exception {
        MockHttpServletResponse res = mvc.perform(get("/api/v1/bar-materials")).andReturn().getResponse();
        JsonNode list = json.readTree(res.getContentAsString());
        assertThat(list).hasSizeGreaterThanOrEqualTo(8);
        for (JsonNode m : list) {
            assertThat(m.get("densityKgPerM3").asDouble()).isPositive();
            assertThat(m.get("youngsModulusPa").asDouble()).isPositive();
            assertThat(m.get("shearModulusPa").asDouble()).isPositive();
            assertThat(m.get("source").asText()).isNotBlank();
        }
        assertThat(list.toString()).contains("\"rosewood\"", "\"padauk\"", "\"maple\"", "\"fibreglass\"",
                "\"aluminium\"", "\"brass\"", "\"steel\"", "\"bell-bronze\"");
    }

    // Each row: the text to replace in BASE | its replacement | the field the problem must name.
    @ParameterizedTest(name = "{index}: {1} -> {2}")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', textBlock = """
            "lengthMm": 380.0          | "lengthMm": -380.0               | lengthMm
            "lengthMm": 380.0          | "lengthMm": 0                    | lengthMm
            "lengthMm": 380.0          | "lengthMm": "NaN"                | lengthMm
            "lengthMm": 380.0          | "lengthMm": 1e400                | lengthMm
            "lengthMm": 380.0          | "lengthMm": "380"                | lengthMm
            "lengthMm": 380.0,         | ''                               | lengthMm
            "section": "rectangle"     | "section": "hexagon"             | section
            "section": "rectangle"     | "section": "RECTANGLE"           | section
            "section": "rectangle"     | "section": null                  | section
            "thicknessMm": 22.0        | "thicknessMm": 0                 | thicknessMm
            "thicknessMm": 22.0        | "thicknessMm": -22               | thicknessMm
            "thicknessMm": 22.0        | "thicknessMm": null              | thicknessMm
            "widthMm": 60.0            | "widthMm": null                  | widthMm
            "widthMm": 60.0            | "widthMm": 0.0                   | widthMm
            "diameterMm": null         | "diameterMm": 20                 | diameterMm
            "profile": null            | "profile": [{"positionMm": 0, "thicknessMm": 22}, {"positionMm": 300, "thicknessMm": 22}] | profile[1].positionMm
            "profile": null            | "profile": [{"positionMm": 10, "thicknessMm": 22}, {"positionMm": 380, "thicknessMm": 22}] | profile[0].positionMm
            "profile": null            | "profile": [{"positionMm": 0, "thicknessMm": 22}, {"positionMm": 380, "thicknessMm": 0}] | profile[1].thicknessMm
            "profile": null            | "profile": [{"positionMm": 0, "thicknessMm": 22}, {"positionMm": 190, "thicknessMm": -1}, {"positionMm": 380, "thicknessMm": 22}] | profile[1].thicknessMm
            "profile": null            | "profile": [{"positionMm": 0, "thicknessMm": 22}, {"positionMm": 200, "thicknessMm": 9}, {"positionMm": 200, "thicknessMm": 9}, {"positionMm": 380, "thicknessMm": 22}] | profile[2].positionMm
            "profile": null            | "profile": [{"positionMm": 0, "thicknessMm": 22}] | profile
            "profile": null            | "profile": [{"positionMm": 0, "thicknessMm": 22}, null] | profile[1]
            "material": "rosewood"     | "material": "unobtainium"        | material
            "material": "rosewood"     | "material": null                 | densityKgPerM3
            "material": "rosewood"     | "material": null                 | youngsModulusPa
            "material": "rosewood"     | "material": null                 | shearModulusPa
            "youngsModulusPa": null    | "youngsModulusPa": -2e10         | youngsModulusPa
            "shearModulusPa": null     | "shearModulusPa": "Infinity"     | shearModulusPa
            "ends": "free-free"        | "ends": "free"                   | ends
            "ends": "free-free"        | "ends": "FREE_FREE"              | ends
            "ends": "free-free"        | "ends": 1                        | ends
            "theory": "timoshenko"     | "theory": "rayleigh"             | theory
            "modeCount": 6             | "modeCount": 1000000000          | modeCount
            "modeCount": 6             | "modeCount": 0                   | modeCount
            "modeCount": 6             | "modeCount": 6.5                 | modeCount
            "modeCount": 6             | "modeCount": 17                  | modeCount
            "modeCount": 6             | "modeCount": 6, "colour": "red"  | colour
            "modeCount": 6             | "modeCount": 6, "referenceA4Hz": 0 | referenceA4Hz
            """)
    void malformedAnalysisIsA400NamingTheField(String find, String replace, String field) throws Exception {
        assertThat(BASE).contains(find);
        assertProblem(BASE.replace(find, replace), field);
    }

    @ParameterizedTest(name = "{index}: {1}")
    @CsvSource(delimiter = '|', textBlock = """
            {"lengthMm": 600, "section": "tube", "diameterMm": 25, "boreMm": 25, "material": "brass"}   | boreMm
            {"lengthMm": 600, "section": "tube", "diameterMm": 25, "boreMm": 30, "material": "brass"}   | boreMm
            {"lengthMm": 600, "section": "tube", "diameterMm": 25, "material": "brass"}                 | boreMm
            {"lengthMm": 600, "section": "tube", "boreMm": 20, "material": "brass"}                     | diameterMm
            {"lengthMm": 600, "section": "round", "material": "steel"}                                  | diameterMm
            {"lengthMm": 600, "section": "round", "diameterMm": 10, "boreMm": 5, "material": "steel"}   | boreMm
            {"lengthMm": 600, "section": "round", "diameterMm": 10, "widthMm": 5, "material": "steel"}  | widthMm
            {"lengthMm": 600, "section": "round", "diameterMm": 10, "material": "steel", "ends": "hinged-free"} | ends
            """)
    void badSectionsAreA400NamingTheField(String body, String field) throws Exception {
        assertProblem(body, field);
    }

    private void assertProblem(String body, String field) throws Exception {
        MockHttpServletResponse res = mvc.perform(post("/api/v1/bars/analyze").contentType(MediaType.APPLICATION_JSON)
                .content(body)).andReturn().getResponse();
        assertThat(res.getStatus()).as(body + " -> " + res.getContentAsString()).isEqualTo(400);
        assertThat(res.getContentType()).startsWith("application/problem+json");
        JsonNode p = json.readTree(res.getContentAsString());
        assertThat(p.get("errors").findValuesAsString("field")).as(res.getContentAsString()).contains(field);
    }
}
