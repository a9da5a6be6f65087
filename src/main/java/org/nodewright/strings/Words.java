package org.nodewright.strings;

import com.fasterxml.jackson.annotation.JsonProperty;
import org.nodewright.physics.strings.EndCondition;
import org.nodewright.physics.strings.ExcitationKind;
import org.nodewright.physics.strings.PickupCombination;

/** The enum words of the strings API, lower-case as the contract spells them. */
public final class Words {

    private Words() {
    }

    /** "pinned" or "clamped". */
    public enum End {
        @JsonProperty("pinned") PINNED(EndCondition.PINNED),
        @JsonProperty("clamped") CLAMPED(EndCondition.CLAMPED);

        private final EndCondition core;

        End(EndCondition core) {
            this.core = core;
        }

        public EndCondition toCore() {
            return core;
        }
    }

    /** "pluck" (triangle) or "strike" (point impulse). */
    public enum Kind {
        @JsonProperty("pluck") PLUCK(ExcitationKind.PLUCK),
        @JsonProperty("strike") STRIKE(ExcitationKind.STRIKE);

        private final ExcitationKind core;

        Kind(ExcitationKind core) {
            this.core = core;
        }

        public ExcitationKind toCore() {
            return core;
        }
    }

    /** "sum" (in phase) or "opposite" (out of phase). */
    public enum Combination {
        @JsonProperty("sum") SUM(PickupCombination.SUM),
        @JsonProperty("opposite") OPPOSITE(PickupCombination.OPPOSITE);

        private final PickupCombination core;

        Combination(PickupCombination core) {
            this.core = core;
        }

        public PickupCombination toCore() {
            return core;
        }
    }
}
