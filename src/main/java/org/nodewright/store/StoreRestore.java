package org.nodewright.store;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.sql.Types;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import org.flywaydb.core.Flyway;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * {@code --app.restore=FILE}: restores a backup file into an empty (or not yet existing) data
 * directory, then the program exits. A non-empty directory is refused, so that a restore never
 * mixes with or overwrites a live store. Every file is checked against the manifest's SHA-256 before
 * anything is written; the restored store is opened once to count its designs. An H2 backup becomes
 * the database file again; a table export (from PostgreSQL) is loaded into a new embedded store made
 * by the same Flyway migrations.
 */
public final class StoreRestore {

    /** Exit codes: done, refused (non-empty folder), unreadable or damaged backup. */
    public static final int DONE = 0;
    public static final int REFUSED = 2;
    public static final int DAMAGED = 3;

    static final String DB_FILE = "nodewright.mv.db";
    /** Tables of a table export that a restore does not load (Flyway writes its own; lock-outs are short-lived). */
    private static final Set<String> NOT_LOADED = Set.of("flyway_schema_history", "sign_in_counters");
    /** Loaded parents first, so that foreign keys hold at every insert. */
    private static final List<String> ORDER = List.of("accounts", "designs", "design_tags", "design_revisions",
            "audit_events", "app_settings");

    private final JsonMapper mapper = JsonMapper.builder().build();
    private final PrintStream out;

    public StoreRestore(PrintStream out) {
        this.out = out;
    }

    /** Restores {@code backup} into {@code dataDir}; one of the exit codes above. */
    public int restore(Path backup, Path dataDir) {
        dataDir = dataDir.toAbsolutePath().normalize();
        if (!Files.isRegularFile(backup)) {
            out.println("Restore refused: no backup file at " + backup.toAbsolutePath() + ".");
            return DAMAGED;
        }
        try {
            if (Files.exists(dataDir) && !isEmptyDirectory(dataDir)) {
                out.println("Restore refused: the data directory " + dataDir + " is not empty. A restore only "
                        + "goes into a new, empty folder; start Nodewright on that folder afterwards.");
                return REFUSED;
            }
        } catch (IOException e) {
            out.println("Restore refused: the data directory " + dataDir + " cannot be read: " + e.getMessage());
            return REFUSED;
        }
        boolean existed = Files.exists(dataDir);
        Path work = null;
        try {
            Files.createDirectories(dataDir);
            work = Files.createTempDirectory(dataDir, ".restore-");
            BackupManifest manifest = unpack(backup, work);
            String url = "jdbc:h2:file:" + dataDir.toString().replace('\\', '/') + "/nodewright";
            if (BackupManifest.H2_METHOD.equals(manifest.method())) {
                Files.move(work.resolve(StoreBackup.H2_DATA), dataDir.resolve(DB_FILE));
            } else if (BackupManifest.TABLE_METHOD.equals(manifest.method())) {
                loadTables(url, manifest, work);
            } else {
                throw new Damaged("the manifest names an unknown method '" + manifest.method() + "'");
            }
            StoreBackup.deleteTree(work);
            long designs = count(url, "designs");
            long revisions = count(url, "design_revisions");
            out.println("Restored the backup of " + manifest.createdAt() + " (" + manifest.store() + ", "
                    + manifest.method() + ") into " + dataDir + ": " + designs + " designs, " + revisions
                    + " revisions. Start Nodewright with --app.data-dir=" + dataDir + ".");
            return DONE;
        } catch (Damaged | IOException | SQLException | RuntimeException e) {
            if (work != null) {
                StoreBackup.deleteTree(work);
            }
            emptyAgain(dataDir, existed);
            out.println("Restore failed, nothing restored: " + e.getMessage());
            return DAMAGED;
        }
    }

    /** Extracts every entry into {@code work}, checking sizes and SHA-256 against the manifest. */
    private BackupManifest unpack(Path backup, Path work) throws IOException, Damaged {
        BackupManifest manifest = null;
        Map<String, Path> extracted = new HashMap<>();
        try (ZipInputStream zip = new ZipInputStream(Files.newInputStream(backup))) {
            for (ZipEntry e; (e = zip.getNextEntry()) != null; ) {
                String name = e.getName();
                if (name.equals(BackupManifest.ENTRY)) {
                    manifest = mapper.readValue(zip.readAllBytes(), BackupManifest.class);
                    continue;
                }
                Path target = work.resolve(name).normalize();
                if (!target.startsWith(work) || e.isDirectory()) {
                    throw new Damaged("the backup holds an unexpected entry '" + name + "'");
                }
                Files.createDirectories(target.getParent());
                Files.copy(zip, target);
                extracted.put(name, target);
            }
        } catch (java.util.zip.ZipException | tools.jackson.core.JacksonException e) {
            throw new Damaged("the file is not a readable Nodewright backup (" + e.getMessage() + ")");
        }
        if (manifest == null || !BackupManifest.FORMAT.equals(manifest.format())) {
            throw new Damaged("the file has no Nodewright backup manifest");
        }
        if (manifest.formatVersion() > BackupManifest.FORMAT_VERSION) {
            throw new Damaged("the backup was written by a newer Nodewright (format " + manifest.formatVersion() + ")");
        }
        for (BackupManifest.FileEntry f : manifest.files()) {
            Path p = extracted.get(f.path());
            if (p == null) {
                throw new Damaged("the backup lacks " + f.path() + ", which its manifest lists");
            }
            if (Files.size(p) != f.bytes() || !StoreBackup.sha256(p).equals(f.sha256())) {
                throw new Damaged(f.path() + " does not match its SHA-256 in the manifest (the file is damaged)");
            }
        }
        return manifest;
    }

