package org.nodewright.plates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockHttpServletResponse;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/** The plate API as the HTTP contract states it: fields, units, null outside an outline, 400s naming the field. */
@StoreFreeWebTest
class PlatesApiTest {

    private static final String BASE = """
            {"outline": "rectangle", "lengthMm": 400.0, "widthMm": 300.0, "thicknessMm": 3.0,
             "material": "spruce", "edges": "free",
             "braces": [{"fromMm": [200.0, 20.0], "toMm": [200.0, 280.0], "widthMm": 6.0, "heightMm": 8.0}],
             "modeCount": 6}""";

    @Autowired
    MockMvc mvc;

    private final ObjectMapper json = new ObjectMapper();

    private MockHttpServletResponse postBody(String body) throws Exception {
        return mvc.perform(post("/api/v1/plates/analyze").contentType(MediaType.APPLICATION_JSON).content(body))
                .andReturn().getResponse();
    }

    @Test
    void analysesARectangleWithTheContractsFields() throws Exception {
        MockHttpServletResponse r = postBody(BASE);
        assertThat(r.getStatus()).isEqualTo(200);
        JsonNode modes = json.readTree(r.getContentAsString()).get("modes");
        assertThat(modes.size()).isEqualTo(6);
        double last = 0;
        for (JsonNode m : modes) {
            assertThat(m.get("frequencyHz").doubleValue()).isGreaterThan(last);
            last = m.get("frequencyHz").doubleValue();
            JsonNode grid = m.get("grid");
            assertThat(grid.get("xMm").get(0).doubleValue()).isEqualTo(0.0);
            assertThat(grid.get("xMm").get(grid.get("xMm").size() - 1).doubleValue()).isEqualTo(400.0);
            assertThat(grid.get("w").size()).isEqualTo(grid.get("xMm").size());
            assertThat(grid.get("w").get(0).size()).isEqualTo(grid.get("yMm").size());
            double max = 0;
            for (JsonNode row : grid.get("w")) {
                for (JsonNode v : row) {
                    assertThat(v.isNumber()).isTrue();
                    max = Math.max(max, Math.abs(v.doubleValue()));
                }
            }
            assertThat(max).isCloseTo(1.0, within(1e-6));
            assertThat(m.get("nodalLines").size()).isPositive();
            assertThat(m.get("nodalLines").get(0).get(0).size()).isEqualTo(2);
            assertThat(m.get("note").get("name").asString()).isNotEmpty();
        }
    }

    @Test
    void modesCsvHasOneRowPerModeWithTheAnswersFrequencies() throws Exception {
        JsonNode modes = json.readTree(postBody(BASE).getContentAsString()).get("modes");
        MockHttpServletResponse r = mvc.perform(post("/api/v1/plates/modes.csv")
                .contentType(MediaType.APPLICATION_JSON).content(BASE)).andReturn().getResponse();
        assertThat(r.getStatus()).isEqualTo(200);
        String[] lines = r.getContentAsString().trim().split("\\r?\\n");
        assertThat(lines[0]).isEqualTo("n,frequencyHz,note,noteCentsOff,name,nodalLinesX,nodalLinesY");
        assertThat(lines).hasSize(modes.size() + 1);
        for (int i = 0; i < modes.size(); i++) {
            String[] cells = lines[i + 1].split(",");
            assertThat(Integer.parseInt(cells[0])).isEqualTo(i + 1);
            assertThat(Double.parseDouble(cells[1])).isEqualTo(modes.get(i).get("frequencyHz").doubleValue());
        }
    }

    @Test
    void aPolygonHasNullOutsideItsOutline() throws Exception {
        StringBuilder pts = new StringBuilder();
        for (int i = 0; i < 64; i++) {
            double t = 2 * Math.PI * i / 64;
            pts.append(i == 0 ? "" : ",").append("[").append(150 + 150 * Math.cos(t)).append(",")
                    .append(150 + 150 * Math.sin(t)).append("]");
        }
        MockHttpServletResponse r = postBody("""
                {"outline": [%s], "thicknessMm": 2.0, "densityKgPerM3": 2700, "elasticAlongPa": 70e9,
                 "elasticAcrossPa": 70e9, "shearPa": 26.923e9, "poissonAlongAcross": 0.3, "edges": "clamped",
                 "modeCount": 2}""".formatted(pts));
        assertThat(r.getStatus()).isEqualTo(200);
        JsonNode m = json.readTree(r.getContentAsString()).get("modes").get(0);
        JsonNode w = m.get("grid").get("w");
        assertThat(w.get(0).get(0).isNull()).isTrue();
        assertThat(w.get(w.size() / 2).get(w.get(0).size() / 2).doubleValue()).isCloseTo(1.0, within(1e-3));
        // λ = 10.2158 (clamped circle, Leissa 1969; Bessel root by scipy, see PlateSolverTest), D = E h³/(12(1 − ν²))
        double d = 70e9 * 8e-9 / (12 * 0.91);
        double f = 10.215826 / (0.15 * 0.15) / Math.sqrt(2700 * 0.002 / d) / (2 * Math.PI);
        assertThat(m.get("frequencyHz").doubleValue()).isCloseTo(f, within(f * 0.002));
    }

