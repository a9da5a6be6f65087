package org.nodewright.sharing;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Counts failed sign-ins per key (a username, a remote address). {@code maxFailures} failures
 * within {@code lockout} of the first one lock the key for {@code lockout}; while locked, no
 * password is even checked. A success clears the username's count (not the address's, so that
 * one valid account cannot be used to reset the guessing budget of an address).
 */
final class LoginThrottle {

    /** Above this many tracked keys, expired entries are purged first (bounds memory). */
    private static final int PURGE_ABOVE = 10_000;

    private record State(int failures, Instant windowStart, Instant lockedUntil) {
    }

    private final Map<String, State> states = new ConcurrentHashMap<>();
    private final int maxFailures;
    private final Duration lockout;
    private final Clock clock;

    LoginThrottle(int maxFailures, Duration lockout, Clock clock) {
        if (maxFailures < 1 || lockout.isNegative() || lockout.isZero()) {
            throw new IllegalArgumentException("maxFailures " + maxFailures + " and lockout " + lockout
                    + " must be positive");
        }
        this.maxFailures = maxFailures;
        this.lockout = lockout;
        this.clock = clock;
    }

    /** How long the key stays locked, if it is locked now. */
    Optional<Duration> lockedFor(String key) {
        State s = states.get(key);
        Instant now = clock.instant();
        if (s == null || s.lockedUntil() == null || !now.isBefore(s.lockedUntil())) {
            return Optional.empty();
        }
        return Optional.of(Duration.between(now, s.lockedUntil()));
    }

    void failed(String key) {
        Instant now = clock.instant();
        if (states.size() > PURGE_ABOVE) {
            states.values().removeIf(s -> expired(s, now));
        }
        states.compute(key, (k, s) -> {
            if (s == null || expired(s, now)) {
                s = new State(0, now, null);
            }
            int failures = s.failures() + 1;
            if (failures >= maxFailures) {
                return new State(0, now, now.plus(lockout));
            }
            return new State(failures, s.windowStart(), s.lockedUntil());
        });
    }

    void succeeded(String key) {
        states.remove(key);
    }

    private boolean expired(State s, Instant now) {
        boolean windowOver = !now.isBefore(s.windowStart().plus(lockout));
        boolean unlocked = s.lockedUntil() == null || !now.isBefore(s.lockedUntil());
        return windowOver && unlocked;
    }
}
