package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.measure.TestRecordings;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

/**
 * Pages handing values to one another, unsaved: the Measure page's fit to the string bench, the
 * bore bench's bore to the bench templates; and a refused upload that leaves no old fit behind.
 */
class HandOverIT extends BrowserTestBase {

    private WebElement measurePanel() {
        driver.get(url("/measure"));
        return waitFor(By.cssSelector("#measure-panel [data-panel='measure-strings'][data-ready='true']"));
    }

    private void upload(WebElement panel, Path file) {
        panel.findElement(By.name("file")).sendKeys(file.toString());
        panel.findElement(By.cssSelector("[data-role='analyse']")).click();
    }

    @Test
    void theMeasurePageOpensTheStringBenchWithTheFit() throws Exception {
        WebElement panel = measurePanel();
        // A recording made from Fletcher's law (1964, eq. 11): f1 = 246.94 Hz, B = 2e-4.
        Path wav = Files.createTempFile("handover-", ".wav");
        Files.write(wav, TestRecordings.pluck(246.94, 2e-4, 2.0, 16, 1));
        upload(panel, wav);
        wait.until(d -> String.valueOf(js("return arguments[0].dataset.measured || ''", panel)).matches("\\d+"));
        // Nothing to compare with on this page: the design columns are not shown empty.
        assertThat(panel.findElement(By.cssSelector("[data-role='peaks'] thead th:nth-child(6)")).isDisplayed()).isFalse();
        WebElement apply = panel.findElement(By.cssSelector("[data-role='apply']"));
        // No design on this page: the button says where the values go instead of "applied to the design".
        assertThat(apply.getText()).contains("string bench");
        for (String[] v : new String[][] {{"tension", "70"}, {"length", "650"}, {"diameter", "0.3"}}) {
            WebElement input = panel.findElement(By.cssSelector("[data-role='" + v[0] + "']"));
            input.clear();
            input.sendKeys(v[1]);
        }
        apply.click();
        wait.until(d -> d.getCurrentUrl().contains("/strings"));
        waitFor(By.id("string-form"));
        wait.until(d -> js("return !!Chart.getChart(document.getElementById('mode-shapes-chart'));"));
        // μ = T/(2·L·f1)² = 70/(2·0.65·246.94)² kg/m = 0.0008843 kg/m = 0.8843 g/m; the bench sounds f1 again.
        double mu = 70 / Math.pow(2 * 0.65 * 246.94, 2) * 1000;
        double shown = Double.parseDouble(driver.findElement(By.id("linearDensity")).getAttribute("value"));
        assertThat(shown).isCloseTo(mu, within(mu * 1e-4));
        assertThat(driver.findElement(By.id("tensionN")).getAttribute("value")).isEqualTo("70");
        assertThat(driver.findElement(By.id("lengthMm")).getAttribute("value")).isEqualTo("650");
        wait.until(d -> !driver.findElement(By.id("summary")).getText().isBlank());
        assertThat(driver.findElement(By.id("summary")).getText()).contains("246.9");
        screenshot("handover-measure-to-strings");
    }

    @Test
    void aRefusedUploadLeavesNoEarlierFitUnderItsError() throws Exception {
        WebElement panel = measurePanel();
        Path wav = Files.createTempFile("handover-", ".wav");
        Files.write(wav, TestRecordings.pluck(246.94, 2e-4, 2.0, 16, 1));
        upload(panel, wav);
        wait.until(d -> String.valueOf(js("return arguments[0].dataset.measured || ''", panel)).matches("\\d+"));
        assertThat(panel.findElement(By.cssSelector("[data-role='result']")).isDisplayed()).isTrue();
        Path notWav = Files.createTempFile("not-a-recording-", ".wav");
        Files.writeString(notWav, "this is not a recording");
        upload(panel, notWav);
        wait.until(d -> "failed".equals(js("return arguments[0].dataset.measured", panel)));
        assertThat(panel.findElement(By.cssSelector("[data-role='result']")).isDisplayed()).isFalse();
        assertThat(panel.findElements(By.cssSelector("[data-role='peaks'] tbody tr"))).isEmpty();
    }

    @Test
    @SuppressWarnings("unchecked")
    void theBoreBenchHandsItsBoreToTheBenchTemplates() {
        driver.get(url("/air-columns"));
        wait.until(d -> js("return document.querySelector('main.air-bench').dataset.analyzed || null") != null);
        // Move the first hole so that the bore handed over is this page's, not the demo's.
        WebElement first = driver.findElement(By.cssSelector("#hole-rows input[data-key='positionMm']"));
        first.clear();
        first.sendKeys("131.5");
        driver.findElement(By.id("send-to-templates")).click();
        wait.until(d -> d.getCurrentUrl().contains("/templates"));
        wait.until(d -> String.valueOf(js("return document.getElementById('bore-json').value")).contains("segments"));
        List<Object> holes = (List<Object>) js("return JSON.parse(document.getElementById('bore-json').value).holes.map(h => h.positionMm)");
        assertThat(((Number) holes.get(0)).doubleValue()).isEqualTo(131.5);
        assertThat(driver.findElement(By.id("bore-message")).getText()).isNotBlank();
        // The button on the templates page takes it again, instead of saying that none was passed.
        driver.findElement(By.id("bore-demo")).click();
        wait.until(d -> !String.valueOf(js("return document.getElementById('bore-json').value")).contains("131.5"));
        driver.findElement(By.id("bore-from-bench")).click();
        wait.until(d -> String.valueOf(js("return document.getElementById('bore-json').value")).contains("131.5"));
    }
}
