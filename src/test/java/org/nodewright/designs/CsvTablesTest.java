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
        // Closed-open cylinder, L = 300 mm, a = 7.5 mm, 20 C dry air (the request's defaults), written here:
        // f_n = (2n-1) c / (4 (L + 0.6133 a)) / (1 + 1.045 / rv), the quarter-wave series with Levine &
        // Schwinger's unflanged end correction (1948) and the boundary-layer phase velocity of Keefe
        // (J. Acoust. Soc. Am. 75, 58, 1984), rv = a sqrt(omega rho / mu); c = 343.36 m/s (Cramer 1993),
        // rho = 1.2046 kg/m3, mu = 1.813e-5 Pa s (see AirPropertiesTest). Solved by fixed point below.
        // Tolerance 0.1 %: the end correction's change with ka (0.04 and 0.12 here) moves f by 0.005 %,
        // the next loss term by less; the end correction alone is 1.5 % of f and the losses 1.3 %.
        assertThat(f1).isCloseTo(quarterWave(1), org.assertj.core.data.Percentage.withPercentage(0.1));
        assertThat(f2).isCloseTo(quarterWave(2), org.assertj.core.data.Percentage.withPercentage(0.1));
        assertThat(f2 / f1).isCloseTo(quarterWave(2) / quarterWave(1), org.assertj.core.data.Offset.offset(0.002));
    }

    /** The contract's string-set example with a label per string (labels are the one text column). */
    static String stringSet(String... labels) {
        StringBuilder b = new StringBuilder("{\"lengthMm\": 650.0, \"referenceA4Hz\": 440.0, \"strings\": [");
        double[] hz = {329.63, 246.94, 196.00};
        double[] d = {0.25, 0.33, 0.43};
        for (int i = 0; i < labels.length; i++) {
            b.append(i == 0 ? "" : ", ").append("{\"label\": \"").append(labels[i]).append("\", \"targetHz\": ")
                    .append(hz[i]).append(", \"material\": \"plain-steel\", \"diameterMm\": ").append(d[i]).append('}');
        }
        return b.append("]}").toString();
    }

    static List<List<String>> rows(String csv) {
        return csv.lines().map(l -> List.of(l.split(",", -1))).toList();
    }

    @Test
    void stringSetAsCsvOneRowPerStringWithMersennesTension() throws Exception {
        HttpResponse<String> r = send("POST", "/api/v1/string-sets/strings.csv", stringSet("top E", "B", "G"));
        assertThat(r.statusCode()).as(r.body()).isEqualTo(200);
        assertThat(r.headers().firstValue("Content-Type").orElse("")).startsWith("text/csv");
        List<List<String>> rows = rows(r.body());
        assertThat(rows).hasSize(4);
        List<String> header = rows.get(0);
        int label = header.indexOf("label");
        int tension = header.indexOf("tensionN");
        assertThat(label).isNotNegative();
        assertThat(tension).isNotNegative();
        assertThat(rows.get(1).get(label)).isEqualTo("top E");
        // Mersenne's law written here, T = rho (pi d^2 / 4) (2 L f)^2, plain steel at the material's
        // catalogue density (read from /api/v1/materials): 0.25 mm, 650 mm, 329.63 Hz.
        HttpResponse<String> materials = send("GET", "/api/v1/materials", null);
        double rho = Double.parseDouble(materials.body()
                .replaceAll("(?s).*?\"id\":\"plain-steel\".*?\"densityKgPerM3\":([0-9.eE+-]+).*", "$1"));
        double expected = rho * Math.PI * Math.pow(0.25e-3, 2) / 4 * Math.pow(2 * 0.650 * 329.63, 2);
        assertThat(Double.parseDouble(rows.get(1).get(tension))).isCloseTo(expected,
                org.assertj.core.data.Percentage.withPercentage(1e-6));
    }

    /**
     * Issue 16 item 11: one value per cell. A note is its name in one cell and its cents in the next
     * (no JSON object), and the string table carries no sampled mode shapes: every cell of every
     * table is a number, a note name, a word, or a list of positions separated by semicolons.
     */
    @Test
    void notesAreANameAndCentsInCellsOfTheirOwnAndNoCellHoldsJsonOrShapes() throws Exception {
        HttpResponse<String> set = send("POST", "/api/v1/string-sets/strings.csv", stringSet("top E", "B", "G"));
        assertThat(set.statusCode()).as(set.body()).isEqualTo(200);
        List<List<String>> rows = rows(set.body());
        int note = rows.get(0).indexOf("note");
        int cents = rows.get(0).indexOf("noteCentsOff");
        assertThat(note).isNotNegative();
        assertThat(cents).isNotNegative();
        // 329.63 Hz against E4 = 440 * 2^(-5/12) Hz (ISO 16 equal temperament), written here: +0.0126 cents.
        double e4 = 440.0 * Math.pow(2, -5.0 / 12);
        assertThat(rows.get(1).get(note)).isEqualTo("E4");
        assertThat(Double.parseDouble(rows.get(1).get(cents))).isCloseTo(1200 * Math.log(329.63 / e4) / Math.log(2),
                org.assertj.core.data.Offset.offset(0.05));
        assertThat(rows.get(2).get(note)).isEqualTo("B3");
        assertThat(rows.get(3).get(note)).isEqualTo("G3");

        HttpResponse<String> partials = send("POST", "/api/v1/strings/partials.csv", DesignApiContract.STRING_PARAMS);
        HttpResponse<String> resonances = send("POST", "/api/v1/air-columns/resonances.csv", DesignApiContract.BORE_PARAMS);
        for (HttpResponse<String> r : List.of(set, partials, resonances)) {
            assertThat(r.statusCode()).as(r.body()).isEqualTo(200);
            assertThat(r.body()).as("no JSON in any cell").doesNotContain("{").doesNotContain("[").doesNotContain("\"name\"");
            List<String> header = rows(r.body()).get(0);
            assertThat(header).as("no sampled shapes").doesNotContain("shape", "shapeX");
            for (List<String> row : rows(r.body())) {
                assertThat(row).as("a row as wide as its header").hasSize(header.size());
            }
        }
        // The partials table: 12 modes, 12 rows, a mode's nodes in one cell as positions (mode 3 of a
        // pinned 650 mm string: the two ends and nodes at L/3 and 2L/3, about 216.7 and 433.3 mm).
        List<List<String>> modes = rows(partials.body());
        assertThat(modes).hasSize(13);
        String nodes3 = modes.get(3).get(modes.get(0).indexOf("nodesMm")).replace("\"", "");
        List<Double> positions = java.util.Arrays.stream(nodes3.split(";")).map(Double::parseDouble).toList();
        assertThat(positions).hasSize(4);
        assertThat(positions.get(0)).isEqualTo(0.0);
        assertThat(positions.get(1)).isCloseTo(650.0 / 3, org.assertj.core.data.Offset.offset(1.0));
        assertThat(positions.get(2)).isCloseTo(1300.0 / 3, org.assertj.core.data.Offset.offset(1.0));
        assertThat(positions.get(3)).isEqualTo(650.0);
    }

    /**
     * Text a spreadsheet would run as a formula (a cell starting with =, +, - or @; OWASP's CSV
     * injection advice) is written with a leading apostrophe, and RFC 4180 quoting keeps commas and
     * quotes inside their cell. Numbers, negative ones too, stay plain numbers.
     */
    @Test
    void labelsThatLookLikeFormulasAreWrittenAsText() throws Exception {
        HttpResponse<String> r = send("POST", "/api/v1/string-sets/strings.csv",
                stringSet("=HYPERLINK(1)", "-2+3", "@SUM(1)"));
        assertThat(r.statusCode()).as(r.body()).isEqualTo(200);
        List<String> lines = r.body().lines().toList();
        assertThat(lines.get(1)).contains("'=HYPERLINK(1)").doesNotContain(",=HYPERLINK");
        assertThat(lines.get(2)).contains("'-2+3");
        assertThat(lines.get(3)).contains("'@SUM(1)");
        HttpResponse<String> quoted = send("POST", "/api/v1/string-sets/strings.csv",
                stringSet("+tuned, \\\"bright\\\"", "B", "G"));
        assertThat(quoted.statusCode()).as(quoted.body()).isEqualTo(200);
        assertThat(quoted.body().lines().toList().get(1)).contains("\"'+tuned, \"\"bright\"\"\"");
        // Negative numbers, alone or in a list, stay numbers; only text is guarded.
        // (The guard keys off the cell's text: a plain number such as -3.5 is left as it is; see CsvTableTest.)
        org.nodewright.web.CsvTable<Object[]> t = org.nodewright.web.CsvTable.of(
                org.nodewright.web.CsvTable.column("centsFromSeries", (Object[] row) -> row[0]),
                org.nodewright.web.CsvTable.column("nodesMm", (Object[] row) -> row[1]),
                org.nodewright.web.CsvTable.column("label", (Object[] row) -> row[2]));
        String table = t.write(List.<Object[]>of(new Object[] {-3.5, List.of(-1.0, 2.0), "-2+3"}));
        assertThat(table.lines().toList().get(1)).isEqualTo("-3.5,\"-1.0;2.0\",'-2+3");
    }

    @Test
    void resonancesAsCsvMatchTheAnalysisOneRowEach() throws Exception {
        HttpResponse<String> json = send("POST", "/api/v1/air-columns/analyze", DesignApiContract.BORE_PARAMS);
        assertThat(json.statusCode()).as(json.body()).isEqualTo(200);
        List<Double> expected = com.jayway.jsonpath.JsonPath.<List<Number>>read(json.body(),
                "$.resonances[*].frequencyHz").stream().map(Number::doubleValue).toList();
        HttpResponse<String> r = send("POST", "/api/v1/air-columns/resonances.csv", DesignApiContract.BORE_PARAMS);
        assertThat(r.statusCode()).as(r.body()).isEqualTo(200);
        assertThat(r.headers().firstValue("Content-Type").orElse("")).startsWith("text/csv");
        List<List<String>> rows = rows(r.body());
        int f = rows.get(0).indexOf("frequencyHz");
        assertThat(rows).hasSize(expected.size() + 1);
        assertThat(expected).hasSizeGreaterThanOrEqualTo(5);
        for (int i = 0; i < expected.size(); i++) {
            assertThat(Double.parseDouble(rows.get(i + 1).get(f))).isEqualTo(expected.get(i));
        }
        // And the first is the end-corrected, boundary-layer quarter wave written below.
        assertThat(expected.get(0)).isCloseTo(quarterWave(1), org.assertj.core.data.Percentage.withPercentage(0.1));
        HttpResponse<String> bad = send("POST", "/api/v1/air-columns/resonances.csv",
                DesignApiContract.BORE_PARAMS.replace("300.0", "-300.0"));
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(bad.body()).contains("\"field\":\"segments[0].lengthMm\"");
    }

    private static double quarterWave(int n) {
        double c = 343.36;
        double rho = 1.2046;
        double mu = 1.813e-5;
        double a = 0.0075;
        double f = (2 * n - 1) * c / (4 * (0.300 + 0.6133 * a));
        for (int i = 0; i < 30; i++) {
            double rv = a * Math.sqrt(2 * Math.PI * f * rho / mu);
            f = (2 * n - 1) * c / (4 * (0.300 + 0.6133 * a)) / (1 + 1.045 / rv);
        }
        return f;
    }
}
