package org.nodewright.physics.strings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class FretsSetsAndGaugeTest {

    // Equal temperament: x_k = L·(1 − 2^(−k/N)), values worked by hand for L = 650 mm. The octave
    // fret (k = N) sits at L/2 for any N.
    @ParameterizedTest(name = "N={0} fret {1}")
    @CsvSource(textBlock = """
            12,  1,  36.481697
            12,  5, 163.050200
            12, 12, 325.000000
            12, 24, 487.500000
            24,  2,  36.481697
            19, 19, 325.000000
            31, 10, 130.235150
            """)
    void fretPositionsFromTheNut(int n, int fret, double mm) {
        List<Fret> frets = Frets.equalDivisions(650, fret, n);
        assertThat(frets.get(fret - 1).fromNutM()).isCloseTo(mm, within(1e-5));
    }

    // Common practice: each fret sits 1/17.817 of the remaining length past the previous one
    // (17.817 = 1/(1 − 2^(−1/12)) rounded); agrees to well under 0.01 mm on a 650 mm scale.
    @Test
    void ruleOfSeventeenPointEightOneSeven() {
        double previous = 0;
        for (Fret f : Frets.equalDivisions(650, 24, 12)) {
            assertThat(f.fromPreviousM()).isCloseTo((650 - previous) / 17.817, within(0.01));
            assertThat(f.fromNutM() - previous).isCloseTo(f.fromPreviousM(), within(1e-9));
            previous = f.fromNutM();
        }
    }

    // Set tension T = μ(2Lf)², worked by hand: 0.25 mm plain steel (μ = 3.853360e-4 kg/m) at
    // 329.63 Hz on 650 mm needs 70.7587 N; the same string on a 680 mm multi-scale length
    // needs (680/650)² times that, 77.4410 N.
    @Test
    void setTensionsAndNeckLoad() {
        StringConstruction e = StringConstruction.plain(Materials.get("plain-steel"), 0.25e-3);
        StringSets.Result r = StringSets.analyze(List.of(
                new SetString(0.650, 329.63, e), new SetString(0.680, 329.63, e)), false, EndCondition.PINNED, 440);
        assertThat(r.members().get(0).tensionN()).isCloseTo(70.7587, within(1e-4));
        assertThat(r.members().get(1).tensionN()).isCloseTo(77.4410, within(1e-4));
        assertThat(r.totalTensionN()).isCloseTo(70.7587 + 77.4410, within(2e-4));
        assertThat(r.members().get(0).note().name()).isEqualTo("E4");
    }

    // Diameter for a wanted tension: closed form for a flexible plain string, d = √(T/(πρ))/(L·f)
    // (worked by hand: 70 N at 329.63 Hz on 650 mm of plain steel gives 0.248656 mm); with stiffness
    // or for a wrap the solved diameter must give back the wanted tension.
    @Test
    void diameterForAWantedTension() {
        Material steel = Materials.get("plain-steel");
        double d = GaugeSolver.plainFlexibleDiameterM(steel.densityKgPerM3(), 0.65, 329.63, 70);
        assertThat(d).isCloseTo(0.248656e-3, within(1e-9));
        GaugeSolver solver = new GaugeSolver();
        double solvedFlexible = solver.diameterM(x -> StringConstruction.plain(steel, x), 0.2e-3, 0.65, 329.63, 70,
                false, EndCondition.PINNED);
        assertThat(solvedFlexible).isCloseTo(d, within(1e-12));
        for (EndCondition end : EndCondition.values()) {
            double stiff = solver.diameterM(x -> StringConstruction.plain(steel, x), 0.2e-3, 0.65, 329.63, 70, true, end);
            StringConstruction c = StringConstruction.plain(steel, stiff);
            double t = new TensionSolver().tensionFor(0.65, c.linearDensityKgPerM(), c.bendingStiffnessNm2(), end, 329.63);
            assertThat(t).isCloseTo(70, within(1e-8));
            assertThat(stiff).isGreaterThan(d);
        }
        Material wrap = Materials.get("phosphor-bronze");
        double w = solver.diameterM(x -> StringConstruction.wound(steel, 0.4e-3, wrap, x), 0.3e-3, 0.65, 82.41, 80,
                true, EndCondition.PINNED);
        StringConstruction c = StringConstruction.wound(steel, 0.4e-3, wrap, w);
        double t = new TensionSolver().tensionFor(0.65, c.linearDensityKgPerM(), c.bendingStiffnessNm2(),
                EndCondition.PINNED, 82.41);
        assertThat(t).isCloseTo(80, within(1e-8));
    }
}
