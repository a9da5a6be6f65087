package org.nodewright.e2e;

import java.util.List;
import java.util.Map;

/** Read-back helpers shared by the string bench and set planner browser tests. */
abstract class StringPageTestBase extends BrowserTestBase {

    static double num(Object o) {
        return ((Number) o).doubleValue();
    }

    /** The datasets of the Chart.js chart on a canvas, as the page holds them. */
    @SuppressWarnings("unchecked")
    List<Map<String, Object>> datasets(String canvasId) {
        Map<String, Object> data = (Map<String, Object>) chartData(canvasId);
        return (List<Map<String, Object>>) data.get("datasets");
    }

    /** Waits for the inline message of a field (re-read each time: the page rewrites it per answer). */
    String errorText(String field) {
        return wait.until(d -> (String) js("const e = document.querySelector('[data-error-for=\"' + CSS.escape(arguments[0]) + '\"]');"
                + "return e && e.textContent.trim() ? e.textContent : null;", field));
    }
}
