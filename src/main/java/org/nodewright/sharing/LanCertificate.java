package org.nodewright.sharing;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.math.BigInteger;
import java.net.InetAddress;
import java.net.NetworkInterface;
import java.net.SocketException;
import java.net.UnknownHostException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.GeneralSecurityException;
import java.security.KeyPair;
import java.security.KeyPairGenerator;
import java.security.KeyStore;
import java.security.MessageDigest;
import java.security.SecureRandom;
import java.security.cert.Certificate;
import java.security.cert.X509Certificate;
import java.security.spec.ECGenParameterSpec;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Base64;
import java.util.Collections;
import java.util.Date;
import java.util.HexFormat;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.bouncycastle.asn1.x500.X500Name;
import org.bouncycastle.asn1.x509.BasicConstraints;
import org.bouncycastle.asn1.x509.ExtendedKeyUsage;
import org.bouncycastle.asn1.x509.Extension;
import org.bouncycastle.asn1.x509.GeneralName;
import org.bouncycastle.asn1.x509.GeneralNames;
import org.bouncycastle.asn1.x509.KeyPurposeId;
import org.bouncycastle.asn1.x509.KeyUsage;
import org.bouncycastle.cert.X509v3CertificateBuilder;
import org.bouncycastle.cert.jcajce.JcaX509CertificateConverter;
import org.bouncycastle.cert.jcajce.JcaX509v3CertificateBuilder;
import org.bouncycastle.operator.OperatorCreationException;
import org.bouncycastle.operator.jcajce.JcaContentSignerBuilder;

/**
 * The TLS key and certificate of LAN mode: either the shop's own PKCS#12 keystore, or a
 * self-signed certificate made on the first LAN start for this machine's host names and
 * addresses, kept under {@code <data-dir>/tls} (owner-only permissions) and reused on every later
 * start. Certificates are built with Bouncy Castle; the key is an ECDSA P-256 key (FIPS 186-4),
 * which every current browser and the JDK accept.
 */
final class LanCertificate {

    static final String ALIAS = "nodewright-lan";
    static final String KEYSTORE_FILE = "lan-certificate.p12";
    static final String PASSWORD_FILE = "lan-certificate.password";
    /** Long enough that a shop does not re-check a fingerprint every year; browsers do not limit self-signed ones. */
    static final Duration VALIDITY = Duration.ofDays(5 * 365);

    private final KeyStore keyStore;
    private final String password;
    private final String alias;
    private final X509Certificate certificate;
    private final Path file;
    private final boolean created;

    private LanCertificate(KeyStore keyStore, String password, String alias, Path file, boolean created)
            throws GeneralSecurityException {
        this.keyStore = keyStore;
        this.password = password;
        this.alias = alias;
        this.certificate = (X509Certificate) keyStore.getCertificate(alias);
        this.file = file;
        this.created = created;
    }

    /** The shop's own PKCS#12 file: its first key entry is served. */
    static LanCertificate fromKeystore(Path file, String password) {
        char[] secret = password == null ? new char[0] : password.toCharArray();
        try (InputStream in = Files.newInputStream(file)) {
            KeyStore ks = KeyStore.getInstance("PKCS12");
            ks.load(in, secret);
            for (String a : Collections.list(ks.aliases())) {
                if (ks.isKeyEntry(a) && ks.getCertificate(a) instanceof X509Certificate) {
                    return new LanCertificate(ks, password == null ? "" : password, a, file, false);
                }
            }
            throw new LanSetupException("The keystore " + file + " holds no private key with an X.509 certificate.",
                    "Give a PKCS#12 file with the server's key and certificate (app.sharing.keystore).");
        } catch (IOException | GeneralSecurityException e) {
            throw new LanSetupException("The keystore " + file + " cannot be read: " + e.getMessage(),
                    "Check the path given as app.sharing.keystore and its app.sharing.keystore-password.");
        }
    }

    /**
     * The certificate kept in {@code dir}, or a new self-signed one for {@code names} written there
     * when there is none yet (or the kept one has expired).
     */
    static LanCertificate selfSigned(Path dir, List<String> names, Clock clock) {
        Path store = dir.resolve(KEYSTORE_FILE);
        Path secretFile = dir.resolve(PASSWORD_FILE);
        try {
            if (Files.isRegularFile(store) && Files.isRegularFile(secretFile)) {
                String secret = Files.readString(secretFile, StandardCharsets.UTF_8).strip();
                LanCertificate kept = load(store, secret);
                if (kept.certificate.getNotAfter().toInstant().isAfter(clock.instant())) {
                    return kept;
                }
            }
            Files.createDirectories(dir);
            ownerOnly(dir, true);
            String secret = randomSecret();
            KeyStore ks = generate(names, secret, clock.instant());
            Path tmp = Files.createTempFile(dir, "lan-", ".tmp");
            ownerOnly(tmp, false);
            try (OutputStream out = Files.newOutputStream(tmp)) {
                ks.store(out, secret.toCharArray());
            }
            Path tmpSecret = Files.createTempFile(dir, "lan-", ".tmp");
            ownerOnly(tmpSecret, false);
            Files.writeString(tmpSecret, secret + "\n", StandardCharsets.UTF_8);
            move(tmp, store);
            move(tmpSecret, secretFile);
            return new LanCertificate(ks, secret, ALIAS, store, true);
        } catch (IOException | GeneralSecurityException | OperatorCreationException e) {
            throw new LanSetupException("The LAN certificate under " + dir + " cannot be made or read: "
                    + e.getMessage(), "Check that the data directory is writable by this user, or give a keystore "
                    + "with app.sharing.keystore.");
        }
    }

