package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;

/** The plate bench in a real headless Chromium: presets, mode gallery with node lines, thickness, braces, errors. */
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
}
