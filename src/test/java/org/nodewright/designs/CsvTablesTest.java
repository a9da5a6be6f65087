package org.nodewright.designs;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.nodewright.NodewrightWebTest;
import org.springframework.boot.test.web.server.LocalServerPort;

/** CSV tables on a real server (the CSV endpoints run the bench endpoints through a servlet include). */
@NodewrightWebTest
class CsvTablesTest {


    @LocalServerPort
    int port;

    private final HttpClient http = HttpClient.newHttpClient();

    private HttpResponse<String> send(String method, String path, String json) throws Exception {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + path));
        if (json != null) {
            b.header("Content-Type", "application/json").method(method, HttpRequest.BodyPublishers.ofString(json));
        } else {
            b.method(method, HttpRequest.BodyPublishers.noBody());
        }
        return http.send(b.build(), HttpResponse.BodyHandlers.ofString());
    }

    @Test
    void fretTableAsCsvPutsTheTwelfthFretAtHalfTheScale() throws Exception {
        HttpResponse<String> r = send("GET", "/api/v1/frets.csv?scaleLengthMm=650&count=22&divisionsPerOctave=12", null);
        assertThat(r.statusCode()).as(r.body()).isEqualTo(200);
        assertThat(r.headers().firstValue("Content-Type").orElse("")).startsWith("text/csv");
        List<String> lines = r.body().lines().toList();
        assertThat(lines).hasSize(23);
        assertThat(lines.get(0)).startsWith("fret,fromNutMm,fromPreviousMm");
        // Equal temperament: fret n sits at L(1 - 2^(-n/12)) from the nut, so fret 12 at L/2 (common practice).
        String[] twelfth = lines.get(12).split(",");
        assertThat(twelfth[0]).isEqualTo("12");
        assertThat(Double.parseDouble(twelfth[1])).isCloseTo(325.0, org.assertj.core.data.Offset.offset(1e-6));
    }

    @Test
    void partialsOfAStringAsCsvOneRowPerMode() throws Exception {
        HttpResponse<String> r = send("POST", "/api/v1/strings/partials.csv", DesignApiContract.STRING_PARAMS
                .replace("\"stiffness\": true", "\"stiffness\": false"));
        assertThat(r.statusCode()).as(r.body()).isEqualTo(200);
        List<String> lines = r.body().lines().toList();
        assertThat(lines).hasSize(13);
        List<String> header = List.of(lines.get(0).split(","));
        int n = header.indexOf("n");
        int f = header.indexOf("frequencyHz");
        int h = header.indexOf("harmonicHz");
        assertThat(n).isNotNegative();
        // A flexible string's partials are exact harmonics, f_n = n f_1 (Mersenne's law; common practice).
        String[] row1 = lines.get(1).split(",");
        String[] row3 = lines.get(3).split(",");
        assertThat(Double.parseDouble(row3[f])).isCloseTo(3 * Double.parseDouble(row1[f]),
                org.assertj.core.data.Offset.offset(1e-6));
        assertThat(Double.parseDouble(row3[h])).isCloseTo(Double.parseDouble(row3[f]),
                org.assertj.core.data.Offset.offset(1e-6));
    }

    @Test
    void badRequestGetsTheBenchsOwnProblemDocument() throws Exception {
        HttpResponse<String> r = send("POST", "/api/v1/strings/partials.csv",
                DesignApiContract.STRING_PARAMS.replace("650.0", "-650.0"));
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(r.headers().firstValue("Content-Type").orElse("")).startsWith("application/problem+json");
        assertThat(r.body()).contains("\"field\":\"lengthMm\"");
    }

    @Test
    void savedBoreAsCsvListsItsResonances() throws Exception {
        HttpResponse<String> created = send("POST", "/api/v1/designs", "{\"name\": \"Harrowgate test bore\","
                + " \"kind\": \"air-column\", \"parameters\": " + DesignApiContract.BORE_PARAMS + "}");
        assertThat(created.statusCode()).as(created.body()).isEqualTo(201);
        String id = created.body().replaceAll("(?s).*?\"id\":(\\d+).*", "$1");
        HttpResponse<String> r = send("GET", "/api/v1/designs/" + id + "/csv", null);
        assertThat(r.statusCode()).as(r.body()).isEqualTo(200);
        List<String> lines = r.body().lines().toList();
        List<String> header = List.of(lines.get(0).split(","));
        int f = header.indexOf("frequencyHz");
        assertThat(f).isNotNegative();
        double f1 = Double.parseDouble(lines.get(1).split(",")[f]);
        double f2 = Double.parseDouble(lines.get(2).split(",")[f]);
        // Closed-open cylinder, quarter-wave resonances f = (2k-1) c / 4(L + 0.6133 a): Levine-Schwinger
        // unflanged end correction; c = 343.2 m/s at 20 C dry (Cramer 1993). L = 300, a = 7.5 mm: 281.7 Hz.
        // Wall losses lower it slightly, hence 3 %.
        assertThat(f1).isCloseTo(281.7, org.assertj.core.data.Percentage.withPercentage(3));
        assertThat(f2 / f1).isCloseTo(3.0, org.assertj.core.data.Percentage.withPercentage(3));
    }
}
