package org.nodewright.measurements;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;

@StoreFreeWebTest
class MeasurePagesControllerTest {


    @Autowired
    MockMvc mvc;

    @ParameterizedTest
    @ValueSource(strings = {"measure-strings", "measure-air", "listen-strings", "listen-air"})
    void eachPanelRendersWithAllItsTexts(String name) throws Exception {
        String html = mvc.perform(get("/measure/panels/" + name)).andExpect(status().isOk())
                .andReturn().getResponse().getContentAsString();
        assertThat(html).contains("data-panel=\"" + name + "\"").doesNotContain("??");
        assertThat(html).doesNotContain("<html").doesNotContain("<body");
    }

    @Test
    void theMeasurePageCarriesBothPanels() throws Exception {
        String html = mvc.perform(get("/measure")).andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
        assertThat(html).contains("data-panel=\"measure-strings\"").contains("data-panel=\"measure-air\"").doesNotContain("??");
    }

    @Test
    void anUnknownPanelIsNotFound() throws Exception {
        mvc.perform(get("/measure/panels/../../application")).andExpect(status().is4xxClientError());
        mvc.perform(get("/measure/panels/nothing")).andExpect(status().isNotFound());
    }

    @Test
    void everyMessageKeyOfTheTemplatesIsDefined() throws Exception {
        Properties messages = new Properties();
        try (var in = getClass().getResourceAsStream("/messages/measurements.properties")) {
            messages.load(new java.io.InputStreamReader(in, java.nio.charset.StandardCharsets.UTF_8));
        }
        Pattern key = Pattern.compile("#\\{([a-zA-Z0-9.]+)}");
        for (String template : new String[] {"panels.html", "measure.html"}) {
            String text = Files.readString(Path.of("src/main/resources/templates/measurements", template));
            Matcher m = key.matcher(text);
            int found = 0;
            while (m.find()) {
                found++;
                assertThat(messages).as(template).containsKey(m.group(1));
            }
            assertThat(found).isGreaterThanOrEqualTo(3);
        }
    }
}
