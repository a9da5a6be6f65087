package org.nodewright.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.zip.GZIPInputStream;
import org.junit.jupiter.api.Test;
import org.nodewright.NodewrightWebTest;
import org.springframework.beans.factory.annotation.Value;

/**
 * Over a real socket (Tomcat's compression is not in MockMvc): with {@code Accept-Encoding: gzip}
 * an answer under {@code server.compression.min-response-size} (64 KiB in application.properties)
 * goes out plain with its length, one over it is compressed, and the change-event stream still
 * streams.
 */
@NodewrightWebTest
class KnownLengthAnswersTest {

    private static final String STRING_24 = """
            {"lengthMm": 650.0, "tensionN": 70.0, "material": "plain-steel", "diameterMm": 0.30,
             "endCondition": "pinned", "stiffness": true, "modeCount": 24,
             "pluck": {"positionMm": 120.0, "kind": "pluck"},
             "pickups": [{"positionMm": 150.0, "apertureMm": 0.0}]}""";

    // A 600 mm cylinder of 15 mm, impedance at 4000 points: well over 64 KiB of JSON.
    private static final String BORE_4000 = """
            {"segments": [{"lengthMm": 600, "inputDiameterMm": 15, "outputDiameterMm": 15}],
             "inputEnd": "closed", "outputEnd": "open-unflanged", "fMinHz": 20, "fMaxHz": 3000,
             "points": 4000}""";

    @Value("${local.server.port}")
    int port;

    private final HttpClient client = HttpClient.newHttpClient();

    private HttpResponse<byte[]> post(String path, String body) throws IOException, InterruptedException {
        return client.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path))
                .header("Content-Type", "application/json").header("Accept-Encoding", "gzip")
                .POST(HttpRequest.BodyPublishers.ofString(body)).build(), HttpResponse.BodyHandlers.ofByteArray());
    }

    @Test
    void aStringAnalysisUnderTheThresholdGoesOutPlainWithItsLength() throws Exception {
        HttpResponse<byte[]> answer = post("/api/v1/strings/analyze", STRING_24);
        assertThat(answer.statusCode()).isEqualTo(200);
        assertThat(answer.headers().firstValue("Content-Encoding")).isEmpty();
        assertThat(answer.headers().firstValueAsLong("Content-Length")).hasValue(answer.body().length);
        assertThat(answer.body().length).isBetween(20_000, 64 * 1024);
        assertThat(new String(answer.body(), java.nio.charset.StandardCharsets.UTF_8)).startsWith("{");
    }

    @Test
    void aLargeImpedanceCurveIsStillCompressed() throws Exception {
        HttpResponse<byte[]> answer = post("/api/v1/air-columns/analyze", BORE_4000);
        assertThat(answer.statusCode()).isEqualTo(200);
        assertThat(answer.headers().firstValue("Content-Encoding")).hasValue("gzip");
        byte[] plain = new GZIPInputStream(new ByteArrayInputStream(answer.body())).readAllBytes();
        assertThat(plain.length).isGreaterThan(64 * 1024);
        assertThat(new String(plain, java.nio.charset.StandardCharsets.UTF_8)).contains("\"impedance\"");
    }

    @Test
    void aProblemDocumentKeepsItsStatusAndLength() throws Exception {
        HttpResponse<byte[]> answer = post("/api/v1/strings/analyze", STRING_24.replace("650.0", "-1"));
        assertThat(answer.statusCode()).isEqualTo(400);
        assertThat(answer.headers().firstValueAsLong("Content-Length")).hasValue(answer.body().length);
        assertThat(new String(answer.body(), java.nio.charset.StandardCharsets.UTF_8)).contains("lengthMm");
    }

    @Test
    void theEventStreamStillStreams() throws Exception {
        HttpResponse<java.io.InputStream> answer = client.send(
                HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + KnownLengthAnswers.EVENT_STREAM))
                        .header("Accept", "text/event-stream").GET().build(),
                HttpResponse.BodyHandlers.ofInputStream());
        assertThat(answer.statusCode()).isEqualTo(200);
        assertThat(answer.headers().firstValue("Content-Length")).isEmpty();
        try (java.io.InputStream in = answer.body()) {
            // The stream's first event arrives while the request is still open.
            String first = new String(in.readNBytes(20), java.nio.charset.StandardCharsets.UTF_8);
            assertThat(first).contains("hello");
        }
    }
}
