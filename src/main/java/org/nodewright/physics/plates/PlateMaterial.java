package org.nodewright.physics.plates;

/**
 * An orthotropic sheet material in its principal axes: x along the grain, y across it.
 *
 * @param densityKgPerM3     density
 * @param elasticAlongPa     Young's modulus along the grain, E_x
 * @param elasticAcrossPa    Young's modulus across the grain, E_y
 * @param shearPa            in-plane shear modulus G_xy
 * @param poissonAlongAcross nu_xy (strain across per strain along under stress along); nu_yx = nu_xy E_y / E_x
 */
public record PlateMaterial(double densityKgPerM3, double elasticAlongPa, double elasticAcrossPa, double shearPa,
                            double poissonAlongAcross) {

    public PlateMaterial {
        positive("densityKgPerM3", densityKgPerM3);
        positive("elasticAlongPa", elasticAlongPa);
        positive("elasticAcrossPa", elasticAcrossPa);
        positive("shearPa", shearPa);
        if (!Double.isFinite(poissonAlongAcross) || poissonAlongAcross <= -1) {
            throw new IllegalArgumentException("poissonAlongAcross must be finite and above -1, got " + poissonAlongAcross);
        }
        if (!isPositiveDefinite(elasticAlongPa, elasticAcrossPa, poissonAlongAcross)) {
            throw new IllegalArgumentException("nu_xy^2 * E_across / E_along must stay below 1 (got "
                    + poissonAlongAcross * poissonAlongAcross * elasticAcrossPa / elasticAlongPa
                    + "): the plate's stiffness matrix would not be positive definite");
        }
    }

    /** An isotropic material: E along = E across, G = E / (2(1 + nu)). */
    public static PlateMaterial isotropic(double densityKgPerM3, double youngsPa, double poisson) {
        return new PlateMaterial(densityKgPerM3, youngsPa, youngsPa, youngsPa / (2 * (1 + poisson)), poisson);
    }

    /** Positive definiteness of the in-plane orthotropic stiffness: 1 − nu_xy nu_yx &gt; 0 (Lekhnitskii). */
    public static boolean isPositiveDefinite(double elasticAlongPa, double elasticAcrossPa, double poissonAlongAcross) {
        return poissonAlongAcross * poissonAlongAcross * elasticAcrossPa / elasticAlongPa < 1;
    }

    /** nu_yx = nu_xy E_y / E_x (reciprocity of the compliance matrix). */
    public double poissonAcrossAlong() {
        return poissonAlongAcross * elasticAcrossPa / elasticAlongPa;
    }

    /**
     * Rigidities of a plate of thickness h: D11 = E_x h³/(12(1 − nu_xy nu_yx)), D22 = E_y h³/(12(1 − nu_xy nu_yx)),
     * D12 = nu_xy D22, D66 = G h³/12 (Leissa 1969, eq. 11.4).
     */
    public Rigidities rigidities(double thicknessM) {
        double h3 = thicknessM * thicknessM * thicknessM;
        double denominator = 12 * (1 - poissonAlongAcross * poissonAcrossAlong());
        double d22 = elasticAcrossPa * h3 / denominator;
        return new Rigidities(elasticAlongPa * h3 / denominator, poissonAlongAcross * d22, d22, shearPa * h3 / 12);
    }

    /**
     * Young's modulus along a direction at angle theta to the grain:
     * 1/E(θ) = cos⁴θ/E_x + (1/G − 2 nu_xy/E_x) sin²θ cos²θ + sin⁴θ/E_y (Lekhnitskii; Jones, Mechanics of Composite Materials, 2.98).
     */
    public double elasticAlongDirection(double cos, double sin) {
        double c2 = cos * cos;
        double s2 = sin * sin;
        double compliance = c2 * c2 / elasticAlongPa + (1 / shearPa - 2 * poissonAlongAcross / elasticAlongPa) * s2 * c2
                + s2 * s2 / elasticAcrossPa;
        return 1 / compliance;
    }

    private static void positive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, got " + value);
        }
    }
}
