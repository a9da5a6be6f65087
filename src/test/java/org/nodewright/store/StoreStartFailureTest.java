package org.nodewright.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.SQLException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nodewright.NodewrightApplication;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.boot.diagnostics.FailureAnalysis;

/** A data directory that cannot be opened: one plain message per cause, and no server. */
class StoreStartFailureTest {

    private final StoreStartFailureAnalyzer analyzer = new StoreStartFailureAnalyzer();

    @Test
    void aDamagedStoreFileStopsTheStartWithOnePlainMessage(@TempDir Path dataDir) throws Exception {
        Files.write(dataDir.resolve("nodewright.mv.db"), "this is not a database file at all ".repeat(400).getBytes());
        assertThatThrownBy(() -> new SpringApplicationBuilder(NodewrightApplication.class)
                .run("--server.port=0", "--app.data-dir=" + dataDir, "--spring.main.banner-mode=off",
                        "--app.air-column.warm-up=false").close())
                .satisfies(failure -> {
                    FailureAnalysis analysis = analyzer.analyze(failure);
                    assertThat(analysis).isNotNull();
                    assertThat(analysis.getDescription()).containsAnyOf("damaged", "another version");
                    assertThat(analysis.getAction()).contains("--app.restore=");
                });
    }

    @Test
    void eachCauseGetsItsOwnAdvice() {
        assertThat(analyzer.analyze(new IllegalStateException("pool", new SQLException(
                "Database may be already in use: \"/data/nodewright.mv.db\"", "90020", 90020))).getDescription())
                .contains("in use by another process");
        assertThat(analyzer.analyze(new SQLException("File corrupted while reading record", "90030", 90030))
                .getDescription()).contains("damaged");
        assertThat(analyzer.analyze(new SQLException("Unsupported database file version", "90048", 90048))
                .getDescription()).contains("another version");
        assertThat(analyzer.analyze(new IllegalStateException("no database here"))).isNull();
    }
}
