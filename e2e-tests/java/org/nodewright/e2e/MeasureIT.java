package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.measure.TestRecordings;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

/**
 * Measured partials and listening in a real headless Chromium: a synthesised recording uploaded on
 * the string bench, its partials drawn on the partials chart, the fit applied back to the design,
 * and the Play buttons starting Web Audio without errors.
 */
class MeasureIT extends BrowserTestBase {

    private void collectErrors() {
        js("window.__pageErrors = []; window.addEventListener('error', e => window.__pageErrors.push(String(e.message)));"
                + "window.addEventListener('unhandledrejection', e => window.__pageErrors.push(String(e.reason)));");
    }

    private long stringAnalyses() {
        return ((Number) js("return window.__analyses || 0;")).longValue();
    }

    private void analyseString() {
        long before = stringAnalyses();
        driver.findElement(By.id("analyze-button")).click();
        wait.until(d -> stringAnalyses() > before);
        wait.until(d -> Boolean.TRUE.equals(js("return document.getElementById('busy').hidden;")));
    }

    @Test
    @SuppressWarnings("unchecked")
    void uploadsARecordingOnTheStringBenchDrawsItAndAppliesTheFit() throws Exception {
        driver.get(url("/strings"));
        waitFor(By.id("string-form"));
        collectErrors();
        js("document.addEventListener('nodewright:string-analyzed', () => { window.__analyses = (window.__analyses || 0) + 1; });"
                + "document.addEventListener('nodewright:apply-string-parameters', e => { window.__applied = e.detail; });");
        waitFor(By.cssSelector("#measure-panel [data-panel='measure-strings'][data-ready='true']"));
        waitFor(By.cssSelector("#listen-panel [data-panel='listen-strings'] [data-role='play']"));
        analyseString();

        // A recording made from Fletcher's law (1964, eq. 11): f1 = 246.94 Hz, B = 2e-4.
        Path wav = Files.createTempFile("measure-it-", ".wav");
        Files.write(wav, TestRecordings.pluck(246.94, 2e-4, 2.0, 16, 1));
        WebElement panel = driver.findElement(By.cssSelector("#measure-panel [data-panel='measure-strings']"));
        panel.findElement(By.name("file")).sendKeys(wav.toString());
        WebElement max = panel.findElement(By.name("maxPartials"));
        max.clear();
        max.sendKeys("16");
        panel.findElement(By.cssSelector("[data-role='analyse']")).click();
        wait.until(d -> js("return arguments[0].dataset.measured || ''", panel).toString().matches("\\d+"));
        assertThat(Long.parseLong(panel.getAttribute("data-measured"))).isGreaterThanOrEqualTo(12);
        assertThat(panel.findElements(By.cssSelector("[data-role='peaks'] tbody tr"))).hasSizeGreaterThanOrEqualTo(12);

        // The measured points sit on the partials chart: cents from n × f1 follow
        // 1200·log2(√(1 + B·n²)) (Fletcher 1964, eq. 11): 17.1 cents at n = 10 for B = 2e-4.
        List<Object> measured = (List<Object>) js("const c = Chart.getChart(document.getElementById('partials-chart'));"
                + "const ds = c.data.datasets.find(d => d.kind === 'measured'); return ds ? ds.data : null;");
        assertThat(measured).isNotNull();
        double at10 = ((Number) measured.get(9)).doubleValue();
        assertThat(at10).isCloseTo(1200 * Math.log(Math.sqrt(1 + 2e-4 * 100)) / Math.log(2), within(0.05));
        screenshot("measure-string-partials");

        // Apply the fit: μ = T/(2·L·f1)², E = 64·T·L²·B/(π³·d⁴) from the panel's own inputs.
        double t = Double.parseDouble(panel.findElement(By.cssSelector("[data-role='tension']")).getAttribute("value"));
        double l = Double.parseDouble(panel.findElement(By.cssSelector("[data-role='length']")).getAttribute("value")) / 1000;
        double d = Double.parseDouble(panel.findElement(By.cssSelector("[data-role='diameter']")).getAttribute("value")) / 1000;
        long before = stringAnalyses();
        panel.findElement(By.cssSelector("[data-role='apply']")).click();
        wait.until(dr -> stringAnalyses() > before);
        Map<String, Object> applied = (Map<String, Object>) js("return window.__applied;");
        double mu = ((Number) applied.get("linearDensityKgPerM")).doubleValue();
        double e = ((Number) applied.get("youngsModulusPa")).doubleValue();
        assertThat(mu).isCloseTo(t / Math.pow(2 * l * 246.94, 2), within(mu * 1e-4));
        assertThat(e).isCloseTo(64 * t * l * l * 2e-4 / (Math.pow(Math.PI, 3) * Math.pow(d, 4)), within(e * 0.02));
        // The bench took them as its linear-density and modulus overrides (g/m and GPa on the form).
        assertThat(Double.parseDouble(driver.findElement(By.id("linearDensity")).getAttribute("value")))
                .isCloseTo(mu * 1000, within(mu * 1000 * 1e-4));
        assertThat(Double.parseDouble(driver.findElement(By.id("youngsModulus")).getAttribute("value")))
                .isCloseTo(e / 1e9, within(e / 1e9 * 1e-4));
        assertThat((List<Object>) js("return window.__pageErrors")).isEmpty();
    }

