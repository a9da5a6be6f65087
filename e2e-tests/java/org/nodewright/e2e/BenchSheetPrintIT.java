package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.support.ui.ExpectedConditions;

/** The bench sheet's print layout, seen through Chromium's print media emulation. */
class BenchSheetPrintIT extends BrowserTestBase {

    /** CSS pixels per millimetre: 96 px per inch, 25.4 mm per inch (CSS Values and Units Level 3, §5.2). */
    private static final double PX_PER_MM = 96 / 25.4;

    @Test
    void printLayoutHasNoNavigationAHeadWithTheNameAnA100MmRulerAndChartsWithinTheSheet() throws Exception {
        driver.get(url("/strings"));
        wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("#design-bar[data-ready=true]")));
        wait.until(d -> d.findElements(By.cssSelector("[data-role=print-sheet]")).size() == 1);
        driver.findElement(By.cssSelector("#design-bar [data-role=name]")).sendKeys("Harrowgate Lane print check");
        js("window.dispatchEvent(new Event('beforeprint'))");
        ((ChromeDriver) driver).executeCdpCommand("Emulation.setEmulatedMedia", Map.of("media", "print"));
        try {
            assertThat(js("return getComputedStyle(document.querySelector('header.topbar')).display")).isEqualTo("none");
            assertThat(js("return getComputedStyle(document.querySelector('[data-role=print-sheet]')).display"))
                    .isEqualTo("none");
            assertThat(driver.findElement(By.id("sheet-head")).isDisplayed()).isTrue();
            assertThat(driver.findElement(By.id("sheet-head")).getText())
                    .contains("Bench sheet", "Harrowgate Lane print check", "not saved");
            // The ruler's 0 and 100 ticks lie 100 mm apart at the CSS scale a printer keeps at 100 %.
            double span = ((Number) js("const r = document.querySelector('#sheet-head svg.sheet-ruler');"
                    + "const a = r.querySelector('[data-mm=\"0\"]').getBoundingClientRect();"
                    + "const b = r.querySelector('[data-mm=\"100\"]').getBoundingClientRect();"
                    + "return (b.left + b.right) / 2 - (a.left + a.right) / 2;")).doubleValue();
            assertThat(span / PX_PER_MM).isCloseTo(100.0, within(0.05));
            // Every chart fits the printable width of A4 and Letter (180 mm).
            @SuppressWarnings("unchecked")
            List<Number> widths = (List<Number>) js("return [...document.querySelectorAll('.chart-box')]"
                    + ".filter(b => b.offsetParent !== null).map(b => b.getBoundingClientRect().width)");
            assertThat(widths).isNotEmpty();
            assertThat(widths).allSatisfy(w -> assertThat(w.doubleValue() / PX_PER_MM).isLessThanOrEqualTo(180.5));
            screenshot("bench-sheet-print");
        } finally {
            ((ChromeDriver) driver).executeCdpCommand("Emulation.setEmulatedMedia", Map.of("media", ""));
        }
    }
}
