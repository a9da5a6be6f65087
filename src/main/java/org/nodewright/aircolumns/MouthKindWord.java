package org.nodewright.aircolumns;

import com.fasterxml.jackson.annotation.JsonProperty;
import org.nodewright.physics.aircolumn.MouthKind;

/** The words of the request's {@code mouth.kind}. */
public enum MouthKindWord {
    @JsonProperty("embouchure")
    EMBOUCHURE(MouthKind.EMBOUCHURE),
    @JsonProperty("window")
    WINDOW(MouthKind.WINDOW),
    @JsonProperty("reed")
    REED(MouthKind.REED),
    @JsonProperty("cup")
    CUP(MouthKind.CUP);

    private final MouthKind core;

    MouthKindWord(MouthKind core) {
        this.core = core;
    }

    MouthKind core() {
        return core;
    }
}
