package org.nodewright.designs;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.jdbc.support.GeneratedKeyHolder;
import org.springframework.jdbc.support.KeyHolder;
import org.springframework.stereotype.Repository;
import org.springframework.transaction.annotation.Transactional;
import tools.jackson.core.type.TypeReference;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The designs and their revisions in SQL (H2 or PostgreSQL, same statements). A save is one
 * transaction: the design row moves from version v to v + 1 only if it is still at v
 * ({@code UPDATE ... WHERE id = ? AND version = ?}), and the revision v + 1 is written with it.
 */
@Repository
class DesignStore {

    private static final TypeReference<List<String>> STRINGS = new TypeReference<>() { };

    private static final String DESIGN_COLUMNS =
            "d.id, d.name, d.kind, d.parameters, d.notes, d.author, d.created_at, d.updated_by, d.updated_at, d.version, d.units";

    private final JdbcClient jdbc;
    private final JsonMapper mapper;

    DesignStore(JdbcClient jdbc, JsonMapper mapper) {
        this.jdbc = jdbc;
        this.mapper = mapper;
    }

    /** Timestamps kept to the millisecond, the finest both databases keep alike. */
    static Instant now() {
        return Instant.now().truncatedTo(ChronoUnit.MILLIS);
    }

    /** Creates a design at version 1 with its first revision. */
    @Transactional
    public Design create(DesignContent content, String by, Instant at, String comment) {
        return createWithHistory(List.of(new Snapshot(content, by, at, comment)));
    }

    /**
     * Creates a design whose revisions are the given snapshots, oldest first (an import keeps its
     * history); the last snapshot is the current state. Created by the first snapshot's author.
     */
    @Transactional
    public Design createWithHistory(List<Snapshot> history) {
        Snapshot last = history.get(history.size() - 1);
        return createWithHistory(history, last.by(), last.at());
    }

    /**
     * As {@link #createWithHistory(List)}, listed as changed by {@code listedBy} at {@code listedAt}
     * (an import: the design arrived in this library now, and sorts with the latest; its revisions
     * keep their own dates).
     */
    @Transactional
    public Design createWithHistory(List<Snapshot> history, String listedBy, Instant listedAt) {
        Snapshot first = history.get(0);
        Snapshot last = history.get(history.size() - 1);
        KeyHolder keys = new GeneratedKeyHolder();
        jdbc.sql("INSERT INTO designs (name, kind, parameters, notes, author, created_at, updated_by, updated_at, version,"
                        + " units) VALUES (:name, :kind, :parameters, :notes, :author, :createdAt, :updatedBy, :updatedAt,"
                        + " :version, :units)")
                .param("name", last.content().name())
                .param("kind", last.content().kind().word())
                .param("parameters", json(last.content().parameters()))
                .param("notes", last.content().notes())
                .param("author", first.by())
                .param("createdAt", time(first.at()))
                .param("updatedBy", listedBy)
                .param("updatedAt", time(listedAt))
                .param("version", (long) history.size())
                .param("units", stored(last.content().units()))
                .update(keys, "id");
        long id = generatedId(keys);
        writeTags(id, last.content().tags());
        long version = 1;
        for (Snapshot s : history) {
            writeRevision(id, version++, s);
        }
        return find(id).orElseThrow();
    }

    /**
     * Saves new content over version {@code expectedVersion}. Empty when the design is no longer at
     * that version (or is gone): nothing is written then.
     */
    @Transactional
    public Optional<Design> update(long id, long expectedVersion, DesignContent content, String by, Instant at,
            String comment) {
        // Units left out keep the design's own (a script that knows no units changes none).
        int rows = jdbc.sql("UPDATE designs SET name = :name, parameters = :parameters, notes = :notes,"
                        + " updated_by = :by, updated_at = :at, version = version + 1, units = COALESCE(:units, units)"
                        + " WHERE id = :id AND version = :version")
                .param("name", content.name())
                .param("parameters", json(content.parameters()))
                .param("notes", content.notes())
                .param("units", stored(content.units()))
                .param("by", by)
                .param("at", time(at))
                .param("id", id)
                .param("version", expectedVersion)
                .update();
        if (rows == 0) {
            return Optional.empty();
        }
        jdbc.sql("DELETE FROM design_tags WHERE design_id = :id").param("id", id).update();
        writeTags(id, content.tags());
        writeRevision(id, expectedVersion + 1, new Snapshot(content, by, at, comment));
        return find(id);
    }

    @Transactional
    public boolean delete(long id) {
        // Children first: the foreign keys cascade, but being explicit costs nothing.
        jdbc.sql("DELETE FROM design_revisions WHERE design_id = :id").param("id", id).update();
        jdbc.sql("DELETE FROM design_tags WHERE design_id = :id").param("id", id).update();
        return jdbc.sql("DELETE FROM designs WHERE id = :id").param("id", id).update() > 0;
    }

    @Transactional(readOnly = true)
    public Optional<Design> find(long id) {
        List<Design> found = withTags(jdbc.sql("SELECT " + DESIGN_COLUMNS + " FROM designs d WHERE d.id = :id")
                .param("id", id).query(this::designRow).list());
        return found.stream().findFirst();
    }

