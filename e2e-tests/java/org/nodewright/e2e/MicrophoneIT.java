package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.measure.TestRecordings;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * Listen on the string bench's measured-partials panel with Chromium's fake microphone playing a
 * stiff string the test synthesises: room noise first, then the pluck (the fake device loops the
 * file, so the onset detector has a quiet room to hear the attack rise from). The recording goes
 * through the upload path and the fit must find the string's f1 and B as the upload test does.
 */
class MicrophoneIT extends BrowserTestBase {

    // The string: G3 = 196.00 Hz (A4 = 440 Hz, equal temperament) with B = 3e-4, partials at
    // n·f1·√(1 + B·n²) (Fletcher 1964, eq. 11); 1 s of room noise at −60 dB, then 3.5 s of pluck.
    private static final double F1_HZ = 196.00;
    private static final double B = 3e-4;

    private static Path wav;

    @Override
    protected List<String> browserArguments() throws IOException {
        return fakeMicrophone();
    }

    /** Chromium's switches for a fake microphone playing the test's string (made once per run). */
    static synchronized List<String> fakeMicrophone() throws IOException {
        if (wav == null || !Files.exists(wav)) {
            wav = Files.createTempFile("microphone-it-", ".wav");
            Files.write(wav, TestRecordings.pluckAfterSilence(F1_HZ, B, 1.0, 3.5));
        }
        return List.of("--use-fake-ui-for-media-stream", "--use-fake-device-for-media-stream",
                "--use-file-for-fake-audio-capture=" + wav, "--autoplay-policy=no-user-gesture-required");
    }

    @AfterAll
    static synchronized void deleteRecording() throws IOException {
        if (wav != null) {
            Files.deleteIfExists(wav);
            wav = null;
        }
    }

    @Test
    void listensToAPluckedStringAndFitsItsF1AndB() throws Exception {
        listenOnTheStringBench(this, url("/strings"), "microphone-string-partials");
    }

