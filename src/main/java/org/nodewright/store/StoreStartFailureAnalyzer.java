package org.nodewright.store;

import java.sql.SQLException;
import org.springframework.boot.diagnostics.FailureAnalysis;
import org.springframework.boot.diagnostics.FailureAnalyzer;

/**
 * A data directory that cannot be opened at start-up (locked by another process, a damaged file,
 * a file of another H2 version, a store migrated by a newer Nodewright) ends the start with one
 * plain message and a non-zero exit, before the server listens: never a half-started server.
 */
public class StoreStartFailureAnalyzer implements FailureAnalyzer {

    // H2's error codes (org.h2.api.ErrorCode), named here so the driver stays a runtime dependency.
    static final int DATABASE_ALREADY_OPEN = 90020;
    static final int FILE_CORRUPTED = 90030;
    static final int FILE_VERSION_ERROR = 90048;
    static final int FILE_ENCRYPTION_ERROR = 90049;

    @Override
    public FailureAnalysis analyze(Throwable failure) {
        String newer = null;
        SQLException sql = null;
        for (Throwable c = failure; c != null; c = c.getCause()) {
            if (c.getClass().getName().startsWith("org.flywaydb") && c.getMessage() != null
                    && (c.getMessage().contains("not resolved locally") || c.getMessage().contains("newer than"))) {
                newer = c.getMessage();
            }
            if (c instanceof SQLException s && sql == null) {
                sql = s;
            }
        }
        if (newer != null) {
            return new FailureAnalysis("The store in the data directory was written by a newer version of Nodewright "
                    + "(its schema has migrations this version does not know).",
                    "Start the newer Nodewright on it again, or restore a backup taken with this version into a new "
                            + "folder (--app.restore=FILE --app.data-dir=NEW-FOLDER).", failure);
        }
        if (sql == null) {
            return null;
        }
        String message = sql.getMessage() == null ? "" : sql.getMessage();
        int code = sql.getErrorCode();
        if (code == DATABASE_ALREADY_OPEN || message.contains("already in use") || message.contains("is locked")) {
            return new FailureAnalysis("The store in the data directory is in use by another process (another "
                    + "Nodewright, or a database tool, has it open): " + firstLine(message),
                    "Stop the other process, or start this one with another --app.data-dir.", failure);
        }
        if (code == FILE_CORRUPTED || code == FILE_ENCRYPTION_ERROR || message.contains("corrupted")
                || message.contains("MVStoreException")) {
            return new FailureAnalysis("The store file in the data directory is damaged and cannot be opened: "
                    + firstLine(message),
                    "Keep the folder as it is for inspection, and restore the last good backup into a new, empty "
                            + "folder (--app.restore=FILE --app.data-dir=NEW-FOLDER).", failure);
        }
        if (code == FILE_VERSION_ERROR || message.contains("Unsupported database file version")) {
            return new FailureAnalysis("The store file in the data directory was written by another version of the "
                    + "embedded database and cannot be opened by this Nodewright: " + firstLine(message),
                    "Open it with the Nodewright that wrote it and take a backup, then restore that backup into a new "
                            + "folder with this version.", failure);
        }
        return new FailureAnalysis("The store cannot be opened: " + firstLine(message),
                "Check --app.data-dir (or the database settings of the postgres profile) and that this user may "
                        + "read and write there.", failure);
    }

    private static String firstLine(String s) {
        int nl = s.indexOf('\n');
        return nl < 0 ? s : s.substring(0, nl);
    }
}
