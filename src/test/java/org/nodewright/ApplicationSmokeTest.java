package org.nodewright;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockMvcRequestBuilders;
import org.springframework.test.web.servlet.result.MockMvcResultMatchers;

@SpringBootTest
@AutoConfigureMockMvc
class ApplicationSmokeTest {

    static Path dataDir;

    @DynamicPropertySource
    static void dataDir(DynamicPropertyRegistry registry) throws Exception {
        dataDir = Files.createTempDirectory("nodewright-smoke-");
        registry.add("app.data-dir", dataDir::toString);
    }

    @Autowired
    MockMvc mvc;

    @Autowired
    org.springframework.core.env.Environment environment;

    @Test
    void theStoreLivesInTheDataDirectoryTheTestChose() {
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
        assertThat(html).contains("Nodewright workshop");
    }

    @Test
    void theOpenApiDescriptionIsServedWithOurTitle() throws Exception {
        mvc.perform(MockMvcRequestBuilders.get("/v3/api-docs"))
                .andExpect(MockMvcResultMatchers.status().isOk())
                .andExpect(MockMvcResultMatchers.jsonPath("$.info.title").value("Nodewright API"))
                .andExpect(MockMvcResultMatchers.jsonPath("$.paths['/api/v1/strings/analyze']").exists());
    }

    @Test
    void unknownApiPathIsAProblemDocumentNotAStackTrace() throws Exception {
        mvc.perform(MockMvcRequestBuilders.get("/api/v1/no-such-thing"))
                .andExpect(MockMvcResultMatchers.status().isNotFound())
                .andExpect(MockMvcResultMatchers.content().contentTypeCompatibleWith("application/problem+json"));
    }
}
