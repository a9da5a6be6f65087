package org.nodewright.audit;

import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.Size;
import java.time.Instant;
import java.util.List;
import org.nodewright.web.BadRequestException;
import org.springframework.format.annotation.DateTimeFormat;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/** {@code GET /api/v1/audit?limit=100&username=&action=&since=}: newest first (admin only in LAN mode). */
@RestController
class AuditController {

    private final AuditTrail trail;

    AuditController(AuditTrail trail) {
        this.trail = trail;
    }

    @GetMapping("/api/v1/audit")
    List<AuditEvent> list(@RequestParam(defaultValue = "100") @Min(1) @Max(10000) int limit,
            @RequestParam(required = false) @Size(max = 80) String username,
            @RequestParam(required = false) String action,
            @RequestParam(required = false) @DateTimeFormat(iso = DateTimeFormat.ISO.DATE_TIME) Instant since) {
        return trail.list(limit, username, action(action), since);
    }

    static AuditAction action(String word) {
        if (word == null || word.isBlank()) {
            return null;
        }
        return AuditAction.fromWord(word.strip()).orElseThrow(() -> new BadRequestException("action",
                "must be one of " + String.join(", ", java.util.Arrays.stream(AuditAction.values())
                        .map(AuditAction::word).toList())));
    }
}
