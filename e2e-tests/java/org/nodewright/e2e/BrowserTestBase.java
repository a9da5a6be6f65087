package org.nodewright.e2e;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
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
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;

/**
 * Runs the whole app on a random port with a throw-away data directory and drives it with the
 * Debian Chromium in headless mode (no driver download: /usr/bin/chromedriver is used).
 */
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
public abstract class BrowserTestBase {

    private static final Path DATA_DIR;

    static {
        try {
            DATA_DIR = Files.createTempDirectory("nodewright-e2e-");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @DynamicPropertySource
    static void dataDir(DynamicPropertyRegistry registry) {
        registry.add("app.data-dir", DATA_DIR::toString);
    }

    @LocalServerPort
    protected int port;

    protected WebDriver driver;
    protected WebDriverWait wait;

    @BeforeEach
    void startBrowser() throws IOException {
        driver = newBrowser(https());
        wait = new WebDriverWait(driver, Duration.ofSeconds(15));
    }

    @AfterEach
    void stopBrowser() {
        if (driver != null) {
            driver.quit();
        }
    }

    /**
     * LAN-mode tests answer true: the app speaks HTTPS with its self-signed certificate, which
     * the test's browser (only there) is told to accept with {@code --ignore-certificate-errors}.
     */
    protected boolean https() {
        return false;
    }

    /** A fresh headless Chromium with its own profile folder; callers quit it. */
    protected static WebDriver newBrowser() throws IOException {
        return newBrowser(false);
    }

    /** As {@link #newBrowser()}; {@code acceptSelfSigned} adds {@code --ignore-certificate-errors}. */
    protected static WebDriver newBrowser(boolean acceptSelfSigned) throws IOException {
        String chromedriver = System.getProperty("nodewright.chromedriver", "/usr/bin/chromedriver");
        String chromium = System.getProperty("nodewright.chromium", "/usr/bin/chromium");
        ChromeDriverService service = new ChromeDriverService.Builder()
                .usingDriverExecutable(Path.of(chromedriver).toFile())
                .usingAnyFreePort()
                .build();
        ChromeOptions options = new ChromeOptions();
        options.setBinary(chromium);
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--window-size=1280,900",
                "--user-data-dir=" + Files.createTempDirectory("nodewright-chromium-"));
        if (acceptSelfSigned) {
            options.addArguments("--ignore-certificate-errors");
            options.setAcceptInsecureCerts(true);
        }
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

    /** Saves a PNG of the page under target/screenshots. */
    protected Path screenshot(String name) throws IOException {
        Path dir = Path.of(System.getProperty("nodewright.screenshots", "target/screenshots"));
        Files.createDirectories(dir);
        Path file = dir.resolve(name + ".png");
        Files.write(file, ((TakesScreenshot) driver).getScreenshotAs(OutputType.BYTES));
        return file;
    }
}