    private void loadTables(String url, BackupManifest manifest, Path work) throws SQLException, IOException, Damaged {
        Flyway.configure().dataSource(url, "nodewright", "").locations("classpath:db/migration")
                .target(manifest.schemaVersion() == null || manifest.schemaVersion().isBlank() ? "latest"
                        : manifest.schemaVersion())
                .load().migrate();
        List<String> tables = new ArrayList<>();
        for (BackupManifest.FileEntry f : manifest.files()) {
            String table = f.path().substring(StoreBackup.TABLES.length(), f.path().length() - ".json".length());
            if (!NOT_LOADED.contains(table)) {
                tables.add(table);
            }
        }
        tables.sort((a, b) -> Integer.compare(rank(a), rank(b)));
        try (Connection c = DriverManager.getConnection(url, "nodewright", "")) {
            c.setAutoCommit(false);
            for (String table : tables) {
                load(c, table, mapper.readTree(work.resolve(StoreBackup.TABLES + table + ".json").toFile()));
            }
            c.commit();
        }
    }

    private static int rank(String table) {
        int i = ORDER.indexOf(table);
        return i < 0 ? ORDER.size() : i;
    }

    private static void load(Connection c, String table, JsonNode rows) throws SQLException, Damaged {
        Map<String, Integer> types = new HashMap<>();
        List<String> columns = new ArrayList<>();
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT * FROM " + table + " WHERE 1 = 0")) {
            ResultSetMetaData meta = rs.getMetaData();
            for (int i = 1; i <= meta.getColumnCount(); i++) {
                String name = meta.getColumnLabel(i).toLowerCase(java.util.Locale.ROOT);
                columns.add(name);
                types.put(name, meta.getColumnType(i));
            }
        } catch (SQLException e) {
            throw new Damaged("the backup holds a table '" + table + "' that this Nodewright does not know");
        }
        String sql = "INSERT INTO " + table + " (" + String.join(", ", columns) + ") VALUES ("
                + String.join(", ", columns.stream().map(x -> "?").toList()) + ")";
        long maxId = 0;
        try (PreparedStatement insert = c.prepareStatement(sql)) {
            for (JsonNode row : rows) {
                for (int i = 0; i < columns.size(); i++) {
                    JsonNode v = row.get(columns.get(i));
                    int type = types.get(columns.get(i));
                    if (v == null || v.isNull()) {
                        insert.setNull(i + 1, type);
                    } else if (type == Types.TIMESTAMP_WITH_TIMEZONE || type == Types.TIMESTAMP) {
                        insert.setObject(i + 1, OffsetDateTime.ofInstant(Instant.parse(v.asString()), ZoneOffset.UTC));
                    } else if (v.isBoolean()) {
                        insert.setBoolean(i + 1, v.asBoolean());
                    } else if (v.isIntegralNumber()) {
                        insert.setLong(i + 1, v.asLong());
                    } else if (v.isNumber()) {
                        insert.setDouble(i + 1, v.asDouble());
                    } else {
                        insert.setString(i + 1, v.asString());
                    }
                }
                if (row.has("id") && row.get("id").isIntegralNumber()) {
                    maxId = Math.max(maxId, row.get("id").asLong());
                }
                insert.addBatch();
            }
            insert.executeBatch();
        }
        if (columns.contains("id") && maxId > 0) {
            try (Statement s = c.createStatement()) {
                s.execute("ALTER TABLE " + table + " ALTER COLUMN id RESTART WITH " + (maxId + 1));
            }
        }
    }

    private static long count(String url, String table) throws SQLException {
        try (Connection c = DriverManager.getConnection(url + ";IFEXISTS=TRUE", "nodewright", "");
                Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM " + table)) {
            rs.next();
            return rs.getLong(1);
        }
    }

    static boolean isEmptyDirectory(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return false;
        }
        try (Stream<Path> entries = Files.list(dir)) {
            return entries.findAny().isEmpty();
        }
    }

    /** After a failed restore the folder is left as it was found: empty, or absent. */
    private static void emptyAgain(Path dataDir, boolean existed) {
        try (Stream<Path> entries = Files.list(dataDir)) {
            for (Iterator<Path> it = entries.iterator(); it.hasNext(); ) {
                StoreBackup.deleteTree(it.next());
            }
        } catch (IOException ignored) {
            // nothing more to do
        }
        if (!existed) {
            try {
                Files.deleteIfExists(dataDir);
            } catch (IOException ignored) {
                // left empty
            }
        }
    }

    /** The backup cannot be restored as it is. */
    static final class Damaged extends Exception {
        Damaged(String message) {
            super(message);
        }
    }

}
