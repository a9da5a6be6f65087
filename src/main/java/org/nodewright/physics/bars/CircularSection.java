package org.nodewright.physics.bars;

/**
 * A round section, solid or hollow, and what its circular symmetry gives both: bending is the same in every
 * plane, so there is no lateral family and the lateral second moment is the bending one; the polar moment equals
 * the torsion constant (a circle does not warp); the properties do not change along the bar; the depth is the
 * outside diameter.
 */
public sealed interface CircularSection extends BarSection permits RoundSection, TubeSection {

    /** Outside diameter, m. */
    double diameter();

    @Override
    default double lateralSecondMoment(double x) {
        return secondMoment(x);
    }

    @Override
    default double polarSecondMoment(double x) {
        return torsionConstant(x);
    }

    @Override
    default double[] breakpoints(double length) {
        return new double[] {0, length};
    }

    @Override
    default boolean hasLateralFamily() {
        return false;
    }

    @Override
    default double depth(double x) {
        return diameter();
    }
}
