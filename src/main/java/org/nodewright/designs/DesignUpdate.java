package org.nodewright.designs;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.List;
import tools.jackson.databind.JsonNode;

/**
 * Body of {@code PUT /api/v1/designs/{id}}: the whole design as the client wants it, with the
 * {@code version} it was read at. A design keeps its kind; {@code kind} may be left out, and must
 * match when given.
 */
public record DesignUpdate(
        @NotNull @PositiveOrZero Long version,
        @NotBlank @Size(max = 200) String name,
        DesignKind kind,
        @NotNull JsonNode parameters,
        @Size(max = 20000) String notes,
        @Size(max = 20) List<@NotBlank @Size(max = 40) @Pattern(regexp = "[^,]*", message = "must not contain a comma")
                String> tags,
        @Size(max = 80) String author,
        @Valid DesignUnits units) {
}
