package org.nodewright.bars;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

/** The bar bench page: a static form whose scripts call the JSON API. */
@Controller
class BarPagesController {

    static final String VIEW = "bars";

    @GetMapping("/bars")
    String barBench() {
        return VIEW;
    }
}
