package org.nodewright.physics.bars;

/** Timoshenko shear coefficients after Cowper, "The shear coefficient in Timoshenko's beam theory", J. Appl. Mech. 33 (1966). */
public final class CowperShearCoefficient {

    private CowperShearCoefficient() {
    }

    /** Rectangle: κ = 10 (1 + ν) / (12 + 11 ν) (Cowper 1966, Table 1). */
    public static double rectangle(double nu) {
        check(nu);
        return 10 * (1 + nu) / (12 + 11 * nu);
    }

    /**
     * Hollow circle with inner/outer radius ratio m (0 for a solid rod):
     * κ = 6 (1 + ν)(1 + m²)² / [(7 + 6ν)(1 + m²)² + (20 + 12ν) m²] (Cowper 1966, Table 1).
     */
    public static double tube(double nu, double m) {
        check(nu);
        if (!(m >= 0 && m < 1)) {
            throw new IllegalArgumentException("radius ratio must be 0 <= m < 1, got " + m);
        }
        double q = (1 + m * m) * (1 + m * m);
        return 6 * (1 + nu) * q / ((7 + 6 * nu) * q + (20 + 12 * nu) * m * m);
    }

    /**
     * The Poisson's ratio the coefficient is taken at: ν = E / (2G) − 1 for an isotropic material;
     * an orthotropic one (wood, fibre composites), whose E/(2G) − 1 falls outside 0..0.5, is taken at
     * ν = 0, which gives Timoshenko's classic 5/6 for the rectangle.
     */
    public static double poissonFor(double youngsModulus, double shearModulus) {
        double nu = youngsModulus / (2 * shearModulus) - 1;
        return nu >= 0 && nu <= 0.5 ? nu : 0.0;
    }

    private static void check(double nu) {
        if (!(nu > -1 && nu <= 0.5)) {
            throw new IllegalArgumentException("Poisson's ratio must be -1 < nu <= 0.5, got " + nu);
        }
    }
}
