package org.nodewright.physics.inverse;

/**
 * One fingering and the note it should sound: which holes are open (index = hole number from the
 * input end, 0-based) and the target frequency.
 */
public record Fingering(String name, boolean[] open, double targetHz) {

    public Fingering {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("fingering name must not be blank");
        }
        if (open == null) {
            throw new IllegalArgumentException("fingering " + name + " needs its open holes");
        }
        open = open.clone();
        if (!(targetHz > 0) || !Double.isFinite(targetHz)) {
            throw new IllegalArgumentException("targetHz of " + name + " must be positive, was " + targetHz);
        }
    }

    @Override
    public boolean[] open() {
        return open.clone();
    }

    boolean isOpen(int hole) {
        return open[hole];
    }
}
