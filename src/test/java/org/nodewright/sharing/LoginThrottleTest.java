package org.nodewright.sharing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;

/** The lockout policy stated in the README: 5 failures within 5 minutes lock a key for 5 minutes. */
class LoginThrottleTest {

    /** A clock the test moves by hand. */
    private static final class HandClock extends Clock {
        private Instant now = Instant.parse("2026-03-01T09:00:00Z");

        @Override
        public ZoneOffset getZone() {
            return ZoneOffset.UTC;
        }

        @Override
        public Clock withZone(java.time.ZoneId zone) {
            return this;
        }

        @Override
        public Instant instant() {
            return now;
        }

        void advance(Duration d) {
            now = now.plus(d);
        }
    }

    private final HandClock clock = new HandClock();
    private final LoginThrottle throttle = new LoginThrottle(5, Duration.ofMinutes(5), clock);

    @Test
    void fourFailuresDoNotLockTheFifthDoesForFiveMinutes() {
        for (int i = 0; i < 4; i++) {
            throttle.failed("user:anna");
            assertThat(throttle.lockedFor("user:anna")).isEmpty();
        }
        throttle.failed("user:anna");
        assertThat(throttle.lockedFor("user:anna")).contains(Duration.ofMinutes(5));
        clock.advance(Duration.ofMinutes(4).plusSeconds(59));
        assertThat(throttle.lockedFor("user:anna")).contains(Duration.ofSeconds(1));
        clock.advance(Duration.ofSeconds(1));
        assertThat(throttle.lockedFor("user:anna")).isEmpty();
        // After the lock the count starts again from zero.
        throttle.failed("user:anna");
        assertThat(throttle.lockedFor("user:anna")).isEmpty();
    }

    @Test
    void failuresSpreadOverMoreThanTheWindowDoNotLock() {
        for (int i = 0; i < 4; i++) {
            throttle.failed("address:10.0.0.9");
        }
        clock.advance(Duration.ofMinutes(5));
        throttle.failed("address:10.0.0.9");
        assertThat(throttle.lockedFor("address:10.0.0.9")).isEmpty();
    }

    @Test
    void aSuccessClearsTheCountAndKeysAreIndependent() {
        for (int i = 0; i < 4; i++) {
            throttle.failed("user:ben");
        }
        throttle.succeeded("user:ben");
        throttle.failed("user:ben");
        assertThat(throttle.lockedFor("user:ben")).isEmpty();
        for (int i = 0; i < 5; i++) {
            throttle.failed("user:cara");
        }
        assertThat(throttle.lockedFor("user:cara")).isPresent();
        assertThat(throttle.lockedFor("user:ben")).isEmpty();
    }

    @Test
    void nonsensePoliciesAreRefused() {
        assertThatThrownBy(() -> new LoginThrottle(0, Duration.ofMinutes(5), clock))
                .isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new LoginThrottle(5, Duration.ZERO, clock))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
