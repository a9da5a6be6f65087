package org.nodewright.designs;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.time.Instant;
import java.util.List;
import tools.jackson.databind.JsonNode;

/**
 * Nodewright's own exchange format for one design or a whole library, with every revision:
 * <pre>{"format": "nodewright-library", "formatVersion": 1, "exportedAt": "...", "designs": [...]}</pre>
 * Read strictly (unknown fields are refused) and validated design by design on import.
 */
record LibraryDocument(
        @NotNull String format,
        @NotNull Integer formatVersion,
        Instant exportedAt,
        @NotNull @Size(max = 2000) List<@Valid @NotNull Entry> designs) {

    static final String FORMAT = "nodewright-library";
    static final int FORMAT_VERSION = 1;

    /** A design: its current state and its revisions, oldest first. */
    record Entry(
            @Size(max = 200) String name,
            DesignKind kind,
            JsonNode parameters,
            @Size(max = 20000) String notes,
            @Size(max = 20) List<@NotNull @Size(max = 40) String> tags,
            @Size(max = 80) String author,
            Instant createdAt,
            Instant updatedAt,
            Long version,
            @Size(max = 2000) List<@Valid @NotNull Revision> revisions) {
    }

    /** One saved state of a design. */
    record Revision(
            @NotNull Long version,
            @Size(max = 200) String name,
            JsonNode parameters,
            @Size(max = 20000) String notes,
            @Size(max = 20) List<@NotNull @Size(max = 40) String> tags,
            @Size(max = 80) String savedBy,
            Instant savedAt,
            @Size(max = 200) String comment) {
    }
}
