package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

/** The set planner in a real headless Chromium: one bar per string, the total, field errors. */
class StringSetPlannerIT extends StringPageTestBase {

    @BeforeEach
    void openPlanner() {
        driver.get(url("/string-sets"));
        waitFor(By.id("set-form"));
        wait.until(d -> js("return !!Chart.getChart(document.getElementById('set-tension-chart'));"));
    }

    @SuppressWarnings("unchecked")
    private List<Object> bars() {
        Map<String, Object> data = (Map<String, Object>) chartData("set-tension-chart");
        List<Map<String, Object>> datasets = (List<Map<String, Object>>) data.get("datasets");
        return (List<Object>) datasets.get(0).get("data");
    }

    private double totalShownN() {
        String text = driver.findElement(By.id("set-total")).getText();
        assertThat(text).endsWith(" N");
        return Double.parseDouble(text.replace(" N", ""));
    }

    private List<WebElement> rows() {
        return driver.findElements(By.cssSelector("#set-rows tr"));
    }

    @Test
    void everyStringGetsABarAndTheTotalIsTheirSum() throws Exception {
        List<Object> bars = bars();
        assertThat(bars).hasSize(rows().size()).hasSize(6);
        double sum = bars.stream().mapToDouble(StringPageTestBase::num).sum();
        assertThat(totalShownN()).isCloseTo(sum, within(0.06));

        // The plain strings against Mersenne's law for an ideal string, T = mu (2 L f)^2 with
        // mu = rho pi d^2 / 4 (Taylor / Mersenne; any physics handbook), using the catalogue density
        // the page shows; the equal-tempered targets are f = 440 * 2^((m - 69)/12).
        double rho = num(js("return fetch('/api/v1/materials').then(r => r.json())"
                + ".then(list => list.find(m => m.id === 'plain-steel').densityKgPerM3);"));
        double[] diametersMm = {0.254, 0.330, 0.432};
        int[] midi = {64, 59, 55}; // E4, B3, G3
        for (int i = 0; i < 3; i++) {
            double d = diametersMm[i] / 1000;
            double f = 440 * Math.pow(2, (midi[i] - 69) / 12.0);
            double expected = rho * Math.PI * d * d / 4 * Math.pow(2 * 0.650 * f, 2);
            assertThat(num(bars.get(i))).isCloseTo(expected, within(expected * 1e-3));
        }
        assertThat(driver.findElement(By.id("neck-caution")).getText()).contains("truss-rod");
        js("document.getElementById('set-total').scrollIntoView();");
        screenshot("set-planner");
    }

    @Test
    void addingAStringAddsABarAndALongerOwnLengthNeedsMoreTension() throws Exception {
        driver.findElement(By.id("add-string")).click();
        wait.until(d -> bars().size() == 7);
        double before = num(bars().get(5));
        // Multi-scale: the sixth string gets its own, longer length (T grows with L^2 at a fixed pitch).
        WebElement own = rows().get(5).findElement(By.cssSelector(".own-length"));
        own.sendKeys("680");
        driver.findElement(By.id("analyze-set")).click();
        wait.until(d -> num(bars().get(5)) > before);
        assertThat(num(bars().get(5)) / before).isCloseTo(Math.pow(680.0 / 650.0, 2), within(1e-3));
        double sum = bars().stream().mapToDouble(StringPageTestBase::num).sum();
        assertThat(totalShownN()).isCloseTo(sum, within(0.06));
        js("document.getElementById('set-total').scrollIntoView();");
        screenshot("set-planner-multiscale");
    }

    @Test
    void badGaugeGetsAnInlineErrorOnItsRow() throws Exception {
        WebElement gauge = rows().get(1).findElement(By.cssSelector(".gauge"));
        gauge.clear();
        gauge.sendKeys("0");
        driver.findElement(By.id("analyze-set")).click();
        assertThat(errorText("strings[1].diameterMm")).isNotBlank();
        assertThat(gauge.getAttribute("value")).isEqualTo("0");
        assertThat(gauge.getAttribute("class")).contains("invalid");
        screenshot("set-planner-field-error");
    }

