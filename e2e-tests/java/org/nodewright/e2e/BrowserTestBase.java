package org.nodewright.e2e;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.nodewright.TemporaryDataDirectory;
import org.nodewright.TestProperties;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.ContextConfiguration;

/**
 * Runs the whole app on a random port and drives it with the Debian Chromium in headless mode (no
 * driver download: /usr/bin/chromedriver is used). Each application context gets its own data
 * directory from {@link TemporaryDataDirectory}, deleted when the context closes (the LAN-mode
 * classes, whose properties differ, get one of their own); the solver's warm-up is off as in every
 * other test context. Each browser's profile folder is deleted after the test that made it.
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT, properties = {
    TestProperties.NO_WARM_UP, TestProperties.NO_BANNER})
@ContextConfiguration(initializers = TemporaryDataDirectory.class)
public abstract class BrowserTestBase {

    /** Profile folders of the browsers started by the running test, deleted after it. */
    private static final List<Path> PROFILES = new ArrayList<>();

    @LocalServerPort
    protected int port;

    protected WebDriver driver;
    protected WebDriverWait wait;

    @BeforeEach
    void startBrowser() throws IOException {
        driver = newBrowser(https(), browserArguments());
        wait = new WebDriverWait(driver, Duration.ofSeconds(15));
    }

    @AfterEach
    void stopBrowser() throws IOException {
        if (driver != null) {
            driver.quit();
        }
        List<Path> made;
        synchronized (PROFILES) {
            made = new ArrayList<>(PROFILES);
            PROFILES.clear();
        }
        for (Path profile : made) {
            deleteTree(profile);
        }
    }

    /** Deletes a folder and all below it (a browser profile, a test's own scratch folder). */
    protected static void deleteTree(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return;
        }
        try (var all = Files.walk(dir)) {
            for (Path p : all.sorted(java.util.Comparator.reverseOrder()).toList()) {
                try {
                    Files.deleteIfExists(p);
                } catch (java.nio.file.DirectoryNotEmptyException e) {
                    // a quitting browser may still write a last file; the next pass would take it
                }
            }
        }
    }

    /**
     * LAN-mode tests answer true: the app speaks HTTPS with its self-signed certificate, which
     * the test's browser (only there) is told to accept with {@code --ignore-certificate-errors}.
     */
    protected boolean https() {
        return false;
    }

    /** Further Chromium switches for this class's browser (e.g. a fake microphone); none by default. */
    protected List<String> browserArguments() throws IOException {
        return List.of();
    }

    /** A fresh headless Chromium with its own profile folder; callers quit it. */
    protected static WebDriver newBrowser() throws IOException {
        return newBrowser(false);
    }

    /** As {@link #newBrowser()}; {@code acceptSelfSigned} adds {@code --ignore-certificate-errors}. */
    protected static WebDriver newBrowser(boolean acceptSelfSigned) throws IOException {
        return newBrowser(acceptSelfSigned, List.of());
    }

    /** As {@link #newBrowser(boolean)} with further Chromium switches. */
    protected static WebDriver newBrowser(boolean acceptSelfSigned, List<String> arguments) throws IOException {
        String chromedriver = System.getProperty("nodewright.chromedriver", "/usr/bin/chromedriver");
        String chromium = System.getProperty("nodewright.chromium", "/usr/bin/chromium");
        ChromeDriverService service = new ChromeDriverService.Builder()
                .usingDriverExecutable(Path.of(chromedriver).toFile())
                .usingAnyFreePort()
                .build();
        Path profile = Files.createTempDirectory("nodewright-chromium-");
        synchronized (PROFILES) {
            PROFILES.add(profile);
        }
        ChromeOptions options = new ChromeOptions();
        options.setBinary(chromium);
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--window-size=1280,900",
                "--user-data-dir=" + profile);
        if (acceptSelfSigned) {
            options.addArguments("--ignore-certificate-errors");
            options.setAcceptInsecureCerts(true);
        }
        options.addArguments(arguments);
        return new ChromeDriver(service, options);
    }

    protected String url(String path) {
        return (https() ? "https" : "http") + "://127.0.0.1:" + port + path;
    }

    protected WebElement waitFor(By by) {
        return wait.until(ExpectedConditions.visibilityOfElementLocated(by));
    }

    protected Object js(String script, Object... args) {
        return ((JavascriptExecutor) driver).executeScript(script, args);
    }

    /** Number of datasets and points of the Chart.js chart drawn on a canvas, read back from the page. */
    protected Object chartData(String canvasId) {
        return js("const c = Chart.getChart(document.getElementById(arguments[0]));"
                + "return c ? c.data : null;", canvasId);
    }

    /**
     * Saves a string design through the API (650 mm plain steel 0.30 mm at 70 N, the contract's
     * example) and returns its id.
     */
    protected String saveStringDesign(String name, String author, String notes) throws IOException, InterruptedException {
        String body = "{\"name\": " + jsonText(name) + ", \"kind\": \"string\", \"author\": " + jsonText(author)
                + ", \"notes\": " + jsonText(notes) + ", \"parameters\": {\"lengthMm\": 650.0, \"tensionN\": 70.0,"
                + " \"material\": \"plain-steel\", \"diameterMm\": 0.30, \"endCondition\": \"pinned\","
                + " \"stiffness\": true, \"modeCount\": 12}}";
        java.net.http.HttpResponse<String> r = java.net.http.HttpClient.newHttpClient().send(
                java.net.http.HttpRequest.newBuilder(java.net.URI.create(url("/api/v1/designs")))
                        .header("Content-Type", "application/json")
                        .POST(java.net.http.HttpRequest.BodyPublishers.ofString(body)).build(),
                java.net.http.HttpResponse.BodyHandlers.ofString());
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\"id\"\\s*:\\s*(\\d+)").matcher(r.body());
        if (r.statusCode() != 201 || !m.find()) {
            throw new IllegalStateException("design not saved: " + r.statusCode() + " " + r.body());
        }
        return m.group(1);
    }

    /** A JSON string literal of s. */
    protected static String jsonText(String s) {
        return "\"" + s.replace("\\", "\\\\").replace("\"", "\\\"") + "\"";
    }

    /** Saves a PNG of the page under target/screenshots. */
    protected Path screenshot(String name) throws IOException {
        Path dir = Path.of(System.getProperty("nodewright.screenshots", "target/screenshots"));
        Files.createDirectories(dir);
        Path file = dir.resolve(name + ".png");
        Files.write(file, ((TakesScreenshot) driver).getScreenshotAs(OutputType.BYTES));
        return file;
    }
}
