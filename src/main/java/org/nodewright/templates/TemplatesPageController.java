package org.nodewright.templates;

import java.util.List;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;

/** The "Bench templates" page: printable templates, the gauge picker and the tone-hole solver. */
@Controller
class TemplatesPageController {

    static final String VIEW = "templates";

    /** Texts the page script needs, rendered into the page from messages/templates.properties. */
    static final List<String> JS_KEYS = List.of("tpl.js.notNumber", "tpl.js.badLine", "tpl.js.badJson",
            "tpl.js.queued", "tpl.js.running", "tpl.js.succeeded", "tpl.js.notConverged", "tpl.js.failed",
            "tpl.js.cancelled", "tpl.js.applied", "tpl.js.foot", "tpl.js.downloaded", "tpl.js.noBench",
            "tpl.js.fromBench", "tpl.js.error", "tpl.js.solvedName", "tpl.js.demoFailed", "tpl.js.notWhole",
            "tpl.js.firstLayout", "tpl.js.calibrated", "tpl.js.calibApplied", "tpl.js.mouthMoved", "tpl.js.peakUsed",
            "tpl.js.peakUnused", "tpl.js.pastSaddle");

    @GetMapping("/templates")
    String page(Model model) {
        model.addAttribute("jsKeys", JS_KEYS);
        return VIEW;
    }
}
