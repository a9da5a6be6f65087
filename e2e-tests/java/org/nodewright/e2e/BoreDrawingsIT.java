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
import org.openqa.selenium.support.ui.Select;

/**
 * The bore bench's own face in a real browser: each fingering drawn as the bore's hole pattern
 * (a click or Enter on a hole closes or opens it, the cents gauge and the note follow), and the
 * bore edited on its drawing (a joint dragged, a diameter and a hole moved with the keys), the
 * rows and the resonance table following through the request loop.
 */
class BoreDrawingsIT extends BrowserTestBase {

    @BeforeEach
    void openTheWhistle() {
        driver.get(url("/air-columns"));
        waitFor(By.id("bore-form"));
        // The bench opens on the workshop's six-hole whistle with its nine fingerings.
        wait.until(d -> !analyzed().isEmpty() && analyzed().equals(fingeringsReady()));
        js("window.__answers = []; document.addEventListener('nodewright:air-analyzed', e => window.__answers.push(e.detail));");
        // Analyse once more so that the test holds the answer the page shows.
        String first = analyzed();
        driver.findElement(By.id("analyze")).click();
        wait.until(d -> !analyzed().equals(first) && analyzed().equals(fingeringsReady()));
    }

    @Test
    void eachFingeringIsDrawnOnTheBoreAndAClickOnAHoleMovesItsGauge() throws Exception {
        List<WebElement> cards = driver.findElements(By.cssSelector("#fingering-cards li.fingering-card"));
        assertThat(cards).hasSize(9);
        // Every card draws the six holes, in the order they sit along the bore (top = input end),
        // with their sizes in proportion: the whistle's holes, read from the editor's rows.
        @SuppressWarnings("unchecked")
        List<Map<String, Object>> drawn = (List<Map<String, Object>>) js(
                "return [...document.querySelectorAll('#fingering-cards li:first-child .fingering-hole')].map(g => {"
                + " const c = g.querySelector('.hole-ring'); return {hole: Number(g.dataset.hole),"
                + " y: Number(c.getAttribute('cy')), r: Number(c.getAttribute('r')), closed: g.classList.contains('closed'),"
                + " checked: g.getAttribute('aria-checked')}; })");
        assertThat(drawn).hasSize(6);
        double[] positions = new double[6];
        double[] diameters = new double[6];
        for (int i = 0; i < 6; i++) {
            positions[i] = Double.parseDouble(field("holes[" + i + "].positionMm").getDomProperty("value"));
            diameters[i] = Double.parseDouble(field("holes[" + i + "].diameterMm").getDomProperty("value"));
        }
        // To scale along the bore: the drawing's gaps between holes are in the ratio of the real ones.
        double pxPerMm = (num(drawn.get(5).get("y")) - num(drawn.get(0).get("y"))) / (positions[5] - positions[0]);
        for (int i = 1; i < 5; i++) {
            assertThat(num(drawn.get(i).get("y")) - num(drawn.get(0).get("y")))
                    .isCloseTo((positions[i] - positions[0]) * pxPerMm, within(0.2));
            // In proportion across it: radius over diameter the same for every hole (to the drawing's 0.01 px).
            assertThat(num(drawn.get(i).get("r")) / diameters[i])
                    .isCloseTo(num(drawn.get(0).get("r")) / diameters[0], within(0.01));
        }
        // D5, the first fingering, closes all six: all drawn filled and announced as checked.
        assertThat(drawn).allSatisfy(h -> {
            assertThat(h.get("closed")).isEqualTo(true);
            assertThat(h.get("checked")).isEqualTo("true");
        });
        WebElement first = cards.get(0);
        assertThat(first.findElement(By.cssSelector(".card-register")).getText()).isEqualTo("1st register");
        assertThat(cards.get(7).findElement(By.cssSelector(".card-register")).getText()).isEqualTo("2nd register");
        assertThat(cards.get(7).findElements(By.cssSelector(".register-chevron"))).hasSize(2);
        String soundsBefore = first.findElement(By.cssSelector(".card-sounds")).getText();
        String centsBefore = first.findElement(By.cssSelector(".card-cents")).getText();
        assertThat(soundsBefore).isEqualTo("D5");
        // The gauge and the text show what the server predicted.
        assertThat(Double.parseDouble(first.findElement(By.cssSelector(".cents-gauge")).getDomAttribute("data-cents")))
                .isCloseTo(lastCents(0), within(0.005));
        assertThat(centsBefore).isEqualTo(signed(lastCents(0)) + " ¢");
        js("document.getElementById('fingering-panel').scrollIntoView();");
        screenshot("bore-cards-whistle");

        // Open the lowest hole (6) of the D5 card: the whistle then sounds its E5 fingering (holes
        // 1-5 closed, the second card), a whole tone up (common practice for this chart).
        String before = analyzed();
        driver.findElement(By.cssSelector("#fingering-cards li:first-child .fingering-hole[data-hole='5']")).click();
        wait.until(d -> !analyzed().equals(before) && analyzed().equals(fingeringsReady()));
        WebElement after = driver.findElement(By.cssSelector("#fingering-cards li:first-child"));
        assertThat(after.findElement(By.cssSelector(".fingering-hole[data-hole='5']")).getDomAttribute("class")).contains("open");
        assertThat(after.findElement(By.cssSelector(".fingering-hole[data-hole='5']")).getDomAttribute("aria-checked")).isEqualTo("false");
        String centsAfter = after.findElement(By.cssSelector(".card-cents")).getText();
        assertThat(centsAfter).isNotEqualTo(centsBefore);
        assertThat(after.findElement(By.cssSelector(".card-sounds")).getText()).isEqualTo("E5");
        double d5 = firstPredictedHz(0);
        double nowHz = lastPredictedHz(0);
        assertThat(cents(nowHz, d5)).isBetween(150.0, 250.0);
        // The same holes closed in the same register: the same pitch as the E5 card.
        assertThat(nowHz).isCloseTo(lastPredictedHz(1), within(1e-9));
        assertThat(Double.parseDouble(after.findElement(By.cssSelector(".cents-gauge")).getDomAttribute("data-cents")))
                .isCloseTo(lastCents(0), within(0.005));
        // The table, the secondary view, shows the same fingering with the hole open.
        assertThat(js("return document.querySelector('#fingering-rows tr:first-child input[data-hole=\"5\"]').checked")).isEqualTo(false);
        js("document.getElementById('fingering-panel').scrollIntoView();");
        screenshot("bore-cards-hole-opened");

        // From the keyboard: Enter on the focused hole closes it again, and the focus stays on it.
        String again = analyzed();
        WebElement hole = driver.findElement(By.cssSelector("#fingering-cards li:first-child .fingering-hole[data-hole='5']"));
        js("arguments[0].focus()", hole);
        new Actions(driver).sendKeys(Keys.ENTER).perform();
        wait.until(d -> !analyzed().equals(again) && analyzed().equals(fingeringsReady()));
        assertThat(driver.findElement(By.cssSelector("#fingering-cards li:first-child .card-sounds")).getText()).isEqualTo("D5");
        assertThat(js("const a = document.activeElement; return a.closest('li').dataset.row + ':' + a.dataset.hole")).isEqualTo("0:5");
        assertThat(lastPredictedHz(0)).isCloseTo(d5, within(1e-9));
    }

