package org.nodewright.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nodewright.NodewrightWebTest;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Backups of the H2 store while it serves, and restores into an empty folder: the manifest's
 * checksums (checked here with the JDK's SHA-256), every design acknowledged before the backup
 * back after a restore, refusals of a non-empty folder and of a damaged file.
 */
@NodewrightWebTest
class BackupRestoreTest {

    @Autowired
    MockMvc mvc;
    @Autowired
    JsonMapper mapper;
    @Autowired
    StoreBackup backup;

    private long save(String name) throws Exception {
        MvcResult r = mvc.perform(post("/api/v1/designs").contentType(MediaType.APPLICATION_JSON)
                        .content("{\"name\":\"" + name + "\",\"kind\":\"string\",\"tags\":[\"backup\"],\"parameters\":"
                                + "{\"lengthMm\":650.0,\"tensionN\":70.0,\"material\":\"plain-steel\",\"diameterMm\":0.30}}"))
                .andExpect(status().isCreated()).andReturn();
        return mapper.readTree(r.getResponse().getContentAsString()).get("id").asLong();
    }

    private byte[] download() throws Exception {
        MvcResult r = mvc.perform(get("/api/v1/backup")).andExpect(status().isOk()).andReturn();
        if (r.getRequest().isAsyncStarted()) {
            r = mvc.perform(org.springframework.test.web.servlet.request.MockMvcRequestBuilders.asyncDispatch(r))
                    .andExpect(status().isOk()).andReturn();
        }
        assertThat(r.getResponse().getHeader("Content-Disposition")).contains("nodewright-backup-").contains(".zip");
        return r.getResponse().getContentAsByteArray();
    }

    private static Map<String, byte[]> entries(byte[] zip) throws Exception {
        Map<String, byte[]> out = new java.util.LinkedHashMap<>();
        try (ZipInputStream in = new ZipInputStream(new java.io.ByteArrayInputStream(zip))) {
            for (ZipEntry e; (e = in.getNextEntry()) != null; ) {
                out.put(e.getName(), in.readAllBytes());
            }
        }
        return out;
    }

    private static Map<Long, String> designsIn(Path dataDir) throws Exception {
        Map<Long, String> out = new HashMap<>();
        try (Connection c = DriverManager.getConnection("jdbc:h2:file:" + dataDir.toString().replace('\\', '/')
                + "/nodewright;IFEXISTS=TRUE", "nodewright", "");
                ResultSet rs = c.createStatement().executeQuery("SELECT id, name FROM designs")) {
            while (rs.next()) {
                out.put(rs.getLong(1), rs.getString(2));
            }
        }
        return out;
    }

    /** Restores a backup into {@code into}; the backup file is written beside it (in the test's own folder). */
    private static int restore(byte[] zip, Path into) throws Exception {
        Path file = into.resolveSibling(into.getFileName() + ".zip");
        Files.write(file, zip);
        ByteArrayOutputStream said = new ByteArrayOutputStream();
        int code = new StoreRestore(new PrintStream(said, true, StandardCharsets.UTF_8)).restore(file, into);
        return code;
    }

    @Test
    void theBackupIsOneZipWithAManifestWhoseChecksumsHold() throws Exception {
        save("Harrowgate backup check");
        Map<String, byte[]> zip = entries(download());
        assertThat(zip.keySet().iterator().next()).isEqualTo("manifest.json");
        JsonNode manifest = mapper.readTree(zip.get("manifest.json"));
        assertThat(manifest.get("format").asString()).isEqualTo("nodewright-backup");
        assertThat(manifest.get("store").asString()).isEqualTo("h2");
        assertThat(manifest.get("method").asString()).isEqualTo("h2-online-backup");
        assertThat(manifest.get("schemaVersion").asString()).isNotBlank();
        assertThat(manifest.get("files")).isNotEmpty();
        for (JsonNode f : manifest.get("files")) {
            byte[] data = zip.get(f.get("path").asString());
            assertThat(data).as(f.get("path").asString()).isNotNull();
            assertThat((long) data.length).isEqualTo(f.get("bytes").asLong());
            assertThat(HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(data)))
                    .isEqualTo(f.get("sha256").asString());
        }
    }

    @Test
    void aBackupTakenUnderWriteLoadRestoresEveryDesignAcknowledgedBeforeIt(@TempDir Path scratch) throws Exception {
        Set<Long> acknowledged = ConcurrentHashMap.newKeySet();
        AtomicBoolean stop = new AtomicBoolean();
        List<Throwable> failures = new ArrayList<>();
        Thread writer = new Thread(() -> {
            int i = 0;
            while (!stop.get()) {
                try {
                    acknowledged.add(save("Load design " + (i++)));
                } catch (Throwable t) {
                    failures.add(t);
                    return;
                }
            }
        });
        writer.start();
        while (acknowledged.size() < 25) {
            Thread.sleep(20);
        }
        Set<Long> before = Set.copyOf(acknowledged);
        byte[] zip = download();
        Set<Long> after = Set.copyOf(acknowledged);
        stop.set(true);
        writer.join();
        assertThat(failures).isEmpty();
        assertThat(after.size()).as("the writer kept writing while the backup ran").isGreaterThanOrEqualTo(before.size());

        Path into = scratch.resolve("restored");
        assertThat(restore(zip, into)).isEqualTo(StoreRestore.DONE);
        Map<Long, String> restored = designsIn(into);
        assertThat(restored.keySet()).containsAll(before);
        assertThat(after).containsAll(restored.keySet().stream().filter(id -> restored.get(id).startsWith("Load"))
                .toList());
    }

    @Test
    void theTableExportRestoresIntoANewEmbeddedStoreToo(@TempDir Path scratch) throws Exception {
        long id = save("Harrowgate table export");
        Path file = scratch.resolve("export.zip");
        StoreBackup tables = new StoreBackup(
                org.springframework.test.util.ReflectionTestUtils.getField(backup, "dataSource") instanceof javax.sql.DataSource ds
                        ? ds : null, mapper, scratch.toString(), "table-export");
        BackupManifest manifest = tables.writeTo(file);
        assertThat(manifest.method()).isEqualTo("table-export");
        assertThat(manifest.rows()).containsKeys("designs", "design_revisions", "accounts", "audit_events");
        Path into = scratch.resolve("restored");
        assertThat(restore(Files.readAllBytes(file), into)).isEqualTo(StoreRestore.DONE);
        Map<Long, String> restored = designsIn(into);
        assertThat(restored).containsEntry(id, "Harrowgate table export");
        assertThat((long) restored.size()).isEqualTo(manifest.rows().get("designs"));
    }

    @Test
    void aRestoreRefusesANonEmptyFolderAndLeavesItAlone(@TempDir Path scratch) throws Exception {
        byte[] zip = download();
        Path busy = Files.createDirectories(scratch.resolve("busy"));
        Files.writeString(busy.resolve("notes.txt"), "a colleague's file");
        assertThat(restore(zip, busy)).isEqualTo(StoreRestore.REFUSED);
        try (var files = Files.list(busy)) {
            assertThat(files.map(p -> p.getFileName().toString())).containsExactly("notes.txt");
        }
    }

    @Test
    void aDamagedBackupIsRefusedAndTheFolderStaysEmpty(@TempDir Path scratch) throws Exception {
        Map<String, byte[]> zip = entries(download());
        ByteArrayOutputStream damaged = new ByteArrayOutputStream();
        try (ZipOutputStream out = new ZipOutputStream(damaged)) {
            for (Map.Entry<String, byte[]> e : zip.entrySet()) {
                byte[] data = e.getValue().clone();
                if (!e.getKey().equals("manifest.json")) {
                    data[data.length / 2] ^= 0x5a;
                }
                out.putNextEntry(new ZipEntry(e.getKey()));
                out.write(data);
                out.closeEntry();
            }
        }
        Path into = Files.createDirectories(scratch.resolve("empty"));
        assertThat(restore(damaged.toByteArray(), into)).isEqualTo(StoreRestore.DAMAGED);
        assertThat(StoreRestore.isEmptyDirectory(into)).isTrue();
        assertThat(restore("not a zip".getBytes(StandardCharsets.UTF_8), scratch.resolve("other")))
                .isEqualTo(StoreRestore.DAMAGED);
        assertThat(scratch.resolve("other")).doesNotExist();
    }
}
