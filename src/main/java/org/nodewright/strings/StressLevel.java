package org.nodewright.strings;

import org.nodewright.physics.strings.StressCheck;

/**
 * How close a string's core is to its typical breaking stress, as one word for the pages
 * ({@code stressLevel} in the answers): the pages colour and mark a string by it instead of
 * keeping their own copies of the limits.
 */
final class StressLevel {

    /** Where the words change, for the pages' drawings. */
    static final StringSetResponse.StressLimits LIMITS =
            new StringSetResponse.StressLimits(StressCheck.WARN_FRACTION, StressCheck.STRONG_FRACTION);

    private StressLevel() {
    }

    /** "ok" up to {@link StressCheck#WARN_FRACTION}, "warning" above it, "danger" above {@link StressCheck#STRONG_FRACTION}; null when unknown. */
    static String of(Double fractionOfStrength) {
        if (fractionOfStrength == null || !Double.isFinite(fractionOfStrength)) {
            return null;
        }
        if (fractionOfStrength > StressCheck.STRONG_FRACTION) {
            return "danger";
        }
        return fractionOfStrength > StressCheck.WARN_FRACTION ? "warning" : "ok";
    }
}
