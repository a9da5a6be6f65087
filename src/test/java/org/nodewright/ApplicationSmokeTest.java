package org.nodewright;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockMvcRequestBuilders;
import org.springframework.test.web.servlet.result.MockMvcResultMatchers;

@NodewrightWebTest
class ApplicationSmokeTest {

    @Autowired
    MockMvc mvc;

    @Autowired
    org.springframework.core.env.Environment environment;

    @Test
    void theStoreLivesInTheDataDirectoryTheTestChose() {
        Path dataDir = Path.of(environment.getProperty("app.data-dir"));
        assertThat(dataDir.getFileName().toString()).startsWith("nodewright-test-");
        assertThat(environment.getProperty("spring.datasource.url")).contains(dataDir.toAbsolutePath().toString());
        assertThat(dataDir.resolve("nodewright.mv.db")).exists();
    }

    @Test
    void healthIsUpAndTheStartPageRenders() throws Exception {
        mvc.perform(MockMvcRequestBuilders.get("/actuator/health"))
                .andExpect(MockMvcResultMatchers.status().isOk())
                .andExpect(MockMvcResultMatchers.jsonPath("$.status").value("UP"));
        String html = mvc.perform(MockMvcRequestBuilders.get("/"))
                .andExpect(MockMvcResultMatchers.status().isOk())
                .andReturn().getResponse().getContentAsString();
        // The start page leads to each bench and the library (links, not wording, are what it is for).
        assertThat(html).contains("href=\"/strings\"", "href=\"/string-sets\"", "href=\"/air-columns\"",
                "href=\"/library\"").doesNotContain("??");
    }

    @Test
    void theOpenApiDescriptionIsServedWithOurTitle() throws Exception {
        mvc.perform(MockMvcRequestBuilders.get("/v3/api-docs"))
                .andExpect(MockMvcResultMatchers.status().isOk())
                .andExpect(MockMvcResultMatchers.jsonPath("$.info.title").value("Nodewright API"))
                .andExpect(MockMvcResultMatchers.jsonPath("$.paths['/api/v1/strings/analyze']").exists());
    }

    @Test
    void theOpenApiDescriptionListsTheTemplateAndInverseEndpoints() throws Exception {
        String docs = mvc.perform(MockMvcRequestBuilders.get("/v3/api-docs"))
                .andExpect(MockMvcResultMatchers.status().isOk())
                .andReturn().getResponse().getContentAsString();
        assertThat(docs).contains("/api/v1/frets.svg", "/api/v1/frets.pdf", "/api/v1/templates/tone-holes.svg",
                "/api/v1/templates/compensation", "/api/v1/inverse/gauges", "/api/v1/inverse/tone-holes",
                "/api/v1/inverse/jobs/{id}", "Inverse design", "/api/v1/templates/bar-undercut.svg",
                "/api/v1/templates/bar-undercut.pdf", "/api/v1/bars/measure-blank", "/api/v1/bars/measure-blank/recording");
    }

    @Test
    void unknownApiPathIsAProblemDocumentNotAStackTrace() throws Exception {
        mvc.perform(MockMvcRequestBuilders.get("/api/v1/no-such-thing"))
                .andExpect(MockMvcResultMatchers.status().isNotFound())
                .andExpect(MockMvcResultMatchers.content().contentTypeCompatibleWith("application/problem+json"));
    }
}
