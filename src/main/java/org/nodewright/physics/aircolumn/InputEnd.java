package org.nodewright.physics.aircolumn;

/** How the input end (x = 0) is driven; it adds no end correction of its own. */
public enum InputEnd {
    /** Reed, lips or a stopped end: the playing resonances are the input-impedance maxima. */
    CLOSED,
    /** Embouchure hole or flue edge: the playing resonances are the input-impedance minima. */
    OPEN
}
