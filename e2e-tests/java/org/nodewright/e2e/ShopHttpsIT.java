package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.springframework.test.context.TestPropertySource;

/**
 * LAN mode over HTTPS in a real browser (the self-signed certificate accepted in this test only):
 * the sign-in page shows the certificate's fingerprint, a wrong password fails, the admin changes
 * their own password on the password page, signs in again with it, and reads the audit page.
 */
@TestPropertySource(properties = {"app.sharing.lan=true", "app.sharing.admin-password=" + ShopHttpsIT.ADMIN_PW})
class ShopHttpsIT extends BrowserTestBase {

    static final String ADMIN_PW = "harrowgate-https-1";
    static final String NEW_PW = "spokeshave-and-plane";

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
    void signInChangeThePasswordAndReadTheAuditPage() throws Exception {
        driver.get(url("/"));
        wait.until(ExpectedConditions.urlContains("/login"));
        assertThat(js("return location.protocol")).isEqualTo("https:");
        String fingerprint = waitFor(By.id("certificate-fingerprint")).getText();
        assertThat(fingerprint).matches("([0-9A-F]{2}:){31}[0-9A-F]{2}");
        screenshot("https-sign-in");

        signIn("admin", "not-the-password");
        waitFor(By.id("login-error"));
        signIn("admin", ADMIN_PW);
        assertThat(waitFor(By.id("signed-in-as")).getText()).isEqualTo("Signed in as admin");

        // The admin page shows the same fingerprint.
        driver.findElement(By.id("accounts-link")).click();
        assertThat(waitFor(By.id("certificate-fingerprint")).getText()).isEqualTo(fingerprint);

        // Change the password: a common one is refused with the reason, then a good one is taken.
        driver.findElement(By.id("own-password-link")).click();
        waitFor(By.id("password-form"));
        fillPasswordForm(ADMIN_PW, "password123", "password123");
        assertThat(waitFor(By.id("password-problem")).getText()).contains("newPassword").contains("common");
        fillPasswordForm(ADMIN_PW, NEW_PW, NEW_PW);
        assertThat(waitFor(By.id("password-notice")).getText()).contains("changed");
        screenshot("https-password-changed");

        driver.findElement(By.id("sign-out")).click();
        waitFor(By.id("login-signed-out"));
        signIn("admin", ADMIN_PW);
        waitFor(By.id("login-error"));
        signIn("admin", NEW_PW);
        waitFor(By.id("signed-in-as"));

        driver.findElement(By.id("audit-nav-link")).click();
        waitFor(By.id("audit-table"));
        List<String> actions = driver.findElements(By.cssSelector("#audit-table tbody .audit-action")).stream()
                .map(WebElement::getText).toList();
        // Newest first: the last sign-in, the failed one before it, the change, the first sign-in, the first failure.
        assertThat(actions).containsSubsequence("sign-in", "sign-in-failed", "password-changed", "sign-in",
                "sign-in-failed");
        assertThat(driver.getPageSource()).doesNotContain(NEW_PW).doesNotContain(ADMIN_PW);

        new Select(driver.findElement(By.id("audit-action"))).selectByValue("password-changed");
        driver.findElement(By.id("audit-filter-submit")).click();
        wait.until(ExpectedConditions.urlContains("action=password-changed"));
        List<WebElement> rows = driver.findElements(By.cssSelector("#audit-table tbody tr"));
        assertThat(rows).hasSize(1);
        assertThat(rows.get(0).findElement(By.className("audit-user")).getText()).isEqualTo("admin");
        screenshot("https-audit-page");
    }

    private void fillPasswordForm(String current, String next, String repeat) {
        waitFor(By.id("password-form"));
        driver.findElement(By.id("current-password")).sendKeys(current);
        driver.findElement(By.id("new-password")).sendKeys(next);
        driver.findElement(By.id("repeat-password")).sendKeys(repeat);
        driver.findElement(By.id("password-submit")).click();
    }
}
