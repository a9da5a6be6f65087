package org.nodewright.designs;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.HttpStatus;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;

/** Export and import of designs as a {@link LibraryDocument}. */
@RestController
@RequestMapping("/api/v1/designs")
class ExchangeController {

    private final LibraryExchange exchange;
    private final DesignLibrary library;
    private final DesignStore store;

    ExchangeController(LibraryExchange exchange, DesignLibrary library, DesignStore store) {
        this.exchange = exchange;
        this.library = library;
        this.store = store;
    }

    /** The whole library (or the designs matching the same filters as the list), with revisions. */
    @GetMapping("/export")
    ResponseEntity<LibraryDocument> exportAll(@RequestParam(required = false) @Size(max = 200) String name,
            @RequestParam(required = false) @Size(max = 40) String tag, @RequestParam(required = false) String kind) {
        return attachment(exchange.export(store.search(name, tag, DesignController.kind(kind), 100_000)),
                "nodewright-library-" + LocalDate.now(ZoneOffset.UTC) + ".json");
    }

    @GetMapping("/{id}/export")
    ResponseEntity<LibraryDocument> exportOne(@PathVariable long id) {
        return attachment(exchange.export(List.of(library.get(id))), "nodewright-design-" + id + ".json");
    }

    /** Every design in the document lands as a new design; nothing existing is touched. */
    @PostMapping("/import")
    ResponseEntity<ImportResult> importAsNew(@Valid @RequestBody LibraryDocument doc,
            @RequestParam(required = false) @Size(max = 80) String author, HttpServletRequest request) {
        List<Design> created = exchange.importAsNew(doc, Authors.who(request, author));
        return ResponseEntity.status(HttpStatus.CREATED).body(new ImportResult(
                created.stream().map(d -> new Imported(d.id(), d.name(), d.kind(), d.version())).toList()));
    }

    /** Asked explicitly: the document's one design becomes a new revision of design {@code id}. */
    @PostMapping("/{id}/import")
    Design importAsRevision(@PathVariable long id, @Valid @RequestBody RevisionImport body, HttpServletRequest request) {
        return exchange.importAsRevision(id, body.version(), body.document(), Authors.who(request, body.author()));
    }

    private static ResponseEntity<LibraryDocument> attachment(LibraryDocument doc, String filename) {
        return ResponseEntity.ok()
                .header(HttpHeaders.CONTENT_DISPOSITION, ContentDisposition.attachment().filename(filename).build().toString())
                .body(doc);
    }

    record RevisionImport(@NotNull @PositiveOrZero Long version, @NotNull @Valid LibraryDocument document,
            @Size(max = 80) String author) {
    }

    record Imported(long id, String name, DesignKind kind, long version) {
    }

    record ImportResult(List<Imported> imported) {
    }
}
