package org.nodewright.sharing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.KeyStore;
import java.security.cert.X509Certificate;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The self-signed LAN certificate: made once, kept with owner-only permissions, reused, and its
 * fingerprint as an outside tool computes it (OpenSSL's {@code x509 -fingerprint -sha256}).
 */
class LanCertificateTest {

    private static final List<String> NAMES = List.of("bench-pc", "bench-pc.harrowgate.lan", "192.168.10.7", "::1");

    @Test
    void theFirstStartMakesItAndEveryLaterStartReusesIt(@TempDir Path dataDir) throws Exception {
        Path tls = dataDir.resolve("tls");
        LanCertificate first = LanCertificate.selfSigned(tls, NAMES, Clock.systemUTC());
        assertThat(first.created()).isTrue();
        assertThat(first.selfSigned()).isTrue();
        LanCertificate again = LanCertificate.selfSigned(tls, NAMES, Clock.systemUTC());
        assertThat(again.created()).isFalse();
        assertThat(again.fingerprint()).isEqualTo(first.fingerprint());
        assertThat(again.certificate().getEncoded()).isEqualTo(first.certificate().getEncoded());

        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(tls))).isEqualTo("rwx------");
        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(tls.resolve("lan-certificate.p12"))))
                .isEqualTo("rw-------");
        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(
                tls.resolve("lan-certificate.password")))).isEqualTo("rw-------");
        try (var files = Files.list(tls)) {
            assertThat(files.map(p -> p.getFileName().toString()))
                    .containsExactlyInAnyOrder("lan-certificate.p12", "lan-certificate.password");
        }
    }

    @Test
    void itNamesTheMachinesHostNamesAndAddressesForServerUse(@TempDir Path dataDir) throws Exception {
        X509Certificate cert = LanCertificate.selfSigned(dataDir, NAMES, Clock.systemUTC()).certificate();
        List<String> alternatives = new ArrayList<>();
        for (List<?> entry : cert.getSubjectAlternativeNames()) {
            alternatives.add(entry.get(0) + "=" + entry.get(1));
        }
        // RFC 5280 4.2.1.6: dNSName is type 2, iPAddress type 7 (the JDK prints IPv6 in full form).
        assertThat(alternatives).contains("2=bench-pc", "2=bench-pc.harrowgate.lan", "7=192.168.10.7",
                "7=0:0:0:0:0:0:0:1");
        assertThat(cert.getExtendedKeyUsage()).containsExactly("1.3.6.1.5.5.7.3.1"); // id-kp-serverAuth, RFC 5280
        assertThat(cert.getBasicConstraints()).isEqualTo(-1); // not a CA
        assertThat(cert.getSubjectX500Principal().getName()).contains("CN=bench-pc");
        assertThat(cert.getPublicKey().getAlgorithm()).isEqualTo("EC");
    }

    @Test
    void anExpiredCertificateIsReplaced(@TempDir Path dataDir) {
        LanCertificate old = LanCertificate.selfSigned(dataDir, NAMES, Clock.systemUTC());
        Clock later = Clock.fixed(Instant.now().plus(LanCertificate.VALIDITY).plus(Duration.ofDays(2)), ZoneOffset.UTC);
        LanCertificate renewed = LanCertificate.selfSigned(dataDir, NAMES, later);
        assertThat(renewed.created()).isTrue();
        assertThat(renewed.fingerprint()).isNotEqualTo(old.fingerprint());
    }

    @Test
    void theFingerprintIsTheOneOpenSslComputes(@TempDir Path dataDir) throws Exception {
        LanCertificate cert = LanCertificate.selfSigned(dataDir, NAMES, Clock.systemUTC());
        Path der = dataDir.resolve("cert.der");
        Files.write(der, cert.certificate().getEncoded());
        Process openssl = new ProcessBuilder("openssl", "x509", "-inform", "DER", "-in", der.toString(), "-noout",
                "-fingerprint", "-sha256").redirectErrorStream(true).start();
        assertThat(openssl.waitFor(30, TimeUnit.SECONDS)).isTrue();
        String out = new String(openssl.getInputStream().readAllBytes()).strip();
        // e.g. "sha256 Fingerprint=AB:CD:..." (the prefix's case differs between OpenSSL versions)
        assertThat(out.substring(out.indexOf('=') + 1)).isEqualTo(cert.fingerprint());
        assertThat(cert.fingerprint()).matches("([0-9A-F]{2}:){31}[0-9A-F]{2}");
    }

    @Test
    void aShopsOwnKeystoreIsServedAsGiven(@TempDir Path dir) throws Exception {
        KeyStore own = LanCertificate.generate(List.of("shop-server.lan"), "shop-secret", Instant.now());
        Path file = dir.resolve("shop.p12");
        try (OutputStream out = Files.newOutputStream(file)) {
            own.store(out, "shop-secret".toCharArray());
        }
        LanCertificate loaded = LanCertificate.fromKeystore(file, "shop-secret");
        assertThat(loaded.fingerprint()).isEqualTo(LanCertificate.fingerprint(
                (X509Certificate) own.getCertificate(LanCertificate.ALIAS)));
        assertThatThrownBy(() -> LanCertificate.fromKeystore(file, "wrong"))
                .isInstanceOf(LanSetupException.class).hasMessageContaining("cannot be read");
        assertThatThrownBy(() -> LanCertificate.fromKeystore(dir.resolve("missing.p12"), "x"))
                .isInstanceOf(LanSetupException.class);
    }
}
