package org.nodewright.templates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
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
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

@StoreFreeWebTest
class ToneHoleTemplateControllerTest {


    @Autowired
    MockMvc mvc;

    /** A Harrowgate Lane Workshop practice pipe: 300 mm cylinder of 15 mm bore, three holes. */
    static final String BORE = "{\"segments\":[{\"lengthMm\":120.0,\"inputDiameterMm\":15.0,\"outputDiameterMm\":15.0},"
            + "{\"lengthMm\":180.0,\"inputDiameterMm\":15.0,\"outputDiameterMm\":13.0}],"
            + "\"inputEnd\":\"closed\",\"outputEnd\":\"open-unflanged\",\"holes\":["
            + "{\"positionMm\":150.0,\"diameterMm\":6.0,\"chimneyMm\":3.0,\"open\":true},"
            + "{\"positionMm\":200.0,\"diameterMm\":7.5,\"chimneyMm\":3.0,\"open\":true},"
            + "{\"positionMm\":250.0,\"diameterMm\":5.0,\"chimneyMm\":3.0,\"open\":false}],"
            + "\"temperatureC\":20.0,\"relativeHumidityPct\":0.0,\"losses\":true,\"fMinHz\":20.0,\"fMaxHz\":3000.0,"
            + "\"points\":4000}";

    @Test
    void holesAreCirclesOfTheirDiameterAtTheirDistanceFromTheInputEnd() throws Exception {
        String svg = mvc.perform(post("/api/v1/templates/tone-holes.svg?name=practice pipe")
                        .contentType(MediaType.APPLICATION_JSON).content(BORE))
                .andExpect(status().isOk())
                .andExpect(content().contentTypeCompatibleWith("image/svg+xml"))
                .andReturn().getResponse().getContentAsString();
        var doc = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        double inputEnd = Double.NaN;
        NodeList lines = doc.getElementsByTagName("line");
        for (int i = 0; i < lines.getLength(); i++) {
            Element e = (Element) lines.item(i);
            if ("input".equals(e.getAttribute("data-end"))) {
                inputEnd = Double.parseDouble(e.getAttribute("x1"));
            }
        }
        NodeList circles = doc.getElementsByTagName("circle");
        double[][] expected = {{150, 6}, {200, 7.5}, {250, 5}};
        int found = 0;
        for (int i = 0; i < circles.getLength(); i++) {
            Element c = (Element) circles.item(i);
            if (c.hasAttribute("data-hole")) {
                int h = Integer.parseInt(c.getAttribute("data-hole")) - 1;
                assertThat(Double.parseDouble(c.getAttribute("cx")) - inputEnd).isCloseTo(expected[h][0], within(1e-9));
                assertThat(2 * Double.parseDouble(c.getAttribute("r"))).isCloseTo(expected[h][1], within(1e-9));
                found++;
            }
        }
        assertThat(found).isEqualTo(3);
    }

    @Test
    void pdfPrintsEveryHoleLabel() throws Exception {
        byte[] pdf = mvc.perform(post("/api/v1/templates/tone-holes.pdf?paper=a4").contentType(MediaType.APPLICATION_JSON)
                        .content(BORE))
                .andExpect(status().isOk())
                .andReturn().getResponse().getContentAsByteArray();
        try (var doc = Loader.loadPDF(pdf)) {
            String text = new PDFTextStripper().getText(doc);
            assertThat(text).contains("H1 d 6.00 at 150.00", "H2 d 7.50 at 200.00", "H3 d 5.00 at 250.00");
        }
    }

    /** Issue 16 polish: with no name the title starts with the bore (it read "Tone holes: bore, bore 300.00 mm"). */
    @Test
    void theTitleNamesTheBoreOnceAndTheNameWhenGiven() throws Exception {
        for (String[] c : new String[][] {{"", "Tone holes: bore 300.00 mm, 3 holes"},
            {"?name=practice pipe", "Tone holes: practice pipe, bore 300.00 mm, 3 holes"}}) {
            byte[] pdf = mvc.perform(post("/api/v1/templates/tone-holes.pdf" + c[0]).contentType(MediaType.APPLICATION_JSON)
                            .content(BORE))
                    .andExpect(status().isOk())
                    .andReturn().getResponse().getContentAsByteArray();
            try (var doc = Loader.loadPDF(pdf)) {
                String text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
                assertThat(text).contains(c[1]).doesNotContain("bore, bore");
            }
        }
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"positionMm\":150.0 | \"positionMm\":350.0 | holes[0].positionMm",
        "\"lengthMm\":120.0 | \"lengthMm\":-1 | segments[0].lengthMm",
        "\"inputEnd\":\"closed\" | \"inputEnd\":\"shut\" | inputEnd",
        "\"diameterMm\":7.5 | \"diameterMm\":\"7.5\" | holes[1].diameterMm",
        "\"diameterMm\":7.5 | \"diameterMm\":1e400 | holes[1].diameterMm",
        "\"diameterMm\":5.0 | \"diameterMm\":20.0 | holes[2].diameterMm"
    })
    void badBoresNameTheField(String from, String to, String field) throws Exception {
        mvc.perform(post("/api/v1/templates/tone-holes.svg").contentType(MediaType.APPLICATION_JSON)
                        .content(BORE.replace(from, to)))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"))
                .andExpect(jsonPath("$.errors[0].field").value(field));
    }
}
