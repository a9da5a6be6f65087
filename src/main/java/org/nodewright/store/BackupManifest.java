package org.nodewright.store;

import java.time.Instant;
import java.util.List;
import java.util.Map;

/**
 * {@code manifest.json}, the first entry of a backup file: what it holds and how it was taken.
 * {@code method} is {@code h2-online-backup} (H2's {@code BACKUP TO}, a transactionally consistent
 * copy of the database file taken while the server serves) or {@code table-export} (PostgreSQL:
 * the app's own export of every table, read in one REPEATABLE READ transaction, so one snapshot).
 * Each file carries its size and SHA-256; {@code rows} counts the rows of each table where the
 * method knows them exactly.
 */
public record BackupManifest(String format, int formatVersion, Instant createdAt, String store, String method,
        String schemaVersion, List<FileEntry> files, Map<String, Long> rows) {

    public static final String FORMAT = "nodewright-backup";
    public static final int FORMAT_VERSION = 1;
    public static final String ENTRY = "manifest.json";
    public static final String H2_METHOD = "h2-online-backup";
    public static final String TABLE_METHOD = "table-export";

    public record FileEntry(String path, long bytes, String sha256) {
    }
}
