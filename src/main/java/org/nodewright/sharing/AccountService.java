package org.nodewright.sharing;

import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;
import org.nodewright.audit.AuditAction;
import org.nodewright.audit.AuditTrail;
import org.nodewright.web.BadRequestException;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Account rules shared by the JSON API and the admin page: username and password policy
 * ({@link PasswordRule}), BCrypt hashing, never leaving the shop without an enabled admin, and an
 * audit entry for every change (who did it, to which account; never the password).
 */
@Service
class AccountService {

    /** NIST SP 800-63B: user-chosen passwords of at least 8 characters. */
    static final int MIN_PASSWORD_LENGTH = PasswordRule.MIN_LENGTH;
    /** BCrypt reads at most 72 bytes of its input; longer passwords are refused, not cut. */
    static final int MAX_PASSWORD_BYTES = PasswordRule.MAX_BYTES;
    static final int MAX_USERNAME_LENGTH = 40;
    /** {@code /api/v1/accounts/me/...} is the signed-in account itself, so no account may be called that. */
    static final String ME = "me";
    private static final Pattern USERNAME = Pattern.compile("[a-z0-9][a-z0-9._-]{0,39}");

    /** The outcome of a change of one's own password. */
    enum OwnChange { CHANGED, WRONG_CURRENT }

    private final AccountStore store;
    private final PasswordEncoder encoder;
    private final AuditTrail audit;

    AccountService(AccountStore store, PasswordEncoder encoder, AuditTrail audit) {
        this.store = store;
        this.encoder = encoder;
        this.audit = audit;
    }

    List<Account> list() {
        return store.list();
    }

    Account get(String username) {
        return store.find(username).orElseThrow(() -> AccountProblem.notFound(username));
    }

    @Transactional
    Account create(String username, String password, Role role, String by) {
        checkUsername("username", username);
        PasswordRule.check("password", password, username);
        if (role == null) {
            throw new BadRequestException("role", "is required: viewer, editor or admin");
        }
        if (!store.create(username, encoder.encode(password), role)) {
            throw AccountProblem.conflict("username", "an account called '" + username + "' exists already");
        }
        audit.record(by, AuditAction.ACCOUNT_CREATED, "account " + username + " (" + role.word() + ")");
        return get(username);
    }

    @Transactional
    Account changeRole(String username, Role role, String by) {
        if (role == null) {
            throw new BadRequestException("role", "is required: viewer, editor or admin");
        }
        Account current = get(username);
        if (current.role() == Role.ADMIN && role != Role.ADMIN && current.enabled()) {
            keepOneAdmin("role");
        }
        store.setRole(username, role);
        audit.record(by, AuditAction.ACCOUNT_ROLE_CHANGED, "account " + username + " (" + current.role().word()
                + " -> " + role.word() + ")");
        return get(username);
    }

    @Transactional
    Account setEnabled(String username, boolean enabled, String by) {
        Account current = get(username);
        if (!enabled && current.enabled() && current.role() == Role.ADMIN) {
            keepOneAdmin("enabled");
        }
        store.setEnabled(username, enabled);
        audit.record(by, enabled ? AuditAction.ACCOUNT_ENABLED : AuditAction.ACCOUNT_DISABLED, "account " + username);
        return get(username);
    }

    /**
     * An admin sets a new password for someone: the account must choose its own at its next
     * sign-in, and its open browser sessions end.
     */
    @Transactional
    Account resetPassword(String username, String password, String by) {
        get(username);
        PasswordRule.check("password", password, username);
        store.setPasswordHash(username, encoder.encode(password), !username.equals(by));
        store.signOutSessionsBefore(username, now());
        audit.record(by, AuditAction.PASSWORD_RESET, "account " + username);
        return get(username);
    }

    /**
     * The signed-in account changes its own password. A wrong current password changes nothing
     * (the caller counts it as a failed sign-in); a weak new one is a 400 naming {@code newPassword}.
     * Other browser sessions of the account end; the caller keeps its own.
     */
    @Transactional
    OwnChange changeOwnPassword(String username, String currentPassword, String newPassword, Instant signedOutBefore) {
        if (currentPassword == null || currentPassword.isEmpty()) {
            throw new BadRequestException("currentPassword", "is required");
        }
        Optional<AccountStore.Credentials> account = store.credentials(username);
        if (account.isEmpty() || !account.get().enabled()
                || !encoder.matches(currentPassword, account.get().passwordHash())) {
            audit.record(username, AuditAction.PASSWORD_CHANGE_FAILED, "account " + username + " (wrong current password)");
            return OwnChange.WRONG_CURRENT;
        }
        PasswordRule.check("newPassword", newPassword, username);
        if (newPassword.equals(currentPassword)) {
            throw new BadRequestException("newPassword", "must differ from the current password");
        }
        store.setPasswordHash(username, encoder.encode(newPassword), false);
        store.signOutSessionsBefore(username, signedOutBefore);
        audit.record(username, AuditAction.PASSWORD_CHANGED, "account " + username);
        return OwnChange.CHANGED;
    }

    /** Ends every open browser session of the account (on its next request); Basic clients are unaffected. */
    @Transactional
    Account signOutEverywhere(String username, String by) {
        get(username);
        store.signOutSessionsBefore(username, now());
        audit.record(by, AuditAction.SIGNED_OUT_EVERYWHERE, "account " + username);
        return get(username);
    }

    /** BCrypt hash of a password (the bootstrap admin skips the password rule, with a warning). */
    String encode(String password) {
        return encoder.encode(password);
    }

    static Instant now() {
        return Instant.now().truncatedTo(ChronoUnit.MILLIS);
    }

    private void keepOneAdmin(String field) {
        if (store.countEnabledAdmins() <= 1) {
            throw AccountProblem.conflict(field, "this is the last enabled admin; make another admin first");
        }
    }

    static void checkUsername(String field, String username) {
        if (username == null || username.isEmpty()) {
            throw new BadRequestException(field, "is required");
        }
        if (username.length() > MAX_USERNAME_LENGTH) {
            throw new BadRequestException(field, "must be at most " + MAX_USERNAME_LENGTH + " characters");
        }
        if (!USERNAME.matcher(username).matches()) {
            throw new BadRequestException(field,
                    "use lower-case letters, digits, '.', '_' or '-', starting with a letter or digit");
        }
        if (ME.equals(username)) {
            throw new BadRequestException(field, "'me' is reserved (it names the signed-in account in the API)");
        }
    }

    static void checkPassword(String field, String password) {
        PasswordRule.check(field, password, null);
    }
}
