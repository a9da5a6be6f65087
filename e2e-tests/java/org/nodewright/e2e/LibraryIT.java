package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.NoAlertPresentException;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * The shop library in a real browser: save from a bench, find, open, change, save, see the
 * revision, restore it; two sessions on one design; a hostile name shown as text.
 */
class LibraryIT extends BrowserTestBase {

    /** The String bench, which carries the design bar. */
    private static final String STRINGS = "/strings";
    /** A test-only bench page (src/test/resources) with three plain inputs, no live analysis of its own. */
    private static final String TEST_BENCH = "/e2e/design-bar-test.html";

    private final HttpClient http = HttpClient.newHttpClient();

    @Test
    void saveFindOpenChangeSaveThenRestoreAnEarlierRevision() throws Exception {
        openBench(driver, STRINGS);
        // Drive the String bench by tension (its default is a target pitch).
        driver.findElement(By.cssSelector("input[name=drive][value=tension]")).click();
        type(driver, "#tensionN", "70");
        type(driver, "[data-role=name]", "Harrowgate Lane parlour, top E");
        type(driver, "[data-role=tags]", "steel, parlour");
        driver.findElement(By.cssSelector("[data-role=save]")).click();
        wait.until(d -> d.findElement(By.id("design-bar")).getAttribute("data-version") != null);
        String id = driver.findElement(By.id("design-bar")).getAttribute("data-design-id");
        assertThat(driver.getCurrentUrl()).endsWith("?design=" + id);

        driver.get(url("/library"));
        waitFor(By.cssSelector("main[data-ready=true]"));
        type(driver, "#search-name", "PARLOUR");
        driver.findElement(By.cssSelector("#library-search button")).click();
        By row = By.cssSelector("#design-list tr[data-design-id='" + id + "']");
        assertThat(settledText(By.cssSelector("#design-list tr[data-design-id='" + id + "'] .design-name")))
                .isEqualTo("Harrowgate Lane parlour, top E");
        assertThat(settledText(row)).contains("steel").contains("parlour");
        type(driver, "#search-name", "");
        new org.openqa.selenium.support.ui.Select(driver.findElement(By.id("search-kind"))).selectByValue("air-column");
        driver.findElement(By.cssSelector("#library-search button")).click();
        wait.until(ExpectedConditions.invisibilityOfElementLocated(By.cssSelector("tr[data-design-id='" + id + "']")));
        screenshot("library-list");

        // Open it into the bench, change the tension, save.
        openBench(driver, STRINGS + "?design=" + id);
        wait.until(d -> number(d, "tensionN") == 70.0);
        type(driver, "#tensionN", "75");
        driver.findElement(By.cssSelector("[data-role=save]")).click();
        wait.until(d -> "2".equals(d.findElement(By.id("design-bar")).getAttribute("data-version")));

        // The history shows both revisions; restore the first.
        driver.get(url("/library/" + id));
        waitFor(By.cssSelector("main[data-ready=true]"));
        assertThat(driver.findElements(By.cssSelector("#revision-list tbody tr"))).hasSize(2);
        driver.findElement(By.cssSelector("#revision-list tr[data-version='1'] .view-revision")).click();
        By tension = By.cssSelector("#revision-params tr[data-path=tensionN]");
        assertThat(settledText(tension)).contains("70");
        String tensionClass = wait.ignoring(org.openqa.selenium.StaleElementReferenceException.class)
                .until(d -> d.findElement(tension).getAttribute("class"));
        assertThat(tensionClass).contains("differs");
        driver.findElement(By.cssSelector("#revision-list tr[data-version='1'] .restore-revision")).click();
        wait.until(d -> "3".equals(d.findElement(By.cssSelector("main")).getAttribute("data-version")));
        assertThat(driver.findElements(By.cssSelector("#revision-list tbody tr"))).hasSize(3);
        // The table is redrawn by the restore and again by the change event: read it once it settles.
        wait.ignoring(org.openqa.selenium.StaleElementReferenceException.class).until(d -> d.findElement(
                By.cssSelector("#revision-list tr[data-version='3']")).getText().contains("restored from version 1"));
        screenshot("library-history");
        assertThat(get("/api/v1/designs/" + id)).contains("\"version\":3");
        assertThat(tension(get("/api/v1/designs/" + id))).isEqualTo(70.0);
    }

