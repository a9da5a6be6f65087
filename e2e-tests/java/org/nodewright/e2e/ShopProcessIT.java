package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.cert.X509Certificate;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Base64;
import java.util.HexFormat;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.net.ssl.SSLContext;
import javax.net.ssl.SSLSocket;
import javax.net.ssl.TrustManager;
import javax.net.ssl.X509TrustManager;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.CleanupMode;
import org.junit.jupiter.api.io.TempDir;

/**
 * The packaged jar in LAN mode as its own process: HTTPS with a self-signed certificate that is
 * kept and served again after a restart, nothing over plain HTTP, secure cookies and HSTS, the own
 * password change (403 / 400 / 204), the audit trail (and its refusal to a non-admin), a second
 * process on the same data directory refused with a plain message, a backup taken while a writer
 * saves designs, its restore into an empty folder (and the refusal of a non-empty one), and every
 * design acknowledged before the backup back after the restore.
 */
class ShopProcessIT {

    private static final String ADMIN_PW = "harrowgate-process-1";
    private static final Pattern ID = Pattern.compile("\"id\"\\s*:\\s*(\\d+)");
    private static final Pattern LOGGED = Pattern.compile("SHA-256 fingerprint ((?:[0-9A-F]{2}:){31}[0-9A-F]{2})");

    private final List<Process> processes = new ArrayList<>();
    private HttpClient https;
    /** The data directories, the backup file and the servers' logs; kept when the test fails, for its logs. */
    @TempDir(cleanup = CleanupMode.ON_SUCCESS)
    Path scratch;

    @AfterEach
    void stop() throws InterruptedException {
        for (Process p : processes) {
            p.destroyForcibly().waitFor();
        }
    }

    private Path log(String name) {
        return scratch.resolve(name + ".log");
    }

    @Test
    void lanModeOverHttpsPasswordsAuditBackupAndRestore() throws Exception {
        https = HttpClient.newBuilder().sslContext(trustAnything()).connectTimeout(Duration.ofSeconds(5)).build();
        HttpClient plain = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(5)).build();
        Path dataDir = Files.createDirectories(scratch.resolve("data"));
        int port = freePort();
        Path log1 = log("shop-1");
        Process server = startLan(port, dataDir, log1);

        // TLS, with the fingerprint the server logged, showed on the sign-in page and serves.
        String served = servedFingerprint(port);
        Matcher logged = LOGGED.matcher(Files.readString(log1));
        assertThat(logged.find()).as("fingerprint in the log").isTrue();
        assertThat(logged.group(1)).isEqualTo(served);
        HttpResponse<String> login = send("GET", port, "/login", null, null, null);
        assertThat(login.statusCode()).isEqualTo(200);
        assertThat(login.body()).contains(served);
        assertThat(login.headers().firstValue("Strict-Transport-Security")).get().asString().startsWith("max-age=");
        assertThat(String.join("\n", login.headers().allValues("Set-Cookie")))
                .contains("Secure").contains("HttpOnly").contains("SameSite=Lax");

