package org.nodewright.physics.bars;

/**
 * The cross-section of a bar along its length, SI units (metres). "Bending" bends through the
 * thickness (the plane a bar is struck in); "lateral" bends across the width.
 */
public sealed interface BarSection permits RectangleSection, CircularSection {

    /** Cross-sectional area A(x), m². */
    double area(double x);

    /** Second moment of area I(x) about the axis across the width (bending through the thickness), m⁴. */
    double secondMoment(double x);

    /** Second moment of area about the axis through the thickness (bending across the width), m⁴. */
    double lateralSecondMoment(double x);

    /** Saint-Venant torsion constant J(x), m⁴. */
    double torsionConstant(double x);

    /** Polar second moment of area I_p(x) = I_y + I_z (the section's rotary inertia per density in twist), m⁴. */
    double polarSecondMoment(double x);

    /**
     * Timoshenko shear coefficient of the section for Poisson's ratio {@code nu} (Cowper 1966).
     *
     * @throws IllegalArgumentException if nu is outside −1 < nu ≤ 0.5
     */
    double shearCoefficient(double nu);

    /** Positions where the section's properties change slope (profile points), ascending, 0 and L included. */
    double[] breakpoints(double length);

    /** True when bending across the width is a family of its own (not the same as through the thickness). */
    boolean hasLateralFamily();

    /** Thickness in the bending plane at x (the diameter for round sections), m. */
    double depth(double x);
}
