package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;

/** The string bench in a real headless Chromium: form, four charts, movable markers, field errors. */
class StringBenchIT extends StringPageTestBase {

    private static final double LENGTH_MM = 650.0;

    @BeforeEach
    void openBench() {
        driver.get(url("/strings"));
        waitFor(By.id("string-form"));
        // Keep the last analysis the page announces, to compare the drawing with the numbers.
        js("document.addEventListener('nodewright:string-analyzed', e => { window.lastAnalysis = e.detail; "
                + "window.analysisCount = (window.analysisCount || 0) + 1; });");
        wait.until(d -> js("return !!Chart.getChart(document.getElementById('mode-shapes-chart'));"));
    }

    private void type(String id, String text) {
        WebElement input = driver.findElement(By.id(id));
        input.clear();
        input.sendKeys(text);
    }

    /** Clicks Analyse and waits until the page has announced a new analysis. */
    private void analyze() {
        long before = ((Number) js("return window.analysisCount || 0;")).longValue();
        driver.findElement(By.id("analyze-button")).click();
        wait.until(d -> ((Number) js("return window.analysisCount || 0;")).longValue() > before);
        // Further analyses may be queued by change events; wait until the page is idle.
        wait.until(d -> Boolean.TRUE.equals(js("return document.getElementById('busy').hidden;")));
    }

    /** Clicks Analyse and waits until every request the form has sent is answered. */
    private void submitAndWaitIdle() {
        driver.findElement(By.id("analyze-button")).click();
        wait.until(d -> Boolean.TRUE.equals(js("return document.getElementById('busy').hidden;")));
    }

    private static List<Map<String, Object>> ofKind(List<Map<String, Object>> sets, String kind) {
        return sets.stream().filter(d -> kind.equals(d.get("kind"))).toList();
    }

    @SuppressWarnings("unchecked")
    private static List<Map<String, Object>> points(Map<String, Object> dataset) {
        return (List<Map<String, Object>>) dataset.get("data");
    }

    @Test
    void typedStringIsDrawnWithEveryModeAndItsNodesAndAntinodes() throws Exception {
        type("lengthMm", "650");
        type("diameterMm", "0.3");
        type("targetHz", "E4");
        type("modeCount", "8");
        analyze();

        List<Map<String, Object>> shapes = datasets("mode-shapes-chart");
        assertThat(ofKind(shapes, "mode")).hasSize(8);
        // Mode n has n + 1 nodes (both ends included) and n antinodes: 44 nodes and 36 antinodes for 8 modes.
        assertThat(points(ofKind(shapes, "nodes").get(0))).hasSize(44);
        assertThat(points(ofKind(shapes, "antinodes").get(0))).hasSize(36);

        // Node map: one row per mode; a pinned string, stiff or not, keeps the sine shapes of the
        // ideal string, so the nodes of mode n sit at jL/n (beam under tension with pinned ends,
        // Fletcher 1964); positions to 0.05 mm.
        List<Map<String, Object>> rows = ofKind(datasets("node-map-chart"), "node-row");
        assertThat(rows).hasSize(8);
        for (Map<String, Object> row : rows) {
            int n = ((Number) row.get("n")).intValue();
            List<Map<String, Object>> nodes = points(row);
            assertThat(nodes).hasSize(n + 1);
            for (int j = 0; j <= n; j++) {
                assertThat(num(nodes.get(j).get("x"))).isCloseTo(j * LENGTH_MM / n, within(0.05));
            }
        }

        // The pluck and both pickups are marked on the node map and on the mode shapes.
        Map<String, Object> marks = annotations("node-map-chart");
        assertThat(marks).containsKeys("pluck", "pickup0", "pickup1");
        assertThat(num(((Map<String, Object>) marks.get("pluck")).get("xMin"))).isCloseTo(520.0, within(1e-9));
        assertThat(annotations("mode-shapes-chart")).containsKeys("pluck", "pickup0", "pickup1");

        // Partials against the harmonic series: for pinned ends f_n = n f1 sqrt(1 + B n^2)
        // (Fletcher 1964), so the bar of mode n is 600 log2(1 + B n^2) cents above n times the ideal f1.
        double b = num(js("return window.lastAnalysis.response.inharmonicityB;"));
        assertThat(b).isPositive();
        List<Object> cents = (List<Object>) datasets("partials-chart").get(0).get("data");
        assertThat(cents).hasSize(8);
        for (int n = 1; n <= 8; n++) {
            assertThat(num(cents.get(n - 1))).isCloseTo(600 * Math.log(1 + b * n * n) / Math.log(2), within(0.01));
        }

        // Results table: one row per mode; nodes from the bridge mirror those from the nut.
        List<WebElement> tableRows = driver.findElements(By.cssSelector("#modes-table tbody tr"));
        assertThat(tableRows).hasSize(8);
        List<WebElement> third = tableRows.get(2).findElements(By.tagName("td"));
        assertThat(third.get(5).getText()).isEqualTo("0.00, 216.67, 433.33, 650.00");
        assertThat(third.get(6).getText()).isEqualTo("0.00, 216.67, 433.33, 650.00");
        assertThat(driver.findElement(By.id("string-caution")).getText()).contains("eye protection");
        js("window.scrollTo(0, 0);");
        screenshot("string-bench-8-modes");
        js("document.getElementById('mode-shapes-chart').scrollIntoView();");
        screenshot("string-bench-mode-shapes");
        js("document.getElementById('modes-table').scrollIntoView();");
        screenshot("string-bench-table");
    }

