package org.nodewright.physics.strings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class MaterialsAndConstructionTest {

    // Handbook densities (kg/m³), from memory: CRC Handbook of Chemistry and Physics for copper
    // (8960) and nickel (8908); ASM Metals Handbook for carbon steel (7850) and 302/304 stainless
    // (7900–8000); Copper Development Association data sheets for C51000 phosphor bronze (8860) and
    // C24000 low brass (8670); polymer handbooks for nylon 6,6 (1140) and PVDF (1780). Gut: the
    // 1280–1330 range quoted for gut strings (from memory). Tolerance: the spread between sources.
    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
            plain-steel,          7850, 0.01
            stainless-steel,      7950, 0.015
            nickel-plated-steel,  7850, 0.015
            phosphor-bronze,      8860, 0.01
            bronze-80-20,         8670, 0.01
            copper,               8960, 0.01
            nylon,                1140, 0.02
            fluorocarbon,         1780, 0.02
            gut,                  1305, 0.03
            """)
    void catalogueDensitiesAgreeWithHandbooks(String id, double handbook, double relTol) {
        Material m = Materials.get(id);
        assertThat(m.densityKgPerM3()).isCloseTo(handbook, within(handbook * relTol));
        assertThat(m.source()).contains("from memory");
        assertThat(m.tensileStrengthPa()).isGreaterThan(1e8);
    }

    // μ = ρ·π·d²/4 for a solid round wire, worked by hand with the catalogue densities.
    @ParameterizedTest(name = "{0} {1} m")
    @CsvSource(textBlock = """
            plain-steel, 0.30e-3, 5.548838e-4
            plain-steel, 0.25e-3, 3.853360e-4
            nylon,       0.70e-3, 4.387234e-4
            """)
    void plainLinearDensity(String id, double d, double mu) {
        assertThat(StringConstruction.plain(Materials.get(id), d).linearDensityKgPerM()).isCloseTo(mu, within(mu * 1e-6));
    }

    // Wound string, touching-turn helix: a 0.40 mm steel core with a 0.38 mm nickel-plated wrap.
    // Worked by hand: core 9.864601e-4, wrap ρ·(πd_w²/4)·√((π(d_c+d_w))² + d_w²)/d_w = 5.824422e-3.
    // Common practice cross-check: close-wound round wire fills π/4 of the annulus it occupies,
    // π/4·ρ·π·d_w·(d_c+d_w) = 5.755628e-3, which the helix exceeds only by its lead angle (1.2 %).
    @Test
    void woundLinearDensityFollowsTheTouchingHelix() {
        StringConstruction s = StringConstruction.wound(Materials.get("plain-steel"), 0.40e-3,
                Materials.get("nickel-plated-steel"), 0.38e-3);
        assertThat(s.coreLinearDensity()).isCloseTo(9.864601e-4, within(1e-9));
        assertThat(s.wrapLinearDensity()).isCloseTo(5.824422e-3, within(1e-9));
        assertThat(s.linearDensityKgPerM()).isCloseTo(6.810882e-3, within(1e-9));
        double packed = Math.PI / 4 * 7870 * Math.PI * 0.38e-3 * (0.40e-3 + 0.38e-3);
        assertThat(s.wrapLinearDensity() / packed).isBetween(1.0, 1.015);
        // Stiffness from the core only.
        assertThat(s.bendingStiffnessNm2()).isEqualTo(
                StringConstruction.plain(Materials.get("plain-steel"), 0.40e-3).bendingStiffnessNm2());
        assertThat(s.outerDiameterM()).isCloseTo(1.16e-3, within(1e-12));
    }

    // σ = T/(πd²/4); warnings above 75 % and 90 % of the typical tensile strength (our thresholds).
    // The core gives the level; the words are tested with the web layer (StressWordingTest).
    @ParameterizedTest(name = "{0} of strength")
    @CsvSource(textBlock = """
            0.50, NONE
            0.74, NONE
            0.76, WARNING
            0.89, WARNING
            0.91, DANGER
            1.20, DANGER
            """)
    void stressLevels(double fraction, StressCheck.Level level) {
        double d = 0.3e-3;
        double strength = 2.6e9;
        double t = fraction * strength * Math.PI * d * d / 4;
        StressCheck c = StressCheck.of(t, d, strength);
        assertThat(c.stressPa()).isCloseTo(fraction * strength, within(1e-3));
        assertThat(c.level()).isEqualTo(level);
    }
}