    /** Clicks Listen on the string bench at pageUrl and checks the fit against the string played. */
    @SuppressWarnings("unchecked")
    static void listenOnTheStringBench(BrowserTestBase t, String pageUrl, String screenshot) throws Exception {
        WebDriver driver = t.driver;
        WebDriverWait wait = t.wait;
        driver.get(pageUrl);
        t.waitFor(By.id("string-form"));
        t.js("window.__pageErrors = []; window.addEventListener('error', e => window.__pageErrors.push(String(e.message)));"
                + "window.addEventListener('unhandledrejection', e => window.__pageErrors.push(String(e.reason)));"
                + "document.addEventListener('nodewright:apply-string-parameters', e => { window.__applied = e.detail; });");
        WebElement panel = t.waitFor(By.cssSelector("#measure-panel [data-panel='measure-strings'][data-ready='true']"));
        wait.until(d -> t.js("return !!Chart.getChart(document.getElementById('partials-chart'))").equals(Boolean.TRUE));
        WebElement max = panel.findElement(By.name("maxPartials"));
        max.clear();
        max.sendKeys("16");
        WebElement mic = panel.findElement(By.cssSelector("[data-mic]"));
        assertThat(mic.getAttribute("data-state")).isEqualTo("idle");
        // Every state the listen goes through, in order: it must wait for the attack, then keep what follows.
        t.js("const mic = arguments[0]; window.__micStates = []; new MutationObserver(() => window.__micStates.push(mic.dataset.state))"
                + ".observe(mic, {attributes: true, attributeFilter: ['data-state']});", mic);
        mic.findElement(By.cssSelector("[data-mic-role='listen']")).click();

        // While it waits for the attack the spectrum runs; then it keeps 3 s and sends them.
        WebDriverWait slow = new WebDriverWait(driver, Duration.ofSeconds(40));
        slow.until(d -> Integer.parseInt(String.valueOf(t.js("return arguments[0].dataset.frames || '0'",
                mic.findElement(By.cssSelector("[data-mic-role='spectrum']"))))) > 3);
        slow.until(d -> List.of("done", "failed").contains(mic.getAttribute("data-state")));
        assertThat(mic.getAttribute("data-state"))
                .as(mic.findElement(By.cssSelector("[data-mic-role='status']")).getText()).isEqualTo("done");
        assertThat((List<Object>) t.js("return window.__micStates.filter((s, i, all) => s !== all[i - 1])"))
                .containsExactly("asking", "waiting", "recording", "sending", "done");
        assertThat(panel.getAttribute("data-measured")).matches("\\d+");
        assertThat(Long.parseLong(panel.getAttribute("data-measured"))).isGreaterThanOrEqualTo(12);
        t.screenshot(screenshot);

        // The same tolerances as the upload path (MeasureIT, MeasurementsControllerTest): f1 to 1e-4
        // of itself, B to 2 %.
        Map<String, Object> fit = (Map<String, Object>) t.js("return JSON.parse(arguments[0].dataset.fit)", panel);
        assertThat(((Number) fit.get("f1Hz")).doubleValue()).isCloseTo(F1_HZ, within(F1_HZ * 1e-4));
        assertThat(((Number) fit.get("inharmonicityB")).doubleValue()).isCloseTo(B, within(0.02 * B));

        // The measured partials ride on the bench's partials chart in cents from n × f1:
        // 1200·log2(√(1 + B·n²)) = 25.4 cents at n = 10 for B = 3e-4 (Fletcher 1964, eq. 11).
        List<Object> measured = (List<Object>) t.js("const c = Chart.getChart(document.getElementById('partials-chart'));"
                + "const ds = c.data.datasets.find(d => d.kind === 'measured'); return ds ? ds.data : null;");
        assertThat(measured).isNotNull();
        assertThat(((Number) measured.get(9)).doubleValue())
                .isCloseTo(1200 * Math.log(Math.sqrt(1 + B * 100)) / Math.log(2), within(0.05));

        // Apply as for an upload: the bench takes μ and E.
        panel.findElement(By.cssSelector("[data-role='apply']")).click();
        wait.until(d -> t.js("return window.__applied") != null);
        Map<String, Object> applied = (Map<String, Object>) t.js("return window.__applied;");
        assertThat(((Number) applied.get("linearDensityKgPerM")).doubleValue()).isPositive();
        assertThat((List<Object>) t.js("return window.__pageErrors")).isEmpty();
    }

    /** Clicks Listen in the microphone part inside root and waits until it is done or failed. */
    private String listenIn(WebElement root) {
        WebElement mic = root.findElement(By.cssSelector("[data-mic]"));
        wait.until(d -> "idle".equals(mic.getAttribute("data-state")));
        mic.findElement(By.cssSelector("[data-mic-role='listen']")).click();
        new WebDriverWait(driver, Duration.ofSeconds(40))
                .until(d -> List.of("done", "failed").contains(mic.getAttribute("data-state")));
        return mic.getAttribute("data-state");
    }

    /** The partials of the string played: n·f1·√(1 + B·n²) (Fletcher 1964, eq. 11). */
    private static double partialHz(int n) {
        return n * F1_HZ * Math.sqrt(1 + B * n * n);
    }

