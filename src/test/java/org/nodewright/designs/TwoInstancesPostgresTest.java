package org.nodewright.designs;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.cert.X509Certificate;
import java.time.Duration;
import java.util.Base64;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import javax.net.ssl.SSLContext;
import javax.net.ssl.TrustManager;
import javax.net.ssl.X509TrustManager;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfEnvironmentVariable;
import org.nodewright.NodewrightApplication;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.boot.web.server.context.WebServerApplicationContext;
import org.springframework.context.ConfigurableApplicationContext;
import org.springframework.jdbc.core.simple.JdbcClient;

/**
 * Two app instances in LAN mode on one PostgreSQL database (the one e2e-tests/run-all-tests.sh
 * starts; skipped without NODEWRIGHT_PG_URL): a design saved through one reaches the change
 * notices of the other within 2 s (LISTEN/NOTIFY), and a sign-in lock-out made through one holds
 * on the other (the counts are in the database).
 */
@EnabledIfEnvironmentVariable(named = "NODEWRIGHT_PG_URL", matches = "jdbc:postgresql:.+")
class TwoInstancesPostgresTest {

    static final String ADMIN_PW = "harrowgate-two-benches";
    private static ConfigurableApplicationContext first;
    private static ConfigurableApplicationContext second;
    private static HttpClient http;

    private static ConfigurableApplicationContext start(String label) throws Exception {
        Path dataDir = Files.createTempDirectory("nodewright-pg-" + label + "-");
        return new SpringApplicationBuilder(NodewrightApplication.class).run("--server.port=0",
                "--app.data-dir=" + dataDir, "--spring.main.banner-mode=off", "--spring.profiles.active=postgres",
                "--spring.datasource.url=" + System.getenv("NODEWRIGHT_PG_URL"),
                "--spring.datasource.username=" + System.getenv("NODEWRIGHT_PG_USER"),
                "--spring.datasource.password=" + System.getenv().getOrDefault("NODEWRIGHT_PG_PASSWORD", ""),
                "--app.sharing.lan=true", "--server.address=127.0.0.1", "--app.sharing.admin-password=" + ADMIN_PW,
                "--app.sharing.max-failures=3", "--app.air-column.warm-up=false", "--app.demo=false");
    }

    @BeforeAll
    static void startTwo() throws Exception {
        first = start("one");
        second = start("two");
        clearLockouts();
        // Each instance has its own self-signed certificate; this test is about the database, not about TLS.
        SSLContext any = SSLContext.getInstance("TLS");
        any.init(null, new TrustManager[] {new X509TrustManager() {
            public void checkClientTrusted(X509Certificate[] chain, String authType) { }

            public void checkServerTrusted(X509Certificate[] chain, String authType) { }

            public X509Certificate[] getAcceptedIssuers() {
                return new X509Certificate[0];
            }
        }}, null);
        http = HttpClient.newBuilder().sslContext(any).connectTimeout(Duration.ofSeconds(5)).build();
    }

    @AfterAll
    static void stopTwo() {
        clearLockouts();
        if (first != null) {
            first.close();
        }
        if (second != null) {
            second.close();
        }
    }

    /** The counts live in the shared database: leave none behind for the next test run from 127.0.0.1. */
    private static void clearLockouts() {
        if (first != null) {
            first.getBean(JdbcClient.class).sql("DELETE FROM sign_in_counters").update();
        }
    }

    private static int port(ConfigurableApplicationContext app) {
        return ((WebServerApplicationContext) app).getWebServer().getPort();
    }

    private static HttpRequest.Builder request(ConfigurableApplicationContext app, String path, String user,
            String password) {
        return HttpRequest.newBuilder(URI.create("https://127.0.0.1:" + port(app) + path))
                .header("Authorization", "Basic " + Base64.getEncoder().encodeToString(
                        (user + ":" + password).getBytes(StandardCharsets.UTF_8)))
                .timeout(Duration.ofSeconds(30));
    }

    private static HttpResponse<String> send(HttpRequest.Builder b) throws Exception {
        return http.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    @Test
    void aSaveThroughOneReachesTheOthersNoticesAndALockOutHoldsOnBoth() throws Exception {
        // Listen on the second instance's event stream.
        BlockingQueue<String> lines = new LinkedBlockingQueue<>();
        HttpResponse<Stream<String>> stream = http.send(request(second, "/api/v1/designs/events", "admin", ADMIN_PW)
                .header("Accept", "text/event-stream").timeout(Duration.ofMinutes(2)).build(),
                HttpResponse.BodyHandlers.ofLines());
        assertThat(stream.statusCode()).isEqualTo(200);
        Thread reader = new Thread(() -> {
            try {
                stream.body().forEach(lines::add);
            } catch (java.io.UncheckedIOException closedAtTheEnd) {
                // the test closes the stream when it is done
            }
        });
        reader.setDaemon(true);
        reader.start();
        assertThat(lines.poll(10, TimeUnit.SECONDS)).as("the stream's hello").isNotNull();

        String name = "Two benches " + System.nanoTime();
        HttpResponse<String> saved = send(request(first, "/api/v1/designs", "admin", ADMIN_PW)
                .header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofString("{\"name\":\"" + name + "\",\"kind\":\"string\",\"parameters\":"
                        + "{\"lengthMm\":650.0,\"tensionN\":70.0,\"material\":\"plain-steel\",\"diameterMm\":0.30}}")));
        assertThat(saved.statusCode()).as(saved.body()).isEqualTo(201);
        long sentAt = System.nanoTime();
        boolean seen = false;
        while (!seen && System.nanoTime() - sentAt < Duration.ofSeconds(2).toNanos()) {
            String line = lines.poll(100, TimeUnit.MILLISECONDS);
            seen = line != null && line.contains(name);
        }
        assertThat(seen).as("the second instance's stream carried the save within 2 s").isTrue();

        // An account of the shop, then three wrong passwords through the first instance ...
        String user = "bench-" + (System.nanoTime() % 100000);
        assertThat(send(request(first, "/api/v1/accounts", "admin", ADMIN_PW).header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofString("{\"username\":\"" + user
                        + "\",\"password\":\"spruce-top-42\",\"role\":\"viewer\"}"))).statusCode()).isEqualTo(201);
        assertThat(send(request(second, "/api/v1/materials", user, "spruce-top-42").GET()).statusCode()).isEqualTo(200);
        for (int i = 0; i < 3; i++) {
            assertThat(send(request(first, "/api/v1/materials", user, "wrong-guess-" + i).GET()).statusCode())
                    .isEqualTo(401);
        }
        // ... and the second refuses even the right one.
        HttpResponse<String> refused = send(request(second, "/api/v1/materials", user, "spruce-top-42").GET());
        assertThat(refused.statusCode()).isEqualTo(429);
        assertThat(refused.headers().firstValue("Retry-After")).isPresent();
        stream.body().close();
    }
}
