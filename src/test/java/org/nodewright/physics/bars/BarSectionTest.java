package org.nodewright.physics.bars;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.tuning.Cents;

/** Section properties, shear coefficients, torsion constants and the twisting family. */
class BarSectionTest {

    // Hollow circle, Roark's Formulas for Stress and Strain (7th ed., Table A.1):
    // A = π(D² − d²)/4, I = π(D⁴ − d⁴)/64, J = π(D⁴ − d⁴)/32, evaluated with python3 (math module)
    // for a 25.4 x 22.0 mm chime tube: 126.574768 mm², 8932.697816 mm⁴, 17865.395631 mm⁴.
    @Test
    void tubeSectionProperties() {
        TubeSection tube = new TubeSection(0.0254, 0.0220);
        assertThat(tube.area(0) * 1e6).isCloseTo(126.574768, within(1e-5));
        assertThat(tube.secondMoment(0) * 1e12).isCloseTo(8932.697816, within(1e-5));
        assertThat(tube.torsionConstant(0) * 1e12).isCloseTo(17865.395631, within(1e-5));
        assertThat(tube.polarSecondMoment(0)).isEqualTo(tube.torsionConstant(0));
    }

    // Cowper, J. Appl. Mech. 33 (1966), Table 1, at ν = 0.3: rectangle 0.850 (10(1+ν)/(12+11ν)),
    // solid circle 0.886, thin-walled round tube 2(1+ν)/(4+3ν) = 0.531 (limit m → 1). 3 decimals.
    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
            rectangle, 0.0,   0.850
            circle,    0.0,   0.886
            tube,      0.999, 0.531
            """)
    void cowperShearCoefficients(String shape, double m, double kappa) {
        double got = shape.equals("rectangle") ? CowperShearCoefficient.rectangle(0.3)
                : CowperShearCoefficient.tube(0.3, m);
        assertThat(got).isCloseTo(kappa, within(0.0006));
    }

    // The material's Poisson's ratio: isotropic steel E 200, G 80 GPa gives 0.25; a wood
    // (E/2G − 1 far above 0.5) is taken at ν = 0, Timoshenko's 5/6 for the rectangle.
    @Test
    void orthotropicMaterialsTakeTheClassicCoefficient() {
        assertThat(CowperShearCoefficient.poissonFor(200e9, 80e9)).isCloseTo(0.25, within(1e-12));
        assertThat(CowperShearCoefficient.poissonFor(20e9, 1.5e9)).isZero();
        assertThat(CowperShearCoefficient.rectangle(0)).isCloseTo(5.0 / 6.0, within(1e-15));
    }

    // Saint-Venant torsion constant J = β a b³ of a rectangle a x b (a ≥ b), Timoshenko and Goodier,
    // Theory of Elasticity (1951), §109 table of β (3 decimals; tolerance 0.0006).
    @ParameterizedTest(name = "a/b = {0}: β = {1}")
    @CsvSource(textBlock = """
            1.0,  0.141
            1.5,  0.196
            2.0,  0.229
            3.0,  0.263
            4.0,  0.281
            5.0,  0.291
            10.0, 0.312
            1000, 0.333
            """)
    void rectangleTorsionConstant(double ratio, double beta) {
        double b = 0.01;
        double a = ratio * b;
        assertThat(SaintVenantTorsion.rectangle(a, b) / (a * b * b * b)).isCloseTo(beta, within(0.0006));
        assertThat(SaintVenantTorsion.rectangle(b, a)).isEqualTo(SaintVenantTorsion.rectangle(a, b));
    }

    // Twisting of a uniform bar is the wave equation with speed c = √(GJ/(ρ I_p)): free–free
    // f_n = n c / 2L, clamped–free f_n = (2n − 1) c / 4L (Rao, Vibration of Continuous Systems, 2007,
    // ch. 7, torsional vibration of shafts). Tolerance 0.05 cent; nodes at the closed-form places.
    @ParameterizedTest(name = "{0} mode {1}")
    @CsvSource(textBlock = """
            FREE_FREE,    1, 1.0
            FREE_FREE,    2, 2.0
            FREE_FREE,    3, 3.0
            CLAMPED_FREE, 1, 0.5
            CLAMPED_FREE, 2, 1.5
            """)
    void twistingModesOfAUniformBar(BarEnds ends, int n, double halfWaves) {
        double len = 0.38;
        RectangleSection s = RectangleSection.uniform(0.06, 0.022, len);
        Bar bar = new Bar(len, s, 1000, 20e9, 1.5e9, ends);
        List<BarMode> twisting = TwistingFamily.modes(bar, 4);
        double c = Math.sqrt(1.5e9 * s.torsionConstant(0) / (1000 * s.polarSecondMoment(0)));
        BarMode m = twisting.get(n - 1);
        assertThat(m.family()).isEqualTo(ModeFamily.TWISTING);
        assertThat(Cents.between(m.frequencyHz(), halfWaves * c / (2 * len))).isCloseTo(0.0, within(0.05));
        if (ends == BarEnds.FREE_FREE) {
            // nodes at (2j − 1) L / 2n
            for (int j = 1; j <= n; j++) {
                assertThat(m.nodes().get(j - 1)).isCloseTo((2 * j - 1) * len / (2 * n), within(2e-5));
            }
        }
    }

    // Bending across the width of a uniform rectangle: Euler–Bernoulli frequencies scale by b/t
    // (I = t b³/12 instead of b t³/12, same mass), so f_lateral/f = 60/22 exactly.
    @Test
    void lateralBendingScalesWithWidthOverThickness() {
        Bar bar = new Bar(0.38, RectangleSection.uniform(0.06, 0.022, 0.38), 1000, 20e9, 1.5e9, BarEnds.FREE_FREE);
        BarAnalysis a = BarAnalyzer.analyze(bar, BeamTheory.EULER_BERNOULLI, 6, true);
        BarMode lateral = a.others().stream().filter(m -> m.family() == ModeFamily.LATERAL_BENDING).findFirst()
                .orElseThrow();
        assertThat(lateral.frequencyHz() / a.fundamentalHz()).isCloseTo(60.0 / 22.0, within(1e-6));
        assertThat(a.others()).extracting(BarMode::frequencyHz).isSorted();
        assertThat(a.others()).allMatch(m -> m.n() == 1 || m.frequencyHz() <= a.bending().get(5).frequencyHz());
    }

    @Test
    void roundSectionsHaveNoLateralFamily() {
        Bar rod = new Bar(0.3, new RoundSection(0.01), 7850, 205e9, 80e9, BarEnds.FREE_FREE);
        BarAnalysis a = BarAnalyzer.analyze(rod, BeamTheory.TIMOSHENKO, 3, true);
        assertThat(a.others()).isNotEmpty().allMatch(m -> m.family() == ModeFamily.TWISTING);
    }

    // Bad input never reaches the core unchecked, but the core still refuses it.
    @Test
    void badGeometryIsRefused() {
        assertThatThrownBy(() -> new TubeSection(0.02, 0.02)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("bore");
        assertThatThrownBy(() -> new TubeSection(0.02, 0.025)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> ThicknessProfile.of(new double[] {0, 0.1}, new double[] {0.02, 0}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("thickness[1]");
        assertThatThrownBy(() -> ThicknessProfile.of(new double[] {0.01, 0.1}, new double[] {0.02, 0.02}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("position 0");
        assertThatThrownBy(() -> ThicknessProfile.of(new double[] {0, 0.1, 0.1}, new double[] {0.02, 0.02, 0.02}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("ascend");
        RectangleSection shortProfile = new RectangleSection(0.05, ThicknessProfile.uniform(0.3, 0.02));
        assertThatThrownBy(() -> new Bar(0.38, shortProfile, 1000, 20e9, 1.5e9, BarEnds.FREE_FREE))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("cover");
        Bar ok = new Bar(0.38, RectangleSection.uniform(0.05, 0.02, 0.38), 1000, 20e9, 1.5e9, BarEnds.FREE_FREE);
        assertThatThrownBy(() -> BarAnalyzer.analyze(ok, BeamTheory.TIMOSHENKO, BarAnalyzer.MAX_MODES + 1, false))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("modeCount");
    }
}
