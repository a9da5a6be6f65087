package org.nodewright.designs;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.List;
import org.nodewright.web.BadRequestException;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.JsonNode;

/** Revisions of a design: list, read one, restore one as a new revision, compare two; compare two designs. */
@RestController
@RequestMapping("/api/v1/designs")
class RevisionController {

    private final DesignLibrary library;
    private final DesignStore store;

    RevisionController(DesignLibrary library, DesignStore store) {
        this.library = library;
        this.store = store;
    }

    @GetMapping("/{id}/revisions")
    List<DesignRevision> revisions(@PathVariable long id) {
        library.get(id);
        return store.revisions(id);
    }

    @GetMapping("/{id}/revisions/{version}")
    DesignRevision revision(@PathVariable long id, @PathVariable long version) {
        return revisionOf(id, version);
    }

    /** Body (optional): {@code {"version": N, "author": "..."}}, N the version the client has open. */
    @PostMapping("/{id}/revisions/{version}/restore")
    Design restore(@PathVariable long id, @PathVariable long version,
            @RequestBody(required = false) RestoreRequest body, HttpServletRequest request) {
        RestoreRequest r = body == null ? new RestoreRequest(null, null) : body;
        return library.restore(id, version, r.version(), Authors.who(request, r.author()));
    }

    /** Two revisions of one design: {@code ?from=1&to=3}. */
    @GetMapping("/{id}/revisions/compare")
    Comparison compareRevisions(@PathVariable long id, @RequestParam long from, @RequestParam long to) {
        DesignRevision a = revisionOf(id, from);
        DesignRevision b = revisionOf(id, to);
        return new Comparison(new Side(id, a.version(), a.name(), a.kind(), a.parameters()),
                new Side(id, b.version(), b.name(), b.kind(), b.parameters()),
                ParameterDiff.between(a.kind(), a.parameters(), b.parameters()));
    }

    /** Two designs of the same kind, each at its current version or the one asked for: {@code ?a=1&b=2}. */
    @GetMapping("/compare")
    Comparison compare(@RequestParam long a, @RequestParam long b,
            @RequestParam(required = false) Long aVersion, @RequestParam(required = false) Long bVersion) {
        Side left = side(a, aVersion);
        Side right = side(b, bVersion);
        if (left.kind() != right.kind()) {
            throw new BadRequestException("b", "is a " + right.kind().word() + " design; only designs of the same kind ("
                    + left.kind().word() + ") can be compared");
        }
        return new Comparison(left, right, ParameterDiff.between(left.kind(), left.parameters(), right.parameters()));
    }

    private Side side(long id, Long version) {
        if (version == null) {
            Design d = library.get(id);
            return new Side(d.id(), d.version(), d.name(), d.kind(), d.parameters());
        }
        DesignRevision r = revisionOf(id, version);
        return new Side(id, r.version(), r.name(), r.kind(), r.parameters());
    }

    private DesignRevision revisionOf(long id, long version) {
        library.get(id);
        return store.revision(id, version).orElseThrow(() -> DesignLibrary.notFound(
                "Design " + id + " has no revision " + version + "."));
    }

    record RestoreRequest(@PositiveOrZero Long version, @Size(max = 80) String author) {
    }

    record Side(long id, long version, String name, DesignKind kind, JsonNode parameters) {
    }

    record Comparison(Side left, Side right, List<ParameterDiff.Difference> differences) {
    }
}
