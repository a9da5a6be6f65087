package org.nodewright.sharing;

import java.time.Duration;
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

    private final DaoAuthenticationProvider delegate;
    private final LoginThrottle throttle;

    ThrottledAuthenticationProvider(AccountStore store, PasswordEncoder encoder, LoginThrottle throttle) {
        UserDetailsService users = username -> store.credentials(username)
                .map(c -> User.withUsername(c.username()).password(c.passwordHash())
                        .authorities(c.role().authority()).disabled(!c.enabled()).build())
                .orElseThrow(() -> new UsernameNotFoundException("no such account"));
        this.delegate = new DaoAuthenticationProvider(users);
        this.delegate.setPasswordEncoder(encoder);
        this.throttle = throttle;
    }

    @Override
    public Authentication authenticate(Authentication authentication) throws AuthenticationException {
        String name = authentication.getName() == null ? "" : authentication.getName().toLowerCase(Locale.ROOT);
        // Keys stay short whatever a client sends (names are at most 40 characters anyway).
        String userKey = "user:" + (name.length() > 64 ? name.substring(0, 64) : name);
        String addressKey = "address:" + remoteAddress(authentication);
        Optional<Duration> locked = throttle.lockedFor(userKey).or(() -> throttle.lockedFor(addressKey));
        if (locked.isPresent()) {
            throw new SignInLockedException(locked.get());
        }
        UsernamePasswordAuthenticationToken normalised = UsernamePasswordAuthenticationToken.unauthenticated(
                name, authentication.getCredentials());
        normalised.setDetails(authentication.getDetails());
        try {
            Authentication result = delegate.authenticate(normalised);
            throttle.succeeded(userKey);
            return result;
        } catch (BadCredentialsException | DisabledException e) {
            throttle.failed(userKey);
            throttle.failed(addressKey);
            if (throttle.lockedFor(userKey).isPresent() || throttle.lockedFor(addressKey).isPresent()) {
                log.warn("Too many failed sign-ins: {} and {} locked out for a while", userKey, addressKey);
            }
            // One answer for a wrong password, an unknown name and a disabled account.
            throw new BadCredentialsException("Wrong username or password, or the account is disabled");
        }
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
