package org.nodewright.store;

import jakarta.servlet.http.HttpServletRequest;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.Principal;
import java.sql.SQLException;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import org.nodewright.audit.AuditAction;
import org.nodewright.audit.AuditTrail;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.servlet.mvc.method.annotation.StreamingResponseBody;

/**
 * {@code GET /api/v1/backup} (admin in LAN mode): a consistent snapshot of the whole store as one zip
 * file ({@link StoreBackup}), taken while the server keeps serving. Restore it with
 * {@code --app.restore=FILE} into an empty data directory.
 */
@RestController
class BackupController {

    static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss").withZone(ZoneOffset.UTC);

    private final StoreBackup backup;
    private final AuditTrail audit;

    BackupController(StoreBackup backup, AuditTrail audit) {
        this.backup = backup;
        this.audit = audit;
    }

    @GetMapping("/api/v1/backup")
    ResponseEntity<StreamingResponseBody> download(Principal who, HttpServletRequest request)
            throws IOException, SQLException {
        String by = who == null ? "local" : who.getName();
        Path file = Files.createTempFile(backup.scratch(), "backup-", ".zip");
        BackupManifest manifest;
        try {
            manifest = backup.writeTo(file);
        } catch (IOException | SQLException | RuntimeException e) {
            Files.deleteIfExists(file);
            audit.record(by, AuditAction.BACKUP_FAILED, "download: " + e.getMessage());
            throw e;
        }
        String name = "nodewright-backup-" + STAMP.format(manifest.createdAt()) + ".zip";
        audit.record(by, AuditAction.BACKUP_TAKEN, "download " + name + " (" + Files.size(file) + " bytes, "
                + manifest.method() + ")");
        StreamingResponseBody body = out -> {
            try (InputStream in = Files.newInputStream(file)) {
                in.transferTo(out);
            } finally {
                Files.deleteIfExists(file);
            }
        };
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, ContentDisposition.attachment().filename(name).build().toString())
                .contentLength(Files.size(file))
                .contentType(MediaType.parseMediaType("application/zip"))
                .body(body);
    }
}
