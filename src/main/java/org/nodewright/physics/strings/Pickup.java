package org.nodewright.physics.strings;

import org.nodewright.physics.Require;

/**
 * A pickup (or any sensor) reading the string's displacement averaged over its aperture.
 *
 * @param positionM  aperture centre, from the nut
 * @param apertureM  aperture width (0 = point sensor)
 */
public record Pickup(double positionM, double apertureM) {

    public Pickup {
        Require.finite("positionM", positionM);
        Require.nonNegative("apertureM", apertureM);
    }

    /** Gain for a mode: the mode shape averaged over [x − w/2, x + w/2] (its point value at w = 0). */
    public double gain(ModeShape shape, double lengthM) {
        double lo = (positionM - apertureM / 2) / lengthM;
        double hi = (positionM + apertureM / 2) / lengthM;
        if (lo < 0 || hi > 1) {
            throw new IllegalArgumentException("pickup aperture reaches past the string ends");
        }
        return apertureM == 0 ? shape.value(positionM / lengthM) : shape.average(lo, hi);
    }
}
