package org.nodewright.physics.aircolumn;

/** The far (output) end of the bore. */
public enum OutputEnd {
    /** Open end of a thin-walled pipe: Levine &amp; Schwinger 1948 via the fit of Silva et al. 2009. */
    OPEN_UNFLANGED,
    /** Open end in an infinite baffle: Norris &amp; Sheng 1989. */
    OPEN_FLANGED,
    /** Pressure release, p = 0, no end correction. */
    IDEAL_OPEN,
    /** Rigid end, volume flow 0. */
    CLOSED
}
