package org.nodewright.physics.tuning;

/** Pitch intervals in cents: the one home of 1200·log2(f/f_ref) (Ellis 1885). */
public final class Cents {

    /** Cents per unit of natural logarithm of a frequency ratio, 1200 / ln 2. */
    public static final double PER_NATURAL_LOG = 1200.0 / Math.log(2.0);

    private Cents() {
    }

    /** Interval from {@code referenceHz} up to {@code frequencyHz}: 1200·log2(f/f_ref) (Ellis 1885). */
    public static double between(double frequencyHz, double referenceHz) {
        return PER_NATURAL_LOG * Math.log(frequencyHz / referenceHz);
    }
}
