package org.nodewright.audit;

import java.time.Instant;

/** One audit entry as listed: when, who, what, on what, and from which address. No password material. */
public record AuditEvent(long id, Instant at, String username, AuditAction action, String target, String address) {
}