    @SuppressWarnings("unchecked")
    private Map<String, Object> annotations(String canvasId) {
        return (Map<String, Object>) js("return Chart.getChart(document.getElementById(arguments[0]))"
                + ".options.plugins.annotation.annotations;", canvasId);
    }

    @Test
    @SuppressWarnings("unchecked")
    void movingThePickupChangesTheSpectrumAndANodeSilencesItsMode() throws Exception {
        type("modeCount", "12");
        analyze();
        List<Object> before = (List<Object>) ofKind(datasets("spectrum-chart"), "pickup").get(0).get("data");
        assertThat(before).hasSize(12);
        // Two pickups: the spectrum also shows them summed and in opposite phase.
        assertThat(ofKind(datasets("spectrum-chart"), "combined")).hasSize(2);

        // Slide pickup 1 towards the nut with the keyboard on its range slider.
        WebElement slider = driver.findElement(By.id("slider-pickup0"));
        double start = num(js("return Number(document.getElementById('pickup-0-position').value);"));
        for (int i = 0; i < 40; i++) {
            slider.sendKeys(Keys.ARROW_LEFT);
        }
        wait.until(d -> num(js("return window.lastAnalysis.request.pickups[0].positionMm;")) < start - 20);
        wait.until(d -> Boolean.TRUE.equals(js("return document.getElementById('busy').hidden;")));
        double moved = num(js("return Number(document.getElementById('pickup-0-position').value);"));
        assertThat(moved).isLessThan(start - 20);
        assertThat(num(((Map<String, Object>) annotations("node-map-chart").get("pickup0")).get("xMin")))
                .isCloseTo(moved, within(0.01));
        List<Object> after = (List<Object>) ofKind(datasets("spectrum-chart"), "pickup").get(0).get("data");
        assertThat(after).isNotEqualTo(before);

        // Drag the pluck line on the node map with the mouse.
        WebElement canvas = driver.findElement(By.id("node-map-chart"));
        Map<String, Object> geometry = (Map<String, Object>) js("const c = Chart.getChart(arguments[0]);"
                + "const a = c.options.plugins.annotation.annotations.pluck;"
                + "return {x: c.scales.x.getPixelForValue(a.xMin), y: (c.chartArea.top + c.chartArea.bottom) / 2,"
                + " w: arguments[0].clientWidth, h: arguments[0].clientHeight};", canvas);
        int fromX = (int) Math.round(num(geometry.get("x")) - num(geometry.get("w")) / 2);
        int fromY = (int) Math.round(num(geometry.get("y")) - num(geometry.get("h")) / 2);
        new Actions(driver).moveToElement(canvas, fromX, fromY).clickAndHold().moveByOffset(-120, 0).release().perform();
        wait.until(d -> num(js("return window.lastAnalysis.request.pluck.positionMm;")) < 500);
        assertThat(num(js("return Number(document.getElementById('pluckPosition').value);"))).isLessThan(500);

        // A point pickup on a node of mode 3 (L/3 from the nut) hears nothing of mode 3: common
        // practice (and the sine shape, zero at its nodes). Its bar sits on the chart's floor.
        type("pickup-0-position", String.valueOf(LENGTH_MM / 3));
        type("pickup-0-aperture", "0");
        analyze();
        List<Object> atNode = (List<Object>) ofKind(datasets("spectrum-chart"), "pickup").get(0).get("data");
        assertThat(num(atNode.get(2))).isEqualTo(-80.0);
        assertThat(num(atNode.get(0))).isGreaterThan(-80.0);
        assertThat(driver.findElement(By.id("near-nodes")).getText()).contains("3, 6, 9, 12");
        // Pointing at L/3 on the node map names the modes resting there: every third one.
        js("arguments[0].scrollIntoView({block: 'center'});", canvas);
        Map<String, Object> probe = (Map<String, Object>) js("const c = Chart.getChart(arguments[0]);"
                + "return {x: c.scales.x.getPixelForValue(arguments[1]), y: (c.chartArea.top + c.chartArea.bottom) / 2,"
                + " w: arguments[0].clientWidth, h: arguments[0].clientHeight};", canvas, LENGTH_MM / 3);
        new Actions(driver).moveToElement(canvas,
                (int) Math.round(num(probe.get("x")) - num(probe.get("w")) / 2),
                (int) Math.round(num(probe.get("y")) - num(probe.get("h")) / 2)).perform();
        wait.until(d -> driver.findElement(By.id("node-probe")).getText().contains("modes 3, 6, 9, 12"));
        js("document.getElementById('partials-chart').scrollIntoView();");
        screenshot("string-bench-pickup-on-node");
    }

