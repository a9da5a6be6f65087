package org.nodewright.web;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import com.jayway.jsonpath.JsonPath;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;
import org.springframework.test.web.servlet.MockMvc;

/**
 * Field messages a maker reads on the page: what to enter, in the page's own terms (hole numbers
 * from 1, no parser or endpoint names, figures without binary noise). The field paths stay the
 * contract's.
 */
@SpringBootTest
@AutoConfigureMockMvc
class UserWordsTest {

    @DynamicPropertySource
    static void dataDir(DynamicPropertyRegistry registry) throws Exception {
        Path dir = Files.createTempDirectory("nodewright-words-");
        registry.add("app.data-dir", dir::toString);
    }

    @Autowired
    MockMvc mvc;

    /** The message of the error on field, from a 400 answer. */
    private String message(String url, String body, String field) throws Exception {
        var result = mvc.perform(post(url).contentType(MediaType.APPLICATION_JSON).content(body)).andReturn();
        assertThat(result.getResponse().getStatus()).isEqualTo(400);
        String json = result.getResponse().getContentAsString();
        List<String> messages = JsonPath.read(json, "$.errors[?(@.field == '" + field + "')].message");
        assertThat(messages).as(json).isNotEmpty();
        return messages.get(0);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', textBlock = """
            "diameterMm": "abc"  | diameterMm
            "lengthMm": "650"    | lengthMm
            "tensionN": true     | tensionN
            """)
    void textInANumberFieldSaysEnterANumber(String replacement, String field) throws Exception {
        String body = """
                {"lengthMm": 650.0, "tensionN": 70.0, "material": "plain-steel", "diameterMm": 0.25}"""
                .replace("\"" + field + "\": " + (field.equals("lengthMm") ? "650.0" : field.equals("tensionN") ? "70.0" : "0.25"),
                        replacement);
        String m = message("/api/v1/strings/analyze", body, field);
        assertThat(m).startsWith("enter a number").doesNotContainIgnoringCase("coerce").doesNotContain("`");
    }

    @Test
    void aPositionPastTheBridgeIsNamedWithoutFloatNoise() throws Exception {
        // 25.5 inch typed on the page is 647.7 mm, which reaches the server as 647.6999999999999.
        String m = message("/api/v1/strings/analyze", """
                {"lengthMm": 647.6999999999999, "tensionN": 70.0, "material": "plain-steel", "diameterMm": 0.25,
                 "pluck": {"positionMm": 700.0, "kind": "pluck"}}""", "pluck.positionMm");
        assertThat(m).contains("647.7 mm").doesNotContain("6999");
    }

    @Test
    void holesAreNumberedFromOneInTheWords() throws Exception {
        String bore = """
                {"segments": [{"lengthMm": 300.0, "inputDiameterMm": 15.0, "outputDiameterMm": 15.0}],
                 "inputEnd": "closed", "outputEnd": "open-unflanged", "fMinHz": 20.0, "fMaxHz": 3000.0, "points": 400,
                 "holes": [{"positionMm": 100.0, "diameterMm": 6.0, "chimneyMm": 3.0},
                           {"positionMm": 150.0, "diameterMm": 6.0, "chimneyMm": 3.0}],
                 "fingerings": [%s]}""";
        // closedHoles counts from 0 (the contract): index 2 is a third hole, which this bore lacks.
        String m = message("/api/v1/air-columns/analyze", bore.formatted("{\"closedHoles\": [2], \"targetHz\": 400.0}"),
                "fingerings[0].closedHoles[0]");
        assertThat(m).contains("hole 3").contains("holes 1 to 2").doesNotContain("index").doesNotContain("0..");
        String none = message("/api/v1/air-columns/analyze", bore.formatted("{\"closedHoles\": [0]}"),
                "fingerings[0].targetHz");
        assertThat(none).contains("target pitch").doesNotContain("targetHz").doesNotContain("targetNote");
    }

    @Test
    void anUnknownMaterialListsTheCatalogueWithoutNamingAnEndpoint() throws Exception {
        String m = message("/api/v1/inverse/gauges", """
                {"lengthMm": 650.0, "strings": [{"targetHz": 329.63, "targetTensionN": 70.0, "material": "unobtainium"}]}""",
                "strings[0].material");
        assertThat(m).contains("unobtainium").contains("plain-steel").doesNotContain("GET").doesNotContain("/api/");
    }

    @Test
    void aStockListWithoutTheGaugeNeededIsWarned() throws Exception {
        // E4 at 70 N on 650 mm of plain steel needs mu = T/(2Lf)^2 = 3.81e-4 kg/m (Mersenne), about 0.249 mm
        // at 7.85 g/cm3 (steel, from memory): 0.20 mm gives some 35 % less tension, 0.25 mm about 1 % more.
        String far = mvc.perform(post("/api/v1/inverse/gauges").contentType(MediaType.APPLICATION_JSON).content("""
                {"lengthMm": 650.0, "availableGaugesMm": [0.20, 0.90],
                 "strings": [{"targetHz": 329.63, "targetTensionN": 70.0, "material": "plain-steel"}]}"""))
                .andReturn().getResponse().getContentAsString();
        double offPct = ((Number) JsonPath.read(far, "$.strings[0].offPct")).doubleValue();
        assertThat(offPct).isLessThan(-10);
        List<String> warnings = JsonPath.read(far, "$.strings[0].warnings");
        assertThat(warnings).anySatisfy(w -> assertThat(w).contains("below the target 70 N").contains("0.2 mm"));
        String near = mvc.perform(post("/api/v1/inverse/gauges").contentType(MediaType.APPLICATION_JSON).content("""
                {"lengthMm": 650.0, "availableGaugesMm": [0.25],
                 "strings": [{"targetHz": 329.63, "targetTensionN": 70.0, "material": "plain-steel"}]}"""))
                .andReturn().getResponse().getContentAsString();
        List<String> none = JsonPath.read(near, "$.strings[0].warnings");
        assertThat(none).noneSatisfy(w -> assertThat(w).contains("the target"));
    }

    @Test
    void anUnknownDesignOpenedInTheBrowserGetsAPageNotAProblemDocument() throws Exception {
        for (String id : List.of("987654321", "not-a-number")) {
            var response = mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders
                    .get("/library/" + id).accept(MediaType.TEXT_HTML)).andReturn().getResponse();
            assertThat(response.getStatus()).isEqualTo(404);
            assertThat(response.getContentType()).startsWith("text/html");
            assertThat(response.getContentAsString()).contains("No such design").contains(id).contains("href=\"/library\"");
        }
    }

    private long createString(String name, String parameters) throws Exception {
        String json = mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON).content(
                "{\"name\": \"" + name + "\", \"kind\": \"string\", \"parameters\": " + parameters + "}"))
                .andReturn().getResponse().getContentAsString();
        return ((Number) JsonPath.read(json, "$.id")).longValue();
    }

    private List<String> differences(long a, long b) throws Exception {
        String json = mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders
                .get("/api/v1/designs/compare").param("a", String.valueOf(a)).param("b", String.valueOf(b)))
                .andReturn().getResponse().getContentAsString();
        return JsonPath.read(json, "$.differences[*].path");
    }

    @Test
    void compareLooksAtEffectiveValues() throws Exception {
        // A4 = 440 Hz typed out against it left to its default, and E4 as 329.6276 Hz (from the
        // note, 329.62756 Hz at A4 = 440 Hz) against 329.63 typed: 0.013 cents apart, one pitch.
        long typed = createString("E typed", """
                {"lengthMm": 650.0, "targetHz": 329.63, "material": "plain-steel", "diameterMm": 0.25,
                 "referenceA4Hz": 440.0, "stiffness": false, "modeCount": 12}""");
        long defaults = createString("E from the note", """
                {"lengthMm": 650.0, "targetHz": 329.6276, "material": "plain-steel", "diameterMm": 0.25}""");
        assertThat(differences(typed, defaults)).isEmpty();
        long shorter = createString("E shorter", """
                {"lengthMm": 648.0, "targetHz": 329.63, "material": "plain-steel", "diameterMm": 0.25, "modeCount": 16}""");
        assertThat(differences(defaults, shorter)).containsExactlyInAnyOrder("lengthMm", "modeCount");
    }

    @Test
    void anImportWithUnsortedTagsAddsNoRevisionAndSortsWithTheLatest() throws Exception {
        long before = System.currentTimeMillis();
        createString("Already here", """
                {"lengthMm": 650.0, "tensionN": 70.0, "material": "plain-steel", "diameterMm": 0.25}""");
        String params = "{\"lengthMm\": 640.0, \"tensionN\": 68.0, \"material\": \"plain-steel\", \"diameterMm\": 0.25}";
        String doc = """
                {"format": "nodewright-library", "formatVersion": 1, "designs": [
                  {"name": "Old treble", "kind": "string", "parameters": %s, "notes": "", "tags": ["treble", "archive"],
                   "author": "Bea", "createdAt": "2019-05-01T10:00:00Z", "updatedAt": "2019-05-01T10:00:00Z", "version": 1,
                   "revisions": [{"version": 1, "name": "Old treble", "parameters": %s, "notes": "",
                                  "tags": ["archive", "treble"], "savedBy": "Bea", "savedAt": "2019-05-01T10:00:00Z",
                                  "comment": "first"}]}]}""".formatted(params, params);
        String answer = mvc.perform(post("/api/v1/designs/import").contentType(MediaType.APPLICATION_JSON).content(doc))
                .andReturn().getResponse().getContentAsString();
        long id = ((Number) JsonPath.read(answer, "$.imported[0].id")).longValue();
        String revisions = mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders
                .get("/api/v1/designs/" + id + "/revisions")).andReturn().getResponse().getContentAsString();
        assertThat((List<Object>) JsonPath.read(revisions, "$[*]")).hasSize(1);
        assertThat((String) JsonPath.read(revisions, "$[0].savedAt")).startsWith("2019-05-01");
        String one = mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders
                .get("/api/v1/designs/" + id)).andReturn().getResponse().getContentAsString();
        assertThat(java.time.Instant.parse(JsonPath.read(one, "$.updatedAt")).toEpochMilli()).isGreaterThanOrEqualTo(before - 1000);
        String list = mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get("/api/v1/designs"))
                .andReturn().getResponse().getContentAsString();
        assertThat(((Number) JsonPath.read(list, "$[0].id")).longValue()).isEqualTo(id);
    }
}
