package org.nodewright.store;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.sql.Connection;
import java.sql.DatabaseMetaData;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import javax.sql.DataSource;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.jdbc.datasource.DataSourceUtils;
import org.springframework.stereotype.Service;
import tools.jackson.core.JsonGenerator;
import tools.jackson.databind.json.JsonMapper;

/**
 * A consistent snapshot of the whole store as one zip file: {@code manifest.json} first, then the
 * data, each file with its SHA-256 in the manifest. On H2 the data is H2's own online backup
 * ({@code BACKUP TO}) of the database file, taken while other requests keep reading and writing; on
 * PostgreSQL it is the app's own export of every table of the schema as JSON, read in one
 * read-only REPEATABLE READ transaction (one snapshot of the database).
 */
@Service
public class StoreBackup {

    static final String H2_DATA = "h2/nodewright.mv.db";
    static final String TABLES = "tables/";

    private final DataSource dataSource;
    private final JsonMapper mapper;
    private final Path dataDir;
    private final String method;

    /** {@code app.backup.method}: {@code auto} (H2's online backup on H2, the table export elsewhere) or {@code table-export}. */
    StoreBackup(DataSource dataSource, JsonMapper mapper, @Value("${app.data-dir.absolute}") String dataDir,
            @Value("${app.backup.method:auto}") String method) {
        if (!method.equals("auto") && !method.equals(BackupManifest.TABLE_METHOD)) {
            throw new IllegalArgumentException("app.backup.method must be auto or table-export, was " + method);
        }
        this.dataSource = dataSource;
        this.mapper = mapper;
        this.dataDir = Path.of(dataDir);
        this.method = method;
    }

