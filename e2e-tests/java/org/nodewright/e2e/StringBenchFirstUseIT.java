package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

/**
 * The string bench as a new user meets it: words instead of parser messages, decimal commas, an
 * empty pitch named on its own field, pickups that always land on the string, sliders that stay
 * inside it, and a switch from pitch to tension that keeps the pitch.
 */
class StringBenchFirstUseIT extends StringPageTestBase {

    @BeforeEach
    void openBench() {
        driver.get(url("/strings"));
        waitFor(By.id("string-form"));
        js("document.addEventListener('nodewright:string-analyzed', e => { window.lastAnalysis = e.detail; "
                + "window.analysisCount = (window.analysisCount || 0) + 1; });");
        wait.until(d -> js("return !!Chart.getChart(document.getElementById('mode-shapes-chart'));"));
        waitIdle();
    }

    private void type(String id, String text) {
        WebElement input = driver.findElement(By.id(id));
        input.clear();
        input.sendKeys(text);
    }

    private void waitIdle() {
        wait.until(d -> Boolean.TRUE.equals(js("return document.getElementById('busy').hidden;")));
    }

    private long analyses() {
        return ((Number) js("return window.analysisCount || 0;")).longValue();
    }

    private void analyze() {
        long before = analyses();
        driver.findElement(By.id("analyze-button")).click();
        wait.until(d -> analyses() > before);
        waitIdle();
    }

    @Test
    void textInANumberFieldIsAnsweredInWordsAndADecimalCommaIsANumber() {
        type("diameterMm", "abc");
        driver.findElement(By.id("analyze-button")).click();
        String message = errorText("diameterMm");
        assertThat(message).startsWith("enter a number");
        assertThat(driver.findElement(By.id("form-problem")).getText())
                .doesNotContainIgnoringCase("coerce").doesNotContain("could not be read");
        assertThat(driver.findElement(By.cssSelector(".bench-results")).getAttribute("class")).contains("stale");

        // 0,30 is 0.30 mm, as on the bore bench.
        type("diameterMm", "0,30");
        analyze();
        assertThat(num(js("return window.lastAnalysis.request.diameterMm;"))).isEqualTo(0.30);
        assertThat(driver.findElements(By.cssSelector("[data-error-for='diameterMm']"))).isEmpty();
    }

    @Test
    void anEmptyTargetPitchIsNamedOnThePitchField() {
        type("targetHz", "");
        driver.findElement(By.id("analyze-button")).click();
        assertThat(errorText("targetHz")).contains("target pitch");
        assertThat(driver.findElement(By.id("targetHz")).getAttribute("class")).contains("invalid");
        assertThat(driver.findElement(By.id("tensionN")).getAttribute("class")).doesNotContain("invalid");
    }

    @Test
    void aPitchWithItsUnitTypedIsAPitch() {
        type("targetHz", "329.63 Hz");
        analyze();
        assertThat(num(js("return window.lastAnalysis.request.targetHz;"))).isEqualTo(329.63);
    }

    @Test
    @SuppressWarnings("unchecked")
    void addedPickupsLandOnTheStringApartUntilThereIsNoRoom() {
        for (int i = 0; i < 12; i++) {
            driver.findElement(By.id("add-pickup")).click();
        }
        waitIdle();
        List<Object> positions = (List<Object>) js(
                "return [...document.querySelectorAll('.pickup-position')].map(e => Number(e.value));");
        assertThat(positions.size()).isBetween(4, 13);
        List<Double> sorted = positions.stream().map(StringPageTestBase::num).sorted().toList();
        // Inside the string (0 < x < L = 650 mm) and at least 20 mm apart (two coil widths centre to centre).
        assertThat(sorted.get(0)).isGreaterThan(0.0);
        assertThat(sorted.get(sorted.size() - 1)).isLessThan(650.0);
        for (int i = 1; i < sorted.size(); i++) {
            assertThat(sorted.get(i) - sorted.get(i - 1)).isGreaterThanOrEqualTo(19.9);
        }
        assertThat(driver.findElement(By.id("pickup-note")).getText()).contains("No room");
        // The server takes every position the page placed.
        analyze();
        assertThat(driver.findElements(By.cssSelector(".pickup-row .invalid"))).isEmpty();
        assertThat((List<Object>) js("return window.lastAnalysis.request.pickups;")).hasSize(positions.size());
    }

