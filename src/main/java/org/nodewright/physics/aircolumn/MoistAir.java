package org.nodewright.physics.aircolumn;

/** Water-vapour content and density of moist air. */
final class MoistAir {

    private MoistAir() {
    }

    /** Saturation vapour pressure over water, Pa: Davis, Metrologia 29, 67 (1992) (CIPM-81/91), T in K. */
    static double saturationVapourPressure(double tKelvin) {
        double T = tKelvin;
        return Math.exp(1.2378847e-5 * T * T - 1.9121316e-2 * T + 33.93711047 - 6.3431645e3 / T);
    }

    /** Enhancement factor f = 1.00062 + 3.14e-8 p + 5.6e-7 t^2: Davis 1992 (CIPM-81/91). */
    static double enhancementFactor(double tC, double p) {
        return 1.00062 + 3.14e-8 * p + 5.6e-7 * tC * tC;
    }

    /** Mole fraction of water vapour xw = h f psv / p (Davis 1992, used by Cramer 1993). */
    static double waterMoleFraction(double tC, double rhPct, double p) {
        return rhPct / 100.0 * enhancementFactor(tC, p) * saturationVapourPressure(tC + 273.15) / p;
    }

    /** Molar mass of dry air with CO2 fraction xc, kg/mol: CIPM-2007, Picard et al. 2008 eq. (A1.1). */
    static double dryMolarMass(double xc) {
        return (28.96546 + 12.011 * (xc - 0.0004)) * 1e-3;
    }

    /** Molar mass of the moist mixture, kg/mol. */
    static double molarMass(double xw, double xc) {
        return (1 - xw) * dryMolarMass(xc) + xw * AirProperties.M_WATER;
    }

    /**
     * Density, kg/m^3: CIPM-2007 rho = p Ma / (Z R T) (1 - xv (1 - Mv/Ma)), compressibility Z from
     * Picard et al., Metrologia 45, 149 (2008), eq. (A1.4).
     */
    static double density(double tC, double p, double xw, double xc) {
        double T = tC + 273.15;
        double ma = dryMolarMass(xc);
        // Picard et al. 2008 eq. (A1.4), coefficients of Table A1.
        double z = 1 - p / T * (1.58123e-6 - 2.9331e-8 * tC + 1.1043e-10 * tC * tC + (5.707e-6 - 2.051e-8 * tC) * xw
                + (1.9898e-4 - 2.376e-6 * tC) * xw * xw) + p * p / (T * T) * (1.83e-11 - 0.765e-8 * xw * xw);
        return p * ma / (z * AirProperties.R_MOLAR * T) * (1 - xw * (1 - AirProperties.M_WATER / ma));
    }
}
