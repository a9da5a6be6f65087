package org.nodewright.designs;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import org.nodewright.sheets.BenchSheetPdf;
import org.nodewright.sheets.DesignSheet;
import org.nodewright.sheets.ParameterRows;
import org.nodewright.sheets.SheetHeader;
import org.nodewright.templates.render.Paper;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The bench sheet of a design as a PDF: {@code GET /api/v1/designs/{id}/sheet.pdf} for a saved one
 * (its current revision, or {@code ?revision=N}), {@code POST /api/v1/designs/sheet.pdf} for one not
 * saved (name, kind and parameters as for a save). {@code ?paper=a4|letter} (default a4). The
 * parameters are validated as the analysis endpoint validates them; the feature owning the kind
 * gives the results, charts and tables ({@link DesignSheet}).
 */
@RestController
class DesignSheetController {

    /** Dates as printed: ISO 8601 date and time in UTC, so that a sheet reads the same in every shop. */
    static final DateTimeFormatter DATE = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private final DesignLibrary library;
    private final DesignStore store;
    private final DesignParameters parameters;
    private final JsonMapper mapper;
    private final List<DesignSheet> sheets;

    DesignSheetController(DesignLibrary library, DesignStore store, DesignParameters parameters, JsonMapper mapper,
            List<DesignSheet> sheets) {
        this.library = library;
        this.store = store;
        this.parameters = parameters;
        this.mapper = mapper;
        this.sheets = sheets;
    }

    @GetMapping(path = "/api/v1/designs/{id}/sheet.pdf", produces = {MediaType.APPLICATION_PDF_VALUE,
        MediaType.APPLICATION_PROBLEM_JSON_VALUE, MediaType.APPLICATION_JSON_VALUE})
    ResponseEntity<byte[]> saved(@PathVariable long id, @RequestParam(required = false) String paper,
            @RequestParam(required = false) Long revision) {
        Paper size = paper(paper);
        Design d = library.get(id);
        if (revision != null && revision != d.version()) {
            DesignRevision r = store.revision(id, revision).orElseThrow(() -> DesignLibrary.notFound(
                    "Design " + id + " has no revision " + revision + "."));
            return pdf(new SheetHeader(r.name(), Long.toString(r.version()), DATE.format(r.savedAt()), r.savedBy(),
                    r.tags()), r.kind(), r.parameters(), "", size, "design-" + id + "-r" + r.version());
        }
        return pdf(new SheetHeader(d.name(), Long.toString(d.version()), DATE.format(d.updatedAt()), d.updatedBy(),
                d.tags()), d.kind(), d.parameters(), "", size, "design-" + id + "-r" + d.version());
    }

    /** A design not saved: the same body as a save (name, kind, parameters), nothing stored. */
    @PostMapping(path = "/api/v1/designs/sheet.pdf", consumes = MediaType.APPLICATION_JSON_VALUE,
            produces = {MediaType.APPLICATION_PDF_VALUE, MediaType.APPLICATION_PROBLEM_JSON_VALUE,
                MediaType.APPLICATION_JSON_VALUE})
    ResponseEntity<byte[]> unsaved(@Valid @RequestBody UnsavedSheet body, @RequestParam(required = false) String paper) {
        Paper size = paper(paper);
        return pdf(new SheetHeader(body.name().strip(), "unsaved", DATE.format(Instant.now()), null, List.of()),
                body.kind(), body.parameters(), "parameters", size, "bench-sheet");
    }

    record UnsavedSheet(@NotBlank @Size(max = 200) String name, @NotNull DesignKind kind, @NotNull JsonNode parameters) {
    }

    private ResponseEntity<byte[]> pdf(SheetHeader header, DesignKind kind, JsonNode params, String prefix, Paper paper,
            String stem) {
        List<FieldProblem> problems = parameters.check(kind, params, prefix).stream()
                .map(p -> new FieldProblem(p.field().startsWith(".") ? p.field().substring(1) : p.field(), p.message()))
                .toList();
        if (!problems.isEmpty()) {
            throw new BadRequestException(problems);
        }
        DesignSheet sheet = sheets.stream().filter(s -> s.requestType() == kind.requestClass()).findFirst()
                .orElseThrow(() -> new BadRequestException("kind", "a " + kind.word() + " design has no bench sheet"));
        var content = sheet.sheet(mapper.treeToValue(params, kind.requestClass()));
        byte[] bytes = BenchSheetPdf.render(header, ParameterRows.of(params), content, paper);
        return ResponseEntity.ok()
                .contentType(MediaType.APPLICATION_PDF)
                .header(HttpHeaders.CONTENT_DISPOSITION,
                        ContentDisposition.inline().filename(stem + "-" + paper.word() + ".pdf").build().toString())
                .body(bytes);
    }

    private static Paper paper(String word) {
        return Paper.ofRequest(word);
    }
}
