package org.nodewright.designs;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import org.nodewright.audit.AuditAction;
import org.nodewright.audit.AuditTrail;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;
import org.springframework.stereotype.Service;
import org.springframework.transaction.annotation.Transactional;

/**
 * Export to and import from {@link LibraryDocument}. An import never overwrites: every design in
 * the document lands as a new design (keeping its revision history), or, when the caller names a
 * design explicitly, as one new revision of it. The whole document is checked first; one bad design
 * refuses the whole import.
 */
@Service
class LibraryExchange {

    private final DesignStore store;
    private final DesignLibrary library;
    private final DesignEvents events;
    private final AuditTrail audit;

    LibraryExchange(DesignStore store, DesignLibrary library, DesignEvents events, AuditTrail audit) {
        this.store = store;
        this.library = library;
        this.events = events;
        this.audit = audit;
    }

    LibraryDocument export(List<Design> designs) {
        List<LibraryDocument.Entry> entries = new ArrayList<>();
        for (Design d : designs) {
            List<LibraryDocument.Revision> revisions = store.revisions(d.id()).stream()
                    .map(r -> new LibraryDocument.Revision(r.version(), r.name(), r.parameters(), r.notes(), r.tags(),
                            r.savedBy(), r.savedAt(), r.comment()))
                    .toList();
            entries.add(new LibraryDocument.Entry(d.name(), d.kind(), d.parameters(), d.notes(), d.tags(), d.author(),
                    d.createdAt(), d.updatedAt(), d.version(), revisions));
        }
        return new LibraryDocument(LibraryDocument.FORMAT, LibraryDocument.FORMAT_VERSION, DesignStore.now(), entries);
    }

    /** Every design of the document as a new design; all or nothing. */
    @Transactional
    public List<Design> importAsNew(LibraryDocument doc, String by) {
        List<List<DesignStore.Snapshot>> histories = check(doc, by);
        List<Design> created = new ArrayList<>();
        Instant now = DesignStore.now();
        for (List<DesignStore.Snapshot> history : histories) {
            created.add(store.createWithHistory(history, by, now));
        }
        created.forEach(events::saved);
        created.forEach(d -> audit.record(by, AuditAction.DESIGN_IMPORTED, DesignLibrary.target(d)));
        return created;
    }

    /** The document's single design as a new revision of design {@code id}, saved over {@code version}. */
    Design importAsRevision(long id, long version, LibraryDocument doc, String by) {
        List<List<DesignStore.Snapshot>> histories = check(doc, by);
        if (histories.size() != 1) {
            throw new BadRequestException("document.designs", "must hold exactly one design to import as a revision");
        }
        List<DesignStore.Snapshot> history = histories.get(0);
        DesignContent content = history.get(history.size() - 1).content();
        Design target = library.get(id);
        if (content.kind() != target.kind()) {
            throw new BadRequestException("document.designs[0].kind", "is " + content.kind().word()
                    + " but design " + id + " is " + target.kind().word());
        }
        return library.update(id, version, content, by, "imported from a file", AuditAction.DESIGN_IMPORTED);
    }

    /** Validates the whole document and turns each design into its history, oldest first. */
    private List<List<DesignStore.Snapshot>> check(LibraryDocument doc, String by) {
        List<FieldProblem> problems = new ArrayList<>();
        if (!LibraryDocument.FORMAT.equals(doc.format())) {
            problems.add(new FieldProblem("format", "must be \"" + LibraryDocument.FORMAT + "\""));
        }
        if (!Objects.equals(doc.formatVersion(), LibraryDocument.FORMAT_VERSION)) {
            problems.add(new FieldProblem("formatVersion", "this server reads version " + LibraryDocument.FORMAT_VERSION));
        }
        if (!problems.isEmpty()) {
            throw new BadRequestException(problems);
        }
        Instant now = DesignStore.now();
        List<List<DesignStore.Snapshot>> histories = new ArrayList<>();
        for (int i = 0; i < doc.designs().size(); i++) {
            LibraryDocument.Entry e = doc.designs().get(i);
            String at = "designs[" + i + "].";
            if (e.kind() == null) {
                problems.add(new FieldProblem(at + "kind", "is required"));
                continue;
            }
            List<DesignStore.Snapshot> history = new ArrayList<>();
            List<LibraryDocument.Revision> revisions = e.revisions() == null ? List.of()
                    : e.revisions().stream().sorted(Comparator.comparing(LibraryDocument.Revision::version)).toList();
            for (int j = 0; j < revisions.size(); j++) {
                LibraryDocument.Revision r = revisions.get(j);
                String rat = at + "revisions[" + doc.designs().get(i).revisions().indexOf(r) + "].";
                DesignContent content = content(r.name(), e.kind(), r.parameters(), r.notes(), r.tags(), rat, problems);
                if (content != null) {
                    history.add(new DesignStore.Snapshot(content, orElse(r.savedBy(), by), orElse(r.savedAt(), now),
                            orElse(r.comment(), "")));
                }
            }
            DesignContent current = content(e.name(), e.kind(), e.parameters(), e.notes(), e.tags(), at, problems);
            if (current != null && (history.isEmpty() || !sameContent(history.get(history.size() - 1).content(), current))) {
                history.add(new DesignStore.Snapshot(current, by, now, "imported from a file"));
            }
            histories.add(history);
        }
        if (!problems.isEmpty()) {
            throw new BadRequestException(problems);
        }
        return histories;
    }

    private DesignContent content(String name, DesignKind kind, tools.jackson.databind.JsonNode parameters,
            String notes, List<String> tags, String at, List<FieldProblem> problems) {
        if (name == null || name.isBlank()) {
            problems.add(new FieldProblem(at + "name", "must not be blank"));
            return null;
        }
        DesignContent content = new DesignContent(name, kind, parameters, notes, tags);
        List<FieldProblem> found = library.problems(content, at);
        problems.addAll(found);
        return found.isEmpty() ? content : null;
    }

    /** Same name, parameters, notes and tags; tags as a set (a file may list them in any order). */
    private static boolean sameContent(DesignContent a, DesignContent b) {
        return a.name().equals(b.name()) && a.parameters().equals(b.parameters()) && a.notes().equals(b.notes())
                && tagKeys(a).equals(tagKeys(b));
    }

    private static java.util.Set<String> tagKeys(DesignContent c) {
        return c.tags().stream().map(DesignContent::tagKey).collect(java.util.stream.Collectors.toSet());
    }

    private static <T> T orElse(T value, T fallback) {
        return value == null ? fallback : value;
    }
}
