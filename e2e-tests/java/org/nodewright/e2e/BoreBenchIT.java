package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;

/**
 * The bore bench in a real browser: a bore built row by row, its impedance chart and resonance
 * table, a tone hole toggled on the drawing, a bad row answered inline, and the demo presets.
 */
class BoreBenchIT extends BrowserTestBase {

    @BeforeEach
    void openThePage() {
        driver.get(url("/air-columns"));
        waitFor(By.id("bore-form"));
        waitForAnalysis("0");
    }

    @Test
    void aCylinderBuiltInTheEditorGetsItsChartAndOddHarmonics() throws Exception {
        String before = analyzed();
        buildLosslessClosedOpenCylinder(300.0, 15.0);
        js("window.__airEvents = []; document.addEventListener('nodewright:air-analyzed', e => window.__airEvents.push(e.detail));");
        driver.findElement(By.id("analyze")).click();
        waitForAnalysisAfter(before);

        // The chart is drawn with one point per requested frequency on a log magnitude axis.
        assertThat(js("return Chart.getChart(document.getElementById('impedance-chart')).data.datasets[0].data.length"))
                .isEqualTo(2000L);
        assertThat(js("return Chart.getChart(document.getElementById('impedance-chart')).options.scales.y.type"))
                .isEqualTo("logarithmic");
        // Lossless cylinder, closed at one end, p = 0 at the other: f_n = (2n-1) c / 4L (the textbook
        // result, e.g. Fletcher & Rossing, The Physics of Musical Instruments, 2nd ed., ch. 8).
        double c = speedOfSound();
        List<Double> f = resonanceColumn(1);
        assertThat(f).hasSizeGreaterThanOrEqualTo(5);
        for (int n = 1; n <= 5; n++) {
            double expected = (2 * n - 1) * c / (4 * 0.300);
            assertThat(cents(f.get(n - 1), expected)).as("resonance %d", n).isCloseTo(0.0, within(1.0));
        }
        // The page compares them with the odd harmonics: 3 f1 for the second resonance.
        assertThat(cell(2, 6)).isEqualTo("3·f1");
        assertThat(Double.parseDouble(cell(2, 7).replace('−', '-'))).isCloseTo(0.0, within(1.0));
        // The event for the listening and measuring panels carries request and response.
        assertThat(js("return window.__airEvents.length")).isEqualTo(1L);
        assertThat(js("return window.__airEvents[0].request.segments[0].lengthMm")).isEqualTo(300L);
        assertThat(js("return window.__airEvents[0].response.resonances.length")).isEqualTo((long) f.size());
        // Phase on demand: a second dataset on its own axis.
        assertThat(js("return Chart.getChart(document.getElementById('impedance-chart')).data.datasets[1].hidden"))
                .isEqualTo(true);
        driver.findElement(By.id("show-phase")).click();
        wait.until(d -> Boolean.FALSE.equals(
                js("return Chart.getChart(document.getElementById('impedance-chart')).data.datasets[1].hidden")));
        fullPageScreenshot("bore-bench-cylinder");

        // Inches on screen, millimetres on the wire: same resonances.
        String beforeUnits = analyzed();
        new Select(driver.findElement(By.id("units"))).selectByValue("inch");
        assertThat(field("segments[0].lengthMm").getDomProperty("value")).isEqualTo("11.81102");
        driver.findElement(By.id("analyze")).click();
        waitForAnalysisAfter(beforeUnits);
        assertThat(resonanceColumn(1).get(0)).isCloseTo(f.get(0), within(1e-6));
    }