    @Test
    void aStringTunedAnOctaveTooHighIsFlaggedInItsRowAndBar() throws Exception {
        WebElement target = rows().get(0).findElement(By.cssSelector(".target"));
        target.clear();
        target.sendKeys("E5");
        driver.findElement(By.id("analyze-set")).click();
        // An octave up needs four times the tension (T = mu (2 L f)^2): about 5.7 GPa in a 0.254 mm wire.
        wait.until(d -> driver.findElements(By.cssSelector("#set-results tbody tr:first-child td.strong")).size() > 0);
        Object colour = js("return Chart.getChart(document.getElementById('set-tension-chart')).data.datasets[0].backgroundColor[0];");
        // The palette's danger colour (one home: --danger in nodewright.css, STATE.danger in charts.js).
        Object danger = js("return getComputedStyle(document.documentElement).getPropertyValue('--danger').trim();");
        assertThat(String.valueOf(colour)).isEqualToIgnoringCase(String.valueOf(danger));
        assertThat(driver.findElement(By.cssSelector("#set-results tbody tr:first-child")).getText()).contains("E5");
        js("document.getElementById('set-total').scrollIntoView();");
        screenshot("set-planner-over-strength");
    }

    @Test
    void kilogramsForceAndInchesAreOnlyADisplay() throws Exception {
        double totalN = totalShownN();
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("force-unit"))).selectByValue("kgf");
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("length-unit"))).selectByValue("inch");
        // 1 kgf = 9.80665 N (standard gravity, 3rd CGPM 1901; NIST SP 811); 650 mm = 25.59055 inch (1 inch = 25.4 mm).
        wait.until(d -> driver.findElement(By.id("set-total")).getText().endsWith(" kgf"));
        String kgf = driver.findElement(By.id("set-total")).getText().replace(" kgf", "");
        assertThat(Double.parseDouble(kgf)).isCloseTo(totalN / 9.80665, within(0.01));
        assertThat(driver.findElement(By.id("setLengthMm")).getAttribute("value")).isEqualTo("25.59055");
        assertThat(rows().get(0).findElement(By.cssSelector(".gauge")).getAttribute("value")).isEqualTo("0.01");
        // Analysing again in these units sends the same millimetres, so the bars do not move.
        List<Object> before = bars();
        String count = driver.findElement(By.id("set-form")).getAttribute("data-analyses");
        driver.findElement(By.id("analyze-set")).click();
        wait.until(d -> !count.equals(driver.findElement(By.id("set-form")).getAttribute("data-analyses")));
        List<Object> after = bars();
        for (int i = 0; i < before.size(); i++) {
            assertThat(num(after.get(i))).isCloseTo(num(before.get(i)), within(1e-9));
        }
    }

    /**
     * A scale length typed in inches goes to the server in mm (1 in = 25.4 mm exactly): 25 in = 635 mm, and at the
     * same pitches and gauges every tension follows Mersenne's law T = mu (2 L f)^2, so each bar moves by
     * (635 / 650)^2.
     */
    @Test
    void aScaleLengthTypedInInchesIsSentInMillimetres() throws Exception {
        List<Object> at650 = bars();
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("length-unit"))).selectByValue("inch");
        WebElement length = driver.findElement(By.id("setLengthMm"));
        length.clear();
        length.sendKeys("25");
        String count = driver.findElement(By.id("set-form")).getAttribute("data-analyses");
        driver.findElement(By.id("analyze-set")).click();
        wait.until(d -> !count.equals(driver.findElement(By.id("set-form")).getAttribute("data-analyses")));
        List<Object> at635 = bars();
        assertThat(at635).hasSameSizeAs(at650);
        for (int i = 0; i < at650.size(); i++) {
            assertThat(num(at635.get(i)) / num(at650.get(i))).as("string %d", i + 1)
                    .isCloseTo(Math.pow(635.0 / 650.0, 2), within(1e-6));
        }
        assertThat(length.getAttribute("value")).isEqualTo("25");
    }
}