    @Test
    void badValueGetsAnInlineErrorAndKeepsWhatWasTyped() throws Exception {
        // Text where a number belongs: the server's problem document names diameterMm.
        type("diameterMm", "abc");
        submitAndWaitIdle();
        assertThat(errorText("diameterMm")).isNotBlank();
        WebElement diameter = driver.findElement(By.id("diameterMm"));
        assertThat(diameter.getAttribute("class")).contains("invalid");
        assertThat(diameter.getAttribute("value")).isEqualTo("abc");

        // A negative length: named lengthMm, and the typed value stays in the field.
        type("diameterMm", "0.25");
        type("lengthMm", "-650");
        submitAndWaitIdle();
        assertThat(errorText("lengthMm")).isNotBlank();
        WebElement length = driver.findElement(By.id("lengthMm"));
        assertThat(length.getAttribute("class")).contains("invalid");
        assertThat(length.getAttribute("value")).isEqualTo("-650");
        assertThat(driver.findElements(By.cssSelector("[data-error-for='diameterMm']"))).isEmpty();
        js("document.getElementById('lengthMm').scrollIntoView({block: 'center'});");
        screenshot("string-bench-field-error");

        // Fixing the value clears the error and draws again.
        type("lengthMm", "650");
        analyze();
        assertThat(driver.findElements(By.cssSelector("[data-error-for='lengthMm']"))).isEmpty();
        assertThat(length.getAttribute("class")).doesNotContain("invalid");
    }

