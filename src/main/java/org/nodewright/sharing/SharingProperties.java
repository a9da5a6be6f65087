package org.nodewright.sharing;

import java.time.Duration;
import org.springframework.boot.context.properties.ConfigurationProperties;
import org.springframework.boot.context.properties.bind.DefaultValue;

/**
 * {@code app.sharing.*}: LAN mode on or off, the first admin's password, the sign-in lockout
 * ({@code max-failures} failed sign-ins within {@code lockout} lock that username, and separately
 * that remote address, for {@code lockout}), and the shop's own TLS keystore (PKCS#12; without one
 * LAN mode makes and keeps a self-signed certificate under the data directory).
 */
@ConfigurationProperties("app.sharing")
record SharingProperties(
        @DefaultValue("false") boolean lan,
        String adminPassword,
        @DefaultValue("5") int maxFailures,
        @DefaultValue("5m") Duration lockout,
        String keystore,
        String keystorePassword) {

    SharingProperties {
        if (maxFailures < 1) {
            throw new IllegalArgumentException("app.sharing.max-failures must be at least 1, was " + maxFailures);
        }
        if (lockout == null || lockout.isNegative() || lockout.isZero()) {
            throw new IllegalArgumentException("app.sharing.lockout must be a positive duration, was " + lockout);
        }
    }

    boolean hasAdminPassword() {
        return adminPassword != null && !adminPassword.isEmpty();
    }

    boolean hasKeystore() {
        return keystore != null && !keystore.isBlank();
    }
}
