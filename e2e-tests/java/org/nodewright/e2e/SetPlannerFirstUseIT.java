package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;

/** The set planner as a new user meets it: words instead of parser messages, and decimal commas. */
class SetPlannerFirstUseIT extends StringPageTestBase {

    @Test
    void textInAGaugeIsAnsweredInWordsAndADecimalCommaIsANumber() {
        driver.get(url("/string-sets"));
        wait.until(d -> js("return !!Chart.getChart(document.getElementById('set-tension-chart'));"));
        WebElement gauge = driver.findElements(By.cssSelector("#set-rows tr")).get(0).findElement(By.cssSelector(".gauge"));
        gauge.clear();
        gauge.sendKeys("abc");
        driver.findElement(By.id("analyze-set")).click();
        assertThat(errorText("strings[0].diameterMm")).startsWith("enter a number");
        assertThat(driver.findElement(By.id("form-problem")).getText()).doesNotContainIgnoringCase("coerce");

        String count = driver.findElement(By.id("set-form")).getAttribute("data-analyses");
        gauge.clear();
        gauge.sendKeys("0,254");
        driver.findElement(By.id("analyze-set")).click();
        wait.until(d -> !count.equals(d.findElement(By.id("set-form")).getAttribute("data-analyses")));
        assertThat(gauge.getAttribute("class")).doesNotContain("invalid");
        assertThat(driver.findElements(By.cssSelector("[data-error-for='strings[0].diameterMm']"))).allSatisfy(
                e -> assertThat(e.getText()).isEmpty());
    }
}