    /**
     * A length typed in inches goes to the server in mm (1 in = 25.4 mm exactly): 12 in = 304.8 mm, and the
     * lossless closed-open cylinder answers f_n = (2n-1) c / 4L for that length, as in mm above.
     */
    @Test
    void aLengthTypedInInchesIsSentInMillimetres() throws Exception {
        String before = analyzed();
        buildLosslessClosedOpenCylinder(300.0, 15.0);
        new Select(driver.findElement(By.id("units"))).selectByValue("inch");
        type(field("segments[0].lengthMm"), "12");
        js("window.__airEvents = []; document.addEventListener('nodewright:air-analyzed', e => window.__airEvents.push(e.detail));");
        driver.findElement(By.id("analyze")).click();
        waitForAnalysisAfter(before);
        assertThat(((Number) js("return window.__airEvents[0].request.segments[0].lengthMm")).doubleValue())
                .isCloseTo(304.8, within(1e-9));
        double c = speedOfSound();
        List<Double> f = resonanceColumn(1);
        for (int n = 1; n <= 3; n++) {
            // the same 1-cent window as the millimetre cylinder above
            assertThat(cents(f.get(n - 1), (2 * n - 1) * c / (4 * 0.3048))).as("resonance %d", n)
                    .isCloseTo(0.0, within(1.0));
        }
        assertThat(field("segments[0].lengthMm").getDomProperty("value")).isEqualTo("12");
    }

    @Test
    void closingAToneHoleOnTheDrawingLowersThePitch() throws Exception {
        buildCylinder(300.0, 15.0);
        new Select(driver.findElement(By.id("input-end"))).selectByValue("open");
        new Select(driver.findElement(By.id("output-end"))).selectByValue("open-unflanged");
        String before = analyzed();
        driver.findElement(By.id("add-hole")).click();
        type(field("holes[0].positionMm"), "200");
        type(field("holes[0].diameterMm"), "9");
        type(field("holes[0].chimneyMm"), "3");
        driver.findElement(By.id("analyze")).click();
        waitForAnalysisAfter(before);
        double open = resonanceColumn(1).get(0);
        screenshot("bore-bench-hole-open");

        // With live analysis on, a click on the hole in the drawing closes it and re-analyses.
        setChecked(driver.findElement(By.id("auto-analyze")), true);
        String beforeToggle = analyzed();
        WebElement hole = driver.findElement(By.cssSelector("#bore-drawing g.bore-hole[data-hole='0']"));
        assertThat(hole.getDomAttribute("class")).contains("open");
        hole.click();
        waitForAnalysisAfter(beforeToggle);
        double closed = resonanceColumn(1).get(0);
        assertThat(driver.findElement(By.cssSelector("#bore-drawing g.bore-hole[data-hole='0']")).getDomAttribute("class"))
                .contains("closed");
        assertThat(field("holes[0].open").isSelected()).isFalse();
        // An open tone hole shortens the acoustic length (common practice): closing it lowers f1,
        // here by far more than a semitone since the hole is a third of the way from the end.
        assertThat(cents(open, closed)).isGreaterThan(100.0);
        fullPageScreenshot("bore-bench-hole-closed");
    }

    @Test
    void aBadRowIsMarkedInlineAndTheRowsAreKept() throws Exception {
        buildCylinder(300.0, 15.0);
        driver.findElement(By.id("add-segment")).click();
        String before = rejected();
        type(field("segments[1].lengthMm"), "-40");
        driver.findElement(By.id("analyze")).click();
        wait.until(d -> !before.equals(rejected()));
        WebElement bad = field("segments[1].lengthMm");
        assertThat(bad.getDomAttribute("class")).contains("invalid");
        WebElement message = waitFor(By.cssSelector("[data-error-for='segments[1].lengthMm']"));
        assertThat(message.getText()).isNotBlank();
        // The user's rows are kept as typed.
        assertThat(driver.findElements(By.cssSelector("#segment-rows tr"))).hasSize(2);
        assertThat(bad.getDomProperty("value")).isEqualTo("-40");
        assertThat(field("segments[0].lengthMm").getDomProperty("value")).isEqualTo("300");
        fullPageScreenshot("bore-bench-bad-row");

        // Text that is not a number is caught in the page, on its own field.
        String again = rejected();
        type(field("segments[0].inputDiameterMm"), "abc");
        driver.findElement(By.id("analyze")).click();
        wait.until(d -> !again.equals(rejected()));
        assertThat(field("segments[0].inputDiameterMm").getDomAttribute("class")).contains("invalid");
        assertThat(field("segments[0].inputDiameterMm").getDomProperty("value")).isEqualTo("abc");

        // Fixed rows analyse again and the marks go away.
        String fixed = analyzed();
        type(field("segments[0].inputDiameterMm"), "15");
        type(field("segments[1].lengthMm"), "40");
        driver.findElement(By.id("analyze")).click();
        waitForAnalysisAfter(fixed);
        assertThat(driver.findElements(By.cssSelector("#bore-form input.invalid"))).isEmpty();
    }

