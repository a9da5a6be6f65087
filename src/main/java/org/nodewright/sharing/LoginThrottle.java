package org.nodewright.sharing;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.UnaryOperator;

/**
 * Counts failed sign-ins per key (a username, a remote address). {@code maxFailures} failures
 * within {@code lockout} of the first one lock the key for {@code lockout}; while locked, no
 * password is even checked. A success clears the username's count (not the address's, so that
 * one valid account cannot be used to reset the guessing budget of an address). The counts live in
 * {@link Counters}: in memory, or in the store's {@code sign_in_counters} table so that every
 * instance on one database sees the same lock-out ({@link DatabaseSignInCounters}).
 */
final class LoginThrottle {

    /** Above this many tracked keys, expired entries are purged first (bounds memory). */
    private static final int PURGE_ABOVE = 10_000;

    record State(int failures, Instant windowStart, Instant lockedUntil) {
    }

    /** Where the counts are kept; {@code change} sees null for a key without a count. */
    interface Counters {
        Optional<State> get(String key);

        void change(String key, UnaryOperator<State> change);

        void remove(String key);

        void removeExpired(Instant now, Duration lockout);
    }

    private final Counters counters;
    private final int maxFailures;
    private final Duration lockout;
    private final Clock clock;

    LoginThrottle(int maxFailures, Duration lockout, Clock clock) {
        this(maxFailures, lockout, clock, new InMemory());
    }

    LoginThrottle(int maxFailures, Duration lockout, Clock clock, Counters counters) {
        if (maxFailures < 1 || lockout.isNegative() || lockout.isZero()) {
            throw new IllegalArgumentException("maxFailures " + maxFailures + " and lockout " + lockout
                    + " must be positive");
        }
        this.maxFailures = maxFailures;
        this.lockout = lockout;
        this.clock = clock;
        this.counters = counters;
    }

    static String userKey(String username) {
        String name = username == null ? "" : username.toLowerCase(java.util.Locale.ROOT);
        // Keys stay short whatever a client sends (names are at most 40 characters anyway).
        return "user:" + (name.length() > 64 ? name.substring(0, 64) : name);
    }

    static String addressKey(String address) {
        String a = address == null ? "unknown" : address;
        return "address:" + (a.length() > 64 ? a.substring(0, 64) : a);
    }

    /** How long the key stays locked, if it is locked now. */
    Optional<Duration> lockedFor(String key) {
        Optional<State> state = counters.get(key);
        Instant now = clock.instant();
        if (state.isEmpty() || state.get().lockedUntil() == null || !now.isBefore(state.get().lockedUntil())) {
            return Optional.empty();
        }
        return Optional.of(Duration.between(now, state.get().lockedUntil()));
    }

    void failed(String key) {
        Instant now = clock.instant();
        counters.change(key, s -> {
            if (s == null || expired(s, now, lockout)) {
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
        counters.remove(key);
    }

    /** Forgets the counts that no longer lock or count (called now and then). */
    void purge() {
        counters.removeExpired(clock.instant(), lockout);
    }

    static boolean expired(State s, Instant now, Duration lockout) {
        boolean windowOver = !now.isBefore(s.windowStart().plus(lockout));
        boolean unlocked = s.lockedUntil() == null || !now.isBefore(s.lockedUntil());
        return windowOver && unlocked;
    }

    /** Counts of this instance only. */
    static final class InMemory implements Counters {

        private final Map<String, State> states = new ConcurrentHashMap<>();
        private volatile Instant lastNow = Instant.EPOCH;
        private volatile Duration lastLockout = Duration.ofMinutes(5);

        @Override
        public Optional<State> get(String key) {
            return Optional.ofNullable(states.get(key));
        }

        @Override
        public void change(String key, UnaryOperator<State> change) {
            if (states.size() > PURGE_ABOVE) {
                removeExpired(lastNow, lastLockout);
            }
            states.compute(key, (k, s) -> change.apply(s));
        }

        @Override
        public void remove(String key) {
            states.remove(key);
        }

        @Override
        public void removeExpired(Instant now, Duration lockout) {
            lastNow = now;
            lastLockout = lockout;
            states.values().removeIf(s -> expired(s, now, lockout));
        }
    }
}
