package org.nodewright.physics.strings;

/**
 * The transverse shape of one mode along the string, in the normalised coordinate ξ = x/L
 * (0 at the nut, 1 at the bridge). Shapes are scaled so that max |X| = 1 and the lobe next to
 * the nut is positive, as sin(nπξ) is.
 */
public sealed interface ModeShape permits SineShape, ClampedShape {

    /** X(ξ). */
    double value(double xi);

    /** The mean of X over [lo, hi] (the point value when lo == hi). */
    double average(double lo, double hi);

    /** Node positions ξ, both ends included, ascending. */
    double[] nodes();

    /** Antinode positions ξ (the extrema of |X| between nodes), ascending. */
    double[] antinodes();
}
