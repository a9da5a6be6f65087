package org.nodewright.measurements;

import java.util.Set;
import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.server.ResponseStatusException;
import org.springframework.http.HttpStatus;

/**
 * The Measure page, and the measurement and listening panels as HTML fragments that the string
 * bench and the bore bench load into their {@code listen-panel} and {@code measure-panel}
 * sections (their text comes from messages/measurements.properties).
 */
@Controller
class MeasurePagesController {

    static final String PAGE = "measurements/measure";
    private static final Set<String> PANELS = Set.of("measure-strings", "measure-air", "listen-strings", "listen-air");

    @GetMapping("/measure")
    String page() {
        return PAGE;
    }

    @GetMapping("/measure/panels/{name}")
    String panel(@PathVariable String name) {
        if (!PANELS.contains(name)) {
            throw new ResponseStatusException(HttpStatus.NOT_FOUND);
        }
        return "measurements/panels :: " + name;
    }
}
