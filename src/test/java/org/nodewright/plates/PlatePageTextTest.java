package org.nodewright.plates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.nodewright.StoreFreeWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;

/** The plate bench page renders its panels, and every text key it or its scripts use is defined. */
@StoreFreeWebTest
class PlatePageTextTest {

    @Autowired
    MockMvc mvc;

    @Test
    void thePageCarriesTheSolverAndMeasurePanels() throws Exception {
        String html = mvc.perform(get("/plates")).andExpect(status().isOk()).andReturn().getResponse()
                .getContentAsString();
        assertThat(html).contains("id=\"thickness-solver\"", "id=\"solver-target-rows\"", "id=\"plate-measure\"",
                "id=\"measure-wav\"", "id=\"thickness-points\"", "McIntyre &amp; Woodhouse 1988");
        assertThat(html).doesNotContain("??");
    }

    @Test
    void everyTextKeyOfThePlatePageIsDefined() throws Exception {
        Properties messages = new Properties();
        try (var in = getClass().getResourceAsStream("/messages/plates.properties")) {
            messages.load(in);
        }
        String page = Files.readString(Path.of("src/main/resources/templates/plates.html"));
        List<String> used = new ArrayList<>();
        collect(page, Pattern.compile("#\\{([a-zA-Z.\\-]+)[}(]"), "", used);
        assertThat(used).hasSizeGreaterThan(60);
        assertThat(used).allSatisfy(key -> assertThat(messages).as(key).containsKey(key));
        List<String> carried = new ArrayList<>();
        collect(page, Pattern.compile("data-k=\"([a-zA-Z.\\-]+)\""), "", carried);
        List<String> scripts = new ArrayList<>();
        for (String script : List.of("static-assets/js/plates/solver-panel.js", "static-assets/js/plates/measure-panel.js")) {
            collect(Files.readString(Path.of(script)), Pattern.compile("\\bt\\('([a-zA-Z.\\-]+)'"), "plates.js.", scripts);
        }
        assertThat(scripts).hasSizeGreaterThan(10);
        assertThat(scripts).allSatisfy(key -> assertThat(carried).as(key).contains(key));
    }

    private static void collect(String text, Pattern key, String prefix, List<String> into) throws IOException {
        Matcher m = key.matcher(text);
        while (m.find()) {
            if (!m.group(1).startsWith("nav.") && !m.group(1).startsWith("app.")) {
                into.add(prefix + m.group(1));
            }
        }
    }
}
