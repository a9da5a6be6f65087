package org.nodewright.strings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import org.junit.jupiter.api.Test;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;

@StoreFreeWebTest
class StringPagesControllerTest {


    @Autowired
    MockMvc mvc;

    private String render(String path, String viewName) throws Exception {
        return mvc.perform(get(path))
                .andExpect(status().isOk())
                .andExpect(view().name(viewName))
                .andReturn().getResponse().getContentAsString();
    }

    @Test
    void stringBenchCarriesTheFourChartsTheHooksAndTheCaution() throws Exception {
        String html = render("/strings", StringPagesController.STRING_VIEW);
        assertThat(html).contains("id=\"mode-shapes-chart\"", "id=\"partials-chart\"", "id=\"spectrum-chart\"",
                "id=\"node-map-chart\"", "id=\"design-bar\"", "id=\"listen-panel\"", "id=\"measure-panel\"",
                "/js/strings-page.js", "/css/strings.css", "eye protection");
        assertThat(html).contains("data-field=\"lengthMm\"", "data-field=\"pluck.positionMm\"", "data-field=\"targetHz\"");
    }

    @Test
    void setPlannerCarriesTheTensionChartAndTheNeckLoadCaution() throws Exception {
        String html = render("/string-sets", StringPagesController.SET_VIEW);
        assertThat(html).contains("id=\"set-tension-chart\"", "id=\"set-total\"", "id=\"design-bar\"",
                "/js/string-sets-page.js", "truss-rod");
    }

    @Test
    void everyMessageKeyOnBothPagesResolves() throws Exception {
        // Thymeleaf writes ??key_locale?? for a key missing from messages/*.properties.
        assertThat(render("/strings", StringPagesController.STRING_VIEW)).doesNotContain("??");
        assertThat(render("/string-sets", StringPagesController.SET_VIEW)).doesNotContain("??");
    }
}
