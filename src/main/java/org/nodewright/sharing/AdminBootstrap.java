package org.nodewright.sharing;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.InitializingBean;

/**
 * First start in LAN mode: creates the account {@code admin} from {@code app.sharing.admin-password}
 * when no admin exists yet, and refuses to start when there is neither an admin nor a password.
 * Once an admin exists the option is ignored (passwords are changed on the admin page).
 */
final class AdminBootstrap implements InitializingBean {

    static final String ADMIN = "admin";
    private static final Logger log = LoggerFactory.getLogger(AdminBootstrap.class);

    private final AccountStore store;
    private final AccountService accounts;
    private final SharingProperties properties;

    AdminBootstrap(AccountStore store, AccountService accounts, SharingProperties properties) {
        this.store = store;
        this.accounts = accounts;
        this.properties = properties;
    }

    @Override
    public void afterPropertiesSet() {
        if (store.countEnabledAdmins() > 0) {
            if (properties.hasAdminPassword()) {
                log.info("LAN mode: admin accounts exist already, so app.sharing.admin-password is ignored; "
                        + "reset passwords on the Accounts page instead.");
            }
            return;
        }
        if (!properties.hasAdminPassword()) {
            throw new LanSetupException(
                    "LAN mode (app.sharing.lan=true) needs accounts, but the store has no enabled admin account "
                            + "and no admin password was given.",
                    "Start once with --app.sharing.admin-password=YOUR-PASSWORD to create the account 'admin', "
                            + "or start without --app.sharing.lan=true to use Nodewright on this machine only.");
        }
        String password = properties.adminPassword();
        if (password.getBytes(java.nio.charset.StandardCharsets.UTF_8).length > AccountService.MAX_PASSWORD_BYTES) {
            throw new LanSetupException("The admin password is longer than " + AccountService.MAX_PASSWORD_BYTES
                    + " bytes (UTF-8), which BCrypt cannot use in full.", "Choose a shorter app.sharing.admin-password.");
        }
        String weak = PasswordRule.problem(password, ADMIN);
        if (weak != null) {
            log.warn("LAN mode: the admin password {}; sign in and choose a better one on the password page.", weak);
        }
        if (store.find(ADMIN).isPresent()) {
            // An 'admin' account exists but is no longer an enabled admin: restore it from the given password.
            store.setPasswordHash(ADMIN, accounts.encode(password), false);
            store.setRole(ADMIN, Role.ADMIN);
            store.setEnabled(ADMIN, true);
            log.warn("LAN mode: no enabled admin was left; the account 'admin' was re-enabled as admin "
                    + "with the given password.");
        } else {
            store.create(ADMIN, accounts.encode(password), Role.ADMIN);
            log.info("LAN mode: created the account 'admin' from app.sharing.admin-password.");
        }
    }
}