    @Test
    void presetsLoadAStoppedPipeAndTheWhistleWithItsFingerings() throws Exception {
        js("window.__answers = []; document.addEventListener('nodewright:air-analyzed', e => window.__answers.push(e.detail));");
        String before = analyzed();
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("stopped-pipe");
        waitForAnalysisAfter(before);
        assertThat(field("segments[0].lengthMm").getDomProperty("value")).isEqualTo("300");
        assertThat(driver.findElements(By.cssSelector("#hole-rows tr"))).isEmpty();
        // Stopped pipe, 300 mm x 25 mm, unflanged, written here: f1 = c / (4 (L + 0.6133 a)) / (1 + 1.045/rv),
        // Levine & Schwinger's (1948) low-ka end correction and Keefe's (1984) boundary-layer phase
        // velocity, rv = a sqrt(omega rho / mu) with rho = 1.2046 kg/m3, mu = 1.813e-5 Pa s (20 C dry air;
        // a percent off in either moves f1 by 0.004 %). Within 1 cent: the end correction's change at
        // ka = 0.06 and the table's rounding are below that; the losses alone are 13 cents.
        double c = speedOfSound();
        double f1 = resonanceColumn(1).get(0);
        double a = 0.0125;
        double expected = c / (4 * (0.300 + 0.6133 * a));
        for (int i = 0; i < 30; i++) {
            double rv = a * Math.sqrt(2 * Math.PI * expected * 1.2046 / 1.813e-5);
            expected = c / (4 * (0.300 + 0.6133 * a)) / (1 + 1.045 / rv);
        }
        assertThat(cents(f1, expected)).isCloseTo(0.0, within(1.0));
        // Every drawn resonance is the server's, within 1 cent (the table rounds to 0.1 Hz: 1.7 cents
        // would need a resonance below 100 Hz, and this pipe's first is near 280 Hz), in its order.
        @SuppressWarnings("unchecked")
        List<Number> served = (List<Number>) js("const r = window.__answers[window.__answers.length - 1].response;"
                + " return r.resonances.map(x => x.frequencyHz);");
        List<Double> drawn = resonanceColumn(1);
        assertThat(drawn).hasSize(served.size()).isNotEmpty();
        for (int i = 0; i < drawn.size(); i++) {
            assertThat(cents(drawn.get(i), served.get(i).doubleValue())).as("resonance %d", i + 1)
                    .isCloseTo(0.0, within(1.0));
        }
        assertThat(cell(2, 6)).isEqualTo("3·f1");
        fullPageScreenshot("bore-bench-stopped-pipe");

        String beforeWhistle = analyzed();
        js("window.__whistle = []; document.addEventListener('nodewright:air-analyzed', e => window.__whistle.push(e.detail));");
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("six-hole-whistle");
        waitForAnalysisAfter(beforeWhistle);
        wait.until(d -> analyzed().equals(js("return document.querySelector('main.air-bench').dataset.fingeringsReady")));
        assertThat(driver.findElements(By.cssSelector("#hole-rows tr"))).hasSize(6);
        // The table is the secondary view of the fingerings now (the cards come first): open it.
        openFingeringTable();
        List<WebElement> rows = driver.findElements(By.cssSelector("#fingering-rows tr"));
        assertThat(rows).hasSize(9);
        for (WebElement row : rows) {
            assertThat(row.findElement(By.cssSelector("td.predicted")).getText()).matches("\\d+\\.\\d");
            assertThat(row.findElement(By.cssSelector("td.verdict")).getText()).isNotBlank();
        }
        // What the table shows is what the server predicted, row by row, to the table's one decimal
        // (0.05 Hz), in the server's order: not merely a number in each cell.
        @SuppressWarnings("unchecked")
        List<Number> predicted = (List<Number>) js("const r = window.__whistle[window.__whistle.length - 1].response;"
                + " return r.fingerings.map(f => f.predictedHz);");
        assertThat(predicted).hasSize(rows.size());
        for (int i = 0; i < rows.size(); i++) {
            double shown = Double.parseDouble(rows.get(i).findElement(By.cssSelector("td.predicted")).getText());
            assertThat(shown).as("fingering %d", i).isCloseTo(predicted.get(i).doubleValue(), within(0.05 + 1e-9));
            assertThat(cents(shown, predicted.get(i).doubleValue())).as("fingering %d", i).isCloseTo(0.0, within(1.0));
        }
        // D6 overblows the all-closed D5 fingering: the second register of an open cylinder sits
        // close to the octave (common practice; end corrections stretch or shrink it a little).
        double d5 = predicted.get(0).doubleValue();
        double d6 = predicted.get(7).doubleValue();
        assertThat(cents(d6, 2 * d5)).isCloseTo(0.0, within(50.0));
        fullPageScreenshot("bore-bench-whistle");

        // A target the server cannot read is marked on that fingering's target, the rows kept.
        String beforeBad = rejected();
        WebElement target = driver.findElement(By.cssSelector("#fingering-rows tr:nth-child(2) input[data-key='target']"));
        type(target, "H9");
        wait.until(d -> !beforeBad.equals(rejected()));
        assertThat(waitFor(By.cssSelector("[data-error-for='fingerings[1].targetNote']")).getText()).isNotBlank();
        assertThat(driver.findElements(By.cssSelector("#fingering-rows tr"))).hasSize(9);
        assertThat(target.getDomProperty("value")).isEqualTo("H9");
    }

