package org.nodewright.physics;

/**
 * The one argument checker of the physics core. A broken contract throws
 * {@link IllegalArgumentException} with a message naming the argument and its value, always in the
 * form {@code "<name> must be <rule>, got <value>"}. User input never reaches these checks
 * unvalidated: the web layer answers bad input with field errors first.
 */
public final class Require {

    private Require() {
    }

    /** {@code value > 0} and finite. */
    public static double positive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, got " + value);
        }
        return value;
    }

    /** {@code value >= 0} and finite. */
    public static double nonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be zero or positive and finite, got " + value);
        }
        return value;
    }

    /** Neither NaN nor infinite. */
    public static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, got " + value);
        }
        return value;
    }

    /** {@code value >= 1}. */
    public static int atLeastOne(String name, int value) {
        if (value < 1) {
            throw new IllegalArgumentException(name + " must be at least 1, got " + value);
        }
        return value;
    }

    /** {@code min <= value <= max}, both bounds inclusive. */
    public static int between(String name, int value, int min, int max) {
        if (value < min || value > max) {
            throw new IllegalArgumentException(name + " must be between " + min + " and " + max + ", got " + value);
        }
        return value;
    }
}
