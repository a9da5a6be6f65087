package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;

/**
 * The bar bench in a real headless Chromium: presets, the drawn charts and table against the
 * server's own answer to the same request, an undercut change, units, an inline error, listen, the
 * undercut template, measure-the-blank and the tuning solver.
 */
class BarBenchIT extends BrowserTestBase {

    private final ObjectMapper json = new ObjectMapper();

    @BeforeEach
    void openBench() {
        driver.get(url("/bars"));
        waitFor(By.id("bar-form"));
        js("document.addEventListener('nodewright:bar-analyzed', () => { window.barCount = (window.barCount || 0) + 1; });");
        wait.until(d -> js("return !!(window.nodewrightBars && window.nodewrightBars.last()"
                + " && Chart.getChart(document.getElementById('bar-shapes-chart')));"));
    }

    private long count() {
        return ((Number) js("return window.barCount || 0;")).longValue();
    }

    private void analyzeAndWait(Runnable change) {
        long before = count();
        change.run();
        wait.until(d -> count() > before);
    }

    private void type(String id, String text) {
        WebElement input = driver.findElement(By.id(id));
        input.clear();
        input.sendKeys(text);
    }

    private JsonNode lastAnswer() {
        return json.readTree((String) js("return JSON.stringify(window.nodewrightBars.last());"));
    }

    /** The server's answer to exactly the request the page last sent, fetched outside the browser. */
    private JsonNode serverAnswer() throws Exception {
        String request = (String) js("return JSON.stringify(window.nodewrightBars.request());");
        HttpResponse<String> res = HttpClient.newHttpClient().send(HttpRequest.newBuilder(URI.create(url("/api/v1/bars/analyze")))
                .header("Content-Type", "application/json").POST(HttpRequest.BodyPublishers.ofString(request)).build(),
                HttpResponse.BodyHandlers.ofString());
        assertThat(res.statusCode()).as(res.body()).isEqualTo(200);
        return json.readTree(res.body());
    }

    private List<String> column(int index) {
        return driver.findElements(By.cssSelector("#bar-modes tbody tr")).stream()
                .map(r -> r.findElements(By.tagName("td")).get(index).getText()).toList();
    }

    @SuppressWarnings("unchecked")
    private List<Map<String, Object>> datasets(String canvasId) {
        return (List<Map<String, Object>>) js("const c = Chart.getChart(document.getElementById(arguments[0]));"
                + "return c.data.datasets.map(d => ({label: d.label, data: d.data}));", canvasId);
    }

    @SuppressWarnings("unchecked")
    private static double x(Object point) {
        return ((Number) ((Map<String, Object>) point).get("x")).doubleValue();
    }

    @Test
    void presetChartsAndTableShowTheServersAnswerAndAnUndercutLowersTheFundamental() throws Exception {
        analyzeAndWait(() -> new Select(driver.findElement(By.id("bar-preset"))).selectByValue("xylophone"));
        JsonNode server = serverAnswer();
        assertThat(lastAnswer().get("modes").get(0).get("frequencyHz").asDouble())
                .isEqualTo(server.get("modes").get(0).get("frequencyHz").asDouble());
        // table: one row per mode, frequencies as the server gave them (2 decimals)
        List<String> hz = column(2);
        assertThat(hz).hasSize(server.get("modes").size());
        for (int i = 0; i < hz.size(); i++) {
            assertThat(Double.parseDouble(hz.get(i))).isCloseTo(server.get("modes").get(i).get("frequencyHz").asDouble(),
                    within(0.0051));
        }
        // mode-shape chart: a curve and a node set per bending mode; the nodes drawn where the server put them
        List<Map<String, Object>> shapes = datasets("bar-shapes-chart");
        assertThat(shapes).hasSize(2 * 6);
        for (int n = 0; n < 6; n++) {
            List<Object> nodes = (List<Object>) shapes.get(2 * n + 1).get("data");
            JsonNode expected = server.get("modes").get(n).get("nodesMm");
            assertThat(nodes).hasSize(expected.size());
            for (int k = 0; k < nodes.size(); k++) {
                assertThat(x(nodes.get(k))).isCloseTo(expected.get(k).asDouble(), within(1e-9));
            }
        }
        // side view: the cord holes drawn at the server's cordHolesMm, 300 mm bar: near 0.224 L (common practice)
        List<Object> holes = (List<Object>) datasets("bar-side-chart").get(1).get("data");
        assertThat(holes).hasSize(2);
        assertThat(x(holes.get(0))).isCloseTo(server.get("cordHolesMm").get(0).asDouble(), within(1e-9));
        assertThat(x(holes.get(0)) / 300).isCloseTo(0.224, within(0.01));
        double plainF1 = server.get("modes").get(0).get("frequencyHz").asDouble();
        screenshot("bar-bench-xylophone");

        // an undercut (thinner in the middle) lowers mode 1: less stiffness where the bending is greatest
        analyzeAndWait(() -> {
            type("profile", "0 : 20\n90 : 20\n150 : 11\n210 : 20\n300 : 20");
            driver.findElement(By.id("analyze-bar")).click();
        });
        JsonNode cut = serverAnswer();
        double cutF1 = lastAnswer().get("modes").get(0).get("frequencyHz").asDouble();
        assertThat(cutF1).isEqualTo(cut.get("modes").get(0).get("frequencyHz").asDouble());
        assertThat(cutF1).isLessThan(0.9 * plainF1);
        assertThat(Double.parseDouble(column(2).get(0))).isCloseTo(cutF1, within(0.0051));
    }

