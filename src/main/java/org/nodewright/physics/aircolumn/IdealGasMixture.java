package org.nodewright.physics.aircolumn;

/**
 * Speed of sound and ratio of specific heats of an ideal-gas mixture of dry air, water vapour and
 * CO2, c = sqrt(gamma R T / M) with gamma = Cp / (Cp - R) and Cp = sum x_i Cp_i (the ideal-gas
 * mixture rule; e.g. Cramer 1993 §II uses it as the low-pressure limit of his fit). Dry air is
 * N2 0.78084, Ar 0.00934 and O2 + CO2 = 0.20986 (mole fractions), breath's CO2 taking the place of
 * O2 as in respiration; the CIPM-2007 molar mass of dry air, Picard et al. 2008 eq. (A1.1), makes
 * the same substitution. Molar heat capacities at 298.15 K and their slopes near it from the
 * JANAF thermochemical tables (Chase, NIST-JANAF 4th ed., 1998), from memory.
 *
 * <p>Used only above Cramer's range (CO2 above 1 %), as a ratio to the same mixture at 1 %, so that
 * the real-gas level comes from Cramer's fit and the composition dependence from this rule.
 */
final class IdealGasMixture {

    // Cp [J/(mol K)] at 298.15 K and dCp/dT [J/(mol K^2)] near it (JANAF, from memory).
    private static final double CP_N2 = 29.124, DCP_N2 = 0.0013;
    private static final double CP_O2 = 29.376, DCP_O2 = 0.0071;
    private static final double CP_AR = 20.786, DCP_AR = 0.0;
    private static final double CP_CO2 = 37.135, DCP_CO2 = 0.041;
    private static final double CP_H2O = 33.590, DCP_H2O = 0.0066;
    private static final double X_N2 = 0.78084, X_AR = 0.00934, X_O2_PLUS_CO2 = 0.20986;
    // Molar masses, kg/mol (IUPAC standard atomic weights).
    private static final double M_N2 = 28.0134e-3, M_O2 = 31.9988e-3, M_AR = 39.948e-3, M_CO2 = 44.0095e-3;

    private IdealGasMixture() {
    }

    /** {speed of sound m/s, gamma} at t (C), water mole fraction xw and CO2 mole fraction xc of the mixture. */
    static double[] speedAndGamma(double tC, double xw, double xc) {
        double dt = tC + 273.15 - 298.15;
        double dry = 1 - xw;
        double xcd = xc / dry; // CO2 fraction of the dry part
        double xo2 = X_O2_PLUS_CO2 - xcd;
        double norm = X_N2 + X_AR + X_O2_PLUS_CO2;
        double n2 = dry * X_N2 / norm;
        double ar = dry * X_AR / norm;
        double o2 = dry * xo2 / norm;
        double co2 = dry * xcd / norm;
        double cp = n2 * (CP_N2 + DCP_N2 * dt) + o2 * (CP_O2 + DCP_O2 * dt) + ar * (CP_AR + DCP_AR * dt)
                + co2 * (CP_CO2 + DCP_CO2 * dt) + xw * (CP_H2O + DCP_H2O * dt);
        double m = n2 * M_N2 + o2 * M_O2 + ar * M_AR + co2 * M_CO2 + xw * AirProperties.M_WATER;
        double r = AirProperties.R_MOLAR;
        double gamma = cp / (cp - r);
        return new double[] {Math.sqrt(gamma * r * (tC + 273.15) / m), gamma};
    }
}
