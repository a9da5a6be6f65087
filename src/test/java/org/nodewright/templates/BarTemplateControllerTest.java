package org.nodewright.templates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockHttpServletResponse;
import org.springframework.test.web.servlet.MockMvc;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The undercut template: 1:1 geometry read back from the SVG, the PDF's tiles and text, and its 400s. */
@StoreFreeWebTest
class BarTemplateControllerTest {

    /** A uniform 380 x 60 x 22 mm bar and the same bar with a three-point undercut to 10 mm at the middle. */
    static final String UNIFORM = """
            {"lengthMm": 380.0, "section": "rectangle", "widthMm": 60.0, "thicknessMm": 22.0,
             "material": "rosewood", "ends": "free-free", "theory": "euler-bernoulli", "modeCount": 3}""";
    static final String UNDERCUT = """
            {"lengthMm": 380.0, "section": "rectangle", "widthMm": 60.0,
             "profile": [{"positionMm": 0, "thicknessMm": 22}, {"positionMm": 100, "thicknessMm": 22},
                         {"positionMm": 190, "thicknessMm": 10}, {"positionMm": 280, "thicknessMm": 22},
                         {"positionMm": 380, "thicknessMm": 22}],
             "material": "rosewood", "ends": "free-free", "theory": "timoshenko", "modeCount": 3}""";

    @Autowired
    MockMvc mvc;

    private MockHttpServletResponse send(String path, String body) throws Exception {
        return mvc.perform(post(path).contentType(MediaType.APPLICATION_JSON).content(body)).andReturn().getResponse();
    }