    @Test
    void theConicalPresetFollowsTheTruncatedConeFormula() throws Exception {
        String before = analyzed();
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("conical-chanter");
        waitForAnalysisAfter(before);
        assertThat(driver.findElements(By.cssSelector("#segment-rows tr"))).hasSize(2);
        // Nearly the full harmonic series for a cone closed at its tip: the second resonance near 2 f1.
        assertThat(cell(2, 6)).isEqualTo("2·f1");
        fullPageScreenshot("bore-bench-cone");

        // Lossless, p = 0 at the wide end: a cone truncated x1 = 50 mm from its apex and closed there
        // resonates where tan kL = -k x1 (Fletcher & Rossing, The Physics of Musical Instruments,
        // 2nd ed., sec. 8.7); L = 550 mm here. The roots are found below by bisection.
        setChecked(driver.findElement(By.id("auto-analyze")), false);
        setChecked(driver.findElement(By.id("losses")), false);
        new Select(driver.findElement(By.id("output-end"))).selectByValue("ideal-open");
        String lossless = analyzed();
        driver.findElement(By.id("analyze")).click();
        waitForAnalysisAfter(lossless);
        double c = speedOfSound();
        List<Double> f = resonanceColumn(1);
        for (int n = 1; n <= 3; n++) {
            double kl = truncatedConeRoot(n, 50.0 / 550.0);
            double expected = kl / (2 * Math.PI * 0.550) * c;
            assertThat(cents(f.get(n - 1), expected)).as("resonance %d", n).isCloseTo(0.0, within(1.0));
        }
    }

    @Test
    void reorderingHolesCarriesTheFingeringsAlong() throws Exception {
        String before = analyzed();
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("six-hole-whistle");
        waitForAnalysisAfter(before);
        // E5 closes holes 1-5; move hole 5 below hole 6: E5 must now close holes 1-4 and 6.
        driver.findElement(By.cssSelector("#hole-rows tr:nth-child(5) button.down")).click();
        assertThat(field("holes[5].positionMm").getDomProperty("value")).isEqualTo("215.5");
        List<Object> closed = closedHolesOfRow(2);
        assertThat(closed).containsExactly(true, true, true, true, false, true);
        // Removing hole 1 drops it from every fingering and renumbers the rest.
        driver.findElement(By.cssSelector("#hole-rows tr:nth-child(1) button.remove")).click();
        List<Object> after = closedHolesOfRow(2);
        assertThat(after).containsExactly(true, true, true, false, true);
        // Inches on screen: 203 mm shows as 7.99213 in.
        new Select(driver.findElement(By.id("units"))).selectByValue("inch");
        assertThat(field("holes[2].positionMm").getDomProperty("value")).isEqualTo("7.99213");
        fullPageScreenshot("bore-bench-reordered-inch");
    }

