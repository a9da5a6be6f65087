package org.nodewright.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;
import org.nodewright.audit.AuditAction;
import org.nodewright.audit.AuditTrail;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.scheduling.annotation.Scheduled;
import org.springframework.stereotype.Component;

/**
 * Scheduled backups: with {@code app.backup.dir=FOLDER} and {@code app.backup.cron} (Spring's
 * six-field cron, e.g. {@code 0 30 2 * * *} for 02:30 every night) a backup file lands in the
 * folder, and only the newest {@code app.backup.keep} (default 7) are kept. Off unless both are set.
 */
@Component
class ScheduledBackups {

    static final String PREFIX = "nodewright-backup-";
    private static final Logger log = LoggerFactory.getLogger(ScheduledBackups.class);

    private final StoreBackup backup;
    private final AuditTrail audit;
    private final String dir;
    private final int keep;

    ScheduledBackups(StoreBackup backup, AuditTrail audit, @Value("${app.backup.dir:}") String dir,
            @Value("${app.backup.keep:7}") int keep) {
        if (keep < 1) {
            throw new IllegalArgumentException("app.backup.keep must be at least 1, was " + keep);
        }
        this.backup = backup;
        this.audit = audit;
        this.dir = dir;
        this.keep = keep;
    }

    @Scheduled(cron = "${app.backup.cron:-}")
    void nightly() {
        if (dir == null || dir.isBlank()) {
            log.warn("app.backup.cron is set but app.backup.dir is not: no scheduled backup written.");
            return;
        }
        try {
            Path written = takeInto(Path.of(dir));
            log.info("Scheduled backup written: {}", written);
        } catch (IOException | java.sql.SQLException | RuntimeException e) {
            log.error("Scheduled backup into {} failed: {}", dir, e.getMessage());
            audit.record("scheduler", AuditAction.BACKUP_FAILED, "scheduled into " + dir + ": " + e.getMessage(), "");
        }
    }

    /** Writes one backup into {@code folder} and keeps the newest {@code keep}; the new file. */
    Path takeInto(Path folder) throws IOException, java.sql.SQLException {
        Files.createDirectories(folder);
        Path tmp = Files.createTempFile(folder, ".partial-", ".zip");
        BackupManifest manifest;
        try {
            manifest = backup.writeTo(tmp);
        } catch (IOException | java.sql.SQLException | RuntimeException e) {
            Files.deleteIfExists(tmp);
            throw e;
        }
        Path target = folder.resolve(PREFIX + BackupController.STAMP.format(manifest.createdAt()) + ".zip");
        Files.move(tmp, target, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        audit.record("scheduler", AuditAction.BACKUP_TAKEN, "scheduled " + target + " (" + Files.size(target)
                + " bytes)", "");
        prune(folder);
        return target;
    }

    private void prune(Path folder) throws IOException {
        List<Path> backups;
        try (Stream<Path> files = Files.list(folder)) {
            backups = files.filter(p -> p.getFileName().toString().startsWith(PREFIX)
                    && p.getFileName().toString().endsWith(".zip"))
                    .sorted(Comparator.comparing((Path p) -> p.getFileName().toString()).reversed()).toList();
        }
        for (Path old : backups.subList(Math.min(keep, backups.size()), backups.size())) {
            Files.deleteIfExists(old);
        }
    }
}
