package org.nodewright.audit;

import jakarta.servlet.http.HttpServletRequest;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.context.event.ApplicationReadyEvent;
import org.springframework.context.event.EventListener;
import org.springframework.dao.DataAccessException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.scheduling.annotation.Scheduled;
import org.springframework.stereotype.Service;
import org.springframework.web.context.request.RequestAttributes;
import org.springframework.web.context.request.RequestContextHolder;
import org.springframework.web.context.request.ServletRequestAttributes;

/**
 * The audit trail in the store ({@code audit_events}, migration V3): sign-ins and their failures,
 * account changes, design writes, deletes, restores and imports, backups. Entries older than
 * {@code app.audit.keep} (default 400 days) are trimmed at start-up and daily. Writing an entry
 * never fails the action it records: a store that refuses the entry is logged instead.
 */
@Service
public class AuditTrail {

    /** The longest target kept; longer ones are cut with an ellipsis (they are descriptions, not data). */
    static final int MAX_TARGET = 300;
    private static final Logger log = LoggerFactory.getLogger(AuditTrail.class);

    private final JdbcClient jdbc;
    private final Duration keep;
    private final Clock clock = Clock.systemUTC();

    AuditTrail(JdbcClient jdbc, @Value("${app.audit.keep:400d}") Duration keep) {
        if (keep.isNegative() || keep.isZero()) {
            throw new IllegalArgumentException("app.audit.keep must be a positive duration, was " + keep);
        }
        this.jdbc = jdbc;
        this.keep = keep;
    }

    /** Records an action of {@code username} on {@code target}, from the current request's address. */
    public void record(String username, AuditAction action, String target) {
        record(username, action, target, currentAddress());
    }

    public void record(String username, AuditAction action, String target, String address) {
        try {
            jdbc.sql("INSERT INTO audit_events (at, username, action, target, address) VALUES (?, ?, ?, ?, ?)")
                    .params(OffsetDateTime.ofInstant(clock.instant().truncatedTo(ChronoUnit.MILLIS), ZoneOffset.UTC),
                            cut(username == null || username.isBlank() ? "-" : username, 80), action.word(),
                            cut(target == null ? "" : target, MAX_TARGET), cut(address == null ? "" : address, 64))
                    .update();
        } catch (DataAccessException e) {
            log.warn("Audit entry not written ({} {} {}): {}", username, action.word(), target, e.getMessage());
        }
    }

    /** Entries newest first, filtered by username, action and time (each null for any). */
    public List<AuditEvent> list(int limit, String username, AuditAction action, Instant since) {
        StringBuilder sql = new StringBuilder("SELECT id, at, username, action, target, address FROM audit_events WHERE 1 = 1");
        Map<String, Object> params = new HashMap<>();
        if (username != null && !username.isBlank()) {
            sql.append(" AND username = :username");
            params.put("username", username.strip());
        }
        if (action != null) {
            sql.append(" AND action = :action");
            params.put("action", action.word());
        }
        if (since != null) {
            sql.append(" AND at >= :since");
            params.put("since", OffsetDateTime.ofInstant(since, ZoneOffset.UTC));
        }
        sql.append(" ORDER BY at DESC, id DESC FETCH FIRST ").append(Math.max(1, limit)).append(" ROWS ONLY");
        return jdbc.sql(sql.toString()).params(params).query(AuditTrail::row).list();
    }

    /** Deletes entries older than {@code app.audit.keep}; the number deleted. */
    @Scheduled(cron = "${app.audit.trim-cron:0 17 3 * * *}")
    public int trim() {
        Instant before = clock.instant().minus(keep);
        int n = jdbc.sql("DELETE FROM audit_events WHERE at < ?").param(OffsetDateTime.ofInstant(before, ZoneOffset.UTC))
                .update();
        if (n > 0) {
            log.info("Audit trail: {} entries older than {} trimmed.", n, keep);
        }
        return n;
    }

    @EventListener(ApplicationReadyEvent.class)
    void trimAtStart() {
        try {
            trim();
        } catch (DataAccessException e) {
            log.warn("Audit trail not trimmed: {}", e.getMessage());
        }
    }

    Duration keep() {
        return keep;
    }

    private static AuditEvent row(ResultSet rs, int n) throws SQLException {
        String word = rs.getString("action");
        AuditAction action = AuditAction.fromWord(word)
                .orElseThrow(() -> new SQLException("unknown audit action in store: " + word));
        return new AuditEvent(rs.getLong("id"), rs.getObject("at", OffsetDateTime.class).toInstant(),
                rs.getString("username"), action, rs.getString("target"), rs.getString("address"));
    }

    private static String currentAddress() {
        RequestAttributes attributes = RequestContextHolder.getRequestAttributes();
        if (attributes instanceof ServletRequestAttributes servlet) {
            HttpServletRequest request = servlet.getRequest();
            return request.getRemoteAddr();
        }
        return "";
    }

    private static String cut(String s, int max) {
        return s.length() <= max ? s : s.substring(0, max - 1) + "\u2026";
    }
}