    @Test
    void listsThePlateMaterials() throws Exception {
        JsonNode list = json.readTree(mvc.perform(get("/api/v1/plate-materials")).andReturn().getResponse()
                .getContentAsString());
        assertThat(list.size()).isGreaterThanOrEqualTo(7);
        assertThat(list.toString()).contains("\"spruce\"", "\"cedar\"", "\"maple\"", "\"mahogany\"", "\"rosewood-like\"",
                "\"aluminium\"", "\"birch-plywood\"", "FPL-GTR-190");
    }

    // Each row: text in BASE | its replacement | the field the problem must name.
    @ParameterizedTest(name = "{index}: {1} -> {2}")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', textBlock = """
            "thicknessMm": 3.0     | "thicknessMm": 0.0                    | thicknessMm
            "thicknessMm": 3.0     | "thicknessMm": -3.0                   | thicknessMm
            "thicknessMm": 3.0     | "thicknessMm": "NaN"                  | thicknessMm
            "thicknessMm": 3.0,    | ''                                    | thicknessMm
            "outline": "rectangle" | "outline": "circle"                   | outline
            "outline": "rectangle" | "outline": [[0,0],[100,0]]            | outline
            "outline": "rectangle" | "outline": [[0,0],[100,100],[0,100],[100,0]] | outline
            "outline": "rectangle" | "outline": [[0,0],[100,0],[50,"x"]]   | outline[2]
            "lengthMm": 400.0,     | ''                                    | lengthMm
            "material": "spruce"   | "material": "balsa-foam"              | material
            "material": "spruce"   | "densityKgPerM3": 450, "elasticAlongPa": 10e9, "elasticAcrossPa": 1e9, "shearPa": 0.7e9, "poissonAlongAcross": 4.0 | poissonAlongAcross
            "material": "spruce"   | "densityKgPerM3": 450                 | elasticAlongPa
            "edges": "free"        | "edges": "hinged"                     | edges
            "modeCount": 6         | "modeCount": 1000000000               | modeCount
            "modeCount": 6         | "modeCount": 0                        | modeCount
            "toMm": [200.0, 280.0] | "toMm": [200.0, 380.0]                | braces[0].toMm
            "fromMm": [200.0, 20.0] | "fromMm": [-5.0, 20.0]               | braces[0].fromMm
            "heightMm": 8.0        | "heightMm": 0.0                       | braces[0].heightMm
            """)
    void badInputIsA400NamingTheField(String from, String to, String field) throws Exception {
        assertThat(BASE).contains(from);
        MockHttpServletResponse r = postBody(BASE.replace(from, to));
        assertThat(r.getStatus()).as(r.getContentAsString()).isEqualTo(400);
        assertThat(r.getContentType()).contains("application/problem+json");
        JsonNode errors = json.readTree(r.getContentAsString()).get("errors");
        assertThat(errors.toString()).contains("\"field\":\"" + field + "\"");
    }

    @Test
    void aBraceCrossingOutOfAConcaveOutlineIsRefused() throws Exception {
        // an L-shaped outline; the brace runs from one arm to the other across the missing corner
        MockHttpServletResponse r = postBody("""
                {"outline": [[0,0],[300,0],[300,100],[100,100],[100,300],[0,300]], "thicknessMm": 3.0,
                 "material": "maple", "braces": [{"fromMm": [250, 50], "toMm": [50, 250], "widthMm": 5, "heightMm": 5}]}""");
        assertThat(r.getStatus()).isEqualTo(400);
        assertThat(r.getContentAsString()).contains("\"field\":\"braces[0]\"");
    }
}
