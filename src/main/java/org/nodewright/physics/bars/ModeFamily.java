package org.nodewright.physics.bars;

/** The families of vibration a bar has. */
public enum ModeFamily {
    /** Bending through the thickness (the modes a bar is tuned by). */
    BENDING,
    /** Saint-Venant twisting about the bar's axis. */
    TWISTING,
    /** Bending across the width, in the plane of the bar's wide face (rectangles only). */
    LATERAL_BENDING
}