    /** Designs matching every given filter (null = any), newest change first. */
    @Transactional(readOnly = true)
    public List<Design> search(String nameContains, String tag, DesignKind kind, int limit) {
        StringBuilder sql = new StringBuilder("SELECT " + DESIGN_COLUMNS + " FROM designs d WHERE 1 = 1");
        Map<String, Object> params = new HashMap<>();
        if (nameContains != null && !nameContains.isBlank()) {
            sql.append(" AND LOWER(d.name) LIKE :name ESCAPE '\\'");
            params.put("name", "%" + likeEscape(nameContains.strip().toLowerCase(java.util.Locale.ROOT)) + "%");
        }
        if (tag != null && !tag.isBlank()) {
            sql.append(" AND EXISTS (SELECT 1 FROM design_tags t WHERE t.design_id = d.id AND t.tag_key = :tag)");
            params.put("tag", DesignContent.tagKey(tag));
        }
        if (kind != null) {
            sql.append(" AND d.kind = :kind");
            params.put("kind", kind.word());
        }
        sql.append(" ORDER BY d.updated_at DESC, d.id DESC FETCH FIRST ").append(Math.max(1, limit)).append(" ROWS ONLY");
        return withTags(jdbc.sql(sql.toString()).params(params).query(this::designRow).list());
    }

    @Transactional(readOnly = true)
    public List<DesignRevision> revisions(long designId) {
        Optional<Design> design = find(designId);
        if (design.isEmpty()) {
            return List.of();
        }
        DesignKind kind = design.get().kind();
        return jdbc.sql("SELECT * FROM design_revisions WHERE design_id = :id ORDER BY version")
                .param("id", designId).query((rs, n) -> revisionRow(rs, kind)).list();
    }

    @Transactional(readOnly = true)
    public Optional<DesignRevision> revision(long designId, long version) {
        return find(designId).flatMap(d -> jdbc.sql(
                        "SELECT * FROM design_revisions WHERE design_id = :id AND version = :version")
                .param("id", designId).param("version", version)
                .query((rs, n) -> revisionRow(rs, d.kind())).optional());
    }

    private void writeTags(long id, List<String> tags) {
        for (String tag : tags) {
            jdbc.sql("INSERT INTO design_tags (design_id, tag, tag_key) VALUES (:id, :tag, :key)")
                    .param("id", id).param("tag", tag).param("key", DesignContent.tagKey(tag)).update();
        }
    }

    private void writeRevision(long id, long version, Snapshot s) {
        jdbc.sql("INSERT INTO design_revisions (design_id, version, name, parameters, notes, tags, saved_by, saved_at,"
                        + " comment) VALUES (:id, :version, :name, :parameters, :notes, :tags, :by, :at, :comment)")
                .param("id", id)
                .param("version", version)
                .param("name", s.content().name())
                .param("parameters", json(s.content().parameters()))
                .param("notes", s.content().notes())
                .param("tags", mapper.writeValueAsString(s.content().tags()))
                .param("by", s.by())
                .param("at", time(s.at()))
                .param("comment", s.comment() == null ? "" : s.comment())
                .update();
    }

    private List<Design> withTags(List<Design> designs) {
        if (designs.isEmpty()) {
            return designs;
        }
        Map<Long, List<String>> tags = new HashMap<>();
        jdbc.sql("SELECT design_id, tag FROM design_tags WHERE design_id IN (:ids) ORDER BY tag_key")
                .param("ids", designs.stream().map(Design::id).toList())
                .query(rs -> {
                    tags.computeIfAbsent(rs.getLong("design_id"), k -> new ArrayList<>()).add(rs.getString("tag"));
                });
        return designs.stream().map(d -> new Design(d.id(), d.name(), d.kind(), d.parameters(), d.notes(),
                tags.getOrDefault(d.id(), List.of()), d.author(), d.createdAt(), d.updatedBy(), d.updatedAt(),
                d.version(), d.units())).toList();
    }

    private Design designRow(ResultSet rs, int n) throws SQLException {
        return new Design(rs.getLong("id"), rs.getString("name"), kind(rs.getString("kind")),
                mapper.readTree(rs.getString("parameters")), rs.getString("notes"), List.of(),
                rs.getString("author"), instant(rs, "created_at"), rs.getString("updated_by"),
                instant(rs, "updated_at"), rs.getLong("version"), DesignUnits.fromStored(rs.getString("units")));
    }

    private DesignRevision revisionRow(ResultSet rs, DesignKind kind) throws SQLException {
        return new DesignRevision(rs.getLong("design_id"), rs.getLong("version"), rs.getString("name"), kind,
                mapper.readTree(rs.getString("parameters")), rs.getString("notes"),
                mapper.readValue(rs.getString("tags"), STRINGS), rs.getString("saved_by"), instant(rs, "saved_at"),
                rs.getString("comment"));
    }

    private static DesignKind kind(String word) {
        return DesignKind.fromWord(word).orElseThrow(() -> new IllegalStateException("Unknown kind in store: " + word));
    }

    private static String stored(DesignUnits units) {
        return units == null ? null : units.stored();
    }

    private String json(JsonNode node) {
        return mapper.writeValueAsString(node);
    }

    private static OffsetDateTime time(Instant at) {
        return OffsetDateTime.ofInstant(at, ZoneOffset.UTC);
    }

    private static Instant instant(ResultSet rs, String column) throws SQLException {
        return rs.getObject(column, OffsetDateTime.class).toInstant();
    }

    private static long generatedId(KeyHolder keys) {
        Map<String, Object> row = keys.getKeys();
        if (row != null && row.size() == 1) {
            return ((Number) row.values().iterator().next()).longValue();
        }
        Object id = row == null ? null : row.getOrDefault("id", row.get("ID"));
        return ((Number) id).longValue();
    }

    private static String likeEscape(String s) {
        return s.replace("\\", "\\\\").replace("%", "\\%").replace("_", "\\_");
    }

    /** One save of a design: its content, who saved it, when, and why (e.g. "restored from version 2"). */
    record Snapshot(DesignContent content, String by, Instant at, String comment) {
    }
}
