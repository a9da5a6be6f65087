package org.nodewright.physics.tuning;

/** Pitch intervals in cents. */
public final class Cents {

    private Cents() {
    }

    /** Interval from {@code referenceHz} up to {@code frequencyHz}: 1200·log2(f/f_ref) (Ellis 1885). */
    public static double between(double frequencyHz, double referenceHz) {
        return 1200.0 * Math.log(frequencyHz / referenceHz) / Math.log(2.0);
    }
}
