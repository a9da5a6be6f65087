package org.nodewright.web;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.GetMapping;

/** The workshop's start page: links to each bench. */
@Controller
class HomeController {

    static final String VIEW = "home";

    @GetMapping("/")
    String home() {
        return VIEW;
    }
}
