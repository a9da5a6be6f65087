package org.nodewright.templates.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.templates.FretTemplate;
import org.nodewright.physics.templates.PositionMark;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** Parses the SVG as XML (the JDK's parser) and measures the drawn lines. */
class FretTemplateSvgTest {

    static Document parse(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    static double attr(Element e, String name) {
        return Double.parseDouble(e.getAttribute(name));
    }

    // Check values: x_n = L (1 - 2^(-n/12)) for 12-TET (common practice); fret 12 = L/2 exactly
    // (the octave); 650 mm fret 1 = 36.48 mm and fret 5 = 163.05 mm as in printed fret tables
    // for a 650 mm classical scale (from memory, 0.01 mm).
    @ParameterizedTest
    @CsvSource({
        "650, 22, 12, 1, 36.48",
        "650, 22, 12, 5, 163.05",
        "650, 22, 12, 12, 325.00",
        "628.65, 22, 12, 12, 314.325",   // 24.75 in scale: octave at half
        "650, 36, 24, 24, 325.00",       // quarter tones: the octave is the 24th division
        "650, 19, 19, 19, 325.00"        // 19-EDO: the octave is the 19th division
    })
    void fretLinesSitWhereEqualDivisionPutsThem(double scale, int count, int d, int n, double expected)
            throws Exception {
        Document doc = parse(SvgRenderer.render(new FretTemplate(scale, count, d, 50, List.of()).draw()));
        Map<Integer, Double> x = fretXs(doc);
        assertThat(x).hasSize(count + 1);
        assertThat(x.get(n) - x.get(0)).isCloseTo(expected, within(0.01));
        for (int k = 0; k <= count; k++) {
            assertThat(x.get(k) - x.get(0)).isCloseTo(scale * (1 - Math.pow(2, -(double) k / d)), within(0.01));
        }
    }

    static Map<Integer, Double> fretXs(Document doc) {
        Map<Integer, Double> x = new HashMap<>();
        NodeList lines = doc.getElementsByTagName("line");
        for (int i = 0; i < lines.getLength(); i++) {
            Element line = (Element) lines.item(i);
            if (line.hasAttribute("data-fret")) {
                assertThat(attr(line, "x1")).isEqualTo(attr(line, "x2"));
                Double prev = x.put(Integer.parseInt(line.getAttribute("data-fret")), attr(line, "x1"));
                assertThat(prev).as("one line per fret").isNull();
            }
        }
        return x;
    }

    @Test
    void sizeIsInMillimetresWithAMillimetreUserUnitAndTheRulerSpans100Mm() throws Exception {
        Document doc = parse(SvgRenderer.render(new FretTemplate(650, 22, 12, 50, List.of()).draw()));
        Element svg = doc.getDocumentElement();
        assertThat(svg.getAttribute("width")).endsWith("mm");
        assertThat(svg.getAttribute("height")).endsWith("mm");
        String[] box = svg.getAttribute("viewBox").split(" ");
        double width = Double.parseDouble(svg.getAttribute("width").replace("mm", ""));
        double height = Double.parseDouble(svg.getAttribute("height").replace("mm", ""));
        assertThat(Double.parseDouble(box[2])).isEqualTo(width);
        assertThat(Double.parseDouble(box[3])).isEqualTo(height);
        assertThat(width).isGreaterThanOrEqualTo(650 + 2 * FretTemplate.MARGIN_MM);
        // The calibration ruler: ticks 0..100, one per mm, the 0 and 100 ticks 100 user units (= mm) apart.
        NodeList lines = doc.getElementsByTagName("line");
        double[] tick = new double[101];
        int ticks = 0;
        for (int i = 0; i < lines.getLength(); i++) {
            Element line = (Element) lines.item(i);
            if (line.hasAttribute("data-mm")) {
                tick[Integer.parseInt(line.getAttribute("data-mm"))] = attr(line, "x1");
                ticks++;
            }
        }
        assertThat(ticks).isEqualTo(101);
        assertThat(tick[100] - tick[0]).isCloseTo(100.0, within(1e-9));
        for (int mm = 1; mm <= 100; mm++) {
            assertThat(tick[mm] - tick[mm - 1]).isCloseTo(1.0, within(1e-9));
        }
    }

    @Test
    void pickupAndBridgePositionsAreMarkedFromTheNut() throws Exception {
        var t = new FretTemplate(648, 21, 12, 45, List.of(new PositionMark("neck pickup", 500.0),
                new PositionMark("bridge pickup", 610.0)));
        Document doc = parse(SvgRenderer.render(t.draw()));
        double nut = fretXs(doc).get(0);
        NodeList lines = doc.getElementsByTagName("line");
        Map<String, Double> marks = new HashMap<>();
        for (int i = 0; i < lines.getLength(); i++) {
            Element line = (Element) lines.item(i);
            if (line.hasAttribute("data-position")) {
                marks.put(line.getAttribute("data-position"), attr(line, "x1") - nut);
            }
        }
        assertThat(marks).containsOnlyKeys("neck pickup", "bridge pickup");
        assertThat(marks.get("neck pickup")).isCloseTo(500.0, within(1e-9));
        assertThat(marks.get("bridge pickup")).isCloseTo(610.0, within(1e-9));
    }
}
