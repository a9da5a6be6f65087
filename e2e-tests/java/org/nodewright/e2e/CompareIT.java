package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;
import org.springframework.test.context.TestPropertySource;

/**
 * The compare page on the first start's demo library: two top strings of the parlour guitar at one
 * pitch in two gauges (0.254 mm at 70 N and 0.305 mm at 100.9323 N, the tension scaled with the
 * square of the gauge), and two revisions of one of them.
 */
@TestPropertySource(properties = "app.demo=true")
class CompareIT extends BrowserTestBase {

    private static final String THIN = "Harrowgate parlour guitar, first string (E4)";
    private static final String HEAVY = "Harrowgate parlour guitar, heavier first string (E4)";

    private WebElement rowOf(String name) {
        return wait.until(d -> d.findElements(By.cssSelector("#design-list tbody tr")).stream()
                .filter(tr -> tr.findElement(By.cssSelector(".design-name")).getText().equals(name))
                .findFirst().orElse(null));
    }

    private double value(String table, String row, String side) {
        String v = driver.findElement(By.cssSelector("#" + table + " tr[data-row='" + row + "'] td[data-side='" + side + "']"))
                .getAttribute("data-value");
        return Double.parseDouble(v);
    }

    private WebElement parameter(String path) {
        return driver.findElement(By.cssSelector("#compare-table tr[data-path='" + path + "']"));
    }

    @Test
    @SuppressWarnings("unchecked")
    void twoGaugesAtOnePitchDifferInBAndInTheirPartialsCents() throws Exception {
        driver.get(url("/library"));
        waitFor(By.cssSelector("main[data-ready=true]"));
        WebElement thin = rowOf(THIN);
        WebElement heavy = rowOf(HEAVY);
        String thinId = thin.getAttribute("data-design-id");
        String heavyId = heavy.getAttribute("data-design-id");
        // Names read as text (left), dates in the browser's locale (a <time> with the ISO instant beside it).
        assertThat(thin.findElement(By.cssSelector("td:nth-child(2)")).getCssValue("text-align")).isIn("left", "start");
        WebElement time = thin.findElement(By.cssSelector("time"));
        assertThat(time.getAttribute("datetime")).matches("\\d{4}-\\d\\d-\\d\\dT.*");
        assertThat(time.getText()).isEqualTo(js("return new Intl.DateTimeFormat(undefined, {dateStyle: 'medium', timeStyle: 'short'})"
                + ".format(new Date(arguments[0]))", time.getAttribute("datetime")));
        // Ticking both opens the compare page (A and B in the list's order); A is then the thin string.
        thin.findElement(By.cssSelector(".compare-tick")).click();
        heavy.findElement(By.cssSelector(".compare-tick")).click();
        driver.findElement(By.id("compare-selected")).click();
        waitFor(By.cssSelector("main[data-view=compare][data-ready=true]"));
        assertThat(driver.getCurrentUrl()).contains("a=").contains("b=");
        driver.get(url("/library/compare?a=" + thinId + "&b=" + heavyId));
        waitFor(By.cssSelector("main[data-view=compare][data-ready=true]"));
        waitFor(By.cssSelector("#results-summary tr[data-row='b']"));

        // Labelled parameters in the user's units: the gauges differ, marked; 0.254 mm is 0.01 in.
        WebElement gauge = parameter("diameterMm");
        assertThat(gauge.getAttribute("class")).contains("differs");
        assertThat(gauge.findElement(By.tagName("th")).getText()).isEqualTo("Diameter");
        assertThat(gauge.findElement(By.cssSelector("td.unit")).getText()).isEqualTo("mm");
        assertThat(parameter("pickups[0].positionMm").findElement(By.tagName("th")).getText()).isEqualTo("Pickup 1 · position");
        new Select(driver.findElement(By.id("length-unit"))).selectByValue("inch");
        assertThat(parameter("diameterMm").findElement(By.cssSelector("td[data-side='a']")).getText()).isEqualTo("0.01");
        assertThat(parameter("diameterMm").findElement(By.cssSelector("td.unit")).getText()).isEqualTo("in");
        // 1 lbf = 4.4482216152605 N (NIST SP 811): 70 N is 15.737 lbf.
        new Select(driver.findElement(By.id("force-unit"))).selectByValue("lbf");
        assertThat(value("results-summary", "tension", "a")).isCloseTo(70 / 4.4482216152605, within(1e-9));
        new Select(driver.findElement(By.id("force-unit"))).selectByValue("N");
        assertThat(value("results-summary", "tension", "a")).isCloseTo(70.0, within(1e-9));
        assertThat(value("results-summary", "tension", "b")).isCloseTo(100.9323, within(1e-9));

        // One pitch: the sounding f1 of both within 1.5 cents (the stiffer string's clamped ends raise it a little).
        double f1a = value("results-summary", "f1", "a");
        double f1b = value("results-summary", "f1", "b");
        assertThat(1200 * Math.log(f1b / f1a) / Math.log(2)).isCloseTo(0.0, within(1.5));
        // B = π³·E·d⁴ / (64·T·L²) (Fletcher 1964): same steel and length, so B_b / B_a = (d_b/d_a)⁴ · T_a/T_b.
        double expectedRatio = Math.pow(0.305 / 0.254, 4) * 70.0 / 100.9323;
        double ba = value("results-summary", "b", "a");
        double bb = value("results-summary", "b", "b");
        assertThat(bb / ba).isCloseTo(expectedRatio, within(expectedRatio * 0.005));
        assertThat(value("results-summary", "b", "difference")).isCloseTo(bb - ba, within(1e-15));

        // Each partial's cents from the harmonic series: the heavier string's are wider, visibly so at n = 10.
        double c10a = value("results-partials", "partial-10", "a");
        double c10b = value("results-partials", "partial-10", "b");
        double d10 = value("results-partials", "partial-10", "difference");
        assertThat(d10).isCloseTo(c10b - c10a, within(1e-9));
        assertThat(d10).isGreaterThan(1.0);
        assertThat(driver.findElement(By.cssSelector("#results-partials tr[data-row='partial-10']")).getAttribute("class"))
                .contains("differs");
        // ... and the chart draws those differences, not the coinciding frequencies.
        Map<String, Object> data = (Map<String, Object>) chartData("compare-chart-partials");
        List<Map<String, Object>> datasets = (List<Map<String, Object>>) data.get("datasets");
        Map<String, Object> difference = datasets.stream().filter(ds -> "difference".equals(ds.get("kind"))).findFirst().orElseThrow();
        assertThat(((Number) ((List<Object>) difference.get("data")).get(9)).doubleValue()).isCloseTo(d10, within(1e-9));
        assertThat(((List<Object>) data.get("labels")).get(9)).isEqualTo("10");
        // The pluck × pickup levels of both, side by side with their difference in dB.
        assertThat(driver.findElements(By.cssSelector("#results-levels tr[data-row]"))).hasSize(16);
        assertThat(chartData("compare-chart-levels")).isNotNull();
        screenshot("compare-two-gauges");
    }