    @Test
    void playStartsAnAudioContextAndComparesTwoVersions() throws Exception {
        driver.get(url("/strings"));
        waitFor(By.id("string-form"));
        collectErrors();
        js("document.addEventListener('nodewright:string-analyzed', () => { window.__analyses = (window.__analyses || 0) + 1; });");
        WebElement panel = waitFor(By.cssSelector("#listen-panel [data-panel='listen-strings']"));
        waitFor(By.cssSelector("#listen-panel [data-role='play']"));
        analyseString();
        panel.findElement(By.cssSelector("[data-role='play']")).click();
        wait.until(d -> "running".equals(js("return arguments[0].dataset.audioState", panel)));
        assertThat(Long.parseLong(panel.getAttribute("data-playing"))).isGreaterThan(3);
        panel.findElement(By.cssSelector("[data-role='rememberA']")).click();
        panel.findElement(By.cssSelector("[data-role='rememberB']")).click();
        panel.findElement(By.cssSelector("[data-role='compare']")).click();
        assertThat(panel.findElement(By.cssSelector("[data-role='snapshots']")).getText()).contains("A:").contains("B:");
        panel.findElement(By.cssSelector("[data-role='stop']")).click();
        assertThat(js("return arguments[0].dataset.voices", panel)).isEqualTo("0");
        assertThat((List<Object>) js("return window.__pageErrors")).isEmpty();
    }

    @Test
    void theMeasurePageRefusesAFileThatIsNotARecording() throws Exception {
        driver.get(url("/measure"));
        WebElement panel = waitFor(By.cssSelector("#measure-panel [data-panel='measure-strings'][data-ready='true']"));
        Path notWav = Files.createTempFile("not-a-recording-", ".wav");
        Files.writeString(notWav, "this is not a recording");
        panel.findElement(By.name("file")).sendKeys(notWav.toString());
        panel.findElement(By.cssSelector("[data-role='analyse']")).click();
        wait.until(d -> "failed".equals(js("return arguments[0].dataset.measured", panel)));
        assertThat(panel.findElement(By.cssSelector("[data-role='status']")).getText()).contains("not a WAV");
        assertThat(panel.findElement(By.name("file")).getAttribute("class")).contains("invalid");
    }

    @Test
    void importsAMeasuredImpedanceCurveOnTheBoreBench() throws Exception {
        driver.get(url("/air-columns"));
        waitFor(By.id("bore-form"));
        collectErrors();
        WebElement panel = waitFor(By.cssSelector("#measure-panel [data-panel='measure-air'][data-ready='true']"));
        wait.until(d -> js("return !!Chart.getChart(document.getElementById('impedance-chart'))").equals(Boolean.TRUE));
        // A closed (reed) input end: resonances are the impedance maxima.
        String before = String.valueOf(js("return document.querySelector('main.air-bench').dataset.analyzed || ''"));
        js("const s = document.getElementById('input-end'); s.value = 'closed'; s.dispatchEvent(new Event('change'));");
        wait.until(d -> !before.equals(String.valueOf(js("return document.querySelector('main.air-bench').dataset.analyzed || ''"))));
        // Two resonances 1/(1 + iQ(f/f0 − f0/f)) at 440 and 880 Hz (Fletcher & Rossing 1998, §1.6).
        StringBuilder csv = new StringBuilder("frequencyHz,magnitude,phaseRad\n");
        for (int i = 0; i <= 1500; i++) {
            double f = 200 + i;
            double re = 0;
            double im = 0;
            for (double f0 : new double[] {440, 880}) {
                double x = 25 * (f / f0 - f0 / f);
                re += 1 / (1 + x * x);
                im += -x / (1 + x * x);
            }
            csv.append(f).append(',').append(Math.hypot(re, im)).append(',').append(Math.atan2(im, re)).append('\n');
        }
        Path file = Files.createTempFile("impedance-", ".csv");
        Files.writeString(file, csv);
        panel.findElement(By.name("file")).sendKeys(file.toString());
        panel.findElement(By.cssSelector("button[type='submit']")).click();
        wait.until(d -> js("return arguments[0].dataset.measured || ''", panel).toString().matches("\\d+"));
        assertThat(panel.getAttribute("data-measured")).isEqualTo("2");
        Object points = js("const c = Chart.getChart(document.getElementById('impedance-chart'));"
                + "const ds = c.data.datasets.find(d => d.kind === 'measured'); return ds ? ds.data.length : 0;");
        assertThat(((Number) points).longValue()).isEqualTo(1501);
        // Issue 16 polish: the measured curve has its entry in the chart's legend, phase hidden or not.
        Object legend = js("const c = Chart.getChart(document.getElementById('impedance-chart'));"
                + "return c.legend.legendItems.map(i => i.text);");
        assertThat((List<Object>) legend).contains("Measured |Z|");
        WebElement listen = waitFor(By.cssSelector("#listen-panel [data-panel='listen-air'] [data-role='play']"));
        screenshot("measure-air-impedance");
        assertThat((List<Object>) js("return window.__pageErrors")).isEmpty();
        assertThat(listen.isDisplayed()).isTrue();
    }
}
