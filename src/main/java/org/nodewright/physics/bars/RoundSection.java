package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * A solid round rod.
 *
 * @param diameter m
 */
public record RoundSection(double diameter) implements CircularSection {

    public RoundSection {
        Require.positive("diameter", diameter);
    }

    /** A = π d² / 4. */
    @Override
    public double area(double x) {
        return Math.PI * diameter * diameter / 4.0;
    }

    /** I = π d⁴ / 64. */
    @Override
    public double secondMoment(double x) {
        return Math.PI * Math.pow(diameter, 4) / 64.0;
    }

    /** J = π d⁴ / 32 (a circle does not warp). */
    @Override
    public double torsionConstant(double x) {
        return Math.PI * Math.pow(diameter, 4) / 32.0;
    }

    @Override
    public double shearCoefficient(double nu) {
        return CowperShearCoefficient.tube(nu, 0.0);
    }
}
