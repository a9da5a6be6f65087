package org.nodewright.strings;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

/**
 * The two string pages: the string bench (one string, its modes and spectra) and the set planner
 * (a whole set's tensions and neck load). Both are static forms; their scripts call the JSON API.
 */
@Controller
class StringPagesController {

    static final String STRING_VIEW = "strings";
    static final String SET_VIEW = "string-sets";

    @GetMapping("/strings")
    String stringBench() {
        return STRING_VIEW;
    }

    @GetMapping("/string-sets")
    String setPlanner() {
        return SET_VIEW;
    }
}