        // Plain HTTP on the port: no credential is looked at, nothing is served.
        HttpResponse<String> clear = plain.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port
                        + "/api/v1/accounts")).header("Authorization", basic("admin", ADMIN_PW)).build(),
                HttpResponse.BodyHandlers.ofString());
        assertThat(clear.statusCode()).isEqualTo(400);
        assertThat(clear.body()).doesNotContain("\"username\"");

        // A second process on the same data directory is refused with one plain message.
        Path log2 = log("shop-locked");
        Process second = start(List.of("--server.port=" + freePort(), "--app.data-dir=" + dataDir), log2);
        assertThat(second.waitFor(480, TimeUnit.SECONDS)).isTrue();
        assertThat(second.exitValue()).isNotZero();
        assertThat(Files.readString(log2)).contains("in use by another process");

        // Accounts and the own password change.
        assertThat(send("POST", port, "/api/v1/accounts", "admin", ADMIN_PW,
                "{\"username\":\"luthier-cara\",\"password\":\"spruce-top-42\",\"role\":\"editor\"}").statusCode())
                .isEqualTo(201);
        HttpResponse<String> wrong = send("PUT", port, "/api/v1/accounts/me/password", "luthier-cara", "spruce-top-42",
                "{\"currentPassword\":\"not-it-at-all\",\"newPassword\":\"maple-back-43\"}");
        assertThat(wrong.statusCode()).isEqualTo(403);
        HttpResponse<String> weak = send("PUT", port, "/api/v1/accounts/me/password", "luthier-cara", "spruce-top-42",
                "{\"currentPassword\":\"spruce-top-42\",\"newPassword\":\"password1\"}");
        assertThat(weak.statusCode()).isEqualTo(400);
        assertThat(weak.body()).contains("\"field\":\"newPassword\"");
        assertThat(send("PUT", port, "/api/v1/accounts/me/password", "luthier-cara", "spruce-top-42",
                "{\"currentPassword\":\"spruce-top-42\",\"newPassword\":\"maple-back-43\"}").statusCode())
                .isEqualTo(204);
        assertThat(send("GET", port, "/api/v1/materials", "luthier-cara", "spruce-top-42", null).statusCode())
                .isEqualTo(401);

        // Designs written while a backup is taken.
        Set<Long> acknowledged = ConcurrentHashMap.newKeySet();
        AtomicBoolean writing = new AtomicBoolean(true);
        Thread writer = new Thread(() -> {
            for (int i = 0; writing.get(); i++) {
                try {
                    HttpResponse<String> r = send("POST", port, "/api/v1/designs", "luthier-cara", "maple-back-43",
                            "{\"name\":\"Process design " + i + "\",\"kind\":\"string\",\"parameters\":{\"lengthMm\":"
                                    + (600 + i) + ".0,\"tensionN\":70.0,\"material\":\"plain-steel\",\"diameterMm\":0.3}}");
                    Matcher m = ID.matcher(r.body());
                    if (r.statusCode() == 201 && m.find()) {
                        acknowledged.add(Long.parseLong(m.group(1)));
                    }
                } catch (Exception e) {
                    return;
                }
            }
        });
        writer.start();
        while (acknowledged.size() < 10) {
            Thread.sleep(50);
        }
        Set<Long> beforeBackup = Set.copyOf(acknowledged);
        HttpResponse<byte[]> backup = https.send(request("GET", port, "/api/v1/backup", "admin", ADMIN_PW, null),
                HttpResponse.BodyHandlers.ofByteArray());
        writing.set(false);
        writer.join();
        assertThat(backup.statusCode()).isEqualTo(200);
        assertThat(send("GET", port, "/api/v1/backup", "luthier-cara", "maple-back-43", null).statusCode())
                .isEqualTo(403);

        // The audit trail, newest first, for the admin only.
        HttpResponse<String> audit = send("GET", port, "/api/v1/audit?limit=500", "admin", ADMIN_PW, null);
        assertThat(audit.statusCode()).isEqualTo(200);
        assertThat(audit.body()).contains("\"action\":\"password-changed\"").contains("\"action\":\"password-change-failed\"")
                .contains("\"action\":\"account-created\"").contains("\"action\":\"design-created\"")
                .contains("\"action\":\"backup-taken\"").doesNotContain("maple-back-43").doesNotContain("spruce-top-42");
        assertThat(audit.body().indexOf("backup-taken")).isLessThan(audit.body().indexOf("password-changed"));
        assertThat(send("GET", port, "/api/v1/audit", "luthier-cara", "maple-back-43", null).statusCode())
                .isEqualTo(403);

        // Restart: the same certificate, the changed password still the one.
        server.destroy();
        assertThat(server.waitFor(60, TimeUnit.SECONDS)).isTrue();
        server = startLan(port, dataDir, log("shop-3"));
        assertThat(servedFingerprint(port)).isEqualTo(served);
        assertThat(send("GET", port, "/api/v1/materials", "luthier-cara", "maple-back-43", null).statusCode())
                .isEqualTo(200);
        server.destroy();
        assertThat(server.waitFor(60, TimeUnit.SECONDS)).isTrue();

        // Restore: refused into the live (non-empty) folder, done into an empty one, with every acknowledged design.
        Path file = scratch.resolve("shop-backup.zip");
        Files.write(file, backup.body());
        Path refusedLog = log("restore-refused");
        Process refused = start(List.of("--app.restore=" + file, "--app.data-dir=" + dataDir), refusedLog);
        assertThat(refused.waitFor(300, TimeUnit.SECONDS)).isTrue();
        assertThat(refused.exitValue()).isEqualTo(2);
        assertThat(Files.readString(refusedLog)).contains("not empty");
        Path restored = Files.createDirectories(scratch.resolve("restored")).resolve("data");
        Process restore = start(List.of("--app.restore=" + file, "--app.data-dir=" + restored),
                log("restore"));
        assertThat(restore.waitFor(300, TimeUnit.SECONDS)).isTrue();
        assertThat(restore.exitValue()).isZero();

        int localPort = freePort();
        Process local = start(List.of("--server.port=" + localPort, "--app.data-dir=" + restored),
                log("shop-local"));
        waitUp(local, () -> plain.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + localPort
                + "/actuator/health")).build(), HttpResponse.BodyHandlers.ofString()));
        for (long id : beforeBackup) {
            HttpResponse<String> r = plain.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + localPort
                    + "/api/v1/designs/" + id)).build(), HttpResponse.BodyHandlers.ofString());
            assertThat(r.statusCode()).as("design " + id + " after the restore").isEqualTo(200);
        }
    }

    private Process startLan(int port, Path dataDir, Path log) throws Exception {
        Process p = start(List.of("--server.port=" + port, "--app.data-dir=" + dataDir, "--app.sharing.lan=true",
                "--server.address=127.0.0.1", "--app.sharing.admin-password=" + ADMIN_PW), log);
        waitUp(p, () -> https.send(request("GET", port, "/actuator/health", null, null, null),
                HttpResponse.BodyHandlers.ofString()));
        return p;
    }

    private Process start(List<String> args, Path log) throws IOException {
        String jar = System.getProperty("nodewright.jar");
        assertThat(jar).as("system property nodewright.jar (set by the pom)").isNotNull();
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx256m", "-jar", jar, "--app.air-column.warm-up=false"));
        command.addAll(args);
        Process p = new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(log.toFile()).start();
        processes.add(p);
        return p;
    }

    interface Probe {
        HttpResponse<String> get() throws Exception;
    }

    private static void waitUp(Process p, Probe health) throws Exception {
        long deadline = System.nanoTime() + Duration.ofSeconds(480).toNanos(); // generous: a loaded CI machine starts slowly
        while (System.nanoTime() < deadline) {
            assertThat(p.isAlive()).as("server process").isTrue();
            try {
                HttpResponse<String> r = health.get();
                if (r.statusCode() == 200 && r.body().contains("UP")) {
                    return;
                }
            } catch (IOException notYet) {
                // not listening yet
            }
            Thread.sleep(250);
        }
        throw new AssertionError("server did not come up within 480 s");
    }

    /** The SHA-256 of the certificate the server presents in the TLS handshake, as browsers show it. */
    private static String servedFingerprint(int port) throws Exception {
        try (SSLSocket socket = (SSLSocket) trustAnything().getSocketFactory().createSocket("127.0.0.1", port)) {
            socket.startHandshake();
            X509Certificate cert = (X509Certificate) socket.getSession().getPeerCertificates()[0];
            return HexFormat.ofDelimiter(":").withUpperCase().formatHex(
                    MessageDigest.getInstance("SHA-256").digest(cert.getEncoded()));
        }
    }

    private HttpRequest request(String method, int port, String path, String user, String password, String json) {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create("https://127.0.0.1:" + port + path))
                .timeout(Duration.ofSeconds(60)).header("Accept", "application/json");
        if (user != null) {
            b.header("Authorization", basic(user, password));
        }
        if (json != null) {
            b.header("Content-Type", "application/json").method(method, HttpRequest.BodyPublishers.ofString(json));
        } else {
            b.method(method, HttpRequest.BodyPublishers.noBody());
        }
        return b.build();
    }

    private HttpResponse<String> send(String method, int port, String path, String user, String password, String json)
            throws Exception {
        return https.send(request(method, port, path, user, password, json), HttpResponse.BodyHandlers.ofString());
    }

    private static String basic(String user, String password) {
        return "Basic " + Base64.getEncoder().encodeToString((user + ":" + password).getBytes(StandardCharsets.UTF_8));
    }

    /** The test checks the fingerprint itself, so the handshake accepts any certificate. */
    private static SSLContext trustAnything() throws Exception {
        SSLContext ssl = SSLContext.getInstance("TLS");
        ssl.init(null, new TrustManager[] {new X509TrustManager() {
            public void checkClientTrusted(X509Certificate[] chain, String authType) { }

            public void checkServerTrusted(X509Certificate[] chain, String authType) { }

            public X509Certificate[] getAcceptedIssuers() {
                return new X509Certificate[0];
            }
        }}, null);
        return ssl;
    }

    private static int freePort() throws IOException {
        try (ServerSocket s = new ServerSocket(0)) {
            return s.getLocalPort();
        }
    }
}
