package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;

/**
 * The player's end on the bore bench: each mouth kind chosen in the editor moves the predicted
 * pitch, the mouth is drawn at x = 0, its end correction and per-resonance cents are shown beside
 * the resonance table, and a contradiction is answered on the field.
 */
class MouthBenchIT extends BrowserTestBase {

    @BeforeEach
    void openThePage() {
        driver.get(url("/air-columns"));
        waitFor(By.id("bore-form"));
        wait.until(d -> !analyzed().isEmpty());
    }

    @Test
    void eachMouthKindMovesThePitch() throws Exception {
        setChecked(driver.findElement(By.id("auto-analyze")), false);
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("stopped-pipe");
        waitForChange("");
        String[][] kinds = {
            {"window", "windowLengthMm=4", "windowWidthMm=8", "wallMm=1.5", "headspaceMm=0"},
            {"embouchure", "holeLengthMm=12", "holeWidthMm=10", "wallMm=4.5", "headspaceMm=17", "lipCoveragePct=25"},
            {"reed", "equivalentVolumeMm3=900"},
            {"cup", "cupVolumeMm3=1100", "throatDiameterMm=3.7", "throatLengthMm=7"},
        };
        // The bare pipe at each input end first.
        Select inputEnd = new Select(driver.findElement(By.id("input-end")));
        inputEnd.selectByValue("closed");
        analyze();
        double bareClosed = firstResonance();
        inputEnd.selectByValue("open");
        analyze();
        double bareOpen = firstResonance();
        for (String[] k : kinds) {
            Select kind = new Select(driver.findElement(By.id("mouth-kind")));
            String before = analyzed();
            kind.selectByValue(k[0]);
            for (int i = 1; i < k.length; i++) {
                String[] kv = k[i].split("=");
                WebElement input = driver.findElement(By.cssSelector("input[data-mouth='" + kv[0] + "']"));
                assertThat(input.isDisplayed()).as(kv[0]).isTrue();
                input.clear();
                input.sendKeys(kv[1]);
            }
            // The kind sets the input end it plays at.
            String end = new Select(driver.findElement(By.id("input-end"))).getFirstSelectedOption()
                    .getDomAttribute("value");
            boolean closed = k[0].equals("reed") || k[0].equals("cup");
            assertThat(end).isEqualTo(closed ? "closed" : "open");
            analyzeAfter(before);
            double fMouth = firstResonance();
            // Every kind lowers the lowest resonance of the same pipe with a bare end: the window's
            // and the embouchure's inertance, the reed's compliance, the cup's volume and throat
            // (common practice: a mouthpiece or a window makes the tube sound longer).
            assertThat(fMouth).as(k[0]).isLessThan(closed ? bareClosed : bareOpen);
            // End correction and the cents column beside the resonance table, the mouth on the drawing.
            String dl = (String) js("return document.getElementById('mouth-summary').dataset.endCorrectionMm");
            assertThat(Double.parseDouble(dl)).as(k[0]).isPositive();
            String cents = driver.findElement(By.cssSelector("#resonance-table tbody tr:first-child td.mouth-cents"))
                    .getText().replace('−', '-');
            assertThat(Double.parseDouble(cents)).as(k[0]).isNegative();
            assertThat(driver.findElements(By.cssSelector("#bore-drawing [data-mouth='" + k[0] + "']"))).hasSize(1);
            screenshot("mouth-" + k[0]);
        }
    }

    @Test
    void theWhistlePresetCarriesItsWindowAndAContradictionIsRefused() throws Exception {
        String before = analyzed();
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("whistle-window");
        waitForChange(before);
        assertThat(new Select(driver.findElement(By.id("mouth-kind"))).getFirstSelectedOption().getDomAttribute("value"))
                .isEqualTo("window");
        wait.until(d -> !driver.findElement(By.id("mouth-summary")).getText().isBlank());
        double dl = Double.parseDouble((String) js(
                "return document.getElementById('mouth-summary').dataset.endCorrectionMm"));
        // A 4 x 8 mm window in a 1.5 mm wall on a 13 mm bore: some 25 mm (see the README's model).
        assertThat(dl).isBetween(20.0, 30.0);
        List<WebElement> rows = driver.findElements(By.cssSelector("#fingering-rows tr"));
        assertThat(rows).hasSize(9);
        screenshot("mouth-whistle-window");

        // A window on a closed input end contradicts it: 400 on mouth.kind, shown on the field.
        setChecked(driver.findElement(By.id("auto-analyze")), false);
        new Select(driver.findElement(By.id("input-end"))).selectByValue("closed");
        String rejectedBefore = rejected();
        driver.findElement(By.id("analyze")).click();
        wait.until(d -> !rejectedBefore.equals(rejected()));
        assertThat(waitFor(By.cssSelector("[data-error-for='mouth.kind']")).getText()).contains("inputEnd");
    }

    // ---- helpers --------------------------------------------------------------------------

    private String analyze() {
        String before = analyzed();
        analyzeAfter(before);
        return analyzed();
    }

    private void analyzeAfter(String before) {
        driver.findElement(By.id("analyze")).click();
        waitForChange(before);
    }

    private void waitForChange(String before) {
        wait.until(d -> !analyzed().isEmpty() && !analyzed().equals(before));
    }

    private double firstResonance() {
        return Double.parseDouble(driver.findElement(
                By.cssSelector("#resonance-table tbody tr:first-child td:nth-child(2)")).getText());
    }

    private String analyzed() {
        return String.valueOf(js("return document.querySelector('main.air-bench').dataset.analyzed || ''"));
    }

    private String rejected() {
        return String.valueOf(js("return document.querySelector('main.air-bench').dataset.rejected || ''"));
    }

    private void setChecked(WebElement box, boolean checked) {
        if (box.isSelected() != checked) {
            box.click();
        }
    }
}