    @Test
    void aBoreSavedFromTheDesignBarComesBackWithItsFingerings() throws Exception {
        wait.until(d -> "true".equals(js("return document.getElementById('design-bar').dataset.ready || ''")));
        String before = analyzed();
        new Select(driver.findElement(By.id("preset-select"))).selectByValue("stopped-pipe");
        waitForAnalysisAfter(before);
        driver.findElement(By.id("add-fingering")).click();
        openFingeringTable();
        type(driver.findElement(By.cssSelector("#fingering-rows tr:nth-child(1) input[data-key='target']")), "C#4");
        type(driver.findElement(By.id("temperature")), "28");
        String changed = analyzed();
        driver.findElement(By.id("analyze")).click();
        waitForAnalysisAfter(changed);
        type(driver.findElement(By.cssSelector("#design-bar [data-role='name']")), "Harrowgate stopped pipe, warm room");
        driver.findElement(By.cssSelector("#design-bar [data-role='save']")).click();
        wait.until(d -> !String.valueOf(js("return document.getElementById('design-bar').dataset.designId || ''")).isEmpty());
        String id = String.valueOf(js("return document.getElementById('design-bar').dataset.designId"));

        driver.get(url("/air-columns?design=" + id));
        wait.until(d -> "true".equals(js("return document.getElementById('design-bar').dataset.ready || ''")));
        wait.until(d -> "28".equals(driver.findElement(By.id("temperature")).getDomProperty("value")));
        assertThat(field("segments[0].inputDiameterMm").getDomProperty("value")).isEqualTo("25");
        assertThat(driver.findElements(By.cssSelector("#hole-rows tr"))).isEmpty();
        assertThat(driver.findElement(By.cssSelector("#fingering-rows tr:nth-child(1) input[data-key='target']"))
                .getDomProperty("value")).isEqualTo("C#4");
        openFingeringTable();
        wait.until(d -> !driver.findElements(By.cssSelector("#fingering-rows tr:nth-child(1) td.predicted")).isEmpty()
                && driver.findElement(By.cssSelector("#fingering-rows tr:nth-child(1) td.predicted")).getText().matches("\\d+\\.\\d"));
        fullPageScreenshot("bore-bench-saved-design");
    }

