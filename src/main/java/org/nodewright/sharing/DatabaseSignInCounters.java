package org.nodewright.sharing;

import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.Optional;
import java.util.function.UnaryOperator;
import org.springframework.dao.DuplicateKeyException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * Failed sign-in counts in the {@code sign_in_counters} table (migration V3): every instance on one
 * PostgreSQL database counts into the same rows, so spreading guesses over instances does not
 * help. A change reads the row {@code FOR UPDATE} in its own transaction, so two instances counting
 * the same key at once are serialised by the database.
 */
final class DatabaseSignInCounters implements LoginThrottle.Counters {

    private final JdbcClient jdbc;
    private final TransactionTemplate transactions;

    DatabaseSignInCounters(JdbcClient jdbc, TransactionTemplate transactions) {
        this.jdbc = jdbc;
        this.transactions = transactions;
    }

    @Override
    public Optional<LoginThrottle.State> get(String key) {
        return jdbc.sql("SELECT failures, window_start, locked_until FROM sign_in_counters WHERE counter_key = ?")
                .param(key).query((rs, n) -> state(rs)).optional();
    }

    @Override
    public void change(String key, UnaryOperator<LoginThrottle.State> change) {
        for (int attempt = 0; ; attempt++) {
            try {
                transactions.executeWithoutResult(tx -> {
                    Optional<LoginThrottle.State> current = jdbc.sql("SELECT failures, window_start, locked_until "
                                    + "FROM sign_in_counters WHERE counter_key = ? FOR UPDATE")
                            .param(key).query((rs, n) -> state(rs)).optional();
                    LoginThrottle.State next = change.apply(current.orElse(null));
                    if (next == null) {
                        jdbc.sql("DELETE FROM sign_in_counters WHERE counter_key = ?").param(key).update();
                    } else if (current.isPresent()) {
                        jdbc.sql("UPDATE sign_in_counters SET failures = ?, window_start = ?, locked_until = ? "
                                        + "WHERE counter_key = ?")
                                .params(next.failures(), time(next.windowStart()), time(next.lockedUntil()), key)
                                .update();
                    } else {
                        jdbc.sql("INSERT INTO sign_in_counters (counter_key, failures, window_start, locked_until) "
                                        + "VALUES (?, ?, ?, ?)")
                                .params(key, next.failures(), time(next.windowStart()), time(next.lockedUntil()))
                                .update();
                    }
                });
                return;
            } catch (DuplicateKeyException raced) {
                // Another instance inserted the first count of this key meanwhile: count on its row.
                if (attempt >= 3) {
                    throw raced;
                }
            }
        }
    }

    @Override
    public void remove(String key) {
        jdbc.sql("DELETE FROM sign_in_counters WHERE counter_key = ?").param(key).update();
    }

    @Override
    public void removeExpired(Instant now, Duration lockout) {
        OffsetDateTime windowOver = time(now.minus(lockout));
        jdbc.sql("DELETE FROM sign_in_counters WHERE window_start <= ? AND (locked_until IS NULL OR locked_until <= ?)")
                .params(windowOver, time(now)).update();
    }

    private static LoginThrottle.State state(java.sql.ResultSet rs) throws java.sql.SQLException {
        OffsetDateTime locked = rs.getObject("locked_until", OffsetDateTime.class);
        return new LoginThrottle.State(rs.getInt("failures"), rs.getObject("window_start", OffsetDateTime.class).toInstant(),
                locked == null ? null : locked.toInstant());
    }

    private static OffsetDateTime time(Instant at) {
        return at == null ? null : OffsetDateTime.ofInstant(at, ZoneOffset.UTC);
    }
}
