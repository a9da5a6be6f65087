package org.nodewright.designs;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.io.InputStream;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.NodewrightWebTest;
import org.nodewright.physics.templates.CalibrationRuler;
import org.nodewright.templates.render.PdfPaths;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/** Bench sheets as PDF, read back with PDFBox: text, vector paths, the 100 mm ruler, and the refusals. */
@NodewrightWebTest
class DesignSheetPdfTest {

    /** 1 pt = 1/72 in and 1 in = 25.4 mm exactly (PDF 32000-1:2008 §8.3.2.3; NIST SP 811). */
    private static final double MM = 72.0 / 25.4;

    @Autowired
    MockMvc mvc;
    @Autowired
    JsonMapper json;

    private long save(String name, String kind, JsonNode parameters) throws Exception {
        ObjectNode body = json.createObjectNode();
        body.put("name", name);
        body.put("kind", kind);
        body.set("parameters", parameters);
        String created = mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                .content(json.writeValueAsString(body))).andExpect(status().isCreated())
                .andReturn().getResponse().getContentAsString();
        return json.readTree(created).get("id").asLong();
    }

    /** The last revision's parameters of the kind's first demo design (the invented workshop's). */
    private JsonNode demoParameters(String kind) throws Exception {
        try (InputStream in = getClass().getResourceAsStream("/demo/" + kind + ".json")) {
            JsonNode revisions = json.readTree(in).get("designs").get(0).get("revisions");
            return revisions.get(revisions.size() - 1).get("parameters");
        }
    }

    private byte[] sheet(String path) throws Exception {
        return mvc.perform(get(path)).andExpect(status().isOk())
                .andExpect(content().contentType(MediaType.APPLICATION_PDF))
                .andReturn().getResponse().getContentAsByteArray();
    }

    private static String text(PDDocument doc) throws Exception {
        return new PDFTextStripper().getText(doc);
    }

    /** The ruler's 10 mm ticks (5 mm long) in the foot of the page, left to right, in pt. */
    private static List<Double> rulerMajorTicks(PDPage page) throws Exception {
        return PdfPaths.of(page).stream().filter(PdfPaths.Segment::vertical)
                .filter(s -> Math.abs(s.length() / MM - CalibrationRuler.MAJOR_TICK_MM) < 1e-3)
                .filter(s -> Math.max(s.y1(), s.y2()) / MM < 45)
                .map(PdfPaths.Segment::x1).sorted().toList();
    }

    // Page sizes: ISO 216 A4 = 210 x 297 mm; ANSI Letter = 8.5 x 11 in = 215.9 x 279.4 mm.
    @ParameterizedTest
    @CsvSource({
        "string, a4, 210.0, 297.0, Bench sheet: String, Partials, 250",
        "string-set, letter, 215.9, 279.4, Bench sheet: String set, Total tension, 40",
        "air-column, a4, 210.0, 297.0, Bench sheet: Air column, Resonances, 1000",
        "bar, letter, 215.9, 279.4, Bench sheet: Bar, Modes, 100",
        "plate, a4, 210.0, 297.0, Bench sheet: Plate, Modes, 100"
    })
    void everyKindsDemoDesignPrintsAsVectorsWithItsNameRevisionResultsAndA100MmRulerOnEveryPage(String kind,
            String paper, double widthMm, double heightMm, String heading, String resultsWord, int chartPieces) throws Exception {
        String name = "Harrowgate Lane sheet check, " + kind;
        long id = save(name, kind, demoParameters(kind));
        byte[] pdf = sheet("/api/v1/designs/" + id + "/sheet.pdf?paper=" + paper);
        java.nio.file.Path out = java.nio.file.Path.of("target", "sheets");
        java.nio.file.Files.createDirectories(out);
        java.nio.file.Files.write(out.resolve(kind + "-" + paper + ".pdf"), pdf); // kept for a look, like screenshots
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            String text = text(doc);
            assertThat(text).contains(heading, name, "Revision 1", "Parameters", resultsWord, "Cautions");
            for (PDPage page : doc.getPages()) {
                assertThat(page.getMediaBox().getWidth() / MM).isCloseTo(widthMm, within(1e-3));
                assertThat(page.getMediaBox().getHeight() / MM).isCloseTo(heightMm, within(1e-3));
                List<Double> major = rulerMajorTicks(page);
                assertThat(major).hasSize(11);
                assertThat((major.get(10) - major.get(0)) / MM).isCloseTo(100.000, within(1e-3));
                // drawn, not pasted: no picture anywhere on the page
                var xobjects = page.getResources().getCOSObject().getCOSDictionary(COSName.XOBJECT);
                assertThat(xobjects == null ? 0 : xobjects.size()).as("images on the page").isZero();
            }
            // The charts are paths: many painted pieces beyond each page's ruler (102 strokes) and no image.
            long pieces = 0;
            for (PDPage page : doc.getPages()) {
                SheetPaths painted = SheetPaths.of(page);
                assertThat(painted.images).isZero();
                pieces += painted.painted - 102;
            }
            assertThat(pieces).as("chart pieces beyond the rulers").isGreaterThan(chartPieces);
        }
    }

    @Test
    void aFlexibleStringsSheetCarriesTheTensionOfMersennesLawAndHarmonicPartials() throws Exception {
        JsonNode p = json.readTree("""
                {"lengthMm": 650.0, "targetHz": 329.63, "linearDensityKgPerM": 0.0004, "stiffness": false,
                 "endCondition": "pinned", "modeCount": 6, "pluck": {"positionMm": 130.0}}""");
        long id = save("Harrowgate Lane flexible check string", "string", p);
        try (PDDocument doc = Loader.loadPDF(sheet("/api/v1/designs/" + id + "/sheet.pdf"))) {
            String text = text(doc);
            // Mersenne's law f = (1/2L)·√(T/μ), so T = 4·L²·f²·μ (common practice): 0.65 m, 329.63 Hz, 0.4 g/m.
            double expected = 4 * 0.65 * 0.65 * 329.63 * 329.63 * 0.0004;
            Matcher m = Pattern.compile("Tension\\s+([0-9.]+) N").matcher(text);
            assertThat(m.find()).as(text).isTrue();
            assertThat(Double.parseDouble(m.group(1))).isCloseTo(expected, within(expected * 1e-4));
            // A flexible string's partials are harmonics: partial 3 at 3 × 329.63 = 988.89 Hz (common practice).
            assertThat(text).containsPattern("(?m)^3 988\\.89");
            // A pluck at 130 mm = L/5 leaves partial 5 without excitation (Young's rule; common practice):
            // its level is floored, far below the strongest.
            String row5 = text.lines().filter(l -> l.startsWith("5 1648.15 1648.15 ")).findFirst().orElseThrow();
            String[] cells = row5.trim().split("\\s+");
            assertThat(Double.parseDouble(cells[cells.length - 1])).as(row5).isLessThan(-40);
        }
    }

    @Test
    void aRevisionOfTheHistoryPrintsWithItsOwnNumber() throws Exception {
        long id = save("Harrowgate Lane revision sheet", "string", demoParameters("string"));
        byte[] pdf = sheet("/api/v1/designs/" + id + "/sheet.pdf?revision=1");
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            assertThat(text(doc)).contains("Revision 1");
        }
        mvc.perform(get("/api/v1/designs/" + id + "/sheet.pdf?revision=7")).andExpect(status().isNotFound())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON));
    }

    @Test
    void aDesignNotSavedPrintsAsUnsaved() throws Exception {
        String body = "{\"name\": \"Harrowgate Lane bench draft\", \"kind\": \"string\", \"parameters\": "
                + json.writeValueAsString(demoParameters("string")) + "}";
        byte[] pdf = mvc.perform(post("/api/v1/designs/sheet.pdf").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isOk()).andExpect(content().contentType(MediaType.APPLICATION_PDF))
                .andReturn().getResponse().getContentAsByteArray();
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            assertThat(text(doc)).contains("Harrowgate Lane bench draft", "Revision unsaved");
        }
    }

    @Test
    void anUnknownDesignIsA404Problem() throws Exception {
        mvc.perform(get("/api/v1/designs/987654321/sheet.pdf")).andExpect(status().isNotFound())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.status").value(404));
    }

    @Test
    void anUnknownPaperIsA400NamingTheField() throws Exception {
        long id = save("Harrowgate Lane paper check", "string", demoParameters("string"));
        mvc.perform(get("/api/v1/designs/" + id + "/sheet.pdf?paper=a3")).andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.errors[0].field").value("paper"));
    }

    @Test
    void badParametersOfAnUnsavedDesignAreA400NamingTheField() throws Exception {
        String body = "{\"name\": \"Harrowgate Lane bad draft\", \"kind\": \"string\", \"parameters\": "
                + "{\"lengthMm\": -5, \"tensionN\": 70, \"linearDensityKgPerM\": 0.0004}}";
        mvc.perform(post("/api/v1/designs/sheet.pdf").contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.errors[0].field").value("parameters.lengthMm"));
        mvc.perform(post("/api/v1/designs/sheet.pdf").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"kind\": \"string\", \"parameters\": {}}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[?(@.field == 'name')]").exists());
    }
}
