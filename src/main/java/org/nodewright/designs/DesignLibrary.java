package org.nodewright.designs;

import java.net.URI;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.audit.AuditAction;
import org.nodewright.audit.AuditTrail;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;
import org.springframework.dao.PessimisticLockingFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.http.ProblemDetail;
import org.springframework.stereotype.Service;
import org.springframework.web.ErrorResponseException;

/**
 * The rules of the library: parameters valid for their kind, saves that never overwrite a
 * colleague's newer save, a revision for every save, and a notice to every open page.
 */
@Service
class DesignLibrary {

    private final DesignStore store;
    private final DesignParameters parameters;
    private final DesignEvents events;
    private final AuditTrail audit;

    DesignLibrary(DesignStore store, DesignParameters parameters, DesignEvents events, AuditTrail audit) {
        this.store = store;
        this.parameters = parameters;
        this.events = events;
        this.audit = audit;
    }

    Design create(DesignContent content, String by, String comment) {
        requireValid(content, "");
        Design created = store.create(content, by, DesignStore.now(), comment);
        events.saved(created);
        audit.record(by, AuditAction.DESIGN_CREATED, target(created));
        return created;
    }

    /** Saves over {@code version}; a stale version is a 409 naming who changed it, and nothing is written. */
    Design update(long id, long version, DesignContent content, String by, String comment) {
        return update(id, version, content, by, comment, AuditAction.DESIGN_SAVED);
    }

    /** As {@link #update(long, long, DesignContent, String, String)}, recorded in the audit trail as {@code action}. */
    Design update(long id, long version, DesignContent content, String by, String comment, AuditAction action) {
        Design current = get(id);
        if (content.kind() != current.kind()) {
            throw new BadRequestException("kind", "a design keeps its kind (" + current.kind().word()
                    + "); save a new design instead");
        }
        requireValid(content, "");
        if (version != current.version()) {
            throw conflict(current, version);
        }
        Design saved;
        try {
            saved = store.update(id, version, content, by, DesignStore.now(), comment)
                    .orElseThrow(() -> conflict(get(id), version));
        } catch (PessimisticLockingFailureException e) {
            // Another save held the row for too long: refused like a stale write, nothing written.
            throw conflict(get(id), version);
        }
        events.saved(saved);
        audit.record(by, action, target(saved));
        return saved;
    }

    /** Restores an old revision as a new revision on top of the current one. */
    Design restore(long id, long revisionVersion, Long expectedVersion, String by) {
        Design current = get(id);
        DesignRevision old = store.revision(id, revisionVersion).orElseThrow(() -> notFound(
                "Design " + id + " has no revision " + revisionVersion + "."));
        long over = expectedVersion == null ? current.version() : expectedVersion;
        DesignContent content = new DesignContent(old.name(), current.kind(), old.parameters(), old.notes(), old.tags());
        return update(id, over, content, by, "restored from version " + revisionVersion, AuditAction.DESIGN_RESTORED);
    }

    void delete(long id, String by) {
        Design current = get(id);
        store.delete(id);
        events.deleted(current, by, DesignStore.now());
        audit.record(by, AuditAction.DESIGN_DELETED, target(current));
    }

    /** How a design is named in the audit trail: id, kind, name and the version written. */
    static String target(Design d) {
        return "design " + d.id() + " (" + d.kind().word() + ") \"" + d.name() + "\" version " + d.version();
    }

    Design get(long id) {
        return store.find(id).orElseThrow(() -> notFound("No design with id " + id + "."));
    }

    /** The design with that id, or empty (for pages, which answer a missing design with a page, not a problem). */
    java.util.Optional<Design> find(long id) {
        return store.find(id);
    }

    List<FieldProblem> problems(DesignContent content, String prefix) {
        List<FieldProblem> problems = new ArrayList<>();
        if (content.name().isEmpty()) {
            problems.add(new FieldProblem(prefix + "name", "must not be blank"));
        }
        problems.addAll(parameters.check(content.kind(), content.parameters(), prefix + "parameters"));
        return problems;
    }

    private void requireValid(DesignContent content, String prefix) {
        List<FieldProblem> problems = problems(content, prefix);
        if (!problems.isEmpty()) {
            throw new BadRequestException(problems);
        }
    }

    static ErrorResponseException notFound(String detail) {
        ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.NOT_FOUND, detail);
        pd.setTitle("Not found");
        return new ErrorResponseException(HttpStatus.NOT_FOUND, pd, null);
    }

    static ErrorResponseException conflict(Design current, long yourVersion) {
        ProblemDetail pd = ProblemDetail.forStatusAndDetail(HttpStatus.CONFLICT,
                "\"" + current.name() + "\" was changed by " + current.updatedBy() + " at " + current.updatedAt()
                        + " (now version " + current.version() + "; you read version " + yourVersion
                        + "). Nothing was overwritten: reload it, or save yours as a copy.");
        pd.setTitle("Changed by someone else");
        pd.setType(URI.create("urn:nodewright:problem:stale-version"));
        pd.setProperty("changedBy", current.updatedBy());
        pd.setProperty("changedAt", current.updatedAt().toString());
        pd.setProperty("currentVersion", current.version());
        pd.setProperty("yourVersion", yourVersion);
        return new ErrorResponseException(HttpStatus.CONFLICT, pd, null);
    }

    static Instant now() {
        return DesignStore.now();
    }
}