    @Test
    void unitsSwitchShowsInchesAndABadThicknessIsAnInlineError() throws Exception {
        analyzeAndWait(() -> new Select(driver.findElement(By.id("bar-preset"))).selectByValue("glockenspiel"));
        JsonNode mm = lastAnswer();
        analyzeAndWait(() -> new Select(driver.findElement(By.id("bar-units"))).selectByValue("inch"));
        // 160 mm = 6.2992 in (1 in = 25.4 mm exactly)
        assertThat(driver.findElement(By.id("lengthMm")).getDomProperty("value")).isEqualTo("6.2992");
        // the request still speaks mm, and the answer is the same bar
        assertThat(((Number) js("return window.nodewrightBars.request().lengthMm;")).doubleValue()).isEqualTo(160.0);
        assertThat(lastAnswer().get("modes").get(0).get("frequencyHz").asDouble())
                .isEqualTo(mm.get("modes").get(0).get("frequencyHz").asDouble());
        String firstNode = column(6).get(0).split(",")[0].trim();
        assertThat(Double.parseDouble(firstNode)).isCloseTo(mm.get("modes").get(0).get("nodesMm").get(0).asDouble() / 25.4,
                within(0.0006));
        assertThat(driver.findElements(By.cssSelector(".unit")).get(0).getText()).isEqualTo("in");

        // a refused request sends no analysis event: wait for the field's own message
        type("thicknessMm", "-0.1");
        driver.findElement(By.id("analyze-bar")).click();
        WebElement error = driver.findElement(By.cssSelector("[data-error-for='thicknessMm']"));
        wait.until(d -> !error.getText().isBlank());
        // the server's message speaks mm; the page shows it in the unit chosen
        assertThat(error.getText()).contains("in").doesNotContain(" mm");
        assertThat(driver.findElement(By.id("form-problem")).getText()).startsWith("thicknessMm");
        assertThat(driver.findElement(By.id("thicknessMm")).getDomAttribute("class")).contains("invalid");
        screenshot("bar-bench-inline-error");
    }

    /**
     * A length typed in inches goes to the server in mm (1 in = 25.4 mm exactly, by definition since 1959), and
     * the bar answers as a bar of that length: a uniform free-free Euler-Bernoulli bar has f = (βL)² √(EI/ρA) /
     * (2π L²) with βL fixed by the ends, so f ∝ 1/L², which the element model keeps exactly when every element
     * scales with L.
     */
    @Test
    void aLengthTypedInInchesIsSentInMillimetres() throws Exception {
        analyzeAndWait(() -> new Select(driver.findElement(By.id("bar-preset"))).selectByValue("glockenspiel"));
        new Select(driver.findElement(By.id("theory"))).selectByValue("euler-bernoulli");
        analyzeAndWait(() -> driver.findElement(By.id("analyze-bar")).click());
        double f160 = lastAnswer().get("modes").get(0).get("frequencyHz").asDouble();
        analyzeAndWait(() -> new Select(driver.findElement(By.id("bar-units"))).selectByValue("inch"));
        type("lengthMm", "7");
        analyzeAndWait(() -> driver.findElement(By.id("analyze-bar")).click());
        assertThat(((Number) js("return window.nodewrightBars.request().lengthMm;")).doubleValue())
                .isCloseTo(177.8, within(1e-9));
        double f178 = lastAnswer().get("modes").get(0).get("frequencyHz").asDouble();
        assertThat(f178 / f160).isCloseTo(Math.pow(160.0 / 177.8, 2), within(1e-6));
        assertThat(driver.findElement(By.id("lengthMm")).getDomProperty("value")).isEqualTo("7");
    }

