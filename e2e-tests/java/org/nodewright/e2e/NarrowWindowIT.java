package org.nodewright.e2e;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.Dimension;

/**
 * Issue 16 polish: in a window 800 px wide (a small laptop, a tablet held upright) no bench scrolls
 * sideways and no drop-down cuts its chosen text ("Plain ste" for plain steel).
 */
class NarrowWindowIT extends BrowserTestBase {

    /** Visible selects whose chosen text (plus the room of Chromium's drop-down arrow) is wider than the box. */
    private static final String CUT_SELECTS = "const ctx = document.createElement('canvas').getContext('2d');"
            + "return [...document.querySelectorAll('select')].filter(s => s.offsetParent !== null).map(s => {"
            + " const cs = getComputedStyle(s); ctx.font = cs.fontStyle + ' ' + cs.fontWeight + ' ' + cs.fontSize + ' ' + cs.fontFamily;"
            + " const text = s.options[s.selectedIndex] ? s.options[s.selectedIndex].text : '';"
            + " const need = ctx.measureText(text).width + parseFloat(cs.paddingLeft) + 20;"
            + " return need > s.clientWidth ? (s.id || s.name || s.className) + ': \"' + text + '\" needs ' + need.toFixed(0)"
            + "   + ' px, has ' + s.clientWidth : null; }).filter(Boolean);";

    @Test
    void atEightHundredPixelsNoBenchScrollsSidewaysAndNoSelectIsCut() {
        driver.manage().window().setSize(new Dimension(800, 900));
        Map<String, String> ready = new LinkedHashMap<>();
        ready.put("/strings", "return !!(window.Chart && Chart.getChart(document.getElementById('mode-shapes-chart')))");
        ready.put("/string-sets", "return !!(window.Chart && Chart.getChart(document.getElementById('set-tension-chart')))");
        ready.put("/air-columns", "return !!document.querySelector('main.air-bench').dataset.analyzed");
        ready.put("/bars", "return !!(window.Chart && Chart.getChart(document.getElementById('bar-side-chart')))");
        ready.put("/plates", "return document.querySelectorAll('#mode-gallery canvas').length > 0");
        ready.put("/templates", "return (document.getElementById('bore-json').value || '').includes('segments')");
        Map<String, Object> found = new LinkedHashMap<>();
        for (Map.Entry<String, String> page : ready.entrySet()) {
            driver.get(url(page.getKey()));
            wait.until(d -> Boolean.TRUE.equals(js(page.getValue())));
            Object width = js("return [document.documentElement.scrollWidth, window.innerWidth];");
            List<?> w = (List<?>) width;
            if (((Number) w.get(0)).longValue() > ((Number) w.get(1)).longValue()) {
                found.put(page.getKey() + " scrolls sideways", width + " widest: " + js(
                        "return [...document.querySelectorAll('main *')].filter(e => e.getBoundingClientRect().right > window.innerWidth + 1)"
                        + ".slice(-5).map(e => e.tagName + (e.id ? '#' + e.id : '') + '.' + e.className).join(', ');"));
            }
            List<?> cut = (List<?>) js(CUT_SELECTS);
            if (!cut.isEmpty()) {
                found.put(page.getKey() + " cut selects", cut);
            }
        }
        assertThat(found).isEmpty();
    }
}