    @Test
    void anyTwoRevisionsOfOneDesignCompare() throws Exception {
        driver.get(url("/library"));
        waitFor(By.cssSelector("main[data-ready=true]"));
        rowOf(THIN).findElement(By.cssSelector(".design-name")).click();
        waitFor(By.cssSelector("main[data-view=design][data-ready=true]"));
        WebElement picker = waitFor(By.id("compare-revisions"));
        new Select(picker.findElement(By.id("compare-from"))).selectByValue("1");
        new Select(picker.findElement(By.id("compare-to"))).selectByValue("2");
        picker.findElement(By.id("compare-revisions-go")).click();
        waitFor(By.cssSelector("main[data-view=compare][data-ready=true]"));
        waitFor(By.cssSelector("#results-summary tr[data-row='f1']"));
        assertThat(driver.findElement(By.id("compare-left-name")).getText()).contains("(v1)");
        assertThat(driver.findElement(By.id("compare-right-name")).getText()).contains("(v2)");
        // Revision 1 at 66 N, revision 2 at 70 N, both pinned: f1 ∝ √T (Mersenne's law), a rise of
        // 600·log2(70/66) = 50.94 cents; the bending stiffness moves f1 by far less than 0.1 cent here.
        assertThat(parameter("tensionN").getAttribute("class")).contains("differs");
        assertThat(value("results-summary", "tension", "a")).isCloseTo(66.0, within(1e-9));
        assertThat(value("results-summary", "tension", "b")).isCloseTo(70.0, within(1e-9));
        assertThat(value("results-summary", "f1", "difference")).isCloseTo(600 * Math.log(70.0 / 66) / Math.log(2), within(0.1));
        assertThat(chartData("compare-chart-partials")).isNotNull();
        screenshot("compare-two-revisions");
    }
}
