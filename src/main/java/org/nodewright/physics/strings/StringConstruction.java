package org.nodewright.physics.strings;

import org.nodewright.physics.Require;

/**
 * How a string is built: a solid core, optionally with one round wrap wire.
 *
 * <p>Packing model for the wrap: a helix of touching turns laid on the core, so the helix pitch
 * equals the wrap diameter d_w and the wire's centre line runs at radius r = (d_c + d_w)/2. Wire
 * length per unit string length is √((2πr)² + d_w²)/d_w. Bending stiffness comes from the core only:
 * the wrap turns are assumed to slide on one another and carry neither tension nor bending.
 *
 * @param core              core material
 * @param coreDiameterM     core diameter
 * @param wrap              wrap wire material, or null for a plain string
 * @param wrapDiameterM     wrap wire diameter (0 for a plain string)
 */
public record StringConstruction(Material core, double coreDiameterM, Material wrap, double wrapDiameterM) {

    public StringConstruction {
        if (core == null) {
            throw new IllegalArgumentException("core material is required");
        }
        Require.positive("coreDiameterM", coreDiameterM);
        if (wrap == null) {
            if (wrapDiameterM != 0) {
                throw new IllegalArgumentException("a wrap diameter needs a wrap material");
            }
        } else {
            Require.positive("wrapDiameterM", wrapDiameterM);
        }
    }

    public static StringConstruction plain(Material core, double diameterM) {
        return new StringConstruction(core, diameterM, null, 0);
    }

    public static StringConstruction wound(Material core, double coreDiameterM, Material wrap, double wrapDiameterM) {
        return new StringConstruction(core, coreDiameterM, wrap, wrapDiameterM);
    }

    public boolean isWound() {
        return wrap != null;
    }

    /** Overall diameter d_c + 2·d_w. */
    public double outerDiameterM() {
        return coreDiameterM + 2 * wrapDiameterM;
    }

    /** μ = ρ_c·π·d_c²/4 + (wrap mass per unit length), kg/m. */
    public double linearDensityKgPerM() {
        return coreLinearDensity() + wrapLinearDensity();
    }

    /** Solid cylinder: μ = ρ·π·d²/4. */
    public double coreLinearDensity() {
        return core.densityKgPerM3() * Math.PI * coreDiameterM * coreDiameterM / 4;
    }

    /** Touching-turn helix: ρ_w·(π·d_w²/4)·√((2π·r)² + d_w²)/d_w with r = (d_c + d_w)/2. */
    public double wrapLinearDensity() {
        if (wrap == null) {
            return 0;
        }
        double r = (coreDiameterM + wrapDiameterM) / 2;
        double wireArea = Math.PI * wrapDiameterM * wrapDiameterM / 4;
        double wirePerLength = Math.hypot(2 * Math.PI * r, wrapDiameterM) / wrapDiameterM;
        return wrap.densityKgPerM3() * wireArea * wirePerLength;
    }

    /** Bending stiffness E·I of the core alone, I = π·d_c⁴/64 (solid circular section). */
    public double bendingStiffnessNm2() {
        return core.youngsModulusPa() * secondMomentOfArea(coreDiameterM);
    }

    /** I = π·d⁴/64 for a solid round section. */
    public static double secondMomentOfArea(double diameterM) {
        return Math.PI * Math.pow(diameterM, 4) / 64;
    }
}
