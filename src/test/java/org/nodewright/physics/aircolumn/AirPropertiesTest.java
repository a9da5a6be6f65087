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

    // Handbook values for dry air at 101.325 kPa (from memory of the CRC Handbook of Chemistry and
    // Physics tables for air): density, viscosity, thermal conductivity, ratio of specific heats.
    @ParameterizedTest
    @CsvSource({
        // t C, rho kg/m3, tol, mu Pa s, tol, kappa W/mK, tol, gamma, tol
        "0,  1.2922, 0.002, 1.716e-5, 0.02e-5, 0.0241, 0.0005, 1.403, 0.003",
        "20, 1.2041, 0.002, 1.813e-5, 0.02e-5, 0.0257, 0.0005, 1.402, 0.003",
        "30, 1.1644, 0.002, 1.86e-5,  0.03e-5, 0.0264, 0.0006, 1.401, 0.003",
    })
    void dryAirAgreesWithHandbookTables(double t, double rho, double rhoTol, double mu, double muTol, double kappa,
            double kappaTol, double gamma, double gammaTol) {
        AirProperties air = AirProperties.at(t, 0);
        assertThat(air.density()).isCloseTo(rho, offset(rhoTol));
        assertThat(air.viscosity()).isCloseTo(mu, offset(muTol));
        assertThat(air.thermalConductivity()).isCloseTo(kappa, offset(kappaTol));
        assertThat(air.gamma()).isCloseTo(gamma, offset(gammaTol));
        // Prandtl number of air about 0.71 (handbook value, from memory).
        assertThat(air.prandtl()).isCloseTo(0.71, offset(0.02));
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