    @Test
    void draggingAJointChangesTheSegmentLengthAndTheResonances() throws Exception {
        String before = analyzed();
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("stopped-pipe");
        wait.until(d -> !analyzed().equals(before));
        assertThat(field("segments[0].lengthMm").getDomProperty("value")).isEqualTo("300");
        double f1Before = firstResonance();
        double pxPerMm = Double.parseDouble((String) js("return document.getElementById('bore-drawing').dataset.pxPerMm"));

        // Drag the far joint 60 px to the right, in three moves, and let go.
        WebElement knob = driver.findElement(By.cssSelector("#bore-drawing [data-handle='joint:0'] .handle-knob"));
        new Actions(driver).clickAndHold(knob).moveByOffset(20, 0).moveByOffset(20, 0).moveByOffset(20, 0).release().perform();
        double lengthMm = Double.parseDouble(field("segments[0].lengthMm").getDomProperty("value"));
        // The scale stays put during the drag: 60 px is 60 / (px per mm), to a pixel.
        assertThat(lengthMm).isCloseTo(300 + 60 / pxPerMm, within(1.5 / pxPerMm));
        // The request loop's last answer is for the row as it now reads.
        wait.until(d -> num(js("const a = window.__answers; return a.length ? a[a.length - 1].request.segments[0].lengthMm : 0"))
                == lengthMm);
        wait.until(d -> firstResonance() < f1Before);
        screenshot("bore-drawing-joint-dragged");
        // Stopped pipe 25 mm wide, unflanged, the new length (same check as BoreBenchIT's preset test):
        // f1 = c / (4 (L + 0.6133 a)) / (1 + 1.045/rv), Levine & Schwinger's (1948) end correction
        // and Keefe's (1984) boundary-layer phase velocity, rv = a sqrt(omega rho / mu),
        // rho = 1.2046 kg/m3, mu = 1.813e-5 Pa s (20 C dry air); within 1 cent.
        double c = speedOfSound();
        double a = 0.0125;
        double l = lengthMm / 1000;
        double expected = c / (4 * (l + 0.6133 * a));
        for (int i = 0; i < 30; i++) {
            double rv = a * Math.sqrt(2 * Math.PI * expected * 1.2046 / 1.813e-5);
            expected = c / (4 * (l + 0.6133 * a)) / (1 + 1.045 / rv);
        }
        assertThat(cents(firstResonance(), expected)).isCloseTo(0.0, within(1.0));
        assertThat(driver.findElement(By.cssSelector("#bore-drawing [data-handle='joint:0']")).getDomAttribute("aria-valuenow"))
                .isEqualTo(String.valueOf(Double.valueOf(lengthMm)).replaceAll("\\.0$", ""));
    }