    @Test
    void slidersStayInsideTheStringAndLeaveATypedPositionAsTyped() {
        WebElement slider = driver.findElement(By.id("slider-pickup0"));
        double min = Double.parseDouble(slider.getAttribute("min"));
        double max = Double.parseDouble(slider.getAttribute("max"));
        double step = Double.parseDouble(slider.getAttribute("step"));
        assertThat(min).isGreaterThan(0.0);
        assertThat(max).isLessThan(650.0);
        // 610 mm sits on a step, so the slider shows it exactly.
        assertThat(Double.parseDouble(slider.getAttribute("value"))).isEqualTo(610.0);
        assertThat((610.0 - min) / step).isCloseTo(Math.rint((610.0 - min) / step), within(1e-9));
        assertThat(driver.findElement(By.id("pickup-0-position")).getAttribute("value")).isEqualTo("610");
    }

    /**
     * Issue 15 §6: the pluck and pickup lines on the node map are sliders for the keyboard too. Tab
     * reaches each line's handle (role slider, named, with its value and unit); the arrow keys move
     * it a millimetre, Page Up ten, End to one step short of the bridge; the form, the native slider
     * and the analysis follow.
     */
    @Test
    void theMarkersOnTheNodeMapMoveWithTheArrowKeys() {
        WebElement handle = waitFor(By.cssSelector("#node-map-chart ~ .line-handle[data-marker='pluck']"));
        assertThat(handle.getAttribute("role")).isEqualTo("slider");
        assertThat(handle.getAttribute("aria-label")).isEqualTo("Pluck");
        assertThat(handle.getAttribute("aria-valuenow")).isEqualTo("520");
        assertThat(handle.getAttribute("aria-valuetext")).isEqualTo("520 mm");
        assertThat(handle.getAttribute("aria-valuemax")).isEqualTo("649");
        // Reached from the keyboard: tabbing from the last form control before the chart lands on a handle.
        js("arguments[0].focus();", driver.findElement(By.id("analyze-button")));
        boolean reached = false;
        for (int i = 0; i < 80 && !reached; i++) {
            new org.openqa.selenium.interactions.Actions(driver).sendKeys(org.openqa.selenium.Keys.TAB).perform();
            reached = Boolean.TRUE.equals(js("return document.activeElement.dataset.marker === 'pluck'"
                    + " && document.activeElement.classList.contains('line-handle');"));
        }
        assertThat(reached).as("the pluck handle is in the tab order").isTrue();
        // The focused handle has a visible focus ring (outline drawn, not 'none').
        assertThat(js("return getComputedStyle(document.activeElement).outlineStyle;")).isNotEqualTo("none");

        long before = analyses();
        org.openqa.selenium.interactions.Actions keys = new org.openqa.selenium.interactions.Actions(driver);
        keys.sendKeys(org.openqa.selenium.Keys.ARROW_RIGHT).perform();
        wait.until(d -> "521".equals(d.findElement(By.id("pluckPosition")).getAttribute("value")));
        keys.sendKeys(org.openqa.selenium.Keys.PAGE_UP).perform();
        wait.until(d -> "531".equals(d.findElement(By.id("pluckPosition")).getAttribute("value")));
        wait.until(d -> analyses() > before && num(js("return window.lastAnalysis.request.pluck.positionMm;")) == 531.0);
        assertThat(driver.findElement(By.id("slider-pluck")).getAttribute("value")).isEqualTo("531");
        assertThat(num(js("return Chart.getChart(document.getElementById('node-map-chart'))"
                + ".options.plugins.annotation.annotations.pluck.xMin;"))).isEqualTo(531.0);
        keys.sendKeys(org.openqa.selenium.Keys.END).perform();
        wait.until(d -> "649".equals(d.findElement(By.id("pluckPosition")).getAttribute("value")));
        assertThat(driver.findElement(By.cssSelector("#node-map-chart ~ .line-handle[data-marker='pluck']"))
                .getAttribute("aria-valuenow")).isEqualTo("649");
        // The chart has its text alternative: an image named by its panel, described by a table of its numbers.
        WebElement canvas = driver.findElement(By.id("node-map-chart"));
        assertThat(canvas.getAttribute("role")).isEqualTo("img");
        assertThat(canvas.getAttribute("aria-describedby")).contains("node-map-chart-numbers").contains("modes-table");
        assertThat(driver.findElements(By.cssSelector("#node-map-chart-numbers tbody tr"))).hasSize(12);
    }

