package org.nodewright.physics.strings;

import org.nodewright.physics.Require;
import org.nodewright.physics.tuning.Cents;

/**
 * One transverse mode of a string.
 *
 * @param n            mode number (1 = fundamental)
 * @param frequencyHz  the mode's frequency, stiffness included when the string is stiff
 * @param harmonicHz   n × the ideal flexible-string f1
 * @param shape        the mode shape along the string
 */
public record Mode(int n, double frequencyHz, double harmonicHz, ModeShape shape) {

    public Mode {
        Require.atLeastOne("mode number", n);
        Require.positive("frequencyHz", frequencyHz);
        Require.positive("harmonicHz", harmonicHz);
        if (shape == null) {
            throw new IllegalArgumentException("shape is required");
        }
    }

    /** Cents of the partial above the harmonic n·f1: 1200·log2(f_n/(n·f1)). */
    public double centsFromHarmonic() {
        return Cents.between(frequencyHz, harmonicHz);
    }
}