    @Test
    void aDiameterAndAHoleMoveWithTheArrowKeysAndKeepTheFocus() throws Exception {
        String before = analyzed();
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("stopped-pipe");
        wait.until(d -> !analyzed().equals(before));
        WebElement inputDiameter = driver.findElement(By.cssSelector("#bore-drawing [data-handle='diameter:0.inputDiameterMm']"));
        js("arguments[0].focus()", inputDiameter);
        new Actions(driver).sendKeys(Keys.ARROW_UP, Keys.ARROW_UP, Keys.ARROW_UP).perform();
        // Three steps of 0.1 mm: 25 mm becomes 25.3 mm in the row; the output end is untouched.
        wait.until(d -> "25.3".equals(field("segments[0].inputDiameterMm").getDomProperty("value")));
        assertThat(field("segments[0].outputDiameterMm").getDomProperty("value")).isEqualTo("25");
        assertThat(js("return document.activeElement.dataset.handle")).isEqualTo("diameter:0.inputDiameterMm");
        new Actions(driver).keyDown(Keys.SHIFT).sendKeys(Keys.ARROW_DOWN).keyUp(Keys.SHIFT).perform();
        wait.until(d -> "24.3".equals(field("segments[0].inputDiameterMm").getDomProperty("value")));
        wait.until(d -> num(js("const a = window.__answers; return a.length ? a[a.length - 1].request.segments[0].inputDiameterMm : 0"))
                == 24.3);

        // A hole of the whistle: the arrow keys move it along the bore by 1 mm, it stays open.
        String whistle = analyzed();
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("six-hole-whistle");
        wait.until(d -> !analyzed().equals(whistle));
        double position = Double.parseDouble(field("holes[2].positionMm").getDomProperty("value"));
        WebElement hole = driver.findElement(By.cssSelector("#bore-drawing g.bore-hole[data-hole='2']"));
        String state = hole.getDomAttribute("class");
        js("arguments[0].focus()", hole);
        new Actions(driver).sendKeys(Keys.ARROW_LEFT, Keys.ARROW_LEFT).perform();
        wait.until(d -> Double.parseDouble(field("holes[2].positionMm").getDomProperty("value")) == position - 2);
        assertThat(driver.findElement(By.cssSelector("#bore-drawing g.bore-hole[data-hole='2']")).getDomAttribute("class")).isEqualTo(state);
        assertThat(js("return document.activeElement.dataset.hole")).isEqualTo("2");
        // Dragged with the pointer it moves too, by the drawing's scale, and is not toggled. (Once the
        // answer for the keyed position is in: each answer draws the bore anew.)
        wait.until(d -> num(js("const a = window.__answers; return a.length ? a[a.length - 1].request.holes[2].positionMm : 0"))
                == position - 2);
        double pxPerMm = Double.parseDouble((String) js("return document.getElementById('bore-drawing').dataset.pxPerMm"));
        WebElement marker = driver.findElement(By.cssSelector("#bore-drawing g.bore-hole[data-hole='2'] .hole-marker"));
        new Actions(driver).clickAndHold(marker).moveByOffset(-15, 0).moveByOffset(-15, 0).release().perform();
        double moved = Double.parseDouble(field("holes[2].positionMm").getDomProperty("value"));
        assertThat(moved).isCloseTo(position - 2 - 30 / pxPerMm, within(1.5 / pxPerMm));
        assertThat(driver.findElement(By.cssSelector("#bore-drawing g.bore-hole[data-hole='2']")).getDomAttribute("class")).isEqualTo(state);
        js("document.getElementById('bore-drawing').scrollIntoView();");
        screenshot("bore-drawing-hole-moved");
    }

