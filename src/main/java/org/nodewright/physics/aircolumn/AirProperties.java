package org.nodewright.physics.aircolumn;

/**
 * Properties of moist air at a temperature and relative humidity (sea-level pressure 101 325 Pa,
 * CO2 mole fraction 0.0004), in SI units.
 *
 * <ul>
 *   <li>speed of sound and ratio of specific heats: Cramer, J. Acoust. Soc. Am. 93, 2510 (1993);</li>
 *   <li>water-vapour mole fraction: saturation pressure and enhancement factor of Davis,
 *       Metrologia 29, 67 (1992) (CIPM-81/91);</li>
 *   <li>density: CIPM-2007 equation for moist air, Picard et al., Metrologia 45, 149 (2008);</li>
 *   <li>viscosity and thermal conductivity: Sutherland's law with the constants of White,
 *       Viscous Fluid Flow, 3rd ed. (2006), Table 1-2 and 1-3 (dry air; humidity neglected);</li>
 *   <li>specific heat at constant pressure: cp = gamma R / ((gamma - 1) M) for the moist mixture.</li>
 * </ul>
 *
 * @param temperatureC        air temperature, degrees Celsius
 * @param relativeHumidityPct relative humidity, percent
 * @param speedOfSound        m/s
 * @param density             kg/m^3
 * @param viscosity           dynamic viscosity, Pa s
 * @param thermalConductivity W/(m K)
 * @param gamma               ratio of specific heats
 * @param specificHeatCp      J/(kg K)
 */
public record AirProperties(double temperatureC, double relativeHumidityPct, double speedOfSound, double density,
        double viscosity, double thermalConductivity, double gamma, double specificHeatCp) {

    /** Standard atmosphere, Pa (ISO 2533). */
    public static final double SEA_LEVEL_PA = 101_325.0;
    /** CO2 mole fraction of present-day air (common practice, about 400 ppm). */
    public static final double CO2_MOLE_FRACTION = 0.0004;
    /** Highest CO2 mole fraction of Cramer's 1993 fit. */
    public static final double CRAMER_MAX_CO2 = 0.01;
    /** Molar gas constant as used by CIPM-2007, J/(mol K). */
    static final double R_MOLAR = 8.314472;
    /** Molar mass of water, kg/mol (CIPM-2007). */
    static final double M_WATER = 18.01528e-3;

    public AirProperties {
        requireFinite(temperatureC, "temperatureC");
        requireFinite(relativeHumidityPct, "relativeHumidityPct");
        if (!(speedOfSound > 0 && density > 0 && viscosity > 0 && thermalConductivity > 0 && gamma > 1
                && specificHeatCp > 0)) {
            throw new IllegalArgumentException("air properties must be positive (gamma > 1): c=" + speedOfSound
                    + " rho=" + density + " mu=" + viscosity + " kappa=" + thermalConductivity + " gamma=" + gamma
                    + " cp=" + specificHeatCp);
        }
    }

    /**
     * Air at the given temperature (-50..60 C) and relative humidity (0..100 %) at 101 325 Pa.
     *
     * @throws IllegalArgumentException outside those ranges
     */
    public static AirProperties at(double temperatureC, double relativeHumidityPct) {
        return of(temperatureC, relativeHumidityPct, CO2_MOLE_FRACTION);
    }

    /**
     * Air with the given CO2 mole fraction (0..0.2; breath is about 0.04), e.g. inside an
     * instrument while it is played. Up to {@link #CRAMER_MAX_CO2} speed of sound and gamma are
     * Cramer's; above it Cramer's values at that limit are scaled by the ratio of the ideal-gas
     * mixture ({@link IdealGasMixture}) at the actual and at the limiting CO2 fraction, so the
     * two join without a step. Density follows CIPM-2007 with its CO2-for-O2 molar mass.
     * Viscosity and thermal conductivity stay those of dry air at the temperature (water vapour
     * and CO2 change them by about 1 %, which moves wall-loss pitch shifts by well under 0.1 cent).
     *
     * @throws IllegalArgumentException outside -50..60 C, 0..100 % or 0..0.2
     */
    public static AirProperties of(double temperatureC, double relativeHumidityPct, double co2MoleFraction) {
        if (!(temperatureC >= -50 && temperatureC <= 60)) {
            throw new IllegalArgumentException("temperatureC must be within -50..60, was " + temperatureC);
        }
        if (!(relativeHumidityPct >= 0 && relativeHumidityPct <= 100)) {
            throw new IllegalArgumentException("relativeHumidityPct must be within 0..100, was " + relativeHumidityPct);
        }
        if (!(co2MoleFraction >= 0 && co2MoleFraction <= 0.2)) {
            throw new IllegalArgumentException("co2MoleFraction must be within 0..0.2, was " + co2MoleFraction);
        }
        double p = SEA_LEVEL_PA;
        double xw = MoistAir.waterMoleFraction(temperatureC, relativeHumidityPct, p);
        double xc = co2MoleFraction;
        double c;
        double gamma;
        if (xc <= CRAMER_MAX_CO2) {
            c = Cramer1993.speedOfSound(temperatureC, p, xw, xc);
            gamma = Cramer1993.ratioOfSpecificHeats(temperatureC, p, xw, xc);
        } else {
            double[] mix = IdealGasMixture.speedAndGamma(temperatureC, xw, xc);
            double[] edge = IdealGasMixture.speedAndGamma(temperatureC, xw, CRAMER_MAX_CO2);
            c = Cramer1993.speedOfSound(temperatureC, p, xw, CRAMER_MAX_CO2) * mix[0] / edge[0];
            gamma = Cramer1993.ratioOfSpecificHeats(temperatureC, p, xw, CRAMER_MAX_CO2) * mix[1] / edge[1];
        }
        double rho = MoistAir.density(temperatureC, p, xw, xc);
        double mu = Sutherland.viscosity(temperatureC + 273.15);
        double kappa = Sutherland.thermalConductivity(temperatureC + 273.15);
        double molarMass = MoistAir.molarMass(xw, xc);
        double cp = gamma * R_MOLAR / ((gamma - 1) * molarMass);
        return new AirProperties(temperatureC, relativeHumidityPct, c, rho, mu, kappa, gamma, cp);
    }

    /** Prandtl number mu cp / kappa. */
    public double prandtl() {
        return viscosity * specificHeatCp / thermalConductivity;
    }

    private static void requireFinite(double v, String name) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(name + " must be finite, was " + v);
        }
    }
}
