package org.nodewright.store;

import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.nodewright.TemporaryDataDirectory;
import org.nodewright.TestProperties;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.http.MediaType;
import org.springframework.test.context.ContextConfiguration;
import org.springframework.test.web.servlet.MockMvc;

/** A disk with less room than the kept margin: writes are refused with a 507 problem, reads go on. */
@SpringBootTest(properties = {TestProperties.NO_WARM_UP, TestProperties.NO_BANNER,
        "app.store.min-free-space=1000000TB", "app.demo=false"})
@AutoConfigureMockMvc
@ContextConfiguration(initializers = TemporaryDataDirectory.class)
class DiskFullTest {

    @Autowired
    MockMvc mvc;

    @Test
    void writesAreRefusedWithAProblemDocumentAndNothingIsWritten() throws Exception {
        mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\":\"Too much\",\"kind\":\"string\",\"parameters\":{\"lengthMm\":650.0,"
                                + "\"tensionN\":70.0,\"material\":\"plain-steel\",\"diameterMm\":0.30}}"))
                .andExpect(status().isInsufficientStorage())
                .andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
                .andExpect(jsonPath("$.title").value("Disk full"))
                .andExpect(jsonPath("$.status").value(507));
        mvc.perform(get("/api/v1/designs")).andExpect(status().isOk()).andExpect(jsonPath("$.length()").value(0));
    }
}
