package org.nodewright.designs;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
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
import org.nodewright.NodewrightWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;

/** The library pages render, escape what users typed, and every text they use is in designs.properties. */
@NodewrightWebTest
class LibraryPagesTest {


    @Autowired
    MockMvc mvc;

    @Test
    void listAndComparePagesRender() throws Exception {
        assertThat(page("/library")).contains("id=\"design-list\"", "id=\"library-search\"", "/js/library-page.js");
        assertThat(page("/library/compare")).contains("id=\"compare-table\"", "id=\"compare-results\"",
                "id=\"length-unit\"", "id=\"force-unit\"");
    }

    @Test
    void designPageEscapesNameAndNotes() throws Exception {
        String body = "{\"name\": \"<script>alert(1)</script>\", \"kind\": \"string\", \"notes\": \"<b>bold</b> & co\","
                + " \"tags\": [\"<i>x</i>\"], \"parameters\": " + DesignApiContract.STRING_PARAMS + "}";
        String json = mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON).content(body))
                .andReturn().getResponse().getContentAsString();
        String id = json.replaceAll("(?s).*?\"id\":(\\d+).*", "$1");
        String html = page("/library/" + id);
        assertThat(html).contains("&lt;script&gt;alert(1)&lt;/script&gt;", "&lt;b&gt;bold&lt;/b&gt; &amp; co",
                "&lt;i&gt;x&lt;/i&gt;", "href=\"/strings?design=" + id + "\"");
        assertThat(html).doesNotContain("<script>alert(1)", "<b>bold", "<i>x");
        mvc.perform(get("/library/999999")).andExpect(status().isNotFound());
    }

    @Test
    void everyTextKeyTheLibraryUsesIsDefined() throws Exception {
        Properties messages = new Properties();
        try (var in = getClass().getResourceAsStream("/messages/designs.properties")) {
            messages.load(in);
        }
        List<String> used = new ArrayList<>();
        for (String template : List.of("library.html", "library-design.html", "library-compare.html")) {
            collect(Path.of("src/main/resources/templates", template), Pattern.compile("#\\{([a-zA-Z.\\-]+)[}(]"), used);
        }
        for (String script : List.of("static-assets/js/library-page.js", "static-assets/js/common/design-bar.js")) {
            collect(Path.of(script), Pattern.compile("t\\['([a-zA-Z.\\-]+)'\\]"), used);
        }
        collect(Path.of("static-assets/js/library/compare.js"), Pattern.compile("\\bt\\('([a-zA-Z.\\-]+)'\\)"), used);
        assertThat(used).hasSizeGreaterThan(40);
        assertThat(used).allSatisfy(key -> assertThat(messages).as(key).containsKey(key));
        mvc.perform(get("/api/v1/designs/ui-text"))
                .andExpect(jsonPath("$['designbar.save']").value(messages.getProperty("designbar.save")));
    }

    private static void collect(Path file, Pattern key, List<String> into) throws IOException {
        Matcher m = key.matcher(Files.readString(file));
        while (m.find()) {
            if (!m.group(1).startsWith("nav.") && !m.group(1).startsWith("app.")) {
                into.add(m.group(1));
            }
        }
    }

    private String page(String path) throws Exception {
        return mvc.perform(get(path)).andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
    }
}
