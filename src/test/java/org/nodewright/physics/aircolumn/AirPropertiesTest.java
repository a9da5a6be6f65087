package org.nodewright.physics.aircolumn;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.data.Offset.offset;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class AirPropertiesTest {

    @Test
    void cramerSpeedOfSoundInDryAirAt20C() {
        // Cramer, J. Acoust. Soc. Am. 93, 2510 (1993): his formula gives about 343.36 m/s at 20 C,
        // 101.325 kPa, dry air with ~400 ppm CO2; handbooks round to 343.2..343.4.
        assertThat(AirProperties.at(20, 0).speedOfSound()).isCloseTo(343.36, offset(0.01));
    }

    // Dry air at 1 atm from Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.4
    // "Thermophysical properties of gases at atmospheric pressure", rows 250 K and 300 K (from memory
    // of the table): viscosity, thermal conductivity, Prandtl number. Not the 273.15 K reference
    // point of the Sutherland constants the code uses (that row would check the constants against
    // themselves). Tolerances: 0.5 % on mu and kappa (the table gives four digits; Sutherland's law
    // agrees with modern correlations to a few tenths of a percent between 250 and 330 K), 0.005 on Pr.
    @ParameterizedTest
    @CsvSource({
        // T K, mu Pa s, kappa W/(m K), Pr
        "250, 159.6e-7, 22.3e-3, 0.720",
        "300, 184.6e-7, 26.3e-3, 0.707",
    })
    void dryAirTransportPropertiesAgreeWithTheHandbookTable(double tK, double mu, double kappa, double pr) {
        AirProperties air = AirProperties.at(tK - 273.15, 0);
        assertThat(air.viscosity()).isCloseTo(mu, offset(mu * 0.005));
        assertThat(air.thermalConductivity()).isCloseTo(kappa, offset(kappa * 0.005));
        assertThat(air.prandtl()).isCloseTo(pr, offset(0.005));
    }

    @ParameterizedTest
    @CsvSource({"0", "20", "30"})
    void dryAirDensityIsTheIdealGasLawWithinTheCompressibility(double t) {
        // Independent formula written here: rho = p M / (Z R T), M = 28.96546 g/mol for dry air with
        // 400 ppm CO2 (Picard et al., Metrologia 45, 149, 2008, CIPM-2007), R = 8.314462618 J/(mol K)
        // (CODATA 2018), Z = 0.9996 at 20 C (CIPM-2007, from memory). The tolerance, 0.03 %, is Z's own
        // variation over 0..30 C (about 0.9994..0.9997); a wrong molar mass or gas constant moves rho more.
        double expected = 101_325.0 * 28.96546e-3 / (0.9996 * 8.314462618 * (t + 273.15));
        assertThat(AirProperties.at(t, 0).density()).isCloseTo(expected, offset(expected * 3e-4));
        // Ratio of specific heats of dry air near room temperature: 1.402 (Cramer 1993, his figure; from
        // memory), within 0.001.
        assertThat(AirProperties.at(t, 0).gamma()).isCloseTo(1.402, offset(0.0015));
    }

    @Test
    void speedOfSoundAgreesWithMeasurementAndTheStandardAtmosphere() {
        // 0 C, dry: 331.45 m/s, the measurement of Hardy, Telfair & Pielemeier, J. Acoust. Soc. Am. 13,
        // 226 (1942) (from memory), within their +-0.05 m/s.
        assertThat(AirProperties.at(0, 0).speedOfSound()).isCloseTo(331.45, offset(0.05));
        // 15 C: 340.294 m/s in the U.S. Standard Atmosphere 1976 sea-level table, which takes gamma =
        // 1.400 exactly; real dry air has gamma = 1.4023 there (+0.08 %, so +0.04 % in c = +0.14 m/s).
        assertThat(AirProperties.at(15, 0).speedOfSound()).isCloseTo(340.294 + 0.14, offset(0.03));
    }

    @Test
    void humidityRaisesTheSpeedOfSoundAndLowersTheDensity() {
        // Cramer 1993 Table/figures: at 20 C, 50 % RH adds about 0.6 m/s (from memory); moist air is
        // lighter than dry air (CIPM-2007, Picard et al. 2008): about 1.199 kg/m3 at 20 C, 50 % RH.
        AirProperties humid = AirProperties.at(20, 50);
        assertThat(humid.speedOfSound() - AirProperties.at(20, 0).speedOfSound()).isBetween(0.45, 0.75);
        assertThat(humid.density()).isCloseTo(1.199, offset(0.002));
    }

    @Test
    void outOfRangeAirIsRefused() {
        assertThatThrownBy(() -> AirProperties.at(80, 0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> AirProperties.at(20, 120)).isInstanceOf(IllegalArgumentException.class);
    }
}
