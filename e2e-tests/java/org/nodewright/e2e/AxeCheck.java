package org.nodewright.e2e;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;

/**
 * The accessibility check of a page: axe-core (Deque Systems, MPL-2.0), vendored unchanged under
 * src/test/resources/axe (see its README), injected into the page as it stands and run on the whole
 * document with the WCAG 2.0/2.1 A and AA rules. Nothing is downloaded at test time.
 */
final class AxeCheck {

    /** axe-core 4.14.1, package/axe.min.js of its npm package. */
    static final String SHA256 = "29348999450cdf2849a8e70b7912fc2da85a849da39c0d0d5394f51d4a9ed95c";

    private static String source;

    private AxeCheck() {
    }

    /** The vendored axe.min.js, checked against its recorded checksum. */
    static synchronized String source() throws IOException {
        if (source == null) {
            try (InputStream in = AxeCheck.class.getResourceAsStream("/axe/axe.min.js")) {
                if (in == null) {
                    throw new IllegalStateException("axe/axe.min.js is missing from the test classpath");
                }
                byte[] bytes = in.readAllBytes();
                String sum = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
                if (!SHA256.equals(sum)) {
                    throw new IllegalStateException("axe/axe.min.js is not the vendored 4.14.1 file: sha256 " + sum);
                }
                source = new String(bytes, StandardCharsets.UTF_8);
            } catch (NoSuchAlgorithmException e) {
                throw new IllegalStateException(e);
            }
        }
        return source;
    }

    /**
     * Runs axe on the page the driver shows and returns its serious and critical violations, one
     * line each: rule id, impact, help text and the first few offending nodes.
     */
    @SuppressWarnings("unchecked")
    static List<String> seriousViolations(WebDriver driver) throws IOException {
        JavascriptExecutor js = (JavascriptExecutor) driver;
        if (!Boolean.TRUE.equals(js.executeScript("return typeof window.axe === 'object'"))) {
            js.executeScript(source());
        }
        Object result = js.executeAsyncScript(
                "const done = arguments[arguments.length - 1];"
                        + "axe.run(document, {runOnly: {type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']},"
                        + " resultTypes: ['violations']})"
                        + ".then(r => done(r.violations.filter(v => v.impact === 'serious' || v.impact === 'critical')"
                        + ".map(v => ({id: v.id, impact: v.impact, help: v.help,"
                        + " nodes: v.nodes.slice(0, 6).map(n => n.target.join(' ') + ' — ' + (n.failureSummary || '').replace(/\\s+/g, ' '))}))))"
                        + ".catch(e => done([{id: 'axe-error', impact: 'critical', help: String(e), nodes: []}]));");
        List<String> lines = new ArrayList<>();
        for (Map<String, Object> v : (List<Map<String, Object>>) result) {
            lines.add(v.get("id") + " (" + v.get("impact") + "): " + v.get("help") + " " + v.get("nodes"));
        }
        return lines;
    }
}
