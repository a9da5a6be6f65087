package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import org.apache.pdfbox.Loader;
import org.junit.jupiter.api.Test;
import org.nodewright.inverse.HeldSolver;
import org.nodewright.templates.render.PdfPaths;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.context.ApplicationContext;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The bench templates page in a real browser: fret template download, tone-hole solve, apply. */
class TemplatesIT extends BrowserTestBase {

    /** 1 pt = 1/72 in, 1 in = 25.4 mm (exact). */
    private static final double PT_PER_MM = 72.0 / 25.4;

    private String fetchFromPage(String url, String body, boolean binary) {
        Object result = ((JavascriptExecutor) driver).executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                        + "fetch(arguments[0], {method: 'POST', headers: {'Content-Type': 'application/json'}, body: arguments[1]})"
                        + ".then(r => arguments[2] ? r.arrayBuffer().then(b => { let s = ''; const a = new Uint8Array(b);"
                        + " for (let i = 0; i < a.length; i++) s += String.fromCharCode(a[i]); return btoa(s); }) : r.text())"
                        + ".then(done, e => done('ERROR ' + e));", url, body, binary);
        return (String) result;
    }

    /** How many designs the shop library holds now. */
    private long designCount() {
        Object n = ((JavascriptExecutor) driver).executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "fetch('/api/v1/designs').then(r => r.json()).then(d => done((Array.isArray(d) ? d : (d.designs || d.items || [])).length));");
        return ((Number) n).longValue();
    }

    /**
     * Issue 16 polish: the fret panel speaks inches when asked (what it sends is still mm), switching
     * back and forth leaves a typed length exactly as it was, and a marked position past the saddle
     * is drawn and said to be past the saddle.
     */
    @Test
    void fretPanelTakesInchesAndSaysWhyAMarkPastTheSaddleIsDrawnThere() throws Exception {
        driver.get(url("/templates"));
        WebElement scale = waitFor(By.id("fret-scale"));
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("fret-units"))).selectByValue("inch");
        // the default 650 mm shown in inches, 650 / 25.4 = 25.5906 (1 inch = 25.4 mm exactly)
        assertThat(scale.getDomProperty("value")).isEqualTo("25.5906");
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("fret-units"))).selectByValue("mm");
        assertThat(scale.getDomProperty("value")).isEqualTo("650");
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("fret-units"))).selectByValue("inch");
        scale.clear();
        scale.sendKeys("25.5");
        driver.findElement(By.id("fret-positions")).sendKeys("tailpiece = 27");
        js("window.__fretBodies = []; const f = window.fetch; window.fetch = (u, o) => {"
                + " if (String(u).includes('/templates/frets')) window.__fretBodies.push(o && o.body); return f(u, o); };");
        driver.findElement(By.id("fret-preview")).click();
        wait.until(d -> String.valueOf(js("return document.getElementById('fret-image').getAttribute('src') || ''"))
                .startsWith("blob:"));
        assertThat(driver.findElement(By.id("fret-message")).getText())
                .contains("tailpiece").contains("past the saddle").contains("27 inch").contains("25.5 inch");
        // What the page sent for the preview: the lengths in mm (1 inch = 25.4 mm exactly).
        Object sent = js("return window.__fretBodies[window.__fretBodies.length - 1];");
        var body = new tools.jackson.databind.json.JsonMapper().readTree(String.valueOf(sent));
        assertThat(body.get("scaleLengthMm").asDouble()).isCloseTo(25.5 * 25.4, within(1e-9));
        assertThat(body.get("positions").get(0).get("positionMm").asDouble()).isCloseTo(27 * 25.4, within(1e-9));
        js("localStorage.removeItem('nodewright.units.templates.frets');");
    }

    /** x1 of the SVG line whose attribute has that value (a fret slot, a ruler tick). */
    private static double lineX(org.w3c.dom.Document doc, String attribute, String value) {
        NodeList lines = doc.getElementsByTagName("line");
        for (int i = 0; i < lines.getLength(); i++) {
            Element e = (Element) lines.item(i);
            if (value.equals(e.getAttribute(attribute))) {
                return Double.parseDouble(e.getAttribute("x1"));
            }
        }
        return Double.NaN;
    }

    @Test
    void fretTemplatePreviewsAndItsSvgAndPdfMeasureTrue() throws Exception {
        driver.get(url("/templates"));
        WebElement scale = waitFor(By.id("fret-scale"));
        scale.clear();
        scale.sendKeys("650");
        WebElement count = driver.findElement(By.id("fret-count"));
        count.clear();
        count.sendKeys("22");
        driver.findElement(By.id("fret-positions")).sendKeys("bridge = 652.5");
        driver.findElement(By.id("fret-preview")).click();
        wait.until(d -> String.valueOf(js("return document.getElementById('fret-image').getAttribute('src') || ''"))
                .startsWith("blob:"));
        assertThat((Long) js("return document.getElementById('fret-image').naturalWidth")).isGreaterThan(0L);
        screenshot("templates-fret-preview");

        // What the page downloads, fetched the same way: the SVG parsed as XML.
        String request = "{\"scaleLengthMm\":650,\"count\":22,\"divisionsPerOctave\":12,\"lineLengthMm\":50,"
                + "\"positions\":[{\"label\":\"bridge\",\"positionMm\":652.5}]}";
        String svg = fetchFromPage("/api/v1/templates/frets.svg", request, false);
        var doc = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
        NodeList lines = doc.getElementsByTagName("line");
        double nut = Double.NaN;
        double fret12 = Double.NaN;
        double tick0 = Double.NaN;
        double tick100 = Double.NaN;
        for (int i = 0; i < lines.getLength(); i++) {
            Element e = (Element) lines.item(i);
            if ("0".equals(e.getAttribute("data-fret"))) {
                nut = Double.parseDouble(e.getAttribute("x1"));
            } else if ("12".equals(e.getAttribute("data-fret"))) {
                fret12 = Double.parseDouble(e.getAttribute("x1"));
            } else if ("0".equals(e.getAttribute("data-mm"))) {
                tick0 = Double.parseDouble(e.getAttribute("x1"));
            } else if ("100".equals(e.getAttribute("data-mm"))) {
                tick100 = Double.parseDouble(e.getAttribute("x1"));
            }
        }
        assertThat(fret12 - nut).isCloseTo(325.0, within(0.01)); // the octave at half the scale (common practice)
        assertThat(tick100 - tick0).isCloseTo(100.0, within(1e-9));
        assertThat(doc.getDocumentElement().getAttribute("width")).endsWith("mm");

        // The PDF on Letter: every page carries a ruler whose 0 and 100 mm ticks are 100 mm apart.
        String pdf64 = fetchFromPage("/api/v1/templates/frets.pdf?paper=letter", request, true);
        try (var pdf = Loader.loadPDF(Base64.getDecoder().decode(pdf64))) {
            assertThat(pdf.getNumberOfPages()).isGreaterThan(1);
            for (var page : pdf.getPages()) {
                List<Double> major = PdfPaths.of(page).stream().filter(PdfPaths.Segment::vertical)
                        .filter(s -> Math.abs(s.length() / PT_PER_MM - 5.0) < 1e-3)
                        .filter(s -> Math.min(s.y1(), s.y2()) / PT_PER_MM < 34.0)
                        .map(PdfPaths.Segment::x1).sorted().toList();
                assertThat((major.get(major.size() - 1) - major.get(0)) / PT_PER_MM).isCloseTo(100.0, within(1e-3));
            }
        }
    }

    @Test
    void toneHoleSolveConvergesAndItsResultIsAppliedAndHandedToTheBoreBench() throws Exception {
        driver.get(url("/templates"));
        wait.until(d -> String.valueOf(js("return document.getElementById('bore-json').value")).contains("segments"));
        String before = String.valueOf(js("return document.getElementById('bore-json').value"));
        driver.findElement(By.id("solve-start")).click();
        new WebDriverWait(driver, Duration.ofSeconds(60)).until(d ->
                "succeeded".equals(js("return document.getElementById('solve-state').dataset.status")));
        assertThat(((Number) js("return document.getElementById('solve-progress').value")).doubleValue()).isEqualTo(1.0);
        @SuppressWarnings("unchecked")
        List<String> cents = (List<String>) js(
                "return [...document.querySelectorAll('#note-rows tr')].map(r => r.dataset.cents)");
        assertThat(cents).hasSize(7).allSatisfy(c -> assertThat(Math.abs(Double.parseDouble(c))).isLessThan(3.0));
        screenshot("templates-solved");

        driver.findElement(By.id("solve-apply")).click();
        String after = String.valueOf(js("return document.getElementById('bore-json').value"));
        assertThat(after).isNotEqualTo(before);
        @SuppressWarnings("unchecked")
        List<Object> solved = (List<Object>) js("return [...document.querySelectorAll('#hole-rows tr')]"
                + ".map(r => Number(r.children[1].textContent))");
        @SuppressWarnings("unchecked")
        List<Object> applied = (List<Object>) js("return JSON.parse(document.getElementById('bore-json').value)"
                + ".holes.map(h => Number(h.positionMm.toFixed(2)))");
        assertThat(applied).hasSize(6);
        for (int i = 0; i < 6; i++) {
            assertThat(((Number) applied.get(i)).doubleValue()).isCloseTo(((Number) solved.get(i)).doubleValue(),
                    within(0.006));
        }

        // The drilling template of the applied bore shows each hole where the solver put it.
        driver.findElement(By.id("bore-preview")).click();
        wait.until(d -> String.valueOf(js("return document.getElementById('bore-image').getAttribute('src') || ''"))
                .startsWith("blob:"));

        // Open in the bore bench: handed over unsaved (nothing lands in the shop library on a click),
        // and the bore bench draws the solver's holes.
        long designsBefore = designCount();
        driver.findElement(By.id("solve-open")).click();
        wait.until(d -> d.getCurrentUrl().contains("/air-columns#from-templates"));
        wait.until(d -> js("return document.querySelector('main.air-bench').dataset.analyzed || null") != null);
        assertThat(driver.findElement(By.id("handover-note")).getText()).contains("not saved");
        @SuppressWarnings("unchecked")
        List<Object> onBench = (List<Object>) js(
                "return [...document.querySelectorAll('#hole-rows input[data-key=\"positionMm\"]')].map(e => Number(e.value))");
        assertThat(onBench).hasSize(6);
        for (int i = 0; i < 6; i++) {
            assertThat(((Number) onBench.get(i)).doubleValue())
                    .isCloseTo(((Number) solved.get(i)).doubleValue(), within(0.006));
        }
        assertThat(designCount()).isEqualTo(designsBefore);
        screenshot("templates-open-in-bore-bench");
    }

    @Test
    void compensationAndGaugePickerFillTheirTables() throws Exception {
        driver.get(url("/templates"));
        waitFor(By.id("comp-run")).click();
        wait.until(d -> !d.findElements(By.cssSelector("#comp-rows tr")).isEmpty());
        @SuppressWarnings("unchecked")
        List<String> setbacks = (List<String>) js("return [...document.querySelectorAll('#comp-rows tr')].map(r => r.dataset.setback)");
        assertThat(setbacks).hasSize(6).allSatisfy(v -> assertThat(Double.parseDouble(v)).isPositive());
        assertThat(driver.findElement(By.id("comp-model")).getText()).contains("Varieschi");
        driver.findElement(By.id("gauge-pick")).click();
        wait.until(d -> d.findElements(By.cssSelector("#gauge-rows tr")).size() == 7);
        screenshot("templates-compensation-and-gauges");
    }

    @Autowired
    private ApplicationContext app;

    /**
     * The solver runs one job at a time. The test holds it (as the controller test does), so the
     * page's own solve waits in the queue: only a working cancel button turns it "cancelled" (a
     * button that sent nothing would leave it queued, and it would succeed once the worker is free).
     */
    @Test
    void cancelStopsAQueuedSolve() throws Exception {
        driver.get(url("/templates"));
        wait.until(d -> String.valueOf(js("return document.getElementById('bore-json').value")).contains("segments"));
        try (HeldSolver held = HeldSolver.hold(app)) {
            driver.findElement(By.id("solve-start")).click();
            wait.until(d -> "queued".equals(js("return document.getElementById('solve-state').dataset.status")));
            assertThat(driver.findElement(By.id("solve-cancel")).isEnabled()).isTrue();
            driver.findElement(By.id("solve-cancel")).click();
            wait.until(d -> "cancelled".equals(js("return document.getElementById('solve-state').dataset.status")));
            assertThat(driver.findElement(By.id("solve-start")).isEnabled()).isTrue();
            assertThat(driver.findElement(By.id("solve-cancel")).isEnabled()).isFalse();
            assertThat(held.stillHolding()).isTrue();
        }
    }
}
