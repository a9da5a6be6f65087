package org.nodewright.templates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.apache.pdfbox.Loader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.StoreFreeWebTest;
import org.nodewright.templates.render.FretTemplateSvgTestAccess;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

@StoreFreeWebTest
class FretTemplateControllerTest {


    @Autowired
    MockMvc mvc;

    @Test
    void contractSvgHasMmSizeAndOneLinePerFretFromTheNut() throws Exception {
        String svg = mvc.perform(get("/api/v1/frets.svg?scaleLengthMm=650&count=22&divisionsPerOctave=12"))
                .andExpect(status().isOk())
                .andExpect(content().contentTypeCompatibleWith("image/svg+xml"))
                .andReturn().getResponse().getContentAsString();
        var x = FretTemplateSvgTestAccess.fretXs(svg);
        assertThat(x).hasSize(23);
        // Equal temperament, x_n = L (1 - 2^(-n/12)) (common practice).
        for (int n = 0; n <= 22; n++) {
            assertThat(x.get(n) - x.get(0)).isCloseTo(650 * (1 - Math.pow(2, -n / 12.0)), within(0.01));
        }
    }

    @Test
    void pdfDownloadIsTiledLetterWhenAsked() throws Exception {
        byte[] pdf = mvc.perform(get("/api/v1/frets.pdf?scaleLengthMm=650&count=22&paper=letter"))
                .andExpect(status().isOk())
                .andExpect(content().contentType(MediaType.APPLICATION_PDF))
                .andReturn().getResponse().getContentAsByteArray();
        try (var doc = Loader.loadPDF(pdf)) {
            assertThat(doc.getNumberOfPages()).isGreaterThan(1);
            // ANSI Letter landscape: 11 in x 8.5 in = 792 x 612 pt.
            assertThat(doc.getPage(0).getMediaBox().getWidth()).isCloseTo(792f, within(0.01f));
        }
    }

    @ParameterizedTest
    @CsvSource({
        "scaleLengthMm=-650&count=22, scaleLengthMm",
        "scaleLengthMm=NaN&count=22, scaleLengthMm",
        "scaleLengthMm=Infinity&count=22, scaleLengthMm",
        "scaleLengthMm=abc, scaleLengthMm",
        "scaleLengthMm=650&count=1000000000, count",
        "scaleLengthMm=650&count=0, count",
        "scaleLengthMm=650&divisionsPerOctave=0, divisionsPerOctave",
        "count=22, scaleLengthMm"
    })
    void badQueriesAreProblemDocumentsNamingTheField(String query, String field) throws Exception {
        mvc.perform(get("/api/v1/frets.svg?" + query))
                .andExpect(status().isBadRequest())
                .andExpect(content().contentTypeCompatibleWith("application/problem+json"))
                .andExpect(jsonPath("$.errors[0].field").value(field));
    }

    @Test
    void unknownPaperIsA400() throws Exception {
        mvc.perform(get("/api/v1/frets.pdf?scaleLengthMm=650&paper=a3"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("paper"));
    }

    @Test
    void markedPositionBeyondTheStringNamesItsDottedPath() throws Exception {
        mvc.perform(post("/api/v1/templates/frets.svg").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"scaleLengthMm\":650,\"count\":22,\"positions\":[{\"label\":\"bridge\","
                                + "\"positionMm\":650},{\"label\":\"far\",\"positionMm\":5000}]}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("positions[1].positionMm"));
        mvc.perform(post("/api/v1/templates/frets.svg").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"scaleLengthMm\":650,\"count\":22,\"positions\":[{\"label\":\"\",\"positionMm\":1}]}"))
                .andExpect(status().isBadRequest())
                .andExpect(jsonPath("$.errors[0].field").value("positions[0].label"));
    }
}
