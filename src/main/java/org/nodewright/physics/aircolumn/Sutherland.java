package org.nodewright.physics.aircolumn;

/**
 * Sutherland's law for air, with the constants of F. M. White, Viscous Fluid Flow, 3rd ed. (2006),
 * Tables 1-2 (viscosity) and 1-3 (thermal conductivity); about 2 % accuracy over 170..1900 K.
 */
final class Sutherland {

    private static final double T0 = 273.15;

    private Sutherland() {
    }

    /** Dynamic viscosity, Pa s: mu0 (T/T0)^1.5 (T0 + S)/(T + S), mu0 = 1.716e-5, S = 110.4 K (White). */
    static double viscosity(double tKelvin) {
        return law(1.716e-5, 110.4, tKelvin);
    }

    /** Thermal conductivity, W/(m K): k0 = 0.0241, S = 194 K (White). */
    static double thermalConductivity(double tKelvin) {
        return law(0.0241, 194.0, tKelvin);
    }

    private static double law(double v0, double s, double t) {
        return v0 * Math.pow(t / T0, 1.5) * (T0 + s) / (t + s);
    }
}
