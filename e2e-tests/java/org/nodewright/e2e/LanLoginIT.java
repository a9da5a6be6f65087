package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.test.context.DynamicPropertyRegistry;
import org.springframework.test.context.DynamicPropertySource;
import org.springframework.test.context.TestPropertySource;

/** LAN mode in a real browser: sign in, manage accounts on the admin page, sign out. */
@TestPropertySource(properties = {"app.sharing.lan=true", "app.sharing.admin-password=" + LanLoginIT.ADMIN_PW})
class LanLoginIT extends BrowserTestBase {

    static final String ADMIN_PW = "harrowgate-bench-1";

    @DynamicPropertySource
    static void ownDatabase(DynamicPropertyRegistry registry) throws Exception {
        Path dir = Files.createTempDirectory("nodewright-lan-e2e-");
        registry.add("spring.datasource.url", () -> "jdbc:h2:file:" + dir.toString().replace('\\', '/') + "/nodewright");
    }

    private void signIn(String username, String password) {
        driver.get(url("/login"));
        waitFor(By.id("login-form"));
        driver.findElement(By.id("username")).sendKeys(username);
        driver.findElement(By.id("password")).sendKeys(password);
        driver.findElement(By.id("login-submit")).click();
    }

    @Test
    void signInManageAccountsOnTheAdminPageAndSignOut() throws Exception {
        // Any page leads to the sign-in form first.
        driver.get(url("/"));
        wait.until(ExpectedConditions.urlContains("/login"));
        signIn("admin", "not-the-password");
        assertThat(waitFor(By.id("login-error")).getText()).contains("do not match");
        screenshot("lan-login-error");

        signIn("admin", ADMIN_PW);
        assertThat(waitFor(By.id("signed-in-as")).getText()).isEqualTo("Signed in as admin");
        assertThat(driver.findElement(By.id("sign-out")).isDisplayed()).isTrue();

        // The page's own CSRF token (meta tags, as js/common/api.js sends it) lets a fetch through.
        Object withToken = ((JavascriptExecutor) driver).executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                        + "const token = document.querySelector('meta[name=\"_csrf\"]').content;"
                        + "const header = document.querySelector('meta[name=\"_csrf_header\"]').content;"
                        + "fetch('/api/v1/accounts', {method: 'POST', headers: {'Content-Type': 'application/json', [header]: token},"
                        + " body: JSON.stringify({username: 'fetched', password: 'fetched-pw-1', role: 'viewer'})})"
                        + ".then(r => done(r.status));");
        assertThat(withToken).isEqualTo(201L);
        Object withoutToken = ((JavascriptExecutor) driver).executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                        + "fetch('/api/v1/accounts', {method: 'POST', headers: {'Content-Type': 'application/json'},"
                        + " body: JSON.stringify({username: 'untokened', password: 'untokened-pw', role: 'viewer'})})"
                        + ".then(r => done(r.status));");
        assertThat(withoutToken).isEqualTo(403L);

        // The admin page adds an account.
        driver.findElement(By.id("accounts-link")).click();
        waitFor(By.id("add-account"));
        driver.findElement(By.id("new-username")).sendKeys("luthier-anna");
        driver.findElement(By.id("new-password")).sendKeys("spruce-and-maple");
        new Select(driver.findElement(By.id("new-role"))).selectByValue("editor");
        driver.findElement(By.id("add-account-submit")).click();
        assertThat(waitFor(By.id("accounts-notice")).getText()).isEqualTo("Account luthier-anna added.");
        By row = By.cssSelector("tr[data-account='luthier-anna']");
        assertThat(new Select(driver.findElement(row).findElement(By.name("role"))).getFirstSelectedOption()
                .getAttribute("value")).isEqualTo("editor");
        assertThat(driver.findElement(By.cssSelector("tr[data-account='fetched'] .account-status")).getText())
                .isEqualTo("enabled");
        screenshot("lan-accounts-page");

        // ... and disables one.
        driver.findElement(By.cssSelector("tr[data-account='fetched'] .toggle-enabled")).click();
        assertThat(waitFor(By.id("accounts-notice")).getText()).startsWith("Account fetched disabled");
        assertThat(driver.findElement(By.cssSelector("tr[data-account='fetched'] .account-status")).getText())
                .isEqualTo("disabled");

        // Sign out, then in again as the new editor: no Accounts link for an editor.
        driver.findElement(By.id("sign-out")).click();
        assertThat(waitFor(By.id("login-signed-out")).isDisplayed()).isTrue();
        driver.get(url("/"));
        wait.until(ExpectedConditions.urlContains("/login"));
        signIn("luthier-anna", "spruce-and-maple");
        assertThat(waitFor(By.id("signed-in-as")).getText()).isEqualTo("Signed in as luthier-anna");
        assertThat(driver.findElements(By.id("accounts-link"))).isEmpty();
        screenshot("lan-signed-in-editor");
        driver.get(url("/admin/accounts"));
        assertThat(driver.getPageSource()).contains("Your account may not do that");
    }
}
