package org.nodewright.designs;

import jakarta.servlet.http.HttpServletResponse;
import java.util.Optional;
import org.springframework.http.HttpStatus;
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
    private static final String MISSING_VIEW = "library-missing";

    private final DesignLibrary library;

    LibraryPageController(DesignLibrary library) {
        this.library = library;
    }

    @GetMapping("/library")
    String list(Model model) {
        model.addAttribute("kinds", DesignKind.values());
        return LIST_VIEW;
    }

    /** One design; an unknown or deleted id (or no id at all) gets a page saying so, with status 404. */
    @GetMapping("/library/{id}")
    String design(@PathVariable String id, Model model, HttpServletResponse response) {
        Design design = parseId(id).flatMap(library::find).orElse(null);
        if (design == null) {
            response.setStatus(HttpStatus.NOT_FOUND.value());
            model.addAttribute("missingId", id);
            return MISSING_VIEW;
        }
        model.addAttribute("design", design);
        model.addAttribute("openPath", design.kind().designerPath() + "?design=" + design.id());
        return DESIGN_VIEW;
    }

    private static Optional<Long> parseId(String id) {
        try {
            return Optional.of(Long.parseLong(id));
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }

    @GetMapping("/library/compare")
    String compare() {
        return COMPARE_VIEW;
    }
}