    /** The n-th root in kL of sin kL + (x1/L)(kL) cos kL = 0, between (n - 1/2)pi and n pi. */
    private static double truncatedConeRoot(int n, double x1OverL) {
        double lo = (n - 0.5) * Math.PI;
        double hi = n * Math.PI;
        java.util.function.DoubleUnaryOperator g = kl -> Math.sin(kl) + x1OverL * kl * Math.cos(kl);
        double glo = g.applyAsDouble(lo);
        for (int i = 0; i < 200; i++) {
            double mid = 0.5 * (lo + hi);
            double gm = g.applyAsDouble(mid);
            if (Math.signum(gm) == Math.signum(glo)) {
                lo = mid;
                glo = gm;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    // ---- helpers -------------------------------------------------------------------------

    /** A screenshot of the whole page: the window is stretched to the page's height for it. */
    private void fullPageScreenshot(String name) throws Exception {
        Dimension before = driver.manage().window().getSize();
        long height = (Long) js("return Math.ceil(document.documentElement.scrollHeight)");
        driver.manage().window().setSize(new Dimension(before.getWidth(), (int) Math.min(height + 120, 4000)));
        Thread.sleep(300); // let the charts redraw at the new size
        screenshot(name);
        driver.manage().window().setSize(before);
    }

    /** Opens the fingering table (a collapsible view under the fingering cards) with its summary, as a user would. */
    private void openFingeringTable() {
        if (!Boolean.TRUE.equals(js("return document.getElementById('fingering-table-view').open"))) {
            driver.findElement(By.cssSelector("#fingering-table-view > summary")).click();
        }
        wait.until(d -> Boolean.TRUE.equals(js("return document.getElementById('fingering-table-view').open")));
    }

    /** One cylinder, closed at the input, ideally open at the output, no losses, 20 to 3000 Hz (f_n = (2n-1) c / 4L). */
    private void buildLosslessClosedOpenCylinder(double lengthMm, double boreMm) {
        buildCylinder(lengthMm, boreMm);
        new Select(driver.findElement(By.id("input-end"))).selectByValue("closed");
        new Select(driver.findElement(By.id("output-end"))).selectByValue("ideal-open");
        setChecked(driver.findElement(By.id("losses")), false);
        type(driver.findElement(By.id("f-min")), "20");
        type(driver.findElement(By.id("f-max")), "3000");
    }

    /** Clears the editor down to one cylinder of the given length and bore, in millimetres. */
    private void buildCylinder(double lengthMm, double boreMm) {
        new Select(driver.findElement(By.id("units"))).selectByValue("mm");
        setChecked(driver.findElement(By.id("auto-analyze")), false);
        while (!driver.findElements(By.cssSelector("#hole-rows button.remove")).isEmpty()) {
            driver.findElement(By.cssSelector("#hole-rows button.remove")).click();
        }
        while (!driver.findElements(By.cssSelector("#segment-rows button.remove")).isEmpty()) {
            driver.findElement(By.cssSelector("#segment-rows button.remove")).click();
        }
        // Fingerings are removed on their cards (the table of them is folded away).
        while (!driver.findElements(By.cssSelector("#fingering-cards button.remove")).isEmpty()) {
            driver.findElement(By.cssSelector("#fingering-cards button.remove")).click();
        }
        driver.findElement(By.id("add-segment")).click();
        type(field("segments[0].lengthMm"), plain(lengthMm));
        type(field("segments[0].inputDiameterMm"), plain(boreMm));
        type(field("segments[0].outputDiameterMm"), plain(boreMm));
        type(driver.findElement(By.id("points")), "2000");
    }

    /** The hole boxes of a fingering row, read in one go (the table re-renders after each analysis). */
    @SuppressWarnings("unchecked")
    private List<Object> closedHolesOfRow(int row) {
        return (List<Object>) js("return [...document.querySelectorAll('#fingering-rows tr:nth-child(' + arguments[0]"
                + " + ') .fingering-holes input')].map(b => b.checked)", row);
    }

    private static String plain(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
    }

    private WebElement field(String dotted) {
        return driver.findElement(By.cssSelector("[data-field='" + dotted + "']"));
    }

    private void type(WebElement input, String text) {
        input.clear();
        input.sendKeys(text);
    }

    private void setChecked(WebElement box, boolean checked) {
        if (box.isSelected() != checked) {
            box.click();
        }
    }

    private String analyzed() {
        Object v = js("return document.querySelector('main.air-bench').dataset.analyzed || ''");
        return String.valueOf(v);
    }

    private String rejected() {
        Object v = js("return document.querySelector('main.air-bench').dataset.rejected || ''");
        return String.valueOf(v);
    }

    private void waitForAnalysis(String notThis) {
        wait.until(d -> !analyzed().isEmpty() && !analyzed().equals(notThis));
    }

    private void waitForAnalysisAfter(String before) {
        wait.until(d -> !analyzed().equals(before));
    }

    private double speedOfSound() {
        String summary = driver.findElement(By.id("analysis-summary")).getText();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("(\\d+\\.\\d+) m/s").matcher(summary);
        assertThat(m.find()).as(summary).isTrue();
        return Double.parseDouble(m.group(1));
    }

    private String cell(int row, int column) {
        return driver.findElement(By.cssSelector("#resonance-table tbody tr:nth-child(" + row + ") td:nth-child(" + (column + 1) + ")"))
                .getText();
    }

    private List<Double> resonanceColumn(int column) {
        return driver.findElements(By.cssSelector("#resonance-table tbody tr")).stream()
                .map(tr -> tr.findElements(By.tagName("td")).get(column).getText())
                .map(Double::parseDouble)
                .toList();
    }

    private static double cents(double f, double reference) {
        return 1200 * Math.log(f / reference) / Math.log(2);
    }
}
