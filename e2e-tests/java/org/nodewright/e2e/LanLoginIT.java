package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.test.context.TestPropertySource;

/** LAN mode in a real browser: sign in, manage accounts on the admin page, sign out. */
@TestPropertySource(properties = {"app.sharing.lan=true", "app.sharing.admin-password=" + LanLoginIT.ADMIN_PW})
class LanLoginIT extends BrowserTestBase {

    static final String ADMIN_PW = "harrowgate-bench-1";

    @Override
    protected boolean https() {
        return true;
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
        waitFor(By.id("login-form"));
        // Issue 15 §6: the sign-in page, like every other, has no serious or critical axe violation.
        assertThat(AxeCheck.seriousViolations(driver)).as("axe on /login").isEmpty();
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
        assertThat(AxeCheck.seriousViolations(driver)).as("axe on /admin/accounts").isEmpty();

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

        // The editor saves a design from the page (session + CSRF header); its name stays text.
        driver.get(url("/"));
        waitFor(By.id("signed-in-as"));
        String name = "<script>window.pwned = 1</script>";
        Object saved = saveDesignFromThePage(name);
        assertThat(saved).asString().startsWith("201 ");
        String id = saved.toString().substring(4);
        driver.get(url("/library/" + id));
        assertThat(waitFor(By.id("design-name")).getText()).isEqualTo(name);
        assertThat(js("return window.pwned === undefined")).isEqualTo(true);
        assertThat(driver.findElements(By.cssSelector("main script"))).isEmpty();

        // A viewer signed in the same way is refused the write with 403.
        driver.findElement(By.id("sign-out")).click();
        waitFor(By.id("login-signed-out"));
        signIn("admin", ADMIN_PW);
        waitFor(By.id("signed-in-as"));
        Object viewerMade = ((JavascriptExecutor) driver).executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                        + "const token = document.querySelector('meta[name=\"_csrf\"]').content;"
                        + "const header = document.querySelector('meta[name=\"_csrf_header\"]').content;"
                        + "fetch('/api/v1/accounts', {method: 'POST', headers: {'Content-Type': 'application/json', [header]: token},"
                        + " body: JSON.stringify({username: 'bench-viewer', password: 'bench-viewer-pw', role: 'viewer'})})"
                        + ".then(r => done(r.status));");
        assertThat(viewerMade).isEqualTo(201L);
        driver.findElement(By.id("sign-out")).click();
        waitFor(By.id("login-signed-out"));
        signIn("bench-viewer", "bench-viewer-pw");
        waitFor(By.id("signed-in-as"));
        assertThat(saveDesignFromThePage("Viewer's attempt")).asString().startsWith("403");
    }

    /** POSTs a string design with the page's CSRF header; answers "status id". */
    private Object saveDesignFromThePage(String name) {
        return ((JavascriptExecutor) driver).executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                        + "const token = document.querySelector('meta[name=\"_csrf\"]').content;"
                        + "const header = document.querySelector('meta[name=\"_csrf_header\"]').content;"
                        + "fetch('/api/v1/designs', {method: 'POST', headers: {'Content-Type': 'application/json', [header]: token},"
                        + " body: JSON.stringify({name: arguments[0], kind: 'string', parameters: {lengthMm: 650.0,"
                        + " tensionN: 70.0, material: 'plain-steel', diameterMm: 0.3, modeCount: 12}})})"
                        + ".then(async r => done(r.status + ' ' + (r.ok ? (await r.json()).id : '')));", name);
    }
}
