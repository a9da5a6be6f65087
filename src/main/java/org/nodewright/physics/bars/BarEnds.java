package org.nodewright.physics.bars;

/**
 * How the two ends of a bar are held. x = 0 is the first end; "clamped-free" is clamped at x = 0.
 * A pinned end holds the displacement (and, for twisting, the twist: a fork support) but lets the
 * section rotate; a clamped end holds both; a free end holds nothing.
 */
public enum BarEnds {
    FREE_FREE(End.FREE, End.FREE),
    CLAMPED_FREE(End.CLAMPED, End.FREE),
    PINNED_PINNED(End.PINNED, End.PINNED),
    CLAMPED_CLAMPED(End.CLAMPED, End.CLAMPED);

    /** One end's support. */
    public enum End { FREE, PINNED, CLAMPED }

    private final End start;
    private final End finish;

    BarEnds(End start, End finish) {
        this.start = start;
        this.finish = finish;
    }

    /** The support at x = 0. */
    public End start() {
        return start;
    }

    /** The support at x = L. */
    public End finish() {
        return finish;
    }

    /** Rigid-body motions a bending family has under these ends (translation and rocking of a free bar). */
    int rigidBendingModes() {
        return this == FREE_FREE ? 2 : 0;
    }

    /** Rigid-body motions the twisting family has (a free bar spinning about its axis). */
    int rigidTwistingModes() {
        return this == FREE_FREE ? 1 : 0;
    }
}
