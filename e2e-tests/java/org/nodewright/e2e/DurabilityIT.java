package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.CleanupMode;
import org.junit.jupiter.api.io.TempDir;

/**
 * Acknowledged writes survive a kill -9: the packaged jar is started as its own process, 20 designs
 * are written (each acknowledged with 201), the process is killed with SIGKILL (no shutdown hook,
 * no flush), a new process is started on the same data directory and every design is read back.
 */
class DurabilityIT {

    private static final int DESIGNS = 20;
    private static final Pattern ID = Pattern.compile("\"id\"\\s*:\\s*(\\d+)");

    private final HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
    private Process server;
    /** The data directory and the servers' logs; kept when a test fails, for its log. */
    @TempDir(cleanup = CleanupMode.ON_SUCCESS)
    Path scratch;

    @AfterEach
    void stop() throws InterruptedException {
        if (server != null && server.isAlive()) {
            server.destroyForcibly().waitFor();
        }
    }

    @Test
    void twentyAcknowledgedDesignsAreKeptAcrossKillMinusNine() throws Exception {
        Path dataDir = Files.createDirectories(scratch.resolve("data"));
        int port = freePort();
        server = start(port, dataDir, "first");

        Map<Long, String> written = new LinkedHashMap<>();
        for (int i = 1; i <= DESIGNS; i++) {
            String name = "Harrowgate Lane test string " + i;
            String body = "{\"name\": \"" + name + "\", \"kind\": \"string\", \"tags\": [\"durability\"], \"parameters\": "
                    + "{\"lengthMm\": " + (600 + i) + ".0, \"tensionN\": 70.0, \"material\": \"plain-steel\","
                    + " \"diameterMm\": 0.30, \"endCondition\": \"pinned\", \"stiffness\": true, \"modeCount\": 12}}";
            HttpResponse<String> r = send(port, "POST", "/api/v1/designs", body);
            assertThat(r.statusCode()).as(r.body()).isEqualTo(201);
            Matcher m = ID.matcher(r.body());
            assertThat(m.find()).isTrue();
            written.put(Long.parseLong(m.group(1)), name);
        }
        // The last write is acknowledged; kill at once, no grace period for a background flush.
        server.destroyForcibly().waitFor();
        assertThat(server.exitValue()).as("killed by SIGKILL (128 + 9)").isEqualTo(137);

        server = start(port, dataDir, "second");
        for (Map.Entry<Long, String> e : written.entrySet()) {
            HttpResponse<String> r = send(port, "GET", "/api/v1/designs/" + e.getKey(), null);
            assertThat(r.statusCode()).as("design " + e.getKey()).isEqualTo(200);
            assertThat(r.body()).contains("\"name\":\"" + e.getValue() + "\"");
        }
        HttpResponse<String> list = send(port, "GET", "/api/v1/designs?tag=durability", null);
        assertThat(ID.matcher(list.body()).results().count()).isEqualTo(DESIGNS);
    }

    private Process start(int port, Path dataDir, String label) throws Exception {
        String jar = System.getProperty("nodewright.jar");
        assertThat(jar).as("system property nodewright.jar (set by the pom)").isNotNull();
        assertThat(Path.of(jar)).exists();
        Path log = scratch.resolve("durability-" + label + ".log");
        Process p = new ProcessBuilder(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx256m", "-jar", jar, "--server.port=" + port, "--app.data-dir=" + dataDir))
                .redirectErrorStream(true).redirectOutput(log.toFile()).start();
        long deadline = System.nanoTime() + Duration.ofSeconds(180).toNanos();
        while (System.nanoTime() < deadline) {
            assertThat(p.isAlive()).as("server process (log: " + log + ")").isTrue();
            try {
                HttpResponse<String> health = send(port, "GET", "/actuator/health", null);
                if (health.statusCode() == 200 && health.body().contains("UP")) {
                    return p;
                }
            } catch (IOException notYet) {
                // not listening yet
            }
            Thread.sleep(250);
        }
        throw new AssertionError("server did not come up within 180 s; log: " + log);
    }

    private HttpResponse<String> send(int port, String method, String path, String json) throws Exception {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path))
                .timeout(Duration.ofSeconds(30)).header("Accept", "application/json");
        if (json != null) {
            b.header("Content-Type", "application/json").method(method, HttpRequest.BodyPublishers.ofString(json));
        } else {
            b.method(method, HttpRequest.BodyPublishers.noBody());
        }
        return http.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    private static int freePort() throws IOException {
        try (ServerSocket s = new ServerSocket(0)) {
            return s.getLocalPort();
        }
    }
}
