package org.nodewright.templates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import com.jayway.jsonpath.JsonPath;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The graduation template: outline and braces at 1:1, contours where Shepard's interpolation puts them, ruler, cautions. */
@StoreFreeWebTest
class PlateTemplateControllerTest {

    /** A test plate of the Harrowgate Lane Workshop: 400 x 300 mm, thick in the middle, thin at one end, one brace. */
    static final String PLATE = """
            {"outline": "rectangle", "lengthMm": 400, "widthMm": 300, "material": "spruce",
             "thicknessPoints": [{"xMm": 100, "yMm": 150, "thicknessMm": 3.2}, {"xMm": 300, "yMm": 150, "thicknessMm": 2.4}],
             "braces": [{"fromMm": [200, 40], "toMm": [200, 260], "widthMm": 6, "heightMm": 9}]}""";

    @Autowired
    MockMvc mvc;

    private Document svg(String query, String body) throws Exception {
        String text = mvc.perform(post("/api/v1/templates/plate-graduation.svg" + query)
                        .contentType(MediaType.APPLICATION_JSON).content(body))
                .andExpect(status().isOk()).andExpect(content().contentTypeCompatibleWith("image/svg+xml"))
                .andReturn().getResponse().getContentAsString();
        return DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)));
    }

    private static List<Element> lines(Document doc, String cls) {
        List<Element> out = new ArrayList<>();
        NodeList all = doc.getElementsByTagName("line");
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (cls.equals(e.getAttribute("class"))) {
                out.add(e);
            }
        }
        return out;
    }

    private static double d(Element e, String attribute) {
        return Double.parseDouble(e.getAttribute(attribute));
    }

    /**
     * Shepard's inverse-distance weighting with power 2 through two points (Shepard 1968) is, on the line joining
     * them, h(s) = (h1 (L − s)² + h2 s²) / ((L − s)² + s²) at distance s from point 1; a level c is crossed at
     * s = L / (1 + √((c − h2)/(h1 − c))). Points 200 mm apart at 3.2 and 2.4 mm: the 3.0 mm contour at s = 200 /
     * (1 + √(0.6/0.2)) = 73.205 mm, the 2.6 mm contour at 200 / (1 + √(0.2/0.6)) = 126.795 mm. Tolerance 0.3 mm
     * (a 1 mm contour grid interpolated linearly).
     */
    @ParameterizedTest(name = "{0} mm at {1} mm from the thick point")
    @CsvSource({"3.0, 73.205", "2.8, 100.0", "2.6, 126.795"})
    void contoursCrossTheLineBetweenThePointsWhereShepardsFormulaSays(String level, double s) throws Exception {
        Document doc = svg("?name=test plate&stepMm=0.2", PLATE);
        // sheet frame: x from the left margin, y flipped from the top of the plate (y = 150 mm is 150 mm below it)
        List<Element> outline = lines(doc, "outline");
        double left = outline.stream().mapToDouble(e -> Math.min(d(e, "x1"), d(e, "x2"))).min().orElseThrow();
        double top = outline.stream().mapToDouble(e -> Math.min(d(e, "y1"), d(e, "y2"))).min().orElseThrow();
        double rowY = top + 150;
        double found = Double.NaN;
        for (Element e : lines(doc, "contour")) {
            if (!level.equals(e.getAttribute("data-level-mm"))) {
                continue;
            }
            double y1 = d(e, "y1");
            double y2 = d(e, "y2");
            if ((y1 - rowY) * (y2 - rowY) <= 0 && y1 != y2) {
                found = d(e, "x1") + (rowY - y1) / (y2 - y1) * (d(e, "x2") - d(e, "x1"));
            }
        }
        assertThat(found - left - 100).isCloseTo(s, within(0.3));
    }

    @Test
    void outlineBraceRulerAndCautionsAreDrawnAtFullSize() throws Exception {
        Document doc = svg("", PLATE);
        List<Element> outline = lines(doc, "outline");
        double minX = outline.stream().mapToDouble(e -> Math.min(d(e, "x1"), d(e, "x2"))).min().orElseThrow();
        double maxX = outline.stream().mapToDouble(e -> Math.max(d(e, "x1"), d(e, "x2"))).max().orElseThrow();
        double minY = outline.stream().mapToDouble(e -> Math.min(d(e, "y1"), d(e, "y2"))).min().orElseThrow();
        double maxY = outline.stream().mapToDouble(e -> Math.max(d(e, "y1"), d(e, "y2"))).max().orElseThrow();
        assertThat(maxX - minX).isCloseTo(400.0, within(1e-3));
        assertThat(maxY - minY).isCloseTo(300.0, within(1e-3));
        assertThat(doc.getDocumentElement().getAttribute("width")).endsWith("mm");
        Element centre = lines(doc, "brace").stream().filter(e -> e.hasAttribute("data-brace")).findFirst().orElseThrow();
        assertThat(Math.hypot(d(centre, "x2") - d(centre, "x1"), d(centre, "y2") - d(centre, "y1")))
                .isCloseTo(220.0, within(1e-3));
        assertThat(centre.getAttribute("data-height-mm")).isEqualTo("9.00");
        List<Element> edges = lines(doc, "brace").stream().filter(e -> e.hasAttribute("data-brace-edge")).toList();
        assertThat(edges).hasSize(2);
        assertThat(Math.abs(d(edges.get(0), "x1") - d(edges.get(1), "x1"))).isCloseTo(6.0, within(1e-3));
        List<Element> ticks = lines(doc, "ruler-tick");
        assertThat(ticks).hasSize(101);
        assertThat(d(ticks.get(100), "x1") - d(ticks.get(0), "x1")).isCloseTo(100.0, within(1e-9));
        String text = doc.getDocumentElement().getTextContent();
        assertThat(text).contains("dust").contains("T1 3.20").contains("B1 6.0 x 9.0 mm");
    }

    @Test
    void aUniformPlateSaysSoAndTheSolvedPlateDrawsToo() throws Exception {
        Document doc = svg("", PLATE.replace("\"thicknessPoints\": [{\"xMm\": 100, \"yMm\": 150, \"thicknessMm\": 3.2},"
                + " {\"xMm\": 300, \"yMm\": 150, \"thicknessMm\": 2.4}]", "\"thicknessMm\": 2.75"));
        assertThat(lines(doc, "contour")).isEmpty();
        assertThat(doc.getDocumentElement().getTextContent()).contains("uniform thickness 2.75 mm");
    }

    @Test
    void thePdfIsTiledWithTheCautionsAndTheRulerOnItsPages() throws Exception {
        byte[] pdf = mvc.perform(post("/api/v1/templates/plate-graduation.pdf?paper=a4")
                        .contentType(MediaType.APPLICATION_JSON).content(PLATE))
                .andExpect(status().isOk()).andExpect(content().contentType(MediaType.APPLICATION_PDF))
                .andReturn().getResponse().getContentAsByteArray();
        try (var doc = Loader.loadPDF(pdf)) {
            // a 430 x 392 mm sheet (400 x 300 plate, margins, title, ruler, three caution lines) on landscape A4:
            // windows 277 x 166 mm (297 and 210 less 10 mm margins, 24 mm footer) overlapping by 12 mm:
            // ceil(418 / 265) = 2 columns x ceil(380 / 154) = 3 rows
            assertThat(doc.getNumberOfPages()).isEqualTo(6);
            String text = new PDFTextStripper().getText(doc);
            assertThat(text).contains("dust").contains("100 mm");
        }
    }

    @ParameterizedTest(name = "{index}: {1}")
    @CsvSource(delimiter = '|', textBlock = """
            ?stepMm=0                | stepMm
            ?stepMm=NaN              | stepMm
            ?name=<script>           | name
            ?paper=a3                | paper
            """)
    void badTemplateRequestsAreA400NamingTheField(String query, String field) throws Exception {
        String path = "?paper=a3".equals(query) ? "/api/v1/templates/plate-graduation.pdf" : "/api/v1/templates/plate-graduation.svg";
        String res = mvc.perform(post(path + query).contentType(MediaType.APPLICATION_JSON).content(PLATE))
                .andExpect(status().isBadRequest()).andReturn().getResponse().getContentAsString();
        List<String> fields = JsonPath.read(res, "$.errors[*].field");
        assertThat(fields).as(res).contains(field);
    }

    @Test
    void aBadPlateIsA400NamingItsField() throws Exception {
        String res = mvc.perform(post("/api/v1/templates/plate-graduation.svg").contentType(MediaType.APPLICATION_JSON)
                        .content(PLATE.replace("\"thicknessMm\": 2.4", "\"thicknessMm\": 0")))
                .andExpect(status().isBadRequest()).andReturn().getResponse().getContentAsString();
        List<String> fields = JsonPath.read(res, "$.errors[*].field");
        assertThat(fields).as(res).contains("thicknessPoints[1].thicknessMm");
    }

    /**
     * A mirrored half outline (an invented workshop body, 400 x 200 mm) with a graduation: every contour lies inside
     * the outline drawn on the same sheet, as java.awt.geom.Path2D (the JDK's own point-in-polygon) sees it, within
     * 0.05 mm.
     */
    @Test
    void contoursOfAnOutlineStayInsideIt() throws Exception {
        String body = """
                {"outline": [[0, 0], [50, 80], [200, 100], [350, 80], [400, 0]], "mirrorHalf": true, "material": "spruce",
                 "thicknessPoints": [{"xMm": 100, "yMm": 0, "thicknessMm": 3.0}, {"xMm": 300, "yMm": 0, "thicknessMm": 2.4},
                                     {"xMm": 200, "yMm": 60, "thicknessMm": 2.8}]}""";
        Document doc = svg("?stepMm=0.1", body);
        List<Element> outline = lines(doc, "outline");
        assertThat(outline).hasSize(8);
        java.awt.geom.Path2D.Double path = new java.awt.geom.Path2D.Double();
        path.moveTo(d(outline.get(0), "x1"), d(outline.get(0), "y1"));
        for (Element e : outline) {
            path.lineTo(d(e, "x2"), d(e, "y2"));
        }
        path.closePath();
        List<Element> contours = lines(doc, "contour");
        assertThat(contours).hasSizeGreaterThan(20);
        for (Element e : contours) {
            for (String end : new String[] {"1", "2"}) {
                double x = d(e, "x" + end);
                double y = d(e, "y" + end);
                assertThat(path.intersects(x - 0.05, y - 0.05, 0.1, 0.1)).as(x + ", " + y).isTrue();
            }
        }
        // levels strictly between the thinnest and thickest control points, every 0.1 mm
        List<String> levels = contours.stream().map(e -> e.getAttribute("data-level-mm")).distinct().sorted().toList();
        assertThat(levels).containsExactly("2.5", "2.6", "2.7", "2.8", "2.9");
    }
}