    @Test
    void twoSessionsOnOneDesignSeeTheConflictAndLoseNothing() throws Exception {
        String id = create("Harrowgate Lane shared top E", "Ada");
        WebDriver second = newBrowser();
        try {
            WebDriverWait secondWait = new WebDriverWait(second, Duration.ofSeconds(15));
            openBench(driver, STRINGS + "?design=" + id);
            openBench(second, STRINGS + "?design=" + id);
            type(driver, "[data-role=who]", "Ada");
            type(second, "[data-role=who]", "Bram");

            // Ada saves first; Bram is told at once.
            type(driver, "#tensionN", "80");
            driver.findElement(By.cssSelector("[data-role=save]")).click();
            wait.until(d -> "2".equals(d.findElement(By.id("design-bar")).getAttribute("data-version")));
            WebElement notice = secondWait.until(ExpectedConditions.visibilityOfElementLocated(
                    By.cssSelector("[data-role=notice]")));
            assertThat(notice.getText()).contains("Ada");

            // Bram saves over the version he opened: refused, told who, his value still on the page.
            type(second, "#tensionN", "90");
            second.findElement(By.cssSelector("[data-role=save]")).click();
            WebElement conflict = secondWait.until(ExpectedConditions.visibilityOfElementLocated(
                    By.cssSelector("[data-role=conflict]")));
            assertThat(conflict.getText()).contains("Ada");
            assertThat(number(second, "tensionN")).isEqualTo(90.0);
            assertThat(get("/api/v1/designs/" + id)).contains("\"version\":2");
            assertThat(tension(get("/api/v1/designs/" + id))).isEqualTo(80.0);

            // He keeps his work as a copy.
            second.findElement(By.cssSelector("[data-role=save-copy]")).click();
            secondWait.until(d -> !id.equals(d.findElement(By.id("design-bar")).getAttribute("data-design-id")));
            String copyId = second.findElement(By.id("design-bar")).getAttribute("data-design-id");
            assertThat(get("/api/v1/designs/" + copyId)).contains("copy by Bram");
            assertThat(tension(get("/api/v1/designs/" + copyId))).isEqualTo(90.0);
            assertThat(get("/api/v1/designs/" + id)).contains("\"version\":2");
            assertThat(tension(get("/api/v1/designs/" + id))).isEqualTo(80.0);
            screenshotOf(second, "library-conflict-copy");
        } finally {
            second.quit();
        }
    }

    @Test
    void aScriptNameAndNotesAreShownAsTextEverywhere() throws Exception {
        String name = "<script>alert(1)</script>";
        String notes = "<img src=x onerror=alert(2)> Harrowgate bench note";
        String id = create(name, "Ada", notes);

        driver.get(url("/library"));
        waitFor(By.cssSelector("main[data-ready=true]"));
        assertThat(settledText(By.cssSelector("#design-list tr[data-design-id='" + id + "'] .design-name")))
                .isEqualTo(name);
        assertNoAlert();

        driver.get(url("/library/" + id));
        waitFor(By.cssSelector("main[data-ready=true]"));
        assertThat(driver.findElement(By.id("design-name")).getText()).isEqualTo(name);
        assertThat(driver.findElement(By.id("design-notes")).getText()).isEqualTo(notes);
        assertThat(driver.getTitle()).contains(name);
        assertThat(driver.findElements(By.cssSelector("main script, main img"))).isEmpty();
        assertNoAlert();

        openBench(driver, STRINGS + "?design=" + id);
        wait.until(d -> name.equals(d.findElement(By.cssSelector("[data-role=name]")).getDomProperty("value")));
        assertThat(driver.findElement(By.cssSelector("[data-role=status]")).getText()).contains(name);
        assertNoAlert();
        screenshot("library-script-name");
    }

