package org.nodewright.physics.templates;

import org.nodewright.physics.Require;

/** A labelled position along the string from the nut (pickup, bridge, support), in mm. */
public record PositionMark(String label, double positionMm) {
    public PositionMark {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("position label must not be blank");
        }
        Require.finite("positionMm", positionMm);
        if (positionMm < 0) {
            throw new IllegalArgumentException("positionMm must not be negative, was " + positionMm);
        }
    }
}
