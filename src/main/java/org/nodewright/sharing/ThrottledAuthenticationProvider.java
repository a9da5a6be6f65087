package org.nodewright.sharing;

import java.time.Duration;
import java.time.Instant;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.nodewright.audit.AuditAction;
import org.nodewright.audit.AuditTrail;
import java.util.Locale;
import java.util.Optional;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.security.authentication.AuthenticationProvider;
import org.springframework.security.authentication.BadCredentialsException;
import org.springframework.security.authentication.DisabledException;
import org.springframework.security.authentication.UsernamePasswordAuthenticationToken;
import org.springframework.security.authentication.dao.DaoAuthenticationProvider;
import org.springframework.security.core.Authentication;
import org.springframework.security.core.AuthenticationException;
import org.springframework.security.core.userdetails.User;
import org.springframework.security.core.userdetails.UserDetailsService;
import org.springframework.security.core.userdetails.UsernameNotFoundException;
import org.springframework.security.crypto.password.PasswordEncoder;
import org.springframework.security.web.authentication.WebAuthenticationDetails;

/**
 * Checks a username and password (form sign-in and HTTP Basic alike) against the accounts table,
 * refusing at once while the username or the remote address is locked out.
 */
final class ThrottledAuthenticationProvider implements AuthenticationProvider {

    private static final Logger log = LoggerFactory.getLogger(ThrottledAuthenticationProvider.class);

    /** A signed-in account is written to the audit trail at most this often per address (Basic signs in on every call). */
    static final Duration SIGN_IN_AUDIT_EVERY = Duration.ofMinutes(30);

    private final DaoAuthenticationProvider delegate;
    private final LoginThrottle throttle;
    private final AuditTrail audit;
    private final Map<String, Instant> lastAudited = new ConcurrentHashMap<>();

    ThrottledAuthenticationProvider(AccountStore store, PasswordEncoder encoder, LoginThrottle throttle,
            AuditTrail audit) {
        UserDetailsService users = username -> store.credentials(username)
                .map(c -> User.withUsername(c.username()).password(c.passwordHash())
                        .authorities(c.role().authority()).disabled(!c.enabled()).build())
                .orElseThrow(() -> new UsernameNotFoundException("no such account"));
        this.delegate = new DaoAuthenticationProvider(users);
        this.delegate.setPasswordEncoder(encoder);
        this.throttle = throttle;
        this.audit = audit;
    }

    @Override
    public Authentication authenticate(Authentication authentication) throws AuthenticationException {
        String name = authentication.getName() == null ? "" : authentication.getName().toLowerCase(Locale.ROOT);
        String address = remoteAddress(authentication);
        String userKey = LoginThrottle.userKey(name);
        String addressKey = LoginThrottle.addressKey(address);
        Optional<Duration> locked = throttle.lockedFor(userKey).or(() -> throttle.lockedFor(addressKey));
        if (locked.isPresent()) {
            audit.record(shortName(name), AuditAction.SIGN_IN_LOCKED, "refused while locked out", address);
            throw new SignInLockedException(locked.get());
        }
        UsernamePasswordAuthenticationToken normalised = UsernamePasswordAuthenticationToken.unauthenticated(
                name, authentication.getCredentials());
        normalised.setDetails(authentication.getDetails());
        try {
            Authentication result = delegate.authenticate(normalised);
            throttle.succeeded(userKey);
            auditSignIn(name, address);
            return result;
        } catch (BadCredentialsException | DisabledException e) {
            throttle.failed(userKey);
            throttle.failed(addressKey);
            boolean nowLocked = throttle.lockedFor(userKey).isPresent() || throttle.lockedFor(addressKey).isPresent();
            audit.record(shortName(name), AuditAction.SIGN_IN_FAILED,
                    nowLocked ? "wrong password, unknown or disabled account; now locked out"
                            : "wrong password, unknown or disabled account", address);
            if (nowLocked) {
                log.warn("Too many failed sign-ins: {} and {} locked out for a while", userKey, addressKey);
            }
            // One answer for a wrong password, an unknown name and a disabled account.
            throw new BadCredentialsException("Wrong username or password, or the account is disabled");
        }
    }

    /** Form sign-ins are each recorded; repeated Basic calls of one account from one address once per half hour. */
    private void auditSignIn(String name, String address) {
        Instant now = Instant.now();
        String key = name + "@" + address;
        Instant last = lastAudited.get(key);
        if (last != null && now.isBefore(last.plus(SIGN_IN_AUDIT_EVERY)) && !formSignIn()) {
            return;
        }
        if (lastAudited.size() > 10_000) {
            lastAudited.clear();
        }
        lastAudited.put(key, now);
        audit.record(name, AuditAction.SIGN_IN, "signed in", address);
    }

    /** Whether the request being served is the sign-in form's POST (the request context filter runs first). */
    private static boolean formSignIn() {
        if (org.springframework.web.context.request.RequestContextHolder.getRequestAttributes()
                instanceof org.springframework.web.context.request.ServletRequestAttributes servlet) {
            return "POST".equals(servlet.getRequest().getMethod())
                    && servlet.getRequest().getRequestURI().endsWith("/login");
        }
        return false;
    }

    private static String shortName(String name) {
        return name.length() > 40 ? name.substring(0, 40) : name;
    }

    @Override
    public boolean supports(Class<?> authentication) {
        return UsernamePasswordAuthenticationToken.class.isAssignableFrom(authentication);
    }

    private static String remoteAddress(Authentication authentication) {
        if (authentication.getDetails() instanceof WebAuthenticationDetails details
                && details.getRemoteAddress() != null) {
            return details.getRemoteAddress();
        }
        return "unknown";
    }
}
