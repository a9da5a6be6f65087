package org.nodewright.plates;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

/** The plate bench page: a static form whose script calls the plate API. */
@Controller
class PlatePagesController {

    @GetMapping("/plates")
    String plateBench() {
        return "plates";
    }
}
