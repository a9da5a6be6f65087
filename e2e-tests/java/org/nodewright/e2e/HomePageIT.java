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
        screenshot("home");
    }
}
