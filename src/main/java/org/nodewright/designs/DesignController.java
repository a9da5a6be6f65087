package org.nodewright.designs;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.validation.Valid;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.Size;
import java.net.URI;
import java.util.List;
import org.nodewright.web.BadRequestException;
import org.springframework.http.ResponseEntity;
import org.springframework.web.bind.annotation.DeleteMapping;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.PutMapping;
import org.springframework.web.bind.annotation.RequestBody;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.bind.annotation.RestController;
import org.springframework.web.servlet.mvc.method.annotation.SseEmitter;

/** {@code /api/v1/designs}: create, list and search, read, save over a version, delete, change events. */
@RestController
@RequestMapping("/api/v1/designs")
class DesignController {

    private final DesignLibrary library;
    private final DesignStore store;
    private final DesignEvents events;
    private final DemoLibrary demo;

    DesignController(DesignLibrary library, DesignStore store, DesignEvents events, DemoLibrary demo) {
        this.library = library;
        this.store = store;
        this.events = events;
        this.demo = demo;
    }

    /** Removes every design tagged {@code demo} (the first start's demo library) in one go. */
    @DeleteMapping("/demo")
    java.util.Map<String, Integer> deleteDemo(HttpServletRequest request) {
        return java.util.Map.of("deleted", demo.removeAll(Authors.who(request, null)));
    }

    @PostMapping
    ResponseEntity<Design> create(@Valid @RequestBody DesignInput in, HttpServletRequest request) {
        Design created = library.create(new DesignContent(in.name(), in.kind(), in.parameters(), in.notes(), in.tags(), in.units()),
                Authors.who(request, in.author()), "created");
        return ResponseEntity.created(URI.create("/api/v1/designs/" + created.id())).body(created);
    }

    @GetMapping
    List<Design> list(@RequestParam(required = false) @Size(max = 200) String name,
            @RequestParam(required = false) @Size(max = 40) String tag,
            @RequestParam(required = false) String kind,
            @RequestParam(defaultValue = "500") @Min(1) @Max(5000) int limit) {
        return store.search(name, tag, kind(kind), limit);
    }

    @GetMapping("/{id}")
    Design one(@PathVariable long id) {
        return library.get(id);
    }

    @PutMapping("/{id}")
    Design update(@PathVariable long id, @Valid @RequestBody DesignUpdate in, HttpServletRequest request) {
        Design current = library.get(id);
        DesignKind kind = in.kind() == null ? current.kind() : in.kind();
        return library.update(id, in.version(), new DesignContent(in.name(), kind, in.parameters(), in.notes(), in.tags(), in.units()),
                Authors.who(request, in.author()), "saved");
    }

    @DeleteMapping("/{id}")
    ResponseEntity<Void> delete(@PathVariable long id, @RequestParam(required = false) @Size(max = 80) String author,
            HttpServletRequest request) {
        library.delete(id, Authors.who(request, author));
        return ResponseEntity.noContent().build();
    }

    /** Server-sent events: {@code design-saved} and {@code design-deleted}, each {id, kind, name, version, by, at}. */
    @GetMapping(path = "/events", produces = "text/event-stream")
    SseEmitter events() {
        return events.subscribe();
    }

    static DesignKind kind(String word) {
        if (word == null || word.isBlank()) {
            return null;
        }
        return DesignKind.fromWord(word).orElseThrow(() -> new BadRequestException("kind",
                "must be one of " + java.util.Arrays.stream(DesignKind.values()).map(DesignKind::word)
                        .collect(java.util.stream.Collectors.joining(", "))));
    }
}
