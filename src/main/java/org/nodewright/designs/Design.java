package org.nodewright.designs;

import java.time.Instant;
import java.util.List;
import tools.jackson.databind.JsonNode;

/**
 * A saved design as the API shows it. {@code author} created it; {@code updatedBy} made the save
 * that produced {@code version}; {@code units} are the units it was last saved in on its bench (or null).
 */
public record Design(long id, String name, DesignKind kind, JsonNode parameters, String notes, List<String> tags,
        String author, Instant createdAt, String updatedBy, Instant updatedAt, long version, DesignUnits units) {

    public Design {
        tags = List.copyOf(tags);
    }
}
