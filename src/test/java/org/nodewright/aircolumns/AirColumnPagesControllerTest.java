package org.nodewright.aircolumns;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.core.io.ClassPathResource;
import org.springframework.core.io.support.PropertiesLoaderUtils;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockMvcRequestBuilders;
import org.springframework.test.web.servlet.result.MockMvcResultMatchers;

@StoreFreeWebTest
class AirColumnPagesControllerTest {


    @Autowired
    MockMvc mvc;

    @Test
    void theBoreBenchRendersItsChartsHooksAndScriptTexts() throws Exception {
        String html = mvc.perform(MockMvcRequestBuilders.get("/air-columns"))
                .andExpect(MockMvcResultMatchers.status().isOk())
                .andReturn().getResponse().getContentAsString();
        assertThat(html).contains("<canvas id=\"impedance-chart\"", "<canvas id=\"profile-chart\"",
                "<div id=\"design-bar\"></div>", "<section id=\"listen-panel\"></section>",
                "<section id=\"measure-panel\"></section>", "/js/air-columns-page.js", "/css/air-columns.css");
        // Script texts reach the page resolved, not as keys.
        assertThat(html).contains("data-key=\"air.js.inTune\">in tune</span>");
        assertThat(html).doesNotContain("??air.");
    }

    @Test
    void everyTextTheScriptsAskForIsInTheMessages() throws IOException {
        Properties messages = PropertiesLoaderUtils.loadProperties(new ClassPathResource(AirColumnPagesController.MESSAGES));
        Set<String> asked = new TreeSet<>();
        Pattern call = Pattern.compile("\\bt\\('([A-Za-z0-9]+)'");
        try (Stream<Path> files = Stream.concat(Stream.of(Path.of("static-assets/js/air-columns-page.js")),
                Files.list(Path.of("static-assets/js/air")))) {
            for (Path file : files.toList()) {
                Matcher m = call.matcher(Files.readString(file));
                while (m.find()) {
                    asked.add(AirColumnPagesController.SCRIPT_PREFIX + m.group(1));
                }
            }
        }
        assertThat(asked).hasSizeGreaterThan(20);
        assertThat(messages.stringPropertyNames()).containsAll(asked);
    }
}
