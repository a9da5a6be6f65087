package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;
import org.nodewright.physics.measure.TestRecordings;

/**
 * The plate bench in a real headless Chromium: presets, mode gallery with node lines, thickness, braces, errors, the
 * thickness solver and measuring a sample.
 */
class PlateBenchIT extends BrowserTestBase {

    @BeforeEach
    void openBench() {
        driver.get(url("/plates"));
        waitFor(By.id("plate-form"));
        js("document.addEventListener('nodewright:plate-analyzed', () => { "
                + "window.plateCount = (window.plateCount || 0) + 1; });");
        wait.until(d -> js("return document.querySelectorAll('#mode-gallery canvas').length;") instanceof Number n
                && n.intValue() > 0);
    }

    private long count() {
        Object c = js("return window.plateCount || 0;");
        return ((Number) c).longValue();
    }

    private void analyzeAndWait() {
        long before = count();
        driver.findElement(By.id("analyze-plate")).click();
        wait.until(d -> count() > before);
    }

    private double frequency(int n) {
        return ((Number) js("return window.nodewrightPlates.last().modes[" + (n - 1) + "].frequencyHz;")).doubleValue();
    }

    private void type(String id, String text) {
        WebElement input = driver.findElement(By.id(id));
        input.clear();
        input.sendKeys(text);
    }

    @Test
    void presetShowsAGalleryWithNodeLinesAndThicknessMovesTheFrequencies() throws Exception {
        long before = count();
        new Select(driver.findElement(By.id("plate-preset"))).selectByValue("lane-parlour-top");
        wait.until(d -> count() > before);
        assertThat(driver.findElements(By.cssSelector("#mode-gallery canvas"))).hasSize(12);
        for (WebElement canvas : driver.findElements(By.cssSelector("#mode-gallery canvas"))) {
            assertThat(Integer.parseInt(canvas.getDomAttribute("data-nodal-lines"))).isPositive();
        }
        // something was drawn: the centre pixel of the first map is not blank
        Object alpha = js("const c = document.getElementById('plate-mode-1');"
                + "return c.getContext('2d').getImageData(c.width / 2, c.height / 2, 1, 1).data[3];");
        assertThat(((Number) alpha).intValue()).isPositive();
        screenshot("plate-bench-parlour");

        // A free plate of uniform thickness h: Kirchhoff frequencies scale with h (ω ∝ √(D/ρh) ∝ h, Leissa 1969).
        new Select(driver.findElement(By.id("plate-preset"))).selectByValue("test-rectangle");
        wait.until(d -> count() > before + 1);
        double f3 = frequency(1);
        type("thicknessMm", "6.0");
        analyzeAndWait();
        assertThat(frequency(1) / f3).isCloseTo(2.0, within(1e-3));

        // A brace along the grain on the centre line (the new row's default) moves the modes
        double[] unbraced = new double[6];
        for (int n = 1; n <= 6; n++) {
            unbraced[n - 1] = frequency(n);
        }
        driver.findElement(By.id("add-brace")).click();
        analyzeAndWait();
        double largest = 0;
        for (int n = 1; n <= 6; n++) {
            largest = Math.max(largest, Math.abs(frequency(n) / unbraced[n - 1] - 1));
        }
        assertThat(largest).isGreaterThan(0.02);
        assertThat(driver.findElements(By.cssSelector("#brace-rows tr"))).hasSize(1);
    }

    private double parameter(String name) {
        return ((Number) js("return window.nodewrightPlates.parameters()." + name + ";")).doubleValue();
    }

    /**
     * Inches on the plate bench (1 in = 25.4 mm exactly, by definition since 1959): the spruce test plate's lengths
     * shown in inches send the same millimetres (same modes); a thickness typed in inches is sent in mm and moves
     * the free plate's modes as Kirchhoff's f ∝ h says (ω ∝ √(D/ρh), D ∝ h³; Leissa 1969); a refused length is
     * said in inches.
     */
    @Test
    void lengthsTypedInInchesAreSentInMillimetres() throws Exception {
        long before = count();
        new Select(driver.findElement(By.id("plate-preset"))).selectByValue("test-rectangle");
        wait.until(d -> count() > before);
        double f1 = frequency(1);
        long beforeUnits = count();
        new Select(driver.findElement(By.id("plate-units"))).selectByValue("inch");
        wait.until(d -> count() > beforeUnits);
        // 400 mm = 15.7480 in, 300 mm = 11.8110 in, 3 mm = 0.1181 in (shown to four decimals)
        assertThat(driver.findElement(By.id("lengthMm")).getDomProperty("value")).isEqualTo("15.748");
        assertThat(driver.findElement(By.id("widthMm")).getDomProperty("value")).isEqualTo("11.811");
        assertThat(driver.findElement(By.id("thicknessMm")).getDomProperty("value")).isEqualTo("0.1181");
        assertThat(driver.findElement(By.cssSelector("[data-unit-label='length']")).getText()).isEqualTo("in");
        // untouched values go on the wire as the exact millimetres they were
        assertThat(parameter("lengthMm")).isEqualTo(400.0);
        assertThat(parameter("thicknessMm")).isEqualTo(3.0);
        assertThat(frequency(1)).isEqualTo(f1);

        type("thicknessMm", "0.25");
        analyzeAndWait();
        assertThat(parameter("thicknessMm")).isCloseTo(6.35, within(1e-9));
        assertThat(frequency(1) / f1).isCloseTo(6.35 / 3.0, within(1e-3));

        type("lengthMm", "0");
        driver.findElement(By.id("analyze-plate")).click();
        WebElement error = driver.findElement(By.cssSelector("[data-error-for='lengthMm']"));
        wait.until(d -> !error.getText().isEmpty());
        // the server's "must be at least 1 mm" shown in the unit chosen: 1 mm = 0.0393701 in
        assertThat(error.getText()).contains("0.0393701 in").doesNotContain("mm");
        screenshot("plate-bench-inches");
    }

