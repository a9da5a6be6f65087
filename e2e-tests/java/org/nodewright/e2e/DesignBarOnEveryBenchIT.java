package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.InputStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Duration;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.openqa.selenium.By;
import org.openqa.selenium.support.ui.ExpectedConditions;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.ObjectMapper;
import tools.jackson.databind.node.ObjectNode;

/**
 * The design bar on each bench that saves designs, against the real store: a colleague saves over
 * the design the page has open, the page's save is refused as a conflict, "reload" brings the
 * colleague's version into the bench (so the page's next save carries the colleague's value, not
 * its own stale one), and "save as" keeps the page's state as a new design and leaves the original
 * alone. Each bench starts from the first demo design of its kind (the Harrowgate Lane Workshop's).
 */
class DesignBarOnEveryBenchIT extends BrowserTestBase {

    private final HttpClient http = HttpClient.newHttpClient();
    private final ObjectMapper json = new ObjectMapper();

    // kind, bench page, JSON pointer of a number in the parameters, the colleague's value for it
    @ParameterizedTest(name = "{0}")
    @CsvSource({
        "string,      /strings,     /tensionN,             74.5",
        "string-set,  /string-sets, /strings/0/lengthMm,   629.5",
        "air-column,  /air-columns, /temperatureC,         27.5",
        "bar,         /bars,        /widthMm,              58.5",
        "plate,       /plates,      /thicknessMm,          2.35"})
    void aConflictReloadsTheColleaguesVersionAndSaveAsKeepsTheOriginal(String kind, String page, String pointer,
            double colleagues) throws Exception {
        JsonNode params = demoParameters(kind);
        String name = "Harrowgate Lane " + kind + " shared";
        ObjectNode create = json.createObjectNode().put("name", name).put("kind", kind).put("author", "Ada");
        create.set("parameters", params);
        JsonNode created = send("POST", "/api/v1/designs", create, 201);
        long id = created.get("id").asLong();

        driver.get(url(page + "?design=" + id));
        wait.until(ExpectedConditions.presenceOfElementLocated(By.cssSelector("#design-bar[data-ready=true]")));
        wait.until(d -> "1".equals(d.findElement(By.id("design-bar")).getAttribute("data-version")));
        driver.findElement(By.cssSelector("[data-role=who]")).sendKeys("Bram");

        // A colleague saves version 2 with another value.
        ObjectNode changed = (ObjectNode) params.deepCopy();
        ObjectNode parent = (ObjectNode) changed.at(pointer.substring(0, pointer.lastIndexOf('/')));
        parent.put(pointer.substring(pointer.lastIndexOf('/') + 1), colleagues);
        ObjectNode put = json.createObjectNode().put("name", name).put("version", 1).put("author", "Cleo");
        put.set("parameters", changed);
        send("PUT", "/api/v1/designs/" + id, put, 200);

        // The page saves over version 1: refused, and the store keeps the colleague's version.
        driver.findElement(By.cssSelector("[data-role=save]")).click();
        try {
            wait.until(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("[data-role=conflict]")));
        } catch (org.openqa.selenium.TimeoutException e) {
            throw new AssertionError("no conflict shown; the design bar says: "
                    + driver.findElement(By.id("design-bar")).getText() + "; fields marked: " + js("return [...document"
                    + ".querySelectorAll('.invalid')].map(x => x.dataset.field + '=' + x.value).join('; ')"), e);
        }
        assertThat(driver.findElement(By.cssSelector("[data-role=conflict]")).getText()).contains("Cleo");
        assertThat(design(id).get("version").asLong()).isEqualTo(2);

        // Reload: version 2 is on the page; saving it again carries the colleague's value.
        driver.findElement(By.cssSelector("[data-role=conflict] [data-role=reload]")).click();
        wait.until(d -> "2".equals(d.findElement(By.id("design-bar")).getAttribute("data-version")));
        assertThat(driver.findElement(By.cssSelector("[data-role=conflict]")).isDisplayed()).isFalse();
        driver.findElement(By.cssSelector("[data-role=save]")).click();
        wait.until(d -> "3".equals(d.findElement(By.id("design-bar")).getAttribute("data-version")));
        JsonNode saved = design(id);
        assertThat(saved.at("/parameters" + pointer).asDouble()).isEqualTo(colleagues);
        if (kind.equals("string-set")) {
            // The set planner's one pitch input must not swallow a label that is no pitch ("1 E4"): it was
            // typed into the pitch field and every save of a loaded set was refused.
            assertThat(saved.at("/parameters/strings/0/label").asString()).isEqualTo(params.at("/strings/0/label").asString());
        }

        // Save as: a new design with the page's state; the original stays at version 3.
        driver.findElement(By.cssSelector("[data-role=save-as]")).click();
        wait.until(d -> !String.valueOf(id).equals(d.findElement(By.id("design-bar")).getAttribute("data-design-id")));
        long copy = Long.parseLong(driver.findElement(By.id("design-bar")).getAttribute("data-design-id"));
        JsonNode copied = design(copy);
        assertThat(copied.get("name").asString()).isNotEqualTo(name).startsWith(name);
        assertThat(copied.get("kind").asString()).isEqualTo(kind);
        assertThat(copied.at("/parameters" + pointer).asDouble()).isEqualTo(colleagues);
        assertThat(design(id).get("version").asLong()).isEqualTo(3);
        screenshot("design-bar-" + kind + "-save-as");
    }

    private JsonNode demoParameters(String kind) throws Exception {
        try (InputStream in = getClass().getResourceAsStream("/demo/" + kind + ".json")) {
            assertThat(in).as("demo designs of " + kind).isNotNull();
            JsonNode revisions = json.readTree(in).get("designs").get(0).get("revisions");
            return revisions.get(revisions.size() - 1).get("parameters");
        }
    }

    private JsonNode design(long id) throws Exception {
        return json.readTree(http.send(HttpRequest.newBuilder(URI.create(url("/api/v1/designs/" + id))).build(),
                HttpResponse.BodyHandlers.ofString()).body());
    }

    private JsonNode send(String method, String path, JsonNode body, int status) throws Exception {
        HttpResponse<String> r = http.send(HttpRequest.newBuilder(URI.create(url(path)))
                .header("Content-Type", "application/json").timeout(Duration.ofSeconds(30))
                .method(method, HttpRequest.BodyPublishers.ofString(json.writeValueAsString(body))).build(),
                HttpResponse.BodyHandlers.ofString());
        assertThat(r.statusCode()).as(r.body()).isEqualTo(status);
        return json.readTree(r.body());
    }
}
