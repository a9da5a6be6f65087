package org.nodewright.sharing;

import java.time.Duration;
import org.springframework.security.authentication.AccountStatusException;

/**
 * Too many failed sign-ins for this username or from this address. An {@link AccountStatusException}
 * so that no other authentication provider is asked after it.
 */
class SignInLockedException extends AccountStatusException {

    private final Duration retryAfter;

    SignInLockedException(Duration retryAfter) {
        super("Too many failed sign-ins; try again later");
        this.retryAfter = retryAfter;
    }

    Duration retryAfter() {
        return retryAfter;
    }
}
