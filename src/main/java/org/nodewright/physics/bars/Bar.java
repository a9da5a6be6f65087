package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * A bar, rod, tube or tine: its length, section, material and ends. SI units.
 *
 * @param length        m
 * @param section       the cross-section along the bar; a profile must cover exactly 0..length
 * @param density       kg/m³
 * @param youngsModulus along the bar, Pa
 * @param shearModulus  in the bending plane, Pa (used by Timoshenko theory and by twisting)
 * @param ends          how the ends are held
 */
public record Bar(double length, BarSection section, double density, double youngsModulus, double shearModulus,
        BarEnds ends) {

    /** Relative mismatch allowed between a profile's last point and the bar's length (rounding of mm input). */
    static final double COVER_TOLERANCE = 1e-9;

    public Bar {
        Require.positive("length", length);
        Require.positive("density", density);
        Require.positive("youngsModulus", youngsModulus);
        Require.positive("shearModulus", shearModulus);
        if (section == null || ends == null) {
            throw new IllegalArgumentException("section and ends are required");
        }
        if (section instanceof RectangleSection r
                && Math.abs(r.profile().length() - length) > COVER_TOLERANCE * length) {
            throw new IllegalArgumentException("the thickness profile must cover 0.." + length + ", it ends at "
                    + r.profile().length());
        }
    }

    /** The same bar with other elastic moduli (for fitting a measured blank). */
    public Bar withModuli(double youngs, double shear) {
        return new Bar(length, section, density, youngs, shear, ends);
    }

    /** The same bar with another section (for the tuning solver). */
    public Bar withSection(BarSection other, double newLength) {
        return new Bar(newLength, other, density, youngsModulus, shearModulus, ends);
    }

    /** Poisson's ratio the shear coefficient is taken at (see {@link CowperShearCoefficient#poissonFor}). */
    public double poissonForShear() {
        return CowperShearCoefficient.poissonFor(youngsModulus, shearModulus);
    }

    /** The Timoshenko shear coefficient of this bar's section and material. */
    public double shearCoefficient() {
        return section.shearCoefficient(poissonForShear());
    }
}