    /** Writes a backup to {@code target} (through a temporary file beside it); its manifest. */
    public BackupManifest writeTo(Path target) throws IOException, SQLException {
        Path work = Files.createTempDirectory(target.toAbsolutePath().getParent(), ".backup-");
        try {
            Instant now = Instant.now().truncatedTo(ChronoUnit.MILLIS);
            Map<String, Path> files = new LinkedHashMap<>();
            Map<String, Long> rows = new LinkedHashMap<>();
            String store;
            String method;
            String schema;
            Connection c = DataSourceUtils.getConnection(dataSource);
            try {
                store = c.getMetaData().getDatabaseProductName().toLowerCase(Locale.ROOT).contains("h2")
                        ? "h2" : "postgresql";
                schema = schemaVersion(c);
                if (store.equals("h2") && this.method.equals("auto")) {
                    method = BackupManifest.H2_METHOD;
                    files.put(H2_DATA, h2OnlineBackup(c, work));
                } else {
                    method = BackupManifest.TABLE_METHOD;
                    exportTables(c, work, files, rows);
                }
            } finally {
                DataSourceUtils.releaseConnection(c, dataSource);
            }
            List<BackupManifest.FileEntry> entries = new ArrayList<>();
            for (Map.Entry<String, Path> f : files.entrySet()) {
                entries.add(new BackupManifest.FileEntry(f.getKey(), Files.size(f.getValue()), sha256(f.getValue())));
            }
            BackupManifest manifest = new BackupManifest(BackupManifest.FORMAT, BackupManifest.FORMAT_VERSION, now,
                    store, method, schema, entries, rows);
            Path tmp = work.resolve("backup.zip");
            try (ZipOutputStream zip = new ZipOutputStream(Files.newOutputStream(tmp))) {
                zip.putNextEntry(new ZipEntry(BackupManifest.ENTRY));
                zip.write(mapper.writerWithDefaultPrettyPrinter().writeValueAsBytes(manifest));
                zip.closeEntry();
                for (Map.Entry<String, Path> f : files.entrySet()) {
                    zip.putNextEntry(new ZipEntry(f.getKey()));
                    Files.copy(f.getValue(), zip);
                    zip.closeEntry();
                }
            }
            Files.move(tmp, target, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            return manifest;
        } finally {
            deleteTree(work);
        }
    }

    /** A temporary folder for backups served over HTTP (under the data directory, so on the same disk). */
    Path scratch() throws IOException {
        Path dir = dataDir.resolve("backup-scratch");
        Files.createDirectories(dir);
        return dir;
    }

    /** H2's BACKUP TO writes a zip holding the database file; the file is taken out of it. */
    private static Path h2OnlineBackup(Connection c, Path work) throws SQLException, IOException {
        Path zip = work.resolve("h2-backup.zip");
        try (Statement s = c.createStatement()) {
            s.execute("BACKUP TO '" + zip.toString().replace("'", "''") + "'");
        }
        Path out = work.resolve("nodewright.mv.db");
        try (ZipInputStream in = new ZipInputStream(Files.newInputStream(zip))) {
            for (ZipEntry e; (e = in.getNextEntry()) != null; ) {
                if (e.getName().endsWith(".mv.db")) {
                    Files.copy(in, out);
                    return out;
                }
            }
        }
        throw new IOException("H2's backup held no database file");
    }

    private void exportTables(Connection c, Path work, Map<String, Path> files, Map<String, Long> rows)
            throws SQLException, IOException {
        boolean auto = c.getAutoCommit();
        int isolation = c.getTransactionIsolation();
        boolean readOnly = c.isReadOnly();
        try {
            c.setAutoCommit(false);
            c.setTransactionIsolation(Connection.TRANSACTION_REPEATABLE_READ);
            c.setReadOnly(true);
            for (String table : tables(c)) {
                // Named in lower case whatever the database's own case (H2 keeps unquoted names upper-case).
                String name = table.toLowerCase(Locale.ROOT);
                Path file = work.resolve(name + ".json");
                rows.put(name, exportTable(c, table, file));
                files.put(TABLES + name + ".json", file);
            }
            c.commit();
        } finally {
            c.setAutoCommit(auto);
            c.setTransactionIsolation(isolation);
            c.setReadOnly(readOnly);
        }
    }

    /** Every table of the schema the app uses (the store's tables and Flyway's history). */
    static List<String> tables(Connection c) throws SQLException {
        List<String> out = new ArrayList<>();
        DatabaseMetaData meta = c.getMetaData();
        try (ResultSet rs = meta.getTables(c.getCatalog(), c.getSchema(), "%", new String[] {"TABLE"})) {
            while (rs.next()) {
                out.add(rs.getString("TABLE_NAME"));
            }
        }
        out.sort(String::compareTo);
        return out;
    }

    /** One table as a JSON array of rows ({@code {column: value}}); the number of rows. */
    private long exportTable(Connection c, String table, Path file) throws SQLException, IOException {
        long n = 0;
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT * FROM \"" + table.replace("\"", "\"\"") + "\"");
                OutputStream out = Files.newOutputStream(file);
                JsonGenerator json = mapper.createGenerator(out)) {
            ResultSetMetaData meta = rs.getMetaData();
            json.writeStartArray();
            while (rs.next()) {
                json.writeStartObject();
                for (int i = 1; i <= meta.getColumnCount(); i++) {
                    json.writeName(meta.getColumnLabel(i).toLowerCase(Locale.ROOT));
                    Object v = rs.getObject(i);
                    if (v == null) {
                        json.writeNull();
                    } else if (v instanceof Number num && !(v instanceof java.math.BigDecimal)) {
                        json.writeNumber(num.longValue() == num.doubleValue() ? Long.toString(num.longValue())
                                : num.toString());
                    } else if (v instanceof Boolean b) {
                        json.writeBoolean(b);
                    } else if (v instanceof java.sql.Timestamp t) {
                        json.writeString(t.toInstant().toString());
                    } else if (v instanceof java.time.OffsetDateTime t) {
                        json.writeString(t.toInstant().toString());
                    } else {
                        json.writeString(rs.getString(i));
                    }
                }
                json.writeEndObject();
                n++;
            }
            json.writeEndArray();
        }
        return n;
    }

    private static String schemaVersion(Connection c) {
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT \"version\" FROM \"flyway_schema_history\" WHERE \"success\" = TRUE"
                        + " ORDER BY \"installed_rank\" DESC")) {
            return rs.next() ? rs.getString(1) : "";
        } catch (SQLException e) {
            return "";
        }
    }

    static String sha256(Path file) throws IOException {
        try (InputStream in = new DigestInputStream(Files.newInputStream(file), MessageDigest.getInstance("SHA-256"))) {
            in.transferTo(OutputStream.nullOutputStream());
            return HexFormat.of().formatHex(((DigestInputStream) in).getMessageDigest().digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is missing from this JDK", e);
        }
    }

    static void deleteTree(Path dir) {
        if (!Files.exists(dir)) {
            return;
        }
        try (var walk = Files.walk(dir)) {
            walk.sorted(java.util.Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException ignored) {
                    // best effort for a temporary folder
                }
            });
        } catch (IOException ignored) {
            // best effort
        }
    }
}
