package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

/**
 * The set planner's drawing in a real browser: one string per row, drawn at its outside diameter
 * (the widths ordered as the gauges and in proportion to them), wound strings with their turns,
 * the total load above the neck matching the table, and a string over its strength marked with a
 * word and a shape at the server's limit.
 */
class SetPlannerDrawingIT extends StringPageTestBase {

    @BeforeEach
    void openPlanner() {
        driver.get(url("/string-sets"));
        waitFor(By.id("set-form"));
        wait.until(d -> driver.findElements(By.cssSelector("#set-drawing g.neck-string")).size() == 6);
    }

    @Test
    void oneStringPerRowAtItsGaugeAndTheTotalIsTheTablesSum() throws Exception {
        List<WebElement> rows = driver.findElements(By.cssSelector("#set-rows tr"));
        @SuppressWarnings("unchecked")
        List<Map<String, Object>> drawn = (List<Map<String, Object>>) js(
                "return [...document.querySelectorAll('#set-drawing g.neck-string')].map(g => {"
                + " const b = g.querySelector('.string-body'); return {i: Number(g.dataset.string),"
                + " y: Number(b.getAttribute('y')) + Number(b.getAttribute('height')) / 2,"
                + " w: Number(b.dataset.widthPx), wound: g.classList.contains('wound'), fill: b.getAttribute('fill') || ''}; })");
        assertThat(drawn).hasSize(rows.size());
        // One row each, top to bottom in the table's order.
        for (int i = 1; i < drawn.size(); i++) {
            assertThat(num(drawn.get(i).get("y"))).isGreaterThan(num(drawn.get(i - 1).get("y")));
            assertThat(num(drawn.get(i).get("i"))).isEqualTo(i);
        }
        // Outside diameters from the form: the core, plus twice the wrap wire when wound (common practice).
        List<Double> outer = new ArrayList<>();
        for (WebElement row : rows) {
            double core = Double.parseDouble(row.findElement(By.cssSelector(".gauge")).getDomProperty("value"));
            boolean wound = row.findElement(By.cssSelector(".wound")).isSelected();
            double wrap = wound ? Double.parseDouble(row.findElement(By.cssSelector(".wrap-gauge")).getDomProperty("value")) : 0;
            outer.add(core + 2 * wrap);
        }
        // The widths are ordered as the gauges are, and in proportion to them (one magnification).
        List<Integer> byGauge = IntStream.range(0, outer.size()).boxed().sorted(Comparator.comparing(outer::get)).toList();
        List<Integer> byWidth = IntStream.range(0, drawn.size()).boxed()
                .sorted(Comparator.comparing(i -> num(drawn.get(i).get("w")))).toList();
        assertThat(byWidth).isEqualTo(byGauge);
        double perMm = num(drawn.get(0).get("w")) / outer.get(0);
        for (int i = 0; i < outer.size(); i++) {
            assertThat(num(drawn.get(i).get("w"))).as("string %d", i + 1).isCloseTo(outer.get(i) * perMm, within(0.002));
            // Wound strings are drawn with the wrap's turns, plain ones solid.
            boolean wound = rows.get(i).findElement(By.cssSelector(".wound")).isSelected();
            assertThat(drawn.get(i).get("wound")).isEqualTo(wound);
            assertThat((String) drawn.get(i).get("fill")).isEqualTo(wound ? "url(#wrap-turns)" : "");
        }
        // The house set's E2 (0.430 core, 0.325 wrap: 1.080 mm outside) is the widest, its E4 (0.254) the thinnest.
        assertThat(byWidth.get(byWidth.size() - 1)).isEqualTo(5);
        assertThat(byWidth.get(0)).isEqualTo(0);

        // The total above the neck is the sum of the table's tension column (each rounded to 0.1 N).
        double sum = driver.findElements(By.cssSelector("#set-results tbody tr")).stream()
                .mapToDouble(tr -> Double.parseDouble(tr.findElements(By.tagName("td")).get(2).getText())).sum();
        String total = driver.findElement(By.id("neck-total")).getText();
        assertThat(total).endsWith(" N");
        double shown = Double.parseDouble(total.replaceAll("^.*: ", "").replace(" N", ""));
        assertThat(shown).isCloseTo(sum, within(0.05 * rows.size() + 1e-9));
        assertThat(total).endsWith(driver.findElement(By.id("set-total")).getText());
        // The tension bars are on one scale: their lengths in the ratio of the table's tensions.
        @SuppressWarnings("unchecked")
        List<Object> bars = (List<Object>) js("return [...document.querySelectorAll('#set-drawing .tension-bar')].map(b => Number(b.dataset.tensionPx))");
        List<Double> tensions = driver.findElements(By.cssSelector("#set-results tbody tr")).stream()
                .map(tr -> Double.parseDouble(tr.findElements(By.tagName("td")).get(2).getText())).toList();
        for (int i = 1; i < bars.size(); i++) {
            assertThat(num(bars.get(i)) / num(bars.get(0))).isCloseTo(tensions.get(i) / tensions.get(0), within(0.01));
        }
        js("document.getElementById('set-drawing').scrollIntoView();");
        screenshot("set-planner-drawing");
    }

    @Test
    void aStringOverItsStrengthIsMarkedWithAWordAndAShapeAtTheServersLimit() throws Exception {
        WebElement target = driver.findElements(By.cssSelector("#set-rows tr")).get(0).findElement(By.cssSelector(".target"));
        target.clear();
        target.sendKeys("E5");
        driver.findElement(By.id("analyze-set")).click();
        // An octave up needs four times the tension (T = mu (2 L f)^2): about 5.7 GPa in a 0.254 mm wire,
        // past any steel's typical strength.
        wait.until(d -> driver.findElements(By.cssSelector("#set-drawing g.neck-string.level-danger")).size() == 1);
        WebElement first = driver.findElement(By.cssSelector("#set-drawing g.neck-string[data-string='0']"));
        String word = first.findElement(By.cssSelector(".stress-word")).getText();
        assertThat(word).startsWith("✖").contains("near breaking");
        // The limit lines are drawn where the answer puts them, not where the page thinks.
        @SuppressWarnings("unchecked")
        Map<String, Object> limits = (Map<String, Object>) js(
                "return fetch('/api/v1/string-sets/analyze', {method: 'POST', headers: {'Content-Type': 'application/json'},"
                + " body: JSON.stringify({lengthMm: 650, strings: [{targetHz: 329.63, material: 'plain-steel', diameterMm: 0.254}]})})"
                + ".then(r => r.json()).then(a => a.stressLimits)");
        double bandWidth = num(js("return Number(document.querySelector('#set-drawing g[data-string=\"0\"] .stress-track').getAttribute('width'))"));
        double bandX = num(js("return Number(document.querySelector('#set-drawing g[data-string=\"0\"] .stress-track').getAttribute('x'))"));
        double warnX = num(js("return Number(document.querySelector('#set-drawing [data-limit=\"warning\"]').getAttribute('x1'))"));
        assertThat((warnX - bandX) / bandWidth).isCloseTo(num(limits.get("warningFraction")), within(1e-9));
        // The other strings keep their own level, in words.
        assertThat(driver.findElement(By.cssSelector("#set-drawing g.neck-string[data-string='1'] .stress-word")).getText())
                .doesNotContain("near breaking");
        js("document.getElementById('set-drawing').scrollIntoView();");
        screenshot("set-planner-drawing-over-strength");
    }
}
