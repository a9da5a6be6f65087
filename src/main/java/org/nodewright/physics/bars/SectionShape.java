package org.nodewright.physics.bars;

/** The kinds of cross-section a bar may have. */
public enum SectionShape {
    /** Width x thickness, the thickness possibly following a profile ({@link RectangleSection}). */
    RECTANGLE,
    /** A solid round rod ({@link RoundSection}). */
    ROUND,
    /** A round tube ({@link TubeSection}). */
    TUBE
}
