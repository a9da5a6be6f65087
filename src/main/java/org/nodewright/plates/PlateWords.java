package org.nodewright.plates;

import com.fasterxml.jackson.annotation.JsonProperty;
import org.nodewright.physics.plates.EdgeCondition;

/** The plate API's enum words (lower-case, hyphenated) and the core constants they stand for. */
final class PlateWords {

    private PlateWords() {
    }

    enum Edges {
        @JsonProperty("free") FREE(EdgeCondition.FREE),
        @JsonProperty("simply-supported") SIMPLY_SUPPORTED(EdgeCondition.SIMPLY_SUPPORTED),
        @JsonProperty("clamped") CLAMPED(EdgeCondition.CLAMPED);

        final EdgeCondition core;

        Edges(EdgeCondition core) {
            this.core = core;
        }
    }
}