    private static LanCertificate load(Path store, String secret) throws IOException, GeneralSecurityException {
        try (InputStream in = Files.newInputStream(store)) {
            KeyStore ks = KeyStore.getInstance("PKCS12");
            ks.load(in, secret.toCharArray());
            if (!ks.isKeyEntry(ALIAS)) {
                throw new GeneralSecurityException("no key entry '" + ALIAS + "' in " + store);
            }
            return new LanCertificate(ks, secret, ALIAS, store, false);
        }
    }

    static KeyStore generate(List<String> names, String secret, Instant now)
            throws GeneralSecurityException, OperatorCreationException, IOException {
        KeyPairGenerator generator = KeyPairGenerator.getInstance("EC");
        generator.initialize(new ECGenParameterSpec("secp256r1"));
        KeyPair pair = generator.generateKeyPair();
        String commonName = names.isEmpty() ? "localhost" : names.get(0);
        X500Name subject = new X500Name("CN=" + commonName.replaceAll("[,=+<>#;\"\\\\]", "_")
                + ",O=Nodewright shop server (self-signed)");
        // RFC 5280 4.1.2.2: a positive serial of at most 20 octets; 16 random bytes (common practice).
        BigInteger serial = new BigInteger(1, new SecureRandom().generateSeed(16)).setBit(0);
        X509v3CertificateBuilder builder = new JcaX509v3CertificateBuilder(subject, serial,
                Date.from(now.minus(Duration.ofHours(1))), Date.from(now.plus(VALIDITY)), subject, pair.getPublic());
        List<GeneralName> alternatives = new ArrayList<>();
        for (String name : names) {
            alternatives.add(isAddress(name) ? new GeneralName(GeneralName.iPAddress, name)
                    : new GeneralName(GeneralName.dNSName, name));
        }
        builder.addExtension(Extension.subjectAlternativeName, false,
                new GeneralNames(alternatives.toArray(GeneralName[]::new)));
        builder.addExtension(Extension.basicConstraints, true, new BasicConstraints(false));
        builder.addExtension(Extension.keyUsage, true, new KeyUsage(KeyUsage.digitalSignature));
        builder.addExtension(Extension.extendedKeyUsage, false, new ExtendedKeyUsage(KeyPurposeId.id_kp_serverAuth));
        X509Certificate cert = new JcaX509CertificateConverter()
                .getCertificate(builder.build(new JcaContentSignerBuilder("SHA256withECDSA").build(pair.getPrivate())));
        KeyStore ks = KeyStore.getInstance("PKCS12");
        ks.load(null, null);
        ks.setKeyEntry(ALIAS, pair.getPrivate(), secret.toCharArray(), new Certificate[] {cert});
        return ks;
    }

    /** This machine's host names and addresses (loopback included), host names first. */
    static List<String> machineNames() {
        Set<String> hosts = new LinkedHashSet<>();
        Set<String> addresses = new LinkedHashSet<>();
        try {
            InetAddress local = InetAddress.getLocalHost();
            hosts.add(local.getHostName().toLowerCase(Locale.ROOT));
            hosts.add(local.getCanonicalHostName().toLowerCase(Locale.ROOT));
        } catch (UnknownHostException e) {
            // no name for this machine: addresses only
        }
        hosts.add("localhost");
        try {
            for (NetworkInterface ni : Collections.list(NetworkInterface.getNetworkInterfaces())) {
                for (InetAddress a : Collections.list(ni.getInetAddresses())) {
                    String text = a.getHostAddress();
                    int zone = text.indexOf('%');
                    addresses.add(zone < 0 ? text : text.substring(0, zone));
                }
            }
        } catch (SocketException e) {
            // no interface list: the loopback addresses below still go in
        }
        addresses.add("127.0.0.1");
        addresses.add("::1");
        List<String> out = new ArrayList<>();
        hosts.stream().filter(h -> !h.isBlank() && !isAddress(h)).forEach(out::add);
        addresses.stream().filter(a -> !out.contains(a)).forEach(out::add);
        return out;
    }

    static boolean isAddress(String name) {
        return name.matches("[0-9.]+") || name.contains(":");
    }

    /** SHA-256 over the DER certificate, as browsers show it: upper-case hex pairs joined by colons. */
    static String fingerprint(X509Certificate cert) {
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(cert.getEncoded());
            return HexFormat.ofDelimiter(":").withUpperCase().formatHex(digest);
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("SHA-256 is missing from this JDK", e);
        }
    }

    String fingerprint() {
        return fingerprint(certificate);
    }

    KeyStore keyStore() {
        return keyStore;
    }

    String password() {
        return password;
    }

    String alias() {
        return alias;
    }

    X509Certificate certificate() {
        return certificate;
    }

    Path file() {
        return file;
    }

    boolean created() {
        return created;
    }

    boolean selfSigned() {
        return certificate.getSubjectX500Principal().equals(certificate.getIssuerX500Principal());
    }

    private static String randomSecret() {
        byte[] bytes = new byte[24];
        new SecureRandom().nextBytes(bytes);
        return Base64.getUrlEncoder().withoutPadding().encodeToString(bytes);
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** rwx------ for the folder, rw------- for the files, where the file system has POSIX permissions. */
    static void ownerOnly(Path path, boolean directory) throws IOException {
        if (!Files.getFileStore(path).supportsFileAttributeView("posix")) {
            return;
        }
        Set<PosixFilePermission> perms = PosixFilePermissions.fromString(directory ? "rwx------" : "rw-------");
        Files.setPosixFilePermissions(path, perms);
    }
}
