package org.nodewright.aircolumns;

import com.fasterxml.jackson.annotation.JsonProperty;
import org.nodewright.physics.aircolumn.InputEnd;

/** The words of the request's {@code inputEnd}. */
public enum InputEndWord {
    @JsonProperty("closed")
    CLOSED(InputEnd.CLOSED),
    @JsonProperty("open")
    OPEN(InputEnd.OPEN);

    private final InputEnd core;

    InputEndWord(InputEnd core) {
        this.core = core;
    }

    InputEnd core() {
        return core;
    }
}
