package org.nodewright.physics.plates;

/** The support along the whole outline of a plate. */
public enum EdgeCondition {
    /** No support: the free plate a luthier holds at a node line and taps. */
    FREE,
    /** Held against deflection but free to rotate (zero moment). */
    SIMPLY_SUPPORTED,
    /** Held against deflection and rotation. */
    CLAMPED
}
