package org.nodewright.sharing;

import java.io.InputStream;
import java.net.http.HttpClient;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.KeyStore;
import java.security.cert.Certificate;
import java.time.Duration;
import javax.net.ssl.SSLContext;
import javax.net.ssl.TrustManagerFactory;

/**
 * HTTP clients for tests of LAN mode that trust exactly the certificate kept in a data directory
 * (nothing else), so that a TLS handshake also proves the server serves that certificate.
 */
final class LanTestTls {

    private LanTestTls() {
    }

    static Certificate keptCertificate(Path dataDir) throws Exception {
        Path tls = dataDir.resolve(LanTlsConfig.TLS_DIR);
        String secret = Files.readString(tls.resolve(LanCertificate.PASSWORD_FILE), StandardCharsets.UTF_8).strip();
        KeyStore ks = KeyStore.getInstance("PKCS12");
        try (InputStream in = Files.newInputStream(tls.resolve(LanCertificate.KEYSTORE_FILE))) {
            ks.load(in, secret.toCharArray());
        }
        return ks.getCertificate(LanCertificate.ALIAS);
    }

    static HttpClient trusting(Certificate certificate) throws Exception {
        KeyStore trust = KeyStore.getInstance("PKCS12");
        trust.load(null, null);
        trust.setCertificateEntry("server", certificate);
        TrustManagerFactory tmf = TrustManagerFactory.getInstance(TrustManagerFactory.getDefaultAlgorithm());
        tmf.init(trust);
        SSLContext ssl = SSLContext.getInstance("TLS");
        ssl.init(null, tmf.getTrustManagers(), null);
        return HttpClient.newBuilder().sslContext(ssl).connectTimeout(Duration.ofSeconds(5)).build();
    }

    static HttpClient trustingKept(Path dataDir) throws Exception {
        return trusting(keptCertificate(dataDir));
    }
}
