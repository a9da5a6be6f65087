package org.nodewright.sharing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.net.ConnectException;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Base64;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nodewright.NodewrightApplication;
import org.nodewright.TestProperties;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.boot.diagnostics.FailureAnalysis;
import org.springframework.boot.web.server.context.WebServerApplicationContext;
import org.springframework.context.ConfigurableApplicationContext;

/**
 * Real start-ups on a random port: which address the server listens on in each mode, the first
 * admin, and the refusal to start LAN mode with neither an admin nor a password. On Linux every
 * 127.x.y.z address reaches the loopback interface, so a server bound to 127.0.0.1 only refuses
 * 127.0.0.2 while one bound to 0.0.0.0 answers it.
 */
class LanStartupTest {

    private static final HttpClient HTTP = HttpClient.newHttpClient();

    private static ConfigurableApplicationContext start(Path dataDir, String... args) {
        String[] all = new String[args.length + 4];
        all[0] = "--server.port=0";
        all[1] = "--app.data-dir=" + dataDir;
        all[2] = "--" + TestProperties.NO_BANNER;
        all[3] = "--" + TestProperties.NO_WARM_UP;
        System.arraycopy(args, 0, all, 4, args.length);
        return new SpringApplicationBuilder(NodewrightApplication.class).run(all);
    }

    private static int port(ConfigurableApplicationContext context) {
        return ((WebServerApplicationContext) context).getWebServer().getPort();
    }

    private static boolean answers(String host, int port) throws IOException {
        try (Socket socket = new Socket()) {
            socket.connect(new InetSocketAddress(host, port), 2000);
            return true;
        } catch (ConnectException refused) {
            return false;
        }
    }

    private static HttpResponse<String> get(String host, int port, String path, String user, String password)
            throws Exception {
        return send(HTTP, "http", host, port, path, user, password);
    }

    /** LAN mode speaks HTTPS only; this client trusts exactly the certificate kept under the data directory. */
    private static HttpResponse<String> getTls(Path dataDir, int port, String path, String user, String password)
            throws Exception {
        return send(LanTestTls.trustingKept(dataDir), "https", "127.0.0.1", port, path, user, password);
    }

    private static HttpResponse<String> send(HttpClient client, String scheme, String host, int port, String path,
            String user, String password) throws Exception {
        HttpRequest.Builder request = HttpRequest.newBuilder(URI.create(scheme + "://" + host + ":" + port + path));
        if (user != null) {
            String token = Base64.getEncoder().encodeToString((user + ":" + password).getBytes(StandardCharsets.UTF_8));
            request.header("Authorization", "Basic " + token);
        }
        return client.send(request.build(), HttpResponse.BodyHandlers.ofString());
    }

    @Test
    void byDefaultItListensOnLoopbackOnlyAndAsksForNoLogin(@TempDir Path dir) throws Exception {
        try (ConfigurableApplicationContext app = start(dir)) {
            int port = port(app);
            assertThat(answers("127.0.0.1", port)).isTrue();
            assertThat(answers("127.0.0.2", port)).isFalse();
            assertThat(get("127.0.0.1", port, "/", null, null).statusCode()).isEqualTo(200);
            assertThat(get("127.0.0.1", port, "/api/v1/accounts", null, null).statusCode()).isEqualTo(404);
            assertThat(get("127.0.0.1", port, "/h2-console", null, null).statusCode()).isEqualTo(404);
            HttpResponse<String> login = get("127.0.0.1", port, "/login", null, null);
            assertThat(login.statusCode()).isEqualTo(302);
            assertThat(get("127.0.0.1", port, "/", null, null).body()).doesNotContain("id=\"sign-out\"");
            assertThat(login.headers().firstValue("X-Frame-Options")).contains("DENY");
        }
    }

    @Test
    void lanModeListensOnAllInterfacesAndTheFirstStartAloneSetsTheAdminPassword(@TempDir Path dir) throws Exception {
        try (ConfigurableApplicationContext app = start(dir, "--app.sharing.lan=true",
                "--app.sharing.admin-password=first-start-pw")) {
            int port = port(app);
            assertThat(answers("127.0.0.2", port)).isTrue();
            assertThat(getTls(dir, port, "/api/v1/accounts", null, null).statusCode()).isEqualTo(401);
            HttpResponse<String> list = getTls(dir, port, "/api/v1/accounts", "admin", "first-start-pw");
            assertThat(list.statusCode()).isEqualTo(200);
            assertThat(list.body()).contains("\"username\":\"admin\"").contains("\"role\":\"admin\"");
            // Plain HTTP on the same port: refused before any credential is looked at (Tomcat's 400).
            HttpResponse<String> plain = get("127.0.0.1", port, "/api/v1/accounts", "admin", "first-start-pw");
            assertThat(plain.statusCode()).isEqualTo(400);
            assertThat(plain.body()).doesNotContain("\"username\"");
        }
        // Second start: the admin exists, so a different password on the command line changes nothing.
        try (ConfigurableApplicationContext app = start(dir, "--app.sharing.lan=true",
                "--app.sharing.admin-password=other-password")) {
            int port = port(app);
            assertThat(getTls(dir, port, "/api/v1/accounts", "admin", "first-start-pw").statusCode())
                    .isEqualTo(200);
            assertThat(getTls(dir, port, "/api/v1/accounts", "admin", "other-password").statusCode())
                    .isEqualTo(401);
        }
        // Third start: no password needed any more; an explicit address is kept.
        try (ConfigurableApplicationContext app = start(dir, "--app.sharing.lan=true", "--server.address=127.0.0.1")) {
            int port = port(app);
            assertThat(answers("127.0.0.2", port)).isFalse();
            assertThat(getTls(dir, port, "/api/v1/accounts", "admin", "first-start-pw").statusCode())
                    .isEqualTo(200);
        }
    }

    @Test
    void lanModeRefusesToStartWithNoAdminAndNoPassword(@TempDir Path dir) {
        // The refusal is expected: keep Boot's failure report and the context's warning out of the log.
        assertThatThrownBy(() -> start(dir, "--app.sharing.lan=true",
                "--logging.level.org.springframework.boot.diagnostics=OFF",
                "--logging.level.org.springframework.boot.web=OFF").close())
                .satisfies(failure -> {
                    Throwable cause = failure;
                    while (cause != null && !(cause instanceof LanSetupException)) {
                        cause = cause.getCause();
                    }
                    assertThat(cause).isInstanceOf(LanSetupException.class);
                    FailureAnalysis analysis = new LanSetupFailureAnalyzer().analyze(failure);
                    assertThat(analysis.getDescription()).contains("no enabled admin account")
                            .contains("no admin password");
                    assertThat(analysis.getAction()).contains("--app.sharing.admin-password=");
                });
    }
}