    @Test
    void badInputIsShownBesideTheField() throws Exception {
        type("thicknessMm", "0");
        driver.findElement(By.id("analyze-plate")).click();
        wait.until(d -> !driver.findElement(By.cssSelector("[data-error-for='thicknessMm']")).getText().isEmpty());
        assertThat(driver.findElement(By.id("thicknessMm")).getDomAttribute("aria-invalid")).isEqualTo("true");
        driver.findElement(By.id("outline-points-kind")).click();
        type("outline-points", "0, 0\n200, 0\n200, 200\n100, -100\n0, 100");
        type("thicknessMm", "3");
        driver.findElement(By.id("analyze-plate")).click();
        wait.until(d -> !driver.findElement(By.cssSelector("[data-error-for='outline']")).getText().isEmpty());
        assertThat(driver.findElement(By.cssSelector("[data-error-for='outline']")).getText()).contains("crosses");
        screenshot("plate-bench-bad-outline");
    }

    private double cellNumber(String css) {
        return Double.parseDouble(driver.findElement(By.cssSelector(css)).getText().replace("+", ""));
    }

    /**
     * The solver on the spruce test plate: mode 1 to 95 % of its frequency now by the uniform thickness. A free
     * Kirchhoff plate of uniform thickness has f ∝ h (ω ∝ √(D/ρh), D ∝ h³; Leissa 1969), so the answer is 95 % of
     * the thickness; applied to the plate, the bench's mode 1 sounds the target.
     */
    @Test
    void theThicknessSolverThinsTheTestPlateToItsTargetAndAppliesIt() throws Exception {
        long before = count();
        new Select(driver.findElement(By.id("plate-preset"))).selectByValue("test-rectangle");
        wait.until(d -> count() > before);
        double h = Double.parseDouble(driver.findElement(By.id("thicknessMm")).getDomProperty("value"));
        double f1 = frequency(1);
        double target = Math.round(0.95 * f1 * 100) / 100.0;
        // the target table shows mode 1's frequency now
        wait.until(d -> !d.findElement(By.cssSelector("#solver-target-rows tr:first-child .now")).getText().isEmpty());
        assertThat(cellNumber("#solver-target-rows tr:first-child .now")).isCloseTo(f1, within(0.06));
        driver.findElement(By.cssSelector("#solver-target-rows tr:nth-child(2) button")).click();
        WebElement cell = driver.findElement(By.cssSelector("#solver-target-rows tr:first-child [data-role='target']"));
        cell.sendKeys(Double.toString(target));
        driver.findElement(By.id("solver-start")).click();
        wait.until(d -> d.findElement(By.id("solver-result")).isDisplayed());
        double cents = Double.parseDouble(driver.findElement(By.cssSelector("#solver-result-targets tbody tr"))
                .getDomAttribute("data-cents"));
        assertThat(Math.abs(cents)).isLessThanOrEqualTo(0.5);
        double solved = Double.parseDouble(driver.findElement(By.cssSelector("#solver-unknowns tbody tr"))
                .getDomAttribute("data-value-mm"));
        assertThat(solved).isCloseTo(h * target / f1, within(0.003));
        // Hz per 0.1 mm removed: f ∝ h gives −f · 0.1 / h
        double sens = cellNumber("#solver-sensitivity tbody tr td:nth-child(2)");
        assertThat(sens).isCloseTo(-target * 0.1 / solved, within(0.02));
        assertThat(driver.findElement(By.id("solver-status")).getText()).isNotEmpty();
        js("document.getElementById('solver-result').scrollIntoView({block: 'center'});");
        screenshot("plate-bench-thickness-solver");

        long beforeApply = count();
        driver.findElement(By.id("solver-apply")).click();
        wait.until(d -> count() > beforeApply);
        assertThat(Double.parseDouble(driver.findElement(By.id("thicknessMm")).getDomProperty("value")))
                .isCloseTo(solved, within(1e-9));
        assertThat(Math.abs(1200 * Math.log(frequency(1) / target) / Math.log(2))).isLessThan(1.0);

        // the graduation template of the solved plate: a 1:1 SVG saying its uniform thickness
        Object svg = ((org.openqa.selenium.JavascriptExecutor) driver).executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                + "fetch('/api/v1/templates/plate-graduation.svg', {method: 'POST', headers: {'Content-Type': "
                + "'application/json'}, body: JSON.stringify(window.nodewrightPlates.parameters())})"
                + ".then(r => r.text()).then(done, e => done(String(e)));");
        assertThat((String) svg).contains("width=\"430mm\"").contains("uniform thickness");
    }

    /**
     * Measuring a sample: 300 x 120 x 3 mm, 46.44 g, with the three tap tones the independent numpy/scipy model
     * src/test/python/free_plate_ritz.py gives for E along 12 GPa, E across 0.90 GPa, G 0.70 GPa (112.382, 180.942,
     * 311.315 Hz): typed, and again from a recording of them; the constants are used for the plate.
     */
    @Test
    void measuringASampleFitsItsConstantsAndTheyAreUsedForThePlate(@org.junit.jupiter.api.io.TempDir Path dir)
            throws Exception {
        type("measure-length", "300");
        type("measure-width", "120");
        type("measure-thickness", "3.0");
        type("measure-mass", "46.44");
        type("measure-twisting", "112.382");
        type("measure-along", "180.942");
        type("measure-across", "311.315");
        driver.findElement(By.id("measure-fit")).click();
        wait.until(d -> d.findElement(By.id("measure-result")).isDisplayed());
        double ex = Double.parseDouble(driver.findElement(By.cssSelector("#measure-constants tr[data-key='elasticAlongPa']"))
                .getDomAttribute("data-value"));
        double ey = Double.parseDouble(driver.findElement(By.cssSelector("#measure-constants tr[data-key='elasticAcrossPa']"))
                .getDomAttribute("data-value"));
        double g = Double.parseDouble(driver.findElement(By.cssSelector("#measure-constants tr[data-key='shearPa']"))
                .getDomAttribute("data-value"));
        assertThat(ex).isCloseTo(12.0e9, within(0.005 * 12.0e9));
        assertThat(ey).isCloseTo(0.90e9, within(0.005 * 0.90e9));
        assertThat(g).isCloseTo(0.70e9, within(0.005 * 0.70e9));
        js("document.getElementById('measure-result').scrollIntoView({block: 'center'});");
        screenshot("plate-bench-measure");

        long before = count();
        driver.findElement(By.id("measure-apply")).click();
        wait.until(d -> count() > before);
        assertThat(new Select(driver.findElement(By.id("material"))).getFirstSelectedOption().getDomAttribute("value"))
                .isEqualTo("measured");
        Object sent = js("return window.nodewrightPlates.parameters().elasticAlongPa;");
        assertThat(((Number) sent).doubleValue()).isCloseTo(ex, within(1.0));

        // the same sample from a tap recording: peaks through the partials analysis' peak finder
        Path wav = dir.resolve("tap.wav");
        Files.write(wav, TestRecordings.tap(new double[] {112.382184, 180.941927, 290.8057, 311.315444},
                new double[] {0.25, 0.18, 0.08, 0.12}, 3.0));
        for (String id : new String[] {"measure-twisting", "measure-along", "measure-across"}) {
            driver.findElement(By.id(id)).clear();
        }
        driver.findElement(By.id("measure-wav")).sendKeys(wav.toString());
        js("document.getElementById('measure-result').hidden = true;");
        driver.findElement(By.id("measure-fit")).click();
        wait.until(d -> d.findElement(By.id("measure-result")).isDisplayed());
        assertThat(driver.findElement(By.id("measure-peaks")).getText()).contains("112.4");
        double g2 = Double.parseDouble(driver.findElement(By.cssSelector("#measure-constants tr[data-key='shearPa']"))
                .getDomAttribute("data-value"));
        assertThat(g2).isCloseTo(0.70e9, within(0.005 * 0.70e9));
        js("document.getElementById('measure-result').scrollIntoView({block: 'center'});");
        screenshot("plate-bench-measure-recording");
    }

    @Test
    void aSolverRequestWithoutUnknownsIsRefusedInline() throws Exception {
        driver.findElement(By.id("solver-thickness")).click();
        driver.findElement(By.cssSelector("#solver-target-rows tr:first-child [data-role='target']")).sendKeys("H9");
        driver.findElement(By.id("solver-start")).click();
        wait.until(d -> !d.findElement(By.cssSelector("[data-error-for='unknowns']")).getText().isEmpty());
        assertThat(driver.findElement(By.cssSelector("#solver-target-rows tr:first-child [data-role='target']"))
                .getDomAttribute("aria-invalid")).isEqualTo("true");
        assertThat(driver.findElement(By.id("solver-result")).isDisplayed()).isFalse();
    }
}
