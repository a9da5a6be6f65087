package org.nodewright.strings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockHttpServletResponse;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * Malformed requests to the strings API: every one is a 400 (or 415) problem document naming the
 * offending field, never a 5xx. The rule is the HTTP contract's.
 */
@StoreFreeWebTest
class StringsApiBadInputTest {

    /** A valid body; each case replaces one placeholder-free fragment of it. */
    private static final String BASE = """
            {"lengthMm": 650.0, "tensionN": 70.0, "material": "plain-steel", "diameterMm": 0.30,
             "endCondition": "pinned", "stiffness": true, "modeCount": 12,
             "pluck": {"positionMm": 120.0, "kind": "pluck"},
             "pickups": [{"positionMm": 150.0, "apertureMm": 0.0}]}""";


    @Autowired
    MockMvc mvc;

    private final ObjectMapper json = new ObjectMapper();

    // Each row: the text to replace in BASE | its replacement | the field the problem must name.
    @ParameterizedTest(name = "{index}: {1} -> {2}")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', textBlock = """
            "lengthMm": 650.0          | "lengthMm": "NaN"             | lengthMm
            "lengthMm": 650.0          | "lengthMm": NaN               | lengthMm
            "lengthMm": 650.0          | "lengthMm": 1e400             | lengthMm
            "lengthMm": 650.0          | "lengthMm": -650.0            | lengthMm
            "lengthMm": 650.0          | "lengthMm": 0                 | lengthMm
            "lengthMm": 650.0          | "lengthMm": "650"             | lengthMm
            "lengthMm": 650.0          | "lengthMm": true              | lengthMm
            "lengthMm": 650.0          | "lengthMm": null              | lengthMm
            "lengthMm": 650.0,         | ''                            | lengthMm
            "lengthMm": 650.0          | "lengthMm": [650.0]           | lengthMm
            "lengthMm": 650.0          | "lengthMm": 1e-300            | lengthMm
            "lengthMm": 650.0          | "lengthMm": -Infinity         | lengthMm
            "tensionN": 70.0           | "tensionN": -70.0             | tensionN
            "tensionN": 70.0           | "tensionN": 0.0               | tensionN
            "tensionN": 70.0           | "tensionN": 1e400             | tensionN
            "tensionN": 70.0           | "tensionN": "Infinity"        | tensionN
            "tensionN": 70.0,          | ''                            | tensionN
            "tensionN": 70.0           | "tensionN": 70.0, "targetHz": 330.0 | targetHz
            "tensionN": 70.0           | "targetHz": -330.0            | targetHz
            "tensionN": 70.0           | "targetHz": 1.0               | targetHz
            "material": "plain-steel"  | "material": "unobtainium"     | material
            "material": "plain-steel"  | "material": 7                 | material
            "material": "plain-steel"  | "material": null              | material
            "diameterMm": 0.30         | "diameterMm": -0.3            | diameterMm
            "diameterMm": 0.30         | "diameterMm": 0               | diameterMm
            "diameterMm": 0.30         | "diameterMm": null            | diameterMm
            "diameterMm": 0.30         | "diameterMm": 0.3, "wrapMaterial": "copper" | wrapDiameterMm
            "diameterMm": 0.30         | "diameterMm": 0.3, "wrapDiameterMm": 0.2 | wrapMaterial
            "diameterMm": 0.30         | "diameterMm": 0.3, "wrapMaterial": "tin", "wrapDiameterMm": 0.2 | wrapMaterial
            "diameterMm": 0.30         | "diameterMm": 0.3, "wrapMaterial": "copper", "wrapDiameterMm": -0.2 | wrapDiameterMm
            "diameterMm": 0.30         | "diameterMm": 0.3, "youngsModulusPa": -2e11 | youngsModulusPa
            "diameterMm": 0.30         | "diameterMm": 0.3, "linearDensityKgPerM": 0 | linearDensityKgPerM
            "diameterMm": 0.30         | "diameterMm": 0.3, "linearDensityKgPerM": "NaN" | linearDensityKgPerM
            "endCondition": "pinned"   | "endCondition": "hinged"      | endCondition
            "endCondition": "pinned"   | "endCondition": "PINNED"      | endCondition
            "endCondition": "pinned"   | "endCondition": 0             | endCondition
            "stiffness": true          | "stiffness": "yes"            | stiffness
            "stiffness": true          | "stiffness": 1                | stiffness
            "modeCount": 12            | "modeCount": 1000000000       | modeCount
            "modeCount": 12            | "modeCount": 12.5             | modeCount
            "modeCount": 12            | "modeCount": 0                | modeCount
            "modeCount": 12            | "modeCount": -3               | modeCount
            "modeCount": 12            | "modeCount": "12"             | modeCount
            "modeCount": 12            | "modeCount": 129              | modeCount
            "modeCount": 12            | "modeCount": 99999999999999999999 | modeCount
            "positionMm": 120.0, "kind" | "positionMm": 700.0, "kind"  | pluck.positionMm
            "positionMm": 120.0, "kind" | "positionMm": 0.0, "kind"    | pluck.positionMm
            "positionMm": 120.0, "kind" | "positionMm": 650.0, "kind"  | pluck.positionMm
            "positionMm": 120.0, "kind" | "positionMm": -5, "kind"     | pluck.positionMm
            "positionMm": 120.0, "kind" | "positionMm": "NaN", "kind"  | pluck.positionMm
            "positionMm": 120.0, "kind" | "kind"                       | pluck.positionMm
            "kind": "pluck"            | "kind": "bow"                 | pluck.kind
            "apertureMm": 0.0          | "apertureMm": -1.0            | pickups[0].apertureMm
            "apertureMm": 0.0          | "apertureMm": 400.0           | pickups[0].apertureMm
            "positionMm": 150.0        | "positionMm": 651.0           | pickups[0].positionMm
            "positionMm": 150.0        | "positionMm": null            | pickups[0].positionMm
            "positionMm": 150.0        | "positionMm": 1e400           | pickups[0].positionMm
            "apertureMm": 0.0}]        | "apertureMm": 0.0}, null]     | pickups[1]
            "apertureMm": 0.0}]        | "apertureMm": 0.0}], "pickupCombination": "sum" | pickupCombination
            "apertureMm": 0.0}]        | "apertureMm": 0.0}, {"positionMm": 300.0}], "pickupCombination": "both" | pickupCombination
            "apertureMm": 0.0}]        | "apertureMm": 0.0}], "referenceA4Hz": 0 | referenceA4Hz
            "apertureMm": 0.0}]        | "apertureMm": 0.0}], "referenceA4Hz": "NaN" | referenceA4Hz
            "apertureMm": 0.0}]        | "apertureMm": 0.0}], "shapeSamples": 1000000 | shapeSamples
            "apertureMm": 0.0}]        | "apertureMm": 0.0}], "colour": "red" | colour
            "pickups": [               | "pickups": 5, "x": [          | pickups
            """)
    void malformedAnalysisIsA400NamingTheField(String find, String replace, String field) throws Exception {
        assertThat(BASE).contains(find);
        assertPostIsProblem("/api/v1/strings/analyze", BASE.replace(find, replace), field);
    }

    @ParameterizedTest(name = "{index}: {0}")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', textBlock = """
            {"strings": [{"targetHz": 329.63, "material": "plain-steel", "diameterMm": 0.25}]}       | strings[0].lengthMm
            {"lengthMm": 650, "strings": []}                                                          | strings
            {"lengthMm": 650}                                                                         | strings
            {"lengthMm": 650, "strings": [{"targetHz": "NaN", "material": "plain-steel", "diameterMm": 0.25}]} | strings[0].targetHz
            {"lengthMm": 650, "strings": [{"material": "plain-steel", "diameterMm": 0.25}]}           | strings[0].targetHz
            {"lengthMm": 650, "strings": [{"targetHz": 330, "material": "brass-ish", "diameterMm": 0.25}]} | strings[0].material
            {"lengthMm": 650, "strings": [{"targetHz": 330, "material": "plain-steel", "diameterMm": -1}]} | strings[0].diameterMm
            {"lengthMm": 650, "strings": [{"targetHz": 330, "material": "plain-steel", "diameterMm": 0.25}, {"targetHz": 110, "material": "plain-steel", "diameterMm": 0.4, "wrapMaterial": "copper"}]} | strings[1].wrapDiameterMm
            {"lengthMm": -650, "strings": [{"targetHz": 330, "material": "plain-steel", "diameterMm": 0.25}]} | lengthMm
            {"lengthMm": 650, "referenceA4Hz": 1e400, "strings": [{"targetHz": 330, "material": "plain-steel", "diameterMm": 0.25}]} | referenceA4Hz
            {"lengthMm": 650, "endCondition": "welded", "strings": [{"targetHz": 330, "material": "plain-steel", "diameterMm": 0.25}]} | endCondition
            {"lengthMm": 650, "strings": [{"targetHz": 330, "material": "plain-steel", "diameterMm": 0.25, "lengthMm": 0}]} | strings[0].lengthMm
            """)
    void malformedSetIsA400NamingTheField(String body, String field) throws Exception {
        assertPostIsProblem("/api/v1/string-sets/analyze", body, field);
    }

    @ParameterizedTest(name = "{index}: {0}")
    @CsvSource(delimiter = '|', textBlock = """
            {"targetHz": 330, "tensionN": 70, "material": "plain-steel"}                              | lengthMm
            {"lengthMm": 650, "targetHz": "NaN", "tensionN": 70, "material": "plain-steel"}           | targetHz
            {"lengthMm": 650, "targetHz": 330, "tensionN": -70, "material": "plain-steel"}            | tensionN
            {"lengthMm": 650, "targetHz": 330, "tensionN": 70, "material": "mithril"}                 | material
            {"lengthMm": 650, "targetHz": 330, "tensionN": 70, "material": "plain-steel", "wrapMaterial": "copper"} | coreDiameterMm
            {"lengthMm": 650, "targetHz": 330, "tensionN": 70, "material": "plain-steel", "coreDiameterMm": 0.4}   | wrapMaterial
            """)
    void malformedGaugeIsA400NamingTheField(String body, String field) throws Exception {
        assertPostIsProblem("/api/v1/strings/gauge", body, field);
    }

    @ParameterizedTest(name = "{index}: {0}")
    @CsvSource(delimiter = '|', textBlock = """
            scaleLengthMm=NaN&count=22&divisionsPerOctave=12         | scaleLengthMm
            scaleLengthMm=Infinity&count=22&divisionsPerOctave=12    | scaleLengthMm
            scaleLengthMm=-650&count=22&divisionsPerOctave=12        | scaleLengthMm
            scaleLengthMm=0&count=22&divisionsPerOctave=12           | scaleLengthMm
            scaleLengthMm=abc&count=22&divisionsPerOctave=12         | scaleLengthMm
            count=22&divisionsPerOctave=12                           | scaleLengthMm
            scaleLengthMm=650&count=0&divisionsPerOctave=12          | count
            scaleLengthMm=650&count=1000000000&divisionsPerOctave=12 | count
            scaleLengthMm=650&count=12.5&divisionsPerOctave=12       | count
            scaleLengthMm=650&count=22&divisionsPerOctave=0          | divisionsPerOctave
            scaleLengthMm=650&count=22&divisionsPerOctave=1000       | divisionsPerOctave
            scaleLengthMm=650&count=22&divisionsPerOctave=x          | divisionsPerOctave
            """)
    void malformedFretQueryIsA400NamingTheParameter(String query, String field) throws Exception {
        MockHttpServletResponse res = mvc.perform(get("/api/v1/frets?" + query)).andReturn().getResponse();
        assertProblem(res, 400, field, query);
    }

    // The shapes query option: "chart" or "none", and none cannot go with a shapeSamples count.
    @ParameterizedTest(name = "{index}: {0}")
    @CsvSource(delimiter = '|', textBlock = """
            shapes=all      | ''                       | shapes
            shapes=NONE     | ''                       | shapes
            shapes=         | ''                       | shapes
            shapes=none     | , "shapeSamples": 11     | shapeSamples
            """)
    void malformedShapesOptionIsA400(String query, String extra, String field) throws Exception {
        String body = BASE.substring(0, BASE.length() - 1) + extra + "}";
        MockHttpServletResponse res = mvc.perform(post("/api/v1/strings/analyze?" + query)
                .contentType(MediaType.APPLICATION_JSON).content(body)).andReturn().getResponse();
        assertProblem(res, 400, field, query + " " + extra);
    }

    @ParameterizedTest(name = "{index}: {0}")
    @CsvSource(delimiter = '|', textBlock = """
            /api/v1/strings/analyze     | text/plain
            /api/v1/string-sets/analyze | application/xml
            """)
    void wrongContentTypeIsA415ProblemDocument(String path, String type) throws Exception {
        MockHttpServletResponse res = mvc.perform(post(path).contentType(type).content(BASE)).andReturn().getResponse();
        assertThat(res.getStatus()).isEqualTo(415);
        assertThat(res.getContentType()).startsWith("application/problem+json");
    }

    @ParameterizedTest(name = "{index}: {0}")
    @CsvSource(delimiter = '|', textBlock = """
            {"lengthMm": 650.0,                                     | body
            not json at all                                         | body
            {"lengthMm": 650.0} {"lengthMm": 1}                     | body
            """)
    void unreadableBodyIsA400(String body, String field) throws Exception {
        MockHttpServletResponse res = mvc.perform(post("/api/v1/strings/analyze")
                .contentType(MediaType.APPLICATION_JSON).content(body)).andReturn().getResponse();
        assertThat(res.getStatus()).isEqualTo(400);
        assertThat(res.getContentType()).startsWith("application/problem+json");
    }

    private void assertPostIsProblem(String path, String body, String field) throws Exception {
        MockHttpServletResponse res = mvc.perform(post(path)
                .contentType(MediaType.APPLICATION_JSON).content(body)).andReturn().getResponse();
        assertProblem(res, 400, field, body);
    }

    private void assertProblem(MockHttpServletResponse res, int status, String field, String sent) throws Exception {
        String text = res.getContentAsString();
        assertThat(res.getStatus()).as("status for %s -> %s", sent, text).isEqualTo(status);
        assertThat(res.getContentType()).startsWith("application/problem+json");
        JsonNode doc = json.readTree(text);
        assertThat(doc.path("title").asString()).isNotBlank();
        assertThat(doc.path("status").asInt()).isEqualTo(status);
        assertThat(doc.path("detail").asString()).isNotBlank();
        assertThat(doc.path("errors").valueStream().map(e -> e.path("field").asString()).toList())
                .as("fields named for %s -> %s", sent, text).contains(field);
        assertThat(text).doesNotContain("Exception").doesNotContain("at org.");
    }
}