    // ---- helpers --------------------------------------------------------------------------

    /** The last answer's prediction for fingering i, Hz. */
    private double lastPredictedHz(int i) {
        return num(js("const a = window.__answers; return a[a.length - 1].response.fingerings[arguments[0]].predictedHz", i));
    }

    /** The first answer the test saw: its prediction for fingering i, Hz. */
    private double firstPredictedHz(int i) {
        return num(js("return window.__answers[0].response.fingerings[arguments[0]].predictedHz", i));
    }

    /** The last answer's cents from target for fingering i. */
    private double lastCents(int i) {
        return num(js("const a = window.__answers; return a[a.length - 1].response.fingerings[arguments[0]].centsFromTarget", i));
    }

    /** Cents as the cards write them: a sign (the minus sign U+2212), one decimal. */
    private static String signed(double c) {
        return (c >= 0 ? "+" : "\u2212") + String.format(java.util.Locale.ROOT, "%.1f", Math.abs(c));
    }

    private static double num(Object v) {
        return ((Number) v).doubleValue();
    }

    private WebElement field(String dotted) {
        return driver.findElement(By.cssSelector("[data-field='" + dotted + "']"));
    }

    private String analyzed() {
        return String.valueOf(js("return document.querySelector('main.air-bench').dataset.analyzed || ''"));
    }

    private String fingeringsReady() {
        return String.valueOf(js("return document.querySelector('main.air-bench').dataset.fingeringsReady || ''"));
    }

    private double firstResonance() {
        return Double.parseDouble(driver.findElement(By.cssSelector("#resonance-table tbody tr:first-child td:nth-child(2)")).getText());
    }

    private double speedOfSound() {
        String summary = driver.findElement(By.id("analysis-summary")).getText();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("(\\d+\\.\\d+) m/s").matcher(summary);
        assertThat(m.find()).as(summary).isTrue();
        return Double.parseDouble(m.group(1));
    }

    private static double cents(double f, double reference) {
        return 1200 * Math.log(f / reference) / Math.log(2);
    }
}
