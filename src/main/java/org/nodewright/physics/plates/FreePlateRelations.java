package org.nodewright.physics.plates;

import org.nodewright.physics.Require;

/**
 * Closed-form relations between the constants of a thin free rectangular plate and its three lowest simple modes,
 * the starting point of the McIntyre &amp; Woodhouse (1988) measurement ({@link ElasticFit} refines them with the full
 * plate model).
 */
public final class FreePlateRelations {

    /**
     * First root of cos βL · cosh βL = 1, the free–free beam's first bending mode (Blevins, Formulas for Natural
     * Frequency and Mode Shape, Table 8-1: 4.73004074).
     */
    public static final double FREE_FREE_BETA_L = 4.730040744862704;

    private FreePlateRelations() {
    }

    /**
     * E of a strip from its first free–free bending mode across the length {@code spanM}: the Euler–Bernoulli beam
     * ω = (βL/L)² √(E h²/(12 ρ)) inverted, E = 12 ρ ω² L⁴ / ((βL)⁴ h²) (the plate's Poisson coupling left out).
     */
    public static double elasticFromBeamMode(double frequencyHz, double spanM, double thicknessM, double density) {
        Require.positive("frequencyHz", frequencyHz);
        Require.positive("spanM", spanM);
        Require.positive("thicknessM", thicknessM);
        Require.positive("density", density);
        double omega = 2 * Math.PI * frequencyHz;
        return 12 * density * omega * omega * Math.pow(spanM, 4) / (Math.pow(FREE_FREE_BETA_L, 4) * thicknessM * thicknessM);
    }

    /**
     * G from the twisting mode of an a × b free plate by Rayleigh's method with w = xy (origin at the centre):
     * strain energy ½·4D66·ab, kinetic energy ½ω²ρh·a³b³/144, so ω² = 576 D66 / (ρh a²b²) and with D66 = G h³/12,
     * G = ρ ω² a² b² / (48 h²).
     */
    public static double shearFromTwisting(double frequencyHz, double lengthM, double widthM, double thicknessM,
            double density) {
        Require.positive("frequencyHz", frequencyHz);
        Require.positive("lengthM", lengthM);
        Require.positive("widthM", widthM);
        Require.positive("thicknessM", thicknessM);
        Require.positive("density", density);
        double omega = 2 * Math.PI * frequencyHz;
        return density * omega * omega * lengthM * lengthM * widthM * widthM / (48 * thicknessM * thicknessM);
    }
}
