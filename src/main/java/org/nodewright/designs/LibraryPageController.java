package org.nodewright.designs;

import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;

/** The shop library pages: the list, one design with its history, and two designs compared. */
@Controller
class LibraryPageController {

    private static final String LIST_VIEW = "library";
    private static final String DESIGN_VIEW = "library-design";
    private static final String COMPARE_VIEW = "library-compare";

    private final DesignLibrary library;

    LibraryPageController(DesignLibrary library) {
        this.library = library;
    }

    @GetMapping("/library")
    String list() {
        return LIST_VIEW;
    }

    @GetMapping("/library/{id}")
    String design(@PathVariable long id, Model model) {
        Design design = library.get(id);
        model.addAttribute("design", design);
        model.addAttribute("openPath", design.kind().designerPath() + "?design=" + design.id());
        return DESIGN_VIEW;
    }

    @GetMapping("/library/compare")
    String compare() {
        return COMPARE_VIEW;
    }
}
