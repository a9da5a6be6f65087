package org.nodewright.sharing;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Clock;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Optional;
import org.springframework.dao.DuplicateKeyException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Repository;

/** The {@code accounts} table (migration V2). Holds BCrypt hashes only. */
@Repository
class AccountStore {

    /** What sign-in needs: the hash stays inside this package. */
    record Credentials(String username, String passwordHash, Role role, boolean enabled,
            boolean mustChangePassword, Instant sessionsValidAfter) {
    }

    private static final String COLUMNS = "id, username, role, enabled, created_at, updated_at";

    private final JdbcClient jdbc;
    private final Clock clock;

    AccountStore(JdbcClient jdbc) {
        this.jdbc = jdbc;
        this.clock = Clock.systemUTC();
    }

    List<Account> list() {
        return jdbc.sql("SELECT " + COLUMNS + " FROM accounts ORDER BY username").query(AccountStore::account).list();
    }

    Optional<Account> find(String username) {
        return jdbc.sql("SELECT " + COLUMNS + " FROM accounts WHERE username = ?").param(username)
                .query(AccountStore::account).optional();
    }

    Optional<Credentials> credentials(String username) {
        return jdbc.sql("SELECT username, password_hash, role, enabled, must_change_password, sessions_valid_after "
                        + "FROM accounts WHERE username = ?")
                .param(username)
                .query((rs, n) -> {
                    OffsetDateTime after = rs.getObject("sessions_valid_after", OffsetDateTime.class);
                    return new Credentials(rs.getString("username"), rs.getString("password_hash"),
                            role(rs), rs.getBoolean("enabled"), rs.getBoolean("must_change_password"),
                            after == null ? null : after.toInstant());
                })
                .optional();
    }

    /** Inserts an enabled account; false when the username is taken. */
    boolean create(String username, String passwordHash, Role role) {
        OffsetDateTime now = now();
        try {
            jdbc.sql("INSERT INTO accounts (username, password_hash, role, enabled, created_at, updated_at) "
                            + "VALUES (?, ?, ?, TRUE, ?, ?)")
                    .params(username, passwordHash, role.word(), now, now).update();
            return true;
        } catch (DuplicateKeyException taken) {
            return false;
        }
    }

    boolean setRole(String username, Role role) {
        return jdbc.sql("UPDATE accounts SET role = ?, updated_at = ? WHERE username = ?")
                .params(role.word(), now(), username).update() == 1;
    }

    boolean setEnabled(String username, boolean enabled) {
        return jdbc.sql("UPDATE accounts SET enabled = ?, updated_at = ? WHERE username = ?")
                .params(enabled, now(), username).update() == 1;
    }

    /** A new password hash; {@code mustChange} makes the account choose its own at the next sign-in. */
    boolean setPasswordHash(String username, String passwordHash, boolean mustChange) {
        return jdbc.sql("UPDATE accounts SET password_hash = ?, must_change_password = ?, updated_at = ? WHERE username = ?")
                .params(passwordHash, mustChange, now(), username).update() == 1;
    }

    /** Ends every browser session of the account signed in before {@code at} (on its next request). */
    boolean signOutSessionsBefore(String username, Instant at) {
        return jdbc.sql("UPDATE accounts SET sessions_valid_after = ? WHERE username = ?")
                .params(OffsetDateTime.ofInstant(at, ZoneOffset.UTC), username).update() == 1;
    }

    long countEnabledAdmins() {
        return jdbc.sql("SELECT COUNT(*) FROM accounts WHERE role = 'admin' AND enabled = TRUE")
                .query(Long.class).single();
    }

    private OffsetDateTime now() {
        return OffsetDateTime.now(clock).withOffsetSameInstant(ZoneOffset.UTC);
    }

    private static Account account(ResultSet rs, int rowNum) throws SQLException {
        return new Account(rs.getLong("id"), rs.getString("username"), role(rs), rs.getBoolean("enabled"),
                rs.getObject("created_at", OffsetDateTime.class), rs.getObject("updated_at", OffsetDateTime.class));
    }

    private static Role role(ResultSet rs) throws SQLException {
        String word = rs.getString("role");
        return Role.fromWord(word).orElseThrow(() -> new SQLException("unknown role in accounts table: " + word));
    }
}
