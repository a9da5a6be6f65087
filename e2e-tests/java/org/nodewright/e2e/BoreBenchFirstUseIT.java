package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

/** The bore bench as a new user meets it: a negative cents tolerance is refused on its field. */
class BoreBenchFirstUseIT extends BrowserTestBase {

    @Test
    void aNegativeCentsToleranceIsRefusedOnItsFieldNotSilentlyReplaced() {
        driver.get(url("/air-columns"));
        wait.until(d -> js("return document.querySelector('main.air-bench').dataset.fingeringsReady || null") != null);
        WebElement tolerance = driver.findElement(By.id("cents-tolerance"));
        tolerance.clear();
        tolerance.sendKeys("-5");
        wait.until(d -> tolerance.getAttribute("class").contains("invalid"));
        String message = driver.findElement(By.cssSelector("[data-error-for='cents-tolerance']")).getText();
        assertThat(message).contains("0 cents or more").contains("10.0");
        assertThat(tolerance.getAttribute("value")).isEqualTo("-5");
        tolerance.clear();
        tolerance.sendKeys("3");
        wait.until(d -> !tolerance.getAttribute("class").contains("invalid"));
        assertThat(driver.findElement(By.cssSelector("[data-error-for='cents-tolerance']")).getText()).isEmpty();
    }
}
