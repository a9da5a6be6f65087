package org.nodewright.designs;

import java.time.Instant;
import java.util.List;
import tools.jackson.databind.JsonNode;

/** A full snapshot of a design as one save left it; {@code version} is the version that save produced. */
public record DesignRevision(long designId, long version, String name, DesignKind kind, JsonNode parameters,
        String notes, List<String> tags, String savedBy, Instant savedAt, String comment) {

    public DesignRevision {
        tags = List.copyOf(tags);
    }
}
