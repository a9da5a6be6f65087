package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * The maker's limits for an undercut. Lengths in m.
 *
 * @param minimumThickness thinnest the bar may be ground anywhere
 * @param flatEnd          flat (uncut) length kept at each end for the cords
 * @param minLength        shortest bar allowed when the length is an unknown (= maxLength to fix it)
 * @param maxLength        longest bar allowed
 */
public record TuningLimits(double minimumThickness, double flatEnd, double minLength, double maxLength) {

    public TuningLimits {
        Require.positive("minimumThickness", minimumThickness);
        Require.nonNegative("flatEnd", flatEnd);
        Require.positive("minLength", minLength);
        Require.positive("maxLength", maxLength);
        if (maxLength < minLength) {
            throw new IllegalArgumentException("maxLength must be at least minLength, got " + maxLength + " and "
                    + minLength);
        }
        if (!(2 * flatEnd < minLength)) {
            throw new IllegalArgumentException("the flat ends (" + flatEnd + " each) leave no room for an undercut in "
                    + minLength);
        }
    }

    public boolean lengthFree() {
        return maxLength > minLength;
    }
}
