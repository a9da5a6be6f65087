package org.nodewright.physics.templates;

/** Argument checks shared by the template records; messages name the value. */
final class Checks {

    private Checks() {
    }

    static void finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, was " + value);
        }
    }

    static void positive(String name, double value) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, was " + value);
        }
    }
}
