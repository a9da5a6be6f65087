package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;

class HomePageIT extends BrowserTestBase {

    @Test
    void startPageLinksEveryBenchAndLoadsChartJsFromTheJar() throws Exception {
        driver.get(url("/"));
        waitFor(By.cssSelector("main.home h1"));
        assertThat(driver.findElements(By.cssSelector("nav.benches a"))).hasSizeGreaterThanOrEqualTo(4);
        // Chart.js comes from its WebJar inside the jar, not a CDN.
        assertThat(js("return typeof Chart")).isEqualTo("function");
        // Every bench of the navigation has a card on the home page with its picture and purpose.
        var nav = driver.findElements(By.cssSelector("nav.benches a")).stream().map(a -> a.getDomAttribute("href")).toList();
        for (String href : nav) {
            var card = driver.findElements(By.cssSelector("li.bench-card[data-bench='" + href + "']"));
            assertThat(card).as("card for " + href).hasSize(1);
            assertThat(card.get(0).findElements(By.cssSelector("svg.bench-picture *"))).as("picture of " + href).isNotEmpty();
            assertThat(card.get(0).findElement(By.cssSelector(".purpose")).getText()).as("purpose of " + href).isNotBlank();
            assertThat(card.get(0).findElement(By.cssSelector("a")).getDomAttribute("href")).isEqualTo(href);
        }
        // Three first steps, each with a link to where it is done.
        assertThat(driver.findElements(By.cssSelector(".first-steps ol > li a"))).hasSize(3);
        screenshot("home");
    }
}