    @Test
    void switchingFromPitchToTensionKeepsTheSolvedTension() {
        type("targetHz", "E4");
        analyze();
        double atPitch = num(js("return window.lastAnalysis.response.fundamentalHz;"));
        long before = analyses();
        driver.findElement(By.cssSelector("input[name='drive'][value='tension']")).click();
        wait.until(d -> analyses() > before && Boolean.TRUE.equals(js("return 'tensionN' in window.lastAnalysis.request;")));
        waitIdle();
        double atTension = num(js("return window.lastAnalysis.response.fundamentalHz;"));
        // The solved tension is what the tension field starts from, so the pitch stays put (the
        // old typed 70 N moved E4 by -9.3 cents): within a thousandth of a cent.
        assertThat(Math.abs(1200 * Math.log(atTension / atPitch) / Math.log(2))).isLessThan(0.001);
    }

    @Test
    void aDesignSavedInInchesAndPoundsReopensSoAndTheNameIsKept() {
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("length-unit"))).selectByValue("inch");
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("force-unit"))).selectByValue("lbf");
        WebElement bar = waitFor(By.cssSelector("#design-bar[data-ready='true']"));
        bar.findElement(By.cssSelector("[data-role='name']")).sendKeys("Parlour first string in inches");
        bar.findElement(By.cssSelector("[data-role='who']")).sendKeys("Ada");
        bar.findElement(By.cssSelector("[data-role='save']")).click();
        wait.until(d -> d.findElement(By.id("design-bar")).getAttribute("data-design-id") != null);
        String id = driver.findElement(By.id("design-bar")).getAttribute("data-design-id");

        // A later visit in this browser, with the page's units back at their defaults.
        js("localStorage.removeItem('nodewright.units.strings');");
        driver.get(url("/strings?design=" + id));
        wait.until(d -> id.equals(d.findElement(By.id("design-bar")).getAttribute("data-design-id")));
        assertThat(driver.findElement(By.id("length-unit")).getAttribute("value")).isEqualTo("inch");
        assertThat(driver.findElement(By.id("force-unit")).getAttribute("value")).isEqualTo("lbf");
        // 650 mm = 25.59055 inch (1 inch = 25.4 mm exactly).
        assertThat(driver.findElement(By.id("lengthMm")).getAttribute("value")).isEqualTo("25.59055");
        assertThat(driver.findElement(By.cssSelector("#design-bar [data-role='who']")).getAttribute("value")).isEqualTo("Ada");
    }

    @Test
    void aColleagueOpeningADesignSavedInInchesAndPoundsSeesItInInchesAndPounds() throws Exception {
        // Issue 16 item 8: the units travel with the design, not only in the browser that saved it.
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("length-unit"))).selectByValue("inch");
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("force-unit"))).selectByValue("lbf");
        WebElement bar = waitFor(By.cssSelector("#design-bar[data-ready='true']"));
        bar.findElement(By.cssSelector("[data-role='name']")).sendKeys("Parlour first string for Bram");
        bar.findElement(By.cssSelector("[data-role='save']")).click();
        wait.until(d -> d.findElement(By.id("design-bar")).getAttribute("data-design-id") != null);
        String id = driver.findElement(By.id("design-bar")).getAttribute("data-design-id");

        // Another person's browser: its own profile, so nothing of the first browser's storage.
        org.openqa.selenium.WebDriver colleague = newBrowser();
        try {
            var theirWait = new org.openqa.selenium.support.ui.WebDriverWait(colleague, java.time.Duration.ofSeconds(15));
            colleague.get(url("/strings?design=" + id));
            theirWait.until(d -> id.equals(d.findElement(By.id("design-bar")).getAttribute("data-design-id")));
            assertThat(colleague.findElement(By.id("length-unit")).getAttribute("value")).isEqualTo("inch");
            assertThat(colleague.findElement(By.id("force-unit")).getAttribute("value")).isEqualTo("lbf");
            // 650 mm = 25.59055 inch (1 inch = 25.4 mm exactly).
            assertThat(colleague.findElement(By.id("lengthMm")).getAttribute("value")).isEqualTo("25.59055");
        } finally {
            colleague.quit();
        }
    }

    @Test
    void inInchesAMessageSpeaksInchesWithoutFloatNoise() {
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("length-unit"))).selectByValue("inch");
        type("lengthMm", "25.5");
        type("pluckPosition", "30");
        driver.findElement(By.id("analyze-button")).click();
        // 25.5 in = 647.7 mm, which the server saw as 647.6999999999999 mm; the page says 25.5 in.
        // (Clearing the field sends an empty position first; wait for the answer to the typed one.)
        String message = wait.until(d -> {
            String m = (String) js("const e = document.querySelector('[data-error-for=\"pluck.positionMm\"]');"
                    + "return e ? e.textContent : null;");
            return m != null && m.contains("bridge") ? m : null;
        });
        assertThat(message).contains("25.5 in").doesNotContain("mm").doesNotContain("6999");
    }
}
