package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * A rectangular bar of constant width whose thickness follows a piecewise-linear profile.
 *
 * @param width   across the bar, m
 * @param profile thickness along the bar (uniform for a plain bar)
 */
public record RectangleSection(double width, ThicknessProfile profile) implements BarSection {

    public RectangleSection {
        Require.positive("width", width);
        if (profile == null) {
            throw new IllegalArgumentException("profile is required");
        }
    }

    /** A plain (uniform) bar. */
    public static RectangleSection uniform(double width, double thickness, double length) {
        return new RectangleSection(width, ThicknessProfile.uniform(length, thickness));
    }

    @Override
    public double area(double x) {
        return width * profile.thicknessAt(x);
    }

    /** I = b t³ / 12. */
    @Override
    public double secondMoment(double x) {
        double t = profile.thicknessAt(x);
        return width * t * t * t / 12.0;
    }

    /** I = t b³ / 12. */
    @Override
    public double lateralSecondMoment(double x) {
        return profile.thicknessAt(x) * width * width * width / 12.0;
    }

    @Override
    public double torsionConstant(double x) {
        return SaintVenantTorsion.rectangle(width, profile.thicknessAt(x));
    }

    /** I_p = b t (b² + t²) / 12. */
    @Override
    public double polarSecondMoment(double x) {
        double t = profile.thicknessAt(x);
        return width * t * (width * width + t * t) / 12.0;
    }

    @Override
    public double shearCoefficient(double nu) {
        return CowperShearCoefficient.rectangle(nu);
    }

    @Override
    public double[] breakpoints(double length) {
        return profile.positions();
    }

    @Override
    public boolean hasLateralFamily() {
        return true;
    }

    @Override
    public double depth(double x) {
        return profile.thicknessAt(x);
    }
}
