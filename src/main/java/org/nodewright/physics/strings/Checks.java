package org.nodewright.physics.strings;

/** Argument checks for the core's compact constructors. */
final class Checks {

    private Checks() {
    }

    static double positive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, got " + value);
        }
        return value;
    }

    static double nonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be zero or positive and finite, got " + value);
        }
        return value;
    }

    static double finite(String name, double value) {
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, got " + value);
        }
        return value;
    }
}