    @Test
    void theBoreBenchListsThePeaksHeardBesideItsResonances() throws Exception {
        driver.get(url("/air-columns"));
        WebElement panel = waitFor(By.cssSelector("#measure-panel [data-panel='measure-air'][data-ready='true']"));
        wait.until(d -> js("return !!Chart.getChart(document.getElementById('impedance-chart'))").equals(Boolean.TRUE));
        assertThat(listenIn(panel)).isEqualTo("done");
        List<Double> heard = panel.findElements(By.cssSelector("[data-role='heard'] tbody tr td:nth-child(2)")).stream()
                .map(td -> Double.parseDouble(td.getText())).toList();
        // The three lowest partials of the string are among the strongest peaks heard, each within 0.5 Hz.
        for (int n = 1; n <= 3; n++) {
            double f = partialHz(n);
            assertThat(heard).as("partial " + n + " at " + f + " Hz").anySatisfy(h -> assertThat(h).isCloseTo(f, within(0.5)));
        }
        // Each beside the nearest predicted resonance, in cents; and drawn on the impedance chart.
        assertThat(panel.findElement(By.cssSelector("[data-role='heard'] tbody tr td:nth-child(5)")).getText()).matches("-?\\d+\\.\\d");
        Object points = js("const c = Chart.getChart(document.getElementById('impedance-chart'));"
                + "const ds = c.data.datasets.find(d => d.kind === 'heard'); return ds ? ds.data.length : 0;");
        assertThat(((Number) points).intValue()).isEqualTo(heard.size());
        screenshot("microphone-bore-heard");
    }

    @Test
    void thePlateBenchTakesTheTapPeaksHeard() throws Exception {
        driver.get(url("/plates"));
        WebElement form = waitFor(By.id("measure-form"));
        WebElement mass = driver.findElement(By.id("measure-mass"));
        mass.clear();
        mass.sendKeys("45");
        listenIn(form);
        // The peaks of the recording reached the plate's fit (the same /peaks path as a chosen file):
        // the string's lowest partial is among them. Whether a string's peaks make a plate is the fit's to say.
        wait.until(d -> !d.findElement(By.id("measure-peaks")).getText().isEmpty());
        assertThat(driver.findElement(By.id("measure-peaks")).getText()).contains(String.format(java.util.Locale.ROOT, "%.1f", partialHz(1)));
        wait.until(d -> d.findElement(By.id("measure-result")).isDisplayed()
                || !d.findElement(By.id("measure-problem")).getText().isEmpty());
    }

    @Test
    void theBarBenchFitsTheBlankFromTheRecordingHeard() throws Exception {
        driver.get(url("/bars"));
        WebElement blank = waitFor(By.id("bar-blank"));
        wait.until(d -> js("return !!window.nodewrightBars && !!window.nodewrightBars.last()").equals(Boolean.TRUE));
        String state = listenIn(blank);
        // The recording went the way of an uploaded one (POST /api/v1/bars/measure-blank/recording):
        // fitted, or refused with the server's reason under the panel. (A string is no bar blank.)
        String fit = driver.findElement(By.id("blank-status")).getAttribute("data-state");
        assertThat(fit).isIn("fitted", "refused");
        assertThat(state).isEqualTo("fitted".equals(fit) ? "done" : "failed");
        if ("refused".equals(fit)) {
            assertThat(driver.findElement(By.id("blank-problem")).getText()).isNotEmpty();
        }
    }

    @Test
    void aPageOverPlainHttpFromAnotherHostSaysWhyTheBrowserRefuses() throws Exception {
        // A host name that is not this machine's loopback name: http://nodewright.test is no secure context.
        WebDriver other = newBrowser(false, List.of("--host-resolver-rules=MAP nodewright.test 127.0.0.1"));
        try {
            other.get("http://nodewright.test:" + port + "/strings");
            WebDriverWait w = new WebDriverWait(other, Duration.ofSeconds(15));
            WebElement mic = w.until(d -> d.findElements(By.cssSelector("#measure-panel [data-mic][data-state='refused']"))
                    .stream().findFirst().orElse(null));
            assertThat(((JavascriptExecutor) other).executeScript("return window.isSecureContext")).isEqualTo(false);
            assertThat(mic.findElement(By.cssSelector("[data-mic-role='listen']")).isEnabled()).isFalse();
            assertThat(mic.findElement(By.cssSelector("[data-mic-role='status']")).getText())
                    .contains("secure pages").contains("HTTPS").contains("127.0.0.1");
        } finally {
            other.quit();
        }
    }
}
