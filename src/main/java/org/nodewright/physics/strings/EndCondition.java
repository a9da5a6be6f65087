package org.nodewright.physics.strings;

/** The bending boundary condition at both ends of a stiff string. */
public enum EndCondition {
    /** Hinged (simply supported): y = y'' = 0. Mode shapes are exact sines. */
    PINNED,
    /** Built in: y = y' = 0. Mode shapes come from the beam-under-tension solution. */
    CLAMPED
}
