package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebElement;

/**
 * A measurement, not a timed test: how long a move on a bench takes to reach painted charts in
 * headless Chromium, recorded under {@code target/speed/} with the machine's load. A step moves the
 * control once, waits until the page announces the answer for exactly that value (its
 * {@code nodewright:*-analyzed} event, sent after the charts are updated), then for the next
 * animation frame and a task after it (the frame has been painted). Only correctness is asserted:
 * every step is answered with its own value and the last answer shown is the last value's.
 */
class DragSpeedIT extends BrowserTestBase {

    private static final int WARM_UP = 3;
    private static final int STEPS = 25;

    /** One step: set a control, time until the matching answer has been painted (ms). */
    private static final String STEP = """
            const [selector, value, eventName, path, done] = arguments;
            const control = document.querySelector(selector);
            const read = (detail) => path.split('.').reduce((o, k) => (o == null ? o : o[k]), detail.request);
            const t0 = performance.now();
            control.value = String(value);
            const target = Number(control.value);   // a slider snaps to its step
            const onAnswer = (e) => {
              if (Math.abs(Number(read(e.detail)) - target) > 1e-9) return;   // an answer to an earlier value
              document.removeEventListener(eventName, onAnswer);
              requestAnimationFrame(() => setTimeout(() => done([performance.now() - t0, target]), 0));
            };
            document.addEventListener(eventName, onAnswer);
            control.dispatchEvent(new Event('input', { bubbles: true }));
            control.dispatchEvent(new Event('change', { bubbles: true }));
            """;

    @Test
    void pickupDragToPaintedChartsOnTheStringBench() throws Exception {
        driver.get(url("/strings"));
        waitFor(By.id("string-form"));
        recordAnswers("nodewright:string-analyzed");
        wait.until(d -> js("return !!Chart.getChart(document.getElementById('spectrum-chart'))"
                + " && !!document.getElementById('slider-pickup0');"));
        List<Double> values = new ArrayList<>();
        for (int i = 0; i < WARM_UP + STEPS; i++) {
            values.add(151.3 + (i % 2 == 0 ? 2.0 * i : -i));
        }
        List<Double> ms = measure("#slider-pickup0", values, "nodewright:string-analyzed", "pickups.0.positionMm");
        record("string-bench-pickup-drag", ms);
        @SuppressWarnings("unchecked")
        Map<String, Object> last = (Map<String, Object>) js("return window.__answers[window.__answers.length - 1];");
        double x = lastTarget;
        assertThat(number(js("return window.__answers[window.__answers.length - 1].request.pickups[0].positionMm")))
                .isCloseTo(x, within(1e-9));
        // The answer drawn is the physics of that position: a pickup of aperture w on the sine mode
        // sin(k x), k = pi / L, reads its average over the aperture, sin(k x) sin(k w / 2) / (k w / 2)
        // (the textbook integral of a sine), here for mode 1 of the page's string.
        if ("sine".equals(js("return window.__answers[window.__answers.length - 1].response.modeShapes"))) {
            double lengthMm = number(js("return window.__answers[window.__answers.length - 1].request.lengthMm"));
            Object w = js("return window.__answers[window.__answers.length - 1].request.pickups[0].apertureMm || 0");
            double k = Math.PI / lengthMm;
            double half = k * number(w) / 2;
            double expected = Math.sin(k * x) * (half == 0 ? 1 : Math.sin(half) / half);
            assertThat(number(js("return window.__answers[window.__answers.length - 1].response.modes[0].pickupResponse[0]")))
                    .isCloseTo(expected, within(1e-9));
        }
        assertThat(last).isNotNull();
    }

    @Test
    void holeDiameterToPaintedChartsOnTheBoreBench() throws Exception {
        driver.get(url("/air-columns"));
        waitFor(By.id("bore-form"));
        wait.until(d -> !String.valueOf(js("return document.querySelector('main.air-bench').dataset.analyzed || ''"))
                .isEmpty());
        WebElement live = driver.findElement(By.id("auto-analyze"));
        if (!live.isSelected()) {
            live.click();
        }
        recordAnswers("nodewright:air-analyzed");
        List<Double> values = new ArrayList<>();
        for (int i = 0; i < WARM_UP + STEPS; i++) {
            values.add(Math.round(100 * (6.5 + 0.1 * (i % 5) + (i % 2 == 0 ? 0.05 : 0))) / 100.0);
        }
        List<Double> ms = measure("[data-field='holes[0].diameterMm']", values, "nodewright:air-analyzed",
                "holes.0.diameterMm");
        record("bore-bench-hole-diameter", ms);
        double d = lastTarget;
        assertThat(number(js("return window.__answers[window.__answers.length - 1].request.holes[0].diameterMm")))
                .isCloseTo(d, within(1e-9));
        assertThat(number(js("return window.__answers[window.__answers.length - 1].response.resonances.length")))
                .isPositive();
        assertThat(number(js("return Chart.getChart(document.getElementById('impedance-chart')).data.datasets[0].data.length")))
                .isPositive();
    }

    private void recordAnswers(String eventName) {
        js("window.__answers = []; document.addEventListener(arguments[0], e => window.__answers.push(e.detail));",
                eventName);
    }

    /** The value the control held after the last step (a slider snaps to its step). */
    private double lastTarget;

    private List<Double> measure(String selector, List<Double> values, String eventName, String path) {
        driver.manage().timeouts().scriptTimeout(Duration.ofSeconds(60));
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < values.size(); i++) {
            List<?> r = (List<?>) ((JavascriptExecutor) driver).executeAsyncScript(STEP, selector, values.get(i),
                    eventName, path);
            lastTarget = number(r.get(1));
            if (i >= WARM_UP) {
                out.add(number(r.get(0)));
            }
        }
        return out;
    }

    private static double number(Object o) {
        return ((Number) o).doubleValue();
    }

    private static void record(String name, List<Double> ms) throws IOException {
        List<Double> sorted = new ArrayList<>(ms);
        sorted.sort(null);
        double median = sorted.size() % 2 == 1 ? sorted.get(sorted.size() / 2)
                : (sorted.get(sorted.size() / 2 - 1) + sorted.get(sorted.size() / 2)) / 2;
        String load = Files.readString(Path.of("/proc/loadavg")).trim();
        String line = String.format(Locale.ROOT, "%s: median %.1f ms, min %.1f, max %.1f over %d steps; load %s; all %s%n",
                name, median, sorted.get(0), sorted.get(sorted.size() - 1), ms.size(), load,
                ms.stream().map(v -> String.format(Locale.ROOT, "%.1f", v)).toList());
        Path dir = Path.of("target", "speed");
        Files.createDirectories(dir);
        Files.writeString(dir.resolve(name + ".txt"), line);
        System.out.print(line);
    }
}
