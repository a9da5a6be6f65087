package org.nodewright.designs;

import java.nio.file.Files;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/** The saved-design contract on the embedded H2 file store, in a fresh data directory. */
@SpringBootTest
@AutoConfigureMockMvc
class DesignApiH2Test extends DesignApiContract {

    @DynamicPropertySource
    static void dataDir(DynamicPropertyRegistry registry) throws Exception {
        registry.add("app.data-dir", Files.createTempDirectory("nodewright-designs-")::toString);
    }
}
