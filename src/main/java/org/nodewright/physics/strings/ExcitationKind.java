package org.nodewright.physics.strings;

/** How the string is set in motion. */
public enum ExcitationKind {
    /** Triangular pluck (finger, plectrum). */
    PLUCK,
    /** Point impulse (hammer, tangent). */
    STRIKE
}
