package org.nodewright.store;

import java.io.IOException;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.http.HttpStatus;
import org.springframework.http.ProblemDetail;
import org.springframework.stereotype.Component;
import org.springframework.util.unit.DataSize;
import org.springframework.web.ErrorResponseException;

/**
 * Refuses writes while the disk of the data directory has less than {@code app.store.min-free-space}
 * (default 64 MB) left, with a 507 problem document: a full disk must never half-write a design.
 * Whatever was acknowledged before stays in the store (H2 commits each write to its file first).
 */
@Component
public class DiskSpace {

    private final Path dataDir;
    private final DataSize minFree;

    DiskSpace(@Value("${app.data-dir.absolute}") String dataDir,
            @Value("${app.store.min-free-space:64MB}") DataSize minFree) {
        this.dataDir = Path.of(dataDir);
        this.minFree = minFree;
    }

    /** Throws the 507 problem when there is too little room left to write safely. */
    public void requireRoomToWrite() {
        long usable;
        try {
            usable = Files.getFileStore(dataDir).getUsableSpace();
        } catch (IOException e) {
            return; // cannot tell: the database itself will refuse if it cannot write
        }
        if (usable < minFree.toBytes()) {
            throw full("Only " + (usable / (1024 * 1024)) + " MB are left on the disk of the data directory (at least "
                    + minFree.toMegabytes() + " MB are kept free). Nothing was written; free some space and save again.");
        }
    }

    /** The problem document for a store that cannot take a write for lack of room. */
    public static ErrorResponseException full(String detail) {
        ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.INSUFFICIENT_STORAGE, detail);
        pd.setTitle("Disk full");
        pd.setType(URI.create("urn:nodewright:problem:disk-full"));
        return new ErrorResponseException(HttpStatus.INSUFFICIENT_STORAGE, pd, null);
    }

    /** Whether a failure comes from a disk that is full (the JDK's and H2's words for it). */
    public static boolean isDiskFull(Throwable t) {
        for (Throwable c = t; c != null; c = c.getCause()) {
            String m = c.getMessage();
            if (m != null && (m.contains("No space left on device") || m.contains("There is not enough space")
                    || m.contains("Disk quota exceeded"))) {
                return true;
            }
            if (c instanceof java.sql.SQLException sql && sql.getErrorCode() == 90100) { // H2 NO_DISK_SPACE_AVAILABLE
                return true;
            }
        }
        return false;
    }
}