    private static Document svg(MockHttpServletResponse res) throws Exception {
        assertThat(res.getStatus()).as(res.getContentAsString()).isEqualTo(200);
        return DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(res.getContentAsString().getBytes(StandardCharsets.UTF_8)));
    }

    private static double startX(Document doc) {
        NodeList lines = doc.getElementsByTagName("line");
        for (int i = 0; i < lines.getLength(); i++) {
            Element e = (Element) lines.item(i);
            if ("start".equals(e.getAttribute("data-end"))) {
                return Double.parseDouble(e.getAttribute("x1"));
            }
        }
        throw new AssertionError("no start end drawn");
    }

    /**
     * Cord holes of a uniform free–free bar at the nodes of mode 1: 0.2242 L and 0.7758 L (Blevins,
     * Formulas for Natural Frequency and Mode Shape, 1979, Table 8-1: 0.224 L; the fourth digit from
     * the root 4.73004 of cos βL cosh βL = 1). 0.2242 × 380 = 85.2 mm; tolerance 0.1 mm.
     */
    @Test
    void cordHolesSitAtTheNodesOfModeOneAtTrueSize() throws Exception {
        Document doc = svg(send("/api/v1/templates/bar-undercut.svg?name=lane marimba F3", UNIFORM));
        Element root = doc.getDocumentElement();
        assertThat(root.getAttribute("width")).endsWith("mm");
        double x0 = startX(doc);
        NodeList circles = doc.getElementsByTagName("circle");
        List<Double> holes = new ArrayList<>();
        for (int i = 0; i < circles.getLength(); i++) {
            Element c = (Element) circles.item(i);
            if (!c.getAttribute("data-cord-hole").isEmpty()) {
                holes.add(Double.parseDouble(c.getAttribute("cx")) - x0);
                assertThat(Double.parseDouble(c.getAttribute("r"))).isCloseTo(2.0, within(1e-9)); // 4 mm default
                // drawn at half the thickness below the top face
                assertThat(Double.parseDouble(c.getAttribute("cy"))).isCloseTo(24.0 + 11.0, within(1e-9));
            }
        }
        assertThat(holes).hasSize(2);
        assertThat(holes.get(0)).isCloseTo(0.2242 * 380, within(0.1));
        assertThat(holes.get(1)).isCloseTo(0.7758 * 380, within(0.1));
        // the 100 mm ruler: ticks 0 and 100 are 100 sheet millimetres apart
        double tick0 = Double.NaN;
        double tick100 = Double.NaN;
        NodeList lines = doc.getElementsByTagName("line");
        for (int i = 0; i < lines.getLength(); i++) {
            Element e = (Element) lines.item(i);
            if ("0".equals(e.getAttribute("data-mm"))) {
                tick0 = Double.parseDouble(e.getAttribute("x1"));
            } else if ("100".equals(e.getAttribute("data-mm"))) {
                tick100 = Double.parseDouble(e.getAttribute("x1"));
            }
        }
        assertThat(tick100 - tick0).isCloseTo(100.0, within(1e-9));
        String text = doc.getDocumentElement().getTextContent();
        assertThat(text).contains("lane marimba F3").contains("sensitiser").contains("eye protection");
    }

    @Test
    void underSideFollowsTheProfileWithItsThicknessAtEachPoint() throws Exception {
        Document doc = svg(send("/api/v1/templates/bar-undercut.svg", UNDERCUT));
        double x0 = startX(doc);
        NodeList lines = doc.getElementsByTagName("line");
        List<double[]> points = new ArrayList<>();
        int underside = 0;
        for (int i = 0; i < lines.getLength(); i++) {
            Element e = (Element) lines.item(i);
            if (!e.getAttribute("data-thickness-mm").isEmpty()) {
                points.add(new double[] {Double.parseDouble(e.getAttribute("x1")) - x0,
                        Double.parseDouble(e.getAttribute("y1")) - 24.0});
            }
            if ("underside".equals(e.getAttribute("data-face"))) {
                underside++;
            }
        }
        assertThat(underside).isEqualTo(4);
        assertThat(points).hasSize(5);
        double[][] expected = {{0, 22}, {100, 22}, {190, 10}, {280, 22}, {380, 22}};
        for (int i = 0; i < 5; i++) {
            assertThat(points.get(i)[0]).isCloseTo(expected[i][0], within(1e-9));
            assertThat(points.get(i)[1]).isCloseTo(expected[i][1], within(1e-9));
        }
    }

    @Test
    void pdfIsTiledWithARulerAndTheCautions() throws Exception {
        MockHttpServletResponse res = send("/api/v1/templates/bar-undercut.pdf?paper=a4", UNDERCUT);
        assertThat(res.getStatus()).as(res.getContentAsString()).isEqualTo(200);
        assertThat(res.getContentType()).isEqualTo("application/pdf");
        try (PDDocument pdf = Loader.loadPDF(res.getContentAsByteArray())) {
            // 380 mm + margins does not fit an A4 page's printable width: two or more tiles
            assertThat(pdf.getNumberOfPages()).isGreaterThanOrEqualTo(2);
            String text = new PDFTextStripper().getText(pdf);
            assertThat(text).contains("100 mm").contains("cord hole 1").contains("sensitiser");
        }
    }

    @Test
    void roundBarHasNoUndercutTemplate() throws Exception {
        MockHttpServletResponse res = send("/api/v1/templates/bar-undercut.svg", """
                {"lengthMm": 300.0, "section": "round", "diameterMm": 20.0, "material": "steel"}""");
        assertThat(res.getStatus()).isEqualTo(400);
        assertThat(res.getContentAsString()).contains("\"field\":\"section\"");
    }

    @Test
    void badProfileIsAProblemNamingTheField() throws Exception {
        MockHttpServletResponse res = send("/api/v1/templates/bar-undercut.svg",
                UNDERCUT.replace("{\"positionMm\": 380, \"thicknessMm\": 22}", "{\"positionMm\": 370, \"thicknessMm\": 22}"));
        assertThat(res.getStatus()).isEqualTo(400);
        assertThat(res.getContentAsString()).contains("profile[4].positionMm");
    }

    @Test
    void cordHoleOutOfRangeIsNamed() throws Exception {
        MockHttpServletResponse res = send("/api/v1/templates/bar-undercut.svg?cordHoleMm=0", UNIFORM);
        assertThat(res.getStatus()).isEqualTo(400);
        assertThat(res.getContentAsString()).contains("cordHoleMm");
    }

    @Test
    void heldBarHasNoCordHoles() throws Exception {
        MockHttpServletResponse res = send("/api/v1/templates/bar-undercut.svg",
                UNIFORM.replace("free-free", "clamped-free"));
        assertThat(res.getStatus()).isEqualTo(400);
        assertThat(res.getContentAsString()).contains("\"field\":\"ends\"");
    }

    @Test
    void badPaperIsAProblemOnPaper() throws Exception {
        MockHttpServletResponse res = send("/api/v1/templates/bar-undercut.pdf?paper=a3", UNIFORM);
        assertThat(res.getStatus()).isEqualTo(400);
        assertThat(res.getContentAsString()).contains("\"field\":\"paper\"");
    }
}