    @Test
    void compareHighlightsTheParametersThatDiffer() throws Exception {
        String a = create("Harrowgate top E at 70 N", "Ada");
        String b = create("Harrowgate top E at 70 N", "Ada");
        driver.get(url("/library"));
        waitFor(By.cssSelector("main[data-ready=true]"));
        // change b through the bench
        openBench(driver, TEST_BENCH + "?design=" + b);
        wait.until(d -> number(d, "tensionN") == 70.0);
        type(driver, "#tensionN", "72.5");
        driver.findElement(By.cssSelector("[data-role=save]")).click();
        wait.until(d -> "2".equals(d.findElement(By.id("design-bar")).getAttribute("data-version")));

        driver.get(url("/library"));
        waitFor(By.cssSelector("main[data-ready=true]"));
        waitFor(By.cssSelector("tr[data-design-id='" + a + "'] .compare-tick")).click();
        driver.findElement(By.cssSelector("tr[data-design-id='" + b + "'] .compare-tick")).click();
        driver.findElement(By.id("compare-selected")).click();
        waitFor(By.cssSelector("main[data-view=compare][data-ready=true]"));
        assertThat(driver.findElements(By.cssSelector("#compare-table tr.differs"))).hasSize(1);
        WebElement differs = driver.findElement(By.cssSelector("#compare-table tr.differs"));
        assertThat(differs.getAttribute("data-path")).isEqualTo("tensionN");
        assertThat(differs.getText()).contains("70").contains("72.5");
        // Both designs analysed by the string bench's endpoint: twelve partials' cents each and their difference.
        wait.until(d -> chartData("compare-chart-partials") != null);
        @SuppressWarnings("unchecked")
        java.util.List<java.util.Map<String, Object>> datasets = (java.util.List<java.util.Map<String, Object>>)
                ((java.util.Map<String, Object>) chartData("compare-chart-partials")).get("datasets");
        assertThat(datasets).extracting(ds -> ds.get("kind")).containsExactly("a", "b", "difference");
        assertThat(datasets).allSatisfy(ds -> assertThat((java.util.List<?>) ds.get("data")).hasSize(12));
        screenshot("library-compare");
    }

    @Test
    void aRefusedSaveMarksTheBenchFieldAndSavesNothing() throws Exception {
        openBench(driver, TEST_BENCH);
        type(driver, "[data-role=name]", "Harrowgate Lane negative scale");
        type(driver, "#lengthMm", "-650");
        driver.findElement(By.cssSelector("[data-role=save]")).click();
        WebElement length = driver.findElement(By.id("lengthMm"));
        wait.until(d -> length.getAttribute("class") != null && length.getAttribute("class").contains("invalid"));
        assertThat(driver.findElement(By.cssSelector("[data-error-for=lengthMm]")).getText()).isNotBlank();
        assertThat(driver.findElement(By.id("design-bar")).getAttribute("data-design-id")).isNull();
        assertThat(get("/api/v1/designs?name=negative")).isEqualTo("[]");
    }

    // ---------- helpers ----------

    private void openBench(WebDriver d, String pathAndQuery) {
        d.get(url(pathAndQuery));
        new WebDriverWait(d, Duration.ofSeconds(15)).until(ExpectedConditions.presenceOfElementLocated(
                By.cssSelector("#design-bar[data-ready=true]")));
    }

    /** The text of an element that the page may redraw meanwhile (a list refreshed by a change event). */
    private String settledText(By by) {
        return wait.ignoring(org.openqa.selenium.StaleElementReferenceException.class)
                .until(d -> d.findElement(by).getText());
    }

    /** The number in an input, however the page formats it. */
    private static double number(WebDriver d, String id) {
        try {
            return Double.parseDouble(d.findElement(By.id(id)).getDomProperty("value").trim());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private static void type(WebDriver d, String css, String text) {
        WebElement e = d.findElement(By.cssSelector(css));
        e.clear();
        e.sendKeys(text);
    }

    private void assertNoAlert() {
        assertThatThrownBy(() -> driver.switchTo().alert()).isInstanceOf(NoAlertPresentException.class);
    }

    private void screenshotOf(WebDriver d, String name) throws Exception {
        WebDriver keep = driver;
        driver = d;
        try {
            screenshot(name);
        } finally {
            driver = keep;
        }
    }

    private String create(String name, String author) throws Exception {
        return create(name, author, "");
    }

    private String create(String name, String author, String notes) throws Exception {
        return saveStringDesign(name, author, notes);
    }

    private String get(String path) throws Exception {
        return http.send(HttpRequest.newBuilder(URI.create(url(path))).build(), HttpResponse.BodyHandlers.ofString())
                .body();
    }

    /** The stored tension, whether the JSON wrote it as 70 or 70.0. */
    private static double tension(String designJson) {
        Matcher m = Pattern.compile("\"tensionN\":([0-9.eE+-]+)").matcher(designJson);
        assertThat(m.find()).as(designJson).isTrue();
        return Double.parseDouble(m.group(1));
    }
}
