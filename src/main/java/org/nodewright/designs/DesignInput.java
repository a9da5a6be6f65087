package org.nodewright.designs;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Pattern;
import jakarta.validation.constraints.Size;
import java.util.List;
import tools.jackson.databind.JsonNode;

/**
 * Body of {@code POST /api/v1/designs}. {@code author} is used in local mode only (default
 * "local"); with accounts the signed-in user is the author.
 */
public record DesignInput(
        @NotBlank @Size(max = 200) String name,
        @NotNull DesignKind kind,
        @NotNull JsonNode parameters,
        @Size(max = 20000) String notes,
        @Size(max = 20) List<@NotBlank @Size(max = 40) @Pattern(regexp = "[^,]*", message = "must not contain a comma")
                String> tags,
        @Size(max = 80) String author,
        @Valid DesignUnits units) {
}
