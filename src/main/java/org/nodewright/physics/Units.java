package org.nodewright.physics;

/**
 * The unit factors of the whole program, exact by definition: the SI prefix milli and the
 * international inch (1959: 1 in = 25.4 mm; NIST SP 811). The core works in SI; the web layer
 * speaks millimetres; the pages convert for display only (their twin is {@code js/common/units.js}).
 */
public final class Units {

    /** Metres per millimetre. */
    public static final double MM = 1e-3;

    /** Millimetres per inch. */
    public static final double MM_PER_INCH = 25.4;

    /** Metres per inch. */
    public static final double INCH = 0.0254;

    private Units() {
    }
}
