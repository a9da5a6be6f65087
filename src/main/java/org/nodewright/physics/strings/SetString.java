package org.nodewright.physics.strings;

import org.nodewright.physics.Require;

/**
 * One string of a set.
 *
 * @param lengthM       its own vibrating length (multi-scale necks give each string its own)
 * @param targetHz      wanted sounding fundamental
 * @param construction  how it is made
 */
public record SetString(double lengthM, double targetHz, StringConstruction construction) {

    public SetString {
        Require.positive("lengthM", lengthM);
        Require.positive("targetHz", targetHz);
        if (construction == null) {
            throw new IllegalArgumentException("construction is required");
        }
    }
}
