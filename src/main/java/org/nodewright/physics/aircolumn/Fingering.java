package org.nodewright.physics.aircolumn;

import java.util.Set;

/**
 * One fingering: which holes are closed (indices into the design's hole list; every other hole is
 * open), the target pitch and the register wanted (1 = the lowest resonance in the analysed range).
 */
public record Fingering(String name, Set<Integer> closedHoles, double targetHz, int register) {

    public Fingering {
        closedHoles = Set.copyOf(closedHoles);
        if (!(targetHz > 0) || register < 1) {
            throw new IllegalArgumentException("need targetHz > 0 and register >= 1: targetHz=" + targetHz
                    + " register=" + register);
        }
    }
}