    @Test
    void inchesAndPoundsAreConvertedAtTheEdgeWithoutNudgingTheValues() throws Exception {
        analyze();
        double tensionN = num(js("return window.lastAnalysis.response.tensionN;"));
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("length-unit"))).selectByValue("inch");
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("force-unit"))).selectByValue("lbf");
        // 650 mm is 25.59055 inch (1 inch = 25.4 mm exactly, NIST SP 811).
        assertThat(driver.findElement(By.id("lengthMm")).getAttribute("value")).isEqualTo("25.59055");
        analyze();
        assertThat(num(js("return window.lastAnalysis.request.lengthMm;"))).isEqualTo(650.0);
        assertThat(num(js("return window.lastAnalysis.request.pluck.positionMm;"))).isEqualTo(520.0);
        // A new length typed in inches goes to the server in mm: 25.5 inch = 647.7 mm.
        type("lengthMm", "25.5");
        analyze();
        assertThat(num(js("return window.lastAnalysis.request.lengthMm;"))).isCloseTo(647.7, within(1e-9));
        // The tension is shown in lbf (1 lbf = 4.4482216152605 N, NIST SP 811).
        String summary = driver.findElement(By.id("summary")).getText();
        double lbf = num(js("return window.lastAnalysis.response.tensionN;")) / 4.4482216152605;
        assertThat(summary).contains(String.format(java.util.Locale.ROOT, "%.3f lbf", lbf));
        assertThat(tensionN).isPositive();
        screenshot("string-bench-inches");
    }

    @Test
    @SuppressWarnings("unchecked")
    void clampedEndsRaiseThePartialsAndAppliedParametersReachTheForm() throws Exception {
        type("modeCount", "8");
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("endCondition"))).selectByValue("clamped");
        analyze();
        assertThat(js("return window.lastAnalysis.request.endCondition;")).isEqualTo("clamped");
        double b = num(js("return window.lastAnalysis.response.inharmonicityB;"));
        List<Object> cents = (List<Object>) datasets("partials-chart").get(0).get("data");
        // Fletcher 1964, clamped ends: f_n = n f0 sqrt(1 + B n^2) (1 + 2/pi sqrt(B) + 4/pi^2 B), an
        // approximation of the exact beam solution the server computes; to 0.05 cent at this small B.
        for (int n = 1; n <= 8; n++) {
            double ratio = Math.sqrt(1 + b * n * n) * (1 + 2 / Math.PI * Math.sqrt(b) + 4 / (Math.PI * Math.PI) * b);
            assertThat(num(cents.get(n - 1))).isCloseTo(1200 * Math.log(ratio) / Math.log(2), within(0.05));
        }
        // The clamped shapes come from the server (shapeX, shape), not a sine: drawn as sent.
        List<Map<String, Object>> modes = ofKind(datasets("mode-shapes-chart"), "mode");
        assertThat(modes).hasSize(8);
        List<Object> shapeX = (List<Object>) js("return window.lastAnalysis.response.modes[0].shapeX;");
        assertThat(points(modes.get(0))).hasSize(shapeX.size());

        // Another panel hands over measured values: they land in the override fields and are analysed.
        long before = ((Number) js("return window.analysisCount || 0;")).longValue();
        js("document.dispatchEvent(new CustomEvent('nodewright:apply-string-parameters',"
                + " {detail: {linearDensityKgPerM: 0.0006, youngsModulusPa: 1.9e11}}));");
        wait.until(d -> ((Number) js("return window.analysisCount;")).longValue() > before);
        assertThat(driver.findElement(By.id("linearDensity")).getAttribute("value")).isEqualTo("0.6");
        assertThat(driver.findElement(By.id("youngsModulus")).getAttribute("value")).isEqualTo("190");
        assertThat(num(js("return window.lastAnalysis.request.linearDensityKgPerM;"))).isCloseTo(0.0006, within(1e-15));
        assertThat(num(js("return window.lastAnalysis.response.linearDensityKgPerM;"))).isCloseTo(0.0006, within(1e-15));
        assertThat(num(js("return window.lastAnalysis.request.youngsModulusPa;"))).isCloseTo(1.9e11, within(1.0));
        screenshot("string-bench-clamped");
    }

    @Test
    void aStringPastItsStrengthShowsAStrongWarningBesideTheCaution() throws Exception {
        driver.findElement(By.cssSelector("input[name='drive'][value='tension']")).click();
        type("diameterMm", "0.25");
        type("tensionN", "300");
        analyze();
        // 300 N on a 0.25 mm wire is 300 / (pi 0.25^2 / 4) = 6112 MPa, far past any steel wire.
        assertThat(num(js("return window.lastAnalysis.request.tensionN;"))).isEqualTo(300.0);
        assertThat(js("return 'targetHz' in window.lastAnalysis.request;")).isEqualTo(false);
        assertThat(driver.findElement(By.id("summary")).getText()).contains("6112 MPa");
        assertThat(driver.findElements(By.cssSelector("#warnings li.strong"))).isNotEmpty();
        assertThat(driver.findElement(By.id("summary-panel")).getAttribute("class")).contains("danger");
        assertThat(driver.findElement(By.id("string-caution")).isDisplayed()).isTrue();
        js("window.scrollTo(0, 0);");
        screenshot("string-bench-over-strength");
    }

    @Test
    void aWoundStringSendsItsWrapAndWeighsMoreThanItsCore() throws Exception {
        type("diameterMm", "0.4");
        analyze();
        double plain = num(js("return window.lastAnalysis.response.linearDensityKgPerM;"));
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("construction"))).selectByValue("wound");
        assertThat(driver.findElement(By.id("wrapDiameterMm")).isDisplayed()).isTrue();
        analyze();
        assertThat(js("return window.lastAnalysis.request.wrapMaterial;")).isNotNull();
        assertThat(num(js("return window.lastAnalysis.request.wrapDiameterMm;"))).isEqualTo(0.25);
        // A wrap can only add mass: the wound string is heavier per metre than its bare core.
        assertThat(num(js("return window.lastAnalysis.response.linearDensityKgPerM;"))).isGreaterThan(plain);
    }

    @Test
    void aSavedDesignComesBackIntoTheFormThroughTheDesignBar() throws Exception {
        type("lengthMm", "640");
        type("modeCount", "5");
        analyze();
        WebElement name = waitFor(By.cssSelector("#design-bar [data-role='name']"));
        name.sendKeys("Harrowgate Lane parlour, first string");
        driver.findElement(By.cssSelector("#design-bar [data-role='save']")).click();
        wait.until(d -> driver.getCurrentUrl().contains("design="));
        String designUrl = driver.getCurrentUrl();

        driver.get(url("/strings"));
        waitFor(By.id("string-form"));
        wait.until(d -> "650".equals(driver.findElement(By.id("lengthMm")).getAttribute("value")));
        driver.get(designUrl);
        wait.until(d -> "640".equals(driver.findElement(By.id("lengthMm")).getAttribute("value")));
        assertThat(driver.findElement(By.id("modeCount")).getAttribute("value")).isEqualTo("5");
        wait.until(d -> {
            Object count = js("const c = Chart.getChart(document.getElementById('partials-chart'));"
                    + "return c ? c.data.datasets[0].data.length : 0;");
            return ((Number) count).intValue() == 5;
        });
        screenshot("string-bench-saved-design");
    }
}
