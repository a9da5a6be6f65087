package org.nodewright.aircolumns;

import com.fasterxml.jackson.annotation.JsonProperty;
import org.nodewright.physics.aircolumn.OutputEnd;

/** The words of the request's {@code outputEnd}. */
public enum OutputEndWord {
    @JsonProperty("open-unflanged")
    OPEN_UNFLANGED(OutputEnd.OPEN_UNFLANGED),
    @JsonProperty("open-flanged")
    OPEN_FLANGED(OutputEnd.OPEN_FLANGED),
    @JsonProperty("ideal-open")
    IDEAL_OPEN(OutputEnd.IDEAL_OPEN),
    @JsonProperty("closed")
    CLOSED(OutputEnd.CLOSED);

    private final OutputEnd core;

    OutputEndWord(OutputEnd core) {
        this.core = core;
    }

    OutputEnd core() {
        return core;
    }
}
