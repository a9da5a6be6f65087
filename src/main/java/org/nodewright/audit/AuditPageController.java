package org.nodewright.audit;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RequestParam;

/** The admin's audit page: the newest entries, filtered by account, action and first day. */
@Controller
class AuditPageController {

    static final String PAGE = "/admin/audit";
    static final String VIEW = "admin-audit";
    static final List<Integer> LIMITS = List.of(50, 100, 500, 2000);

    private final AuditTrail trail;

    AuditPageController(AuditTrail trail) {
        this.trail = trail;
    }

    @GetMapping(PAGE)
    String show(@RequestParam(defaultValue = "") String username, @RequestParam(defaultValue = "") String action,
            @RequestParam(defaultValue = "") String since, @RequestParam(defaultValue = "100") int limit, Model model) {
        AuditAction chosen = AuditAction.fromWord(action).orElse(null);
        Instant from = null;
        String problem = null;
        if (!since.isBlank()) {
            try {
                from = LocalDate.parse(since.strip()).atStartOfDay(ZoneOffset.UTC).toInstant();
            } catch (java.time.format.DateTimeParseException e) {
                problem = since;
            }
        }
        int n = LIMITS.contains(limit) ? limit : 100;
        model.addAttribute("events", trail.list(n, username.strip(), chosen, from));
        model.addAttribute("actions", AuditAction.values());
        model.addAttribute("limits", LIMITS);
        model.addAttribute("username", username.strip());
        model.addAttribute("action", chosen == null ? "" : chosen.word());
        model.addAttribute("since", since.strip());
        model.addAttribute("limit", n);
        model.addAttribute("sinceProblem", problem);
        model.addAttribute("keepDays", trail.keep().toDays());
        return VIEW;
    }
}
