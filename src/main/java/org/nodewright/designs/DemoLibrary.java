package org.nodewright.designs;

import java.io.IOException;
import java.io.InputStream;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.audit.AuditAction;
import org.nodewright.audit.AuditTrail;
import org.nodewright.web.FieldProblem;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.springframework.beans.factory.InitializingBean;
import org.springframework.beans.factory.annotation.Value;
import org.springframework.dao.DuplicateKeyException;
import org.springframework.jdbc.core.simple.JdbcClient;
import org.springframework.stereotype.Component;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * First start: on a store with no designs, and unless {@code --app.demo=false}, adds the demo
 * library of the invented Harrowgate Lane Workshop: for every {@link DesignKind}, the designs of
 * {@code demo/<kind word>.json} (each with its revision history and tags), all tagged {@value #TAG}.
 * A new kind joins by adding its file; {@code DemoLibraryTest} fails for a kind without one. It runs
 * once per store (a mark in {@code app_settings}), before the server listens, so deleting the demo
 * designs keeps them deleted; {@code DELETE /api/v1/designs/demo} removes them all at once.
 *
 * <p>The demo files ship inside the jar, so they are checked as a save would check them at build
 * time ({@code DemoLibraryTest} calls {@link #histories(boolean) histories(true)}), not at every
 * first start: checking them there built the request mappers and validators of every bench before
 * the server listened, about a quarter of a fresh start (see README, Speed).
 */
@Component
class DemoLibrary implements InitializingBean {

    static final String TAG = "demo";
    static final String MARK = "demo-library";
    static final String AUTHOR = "Harrowgate Lane Workshop";
    private static final Logger log = LoggerFactory.getLogger(DemoLibrary.class);

    private final boolean enabled;
    private final JdbcClient jdbc;
    private final DesignStore store;
    private final DesignLibrary library;
    private final AuditTrail audit;
    private final JsonMapper mapper;
    private final TransactionTemplate transactions;

    DemoLibrary(@Value("${app.demo:true}") boolean enabled, JdbcClient jdbc, DesignStore store, DesignLibrary library,
            AuditTrail audit, JsonMapper mapper, PlatformTransactionManager tx) {
        this.enabled = enabled;
        this.jdbc = jdbc;
        this.store = store;
        this.library = library;
        this.audit = audit;
        this.mapper = mapper;
        this.transactions = new TransactionTemplate(tx);
    }

    @Override
    public void afterPropertiesSet() {
        if (!enabled) {
            return;
        }
        try {
            List<Design> added = transactions.execute(tx -> seedOnce());
            if (added != null && !added.isEmpty()) {
                log.info("First start: added {} demo designs of the Harrowgate Lane Workshop (tag '{}'); "
                        + "remove them from the library page, or start with --app.demo=false.", added.size(), TAG);
                audit.record("nodewright", AuditAction.DEMO_LIBRARY_ADDED, added.size() + " designs tagged " + TAG, "");
            }
        } catch (DuplicateKeyException anotherInstance) {
            // Another instance on the same database marked and seeded the store at the same moment.
        }
    }

    /** Adds the demo designs when the store is fresh; the designs added (none otherwise). */
    private List<Design> seedOnce() {
        boolean marked = jdbc.sql("SELECT COUNT(*) FROM app_settings WHERE setting_key = ?").param(MARK)
                .query(Long.class).single() > 0;
        if (marked) {
            return List.of();
        }
        long designs = jdbc.sql("SELECT COUNT(*) FROM designs").query(Long.class).single();
        jdbc.sql("INSERT INTO app_settings (setting_key, setting_value) VALUES (?, ?)")
                .params(MARK, designs > 0 ? "skipped: the store had designs" : "added " + Instant.now()).update();
        if (designs > 0) {
            return List.of();
        }
        List<Design> added = new ArrayList<>();
        for (List<DesignStore.Snapshot> history : histories(false)) {
            added.add(store.createWithHistory(history));
        }
        return added;
    }

    /**
     * Every demo design of every kind as its history, oldest revision first. When {@code strict}
     * (the build-time test) each revision is checked like a save and a refused one throws naming
     * the file and revision; at start-up the shipped files are taken as the test left them.
     */
    List<List<DesignStore.Snapshot>> histories(boolean strict) {
        List<List<DesignStore.Snapshot>> out = new ArrayList<>();
        // Revisions a day apart, ending an hour ago, so the history reads like a workshop's.
        Instant end = DesignStore.now().minus(Duration.ofHours(1));
        for (DesignKind kind : DesignKind.values()) {
            JsonNode doc = read(kind);
            if (doc == null) {
                log.warn("No demo designs for the kind '{}' (demo/{}.json is missing).", kind.word(), kind.word());
                continue;
            }
            for (JsonNode d : doc.get("designs")) {
                List<String> tags = new ArrayList<>();
                d.get("tags").forEach(t -> tags.add(t.asString()));
                if (!tags.contains(TAG)) {
                    tags.add(0, TAG);
                }
                JsonNode revisions = d.get("revisions");
                List<DesignStore.Snapshot> history = new ArrayList<>();
                for (int i = 0; i < revisions.size(); i++) {
                    JsonNode r = revisions.get(i);
                    DesignContent content = new DesignContent(d.get("name").asString(), kind, r.get("parameters"),
                            d.path("notes").asString(""), tags);
                    List<FieldProblem> problems = strict ? library.problems(content, "") : List.of();
                    if (!problems.isEmpty()) {
                        throw new IllegalStateException("demo/" + kind.word() + ".json: \"" + content.name()
                                + "\" revision " + (i + 1) + " is refused: " + problems);
                    }
                    Instant at = end.minus(Duration.ofDays(revisions.size() - 1 - i));
                    history.add(new DesignStore.Snapshot(content, AUTHOR, at, r.path("comment").asString("")));
                }
                out.add(history);
            }
        }
        return out;
    }

    private JsonNode read(DesignKind kind) {
        try (InputStream in = DemoLibrary.class.getResourceAsStream("/demo/" + kind.word() + ".json")) {
            return in == null ? null : mapper.readTree(in);
        } catch (IOException e) {
            throw new IllegalStateException("demo/" + kind.word() + ".json cannot be read", e);
        }
    }

    /** Deletes every design tagged {@value #TAG}; how many. */
    int removeAll(String by) {
        List<Design> demo = store.search(null, TAG, null, 10_000);
        for (Design d : demo) {
            library.delete(d.id(), by);
        }
        return demo.size();
    }
}
