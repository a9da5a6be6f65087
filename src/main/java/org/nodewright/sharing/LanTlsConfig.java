package org.nodewright.sharing;

import java.nio.file.Path;
import java.time.Clock;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.boot.autoconfigure.condition.ConditionalOnProperty;
import org.springframework.boot.autoconfigure.ssl.SslBundleRegistrar;
import org.springframework.boot.ssl.SslBundle;
import org.springframework.boot.ssl.SslBundleKey;
import org.springframework.boot.ssl.SslStoreBundle;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/**
 * HTTPS for LAN mode through Spring Boot's SSL bundles: the bundle {@value #BUNDLE} (which
 * {@link LanBindAddress} names as {@code server.ssl.bundle}) serves the shop's keystore or the kept
 * self-signed certificate. The certificate's SHA-256 fingerprint is logged at every start.
 */
@Configuration(proxyBeanMethods = false)
@ConditionalOnProperty(name = "app.sharing.lan", havingValue = "true")
class LanTlsConfig {

    static final String BUNDLE = "nodewright-lan";
    static final String TLS_DIR = "tls";
    private static final Logger log = LoggerFactory.getLogger(LanTlsConfig.class);

    @Bean
    LanCertificate lanCertificate(SharingProperties properties, @Value("${app.data-dir.absolute}") String dataDir) {
        LanCertificate cert;
        if (properties.hasKeystore()) {
            cert = LanCertificate.fromKeystore(Path.of(properties.keystore()), properties.keystorePassword());
            log.info("LAN mode: serving HTTPS with the keystore {} (certificate {}).", cert.file(),
                    cert.certificate().getSubjectX500Principal().getName());
        } else {
            cert = LanCertificate.selfSigned(Path.of(dataDir, TLS_DIR), LanCertificate.machineNames(),
                    Clock.systemUTC());
            log.info("LAN mode: serving HTTPS with the {} self-signed certificate {}.",
                    cert.created() ? "newly made" : "kept", cert.file());
        }
        log.info("LAN mode: certificate SHA-256 fingerprint {} -- colleagues compare it once with what their "
                + "browser shows for this server.", cert.fingerprint());
        return cert;
    }

    @Bean
    SslBundleRegistrar lanSslBundle(LanCertificate certificate) {
        return registry -> registry.registerBundle(BUNDLE, SslBundle.of(
                SslStoreBundle.of(certificate.keyStore(), certificate.password(), null),
                SslBundleKey.of(certificate.password(), certificate.alias())));
    }
}