    @Test
    void listenTemplateAndMeasureTheBlank() throws Exception {
        analyzeAndWait(() -> new Select(driver.findElement(By.id("bar-preset"))).selectByValue("marimba"));
        JsonNode answer = lastAnswer();
        driver.findElement(By.id("bar-listen")).click();
        wait.until(d -> driver.findElement(By.id("listen-status")).getDomAttribute("data-state") != null);
        assertThat(driver.findElement(By.id("listen-status")).getDomAttribute("data-state")).isEqualTo("playing");
        List<Object> tap = (List<Object>) js("return window.nodewrightBars.lastTap.map(p => p.frequencyHz);");
        assertThat(((Number) tap.get(0)).doubleValue()).isEqualTo(answer.get("modes").get(0).get("frequencyHz").asDouble());

        driver.findElement(By.id("template-svg")).click();
        wait.until(d -> "svg".equals(driver.findElement(By.id("template-status")).getDomAttribute("data-kind")));
        String svg = (String) js("return window.nodewrightBars.lastTemplate;");
        assertThat(svg).contains("data-cord-hole=\"1\"", "data-cord-hole=\"2\"", "sensitiser");
        driver.findElement(By.id("template-pdf")).click();
        wait.until(d -> "pdf".equals(driver.findElement(By.id("template-status")).getDomAttribute("data-kind")));
        assertThat(Long.parseLong(driver.findElement(By.id("template-status")).getDomAttribute("data-bytes"))).isPositive();

        // measure the blank: two modes typed; after "use these moduli" the bar's mode 1 is the fitted model's
        type("blank-modes", "1: 172\n2: 690");
        driver.findElement(By.id("blank-fit")).click();
        wait.until(d -> "fitted".equals(driver.findElement(By.id("blank-status")).getDomAttribute("data-state")));
        double model1 = ((Number) js("return window.nodewrightBars.lastFit.matches[0].modelHz;")).doubleValue();
        analyzeAndWait(() -> driver.findElement(By.id("blank-apply")).click());
        assertThat(driver.findElement(By.id("youngsGPa")).getDomProperty("value")).isNotBlank();
        assertThat(lastAnswer().get("modes").get(0).get("frequencyHz").asDouble()).isCloseTo(model1, within(0.01 * model1 / 1000));
        assertThat(Math.abs(model1 - 172)).isLessThan(172 * 0.01);
        screenshot("bar-bench-blank");

        // the same panel from a recording: a synthetic tap of this bar with every mode 5 % sharp is
        // a blank whose moduli are 1.05² = 1.1025 times the catalogue's (f ∝ √E at fixed E/G)
        analyzeAndWait(() -> {
            driver.findElement(By.id("youngsGPa")).clear();
            driver.findElement(By.id("shearGPa")).clear();
            driver.findElement(By.id("analyze-bar")).click();
        });
        JsonNode plain = lastAnswer();
        double[] hz = new double[3];
        for (int n = 0; n < 3; n++) {
            hz[n] = 1.05 * plain.get("modes").get(n).get("frequencyHz").asDouble();
        }
        java.nio.file.Path wav = java.nio.file.Files.createTempFile("nodewright-tap-", ".wav");
        java.nio.file.Files.write(wav, org.nodewright.physics.measure.TestRecordings.tap(hz, new double[] {0.4, 0.2, 0.1}, 2.0));
        driver.findElement(By.id("blank-file")).sendKeys(wav.toAbsolutePath().toString());
        js("document.getElementById('blank-status').removeAttribute('data-state');");
        driver.findElement(By.id("blank-fit-recording")).click();
        wait.until(d -> driver.findElement(By.id("blank-status")).getDomAttribute("data-state") != null);
        assertThat(driver.findElement(By.id("blank-status")).getDomAttribute("data-state"))
                .as(driver.findElement(By.id("blank-problem")).getText()).isEqualTo("fitted");
        double catalogueE = plain.get("material").get("youngsModulusPa").asDouble();
        double fittedE = ((Number) js("return window.nodewrightBars.lastFit.youngsModulusPa;")).doubleValue();
        assertThat(fittedE / catalogueE).isCloseTo(1.1025, within(0.01));
        java.nio.file.Files.deleteIfExists(wav);
    }

    @Test
    void tuningSolverReachesTheMarimbaRatios() throws Exception {
        analyzeAndWait(() -> new Select(driver.findElement(By.id("bar-preset"))).selectByValue("marimba"));
        type("profile", "");
        analyzeAndWait(() -> driver.findElement(By.id("analyze-bar")).click());
        driver.findElement(By.id("solver-start")).click();
        new WebDriverWait(driver, Duration.ofSeconds(120)).until(d -> {
            String s = driver.findElement(By.id("solver-status")).getDomAttribute("data-state");
            return "succeeded".equals(s) || "failed".equals(s) || "cancelled".equals(s);
        });
        assertThat(driver.findElement(By.id("solver-status")).getDomAttribute("data-state")).isEqualTo("succeeded");
        assertThat(datasets("bar-sensitivity-chart")).hasSize(3);
        analyzeAndWait(() -> driver.findElement(By.id("solver-apply")).click());
        // the chart of partials against 1:4:10: modes 2 and 3 within the solver's ±3 cents
        List<Object> cents = (List<Object>) js("return Chart.getChart(document.getElementById('bar-ratios-chart'))"
                + ".data.datasets[0].data;");
        assertThat(cents).hasSize(2);
        for (Object c : cents) {
            assertThat(Math.abs(((Number) c).doubleValue())).isLessThan(3.0 * 2 + 0.01);
        }
        JsonNode a = lastAnswer();
        double f1 = a.get("modes").get(0).get("frequencyHz").asDouble();
        assertThat(1200 * Math.log(f1 / 174.614) / Math.log(2)).isCloseTo(0.0, within(3.01)); // F3, ISO 16 A4 = 440 Hz
        screenshot("bar-bench-tuned");
    }
}
