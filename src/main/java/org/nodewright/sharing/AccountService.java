package org.nodewright.sharing;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.regex.Pattern;
import org.nodewright.web.BadRequestException;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Account rules shared by the JSON API and the admin page: username and password policy, BCrypt
 * hashing, and never leaving the shop without an enabled admin.
 */
@Service
class AccountService {

    /** NIST SP 800-63B: user-chosen passwords of at least 8 characters. */
    static final int MIN_PASSWORD_LENGTH = 8;
    /** BCrypt reads at most 72 bytes of its input; longer passwords are refused, not cut. */
    static final int MAX_PASSWORD_BYTES = 72;
    static final int MAX_USERNAME_LENGTH = 40;
    private static final Pattern USERNAME = Pattern.compile("[a-z0-9][a-z0-9._-]{0,39}");

    private final AccountStore store;
    private final PasswordEncoder encoder;

    AccountService(AccountStore store, PasswordEncoder encoder) {
        this.store = store;
        this.encoder = encoder;
    }

    List<Account> list() {
        return store.list();
    }

    Account get(String username) {
        return store.find(username).orElseThrow(() -> AccountProblem.notFound(username));
    }

    @Transactional
    Account create(String username, String password, Role role) {
        checkUsername("username", username);
        checkPassword("password", password);
        if (role == null) {
            throw new BadRequestException("role", "is required: viewer, editor or admin");
        }
        if (!store.create(username, encoder.encode(password), role)) {
            throw AccountProblem.conflict("username", "an account called '" + username + "' exists already");
        }
        return get(username);
    }

    @Transactional
    Account changeRole(String username, Role role) {
        if (role == null) {
            throw new BadRequestException("role", "is required: viewer, editor or admin");
        }
        Account current = get(username);
        if (current.role() == Role.ADMIN && role != Role.ADMIN && current.enabled()) {
            keepOneAdmin("role");
        }
        store.setRole(username, role);
        return get(username);
    }

    @Transactional
    Account setEnabled(String username, boolean enabled) {
        Account current = get(username);
        if (!enabled && current.enabled() && current.role() == Role.ADMIN) {
            keepOneAdmin("enabled");
        }
        store.setEnabled(username, enabled);
        return get(username);
    }

    @Transactional
    Account resetPassword(String username, String password) {
        get(username);
        checkPassword("password", password);
        store.setPasswordHash(username, encoder.encode(password));
        return get(username);
    }

    /** BCrypt hash of a password (the bootstrap admin skips the length policy, with a warning). */
    String encode(String password) {
        return encoder.encode(password);
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
    }

    static void checkPassword(String field, String password) {
        if (password == null || password.isEmpty()) {
            throw new BadRequestException(field, "is required");
        }
        if (password.codePointCount(0, password.length()) < MIN_PASSWORD_LENGTH) {
            throw new BadRequestException(field, "must be at least " + MIN_PASSWORD_LENGTH + " characters");
        }
        if (password.getBytes(StandardCharsets.UTF_8).length > MAX_PASSWORD_BYTES) {
            throw new BadRequestException(field, "must be at most " + MAX_PASSWORD_BYTES + " bytes (UTF-8)");
        }
        if (password.isBlank()) {
            throw new BadRequestException(field, "must not be only spaces");
        }
    }
}
