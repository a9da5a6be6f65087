package org.nodewright.physics.bars;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.tuning.Cents;

/**
 * The grinding chart's first-order sensitivities against re-analysing the bar with a shallow
 * notch actually cut (0.05 mm deep over 10 mm), and their signs as makers know them: grinding at
 * the centre lowers mode 1, grinding near the ends raises it (common practice).
 */
class GrindingSensitivityTest {

    private static final double L = 0.38;

    @ParameterizedTest(name = "{0} x = {1} mm, mode {2}")
    @CsvSource(textBlock = """
            EULER_BERNOULLI, 190, 1, -1
            EULER_BERNOULLI, 30,  1, 1
            EULER_BERNOULLI, 120, 2, -1
            TIMOSHENKO,      190, 1, -1
            TIMOSHENKO,      30,  1, 1
            TIMOSHENKO,      95,  3, 0
            """)
    void firstOrderChangeMatchesACutNotch(BeamTheory theory, double xMm, int mode, int sign) {
        Bar bar = new Bar(L, RectangleSection.uniform(0.06, 0.022, L), 1000, 20e9, 1.5e9, BarEnds.FREE_FREE);
        GrindingSensitivity g = GrindingSensitivity.of(bar, theory, 3);
        int i = (int) Math.round(xMm / 1000 / L * (GrindingSensitivity.SAMPLES - 1));
        double x = g.positions()[i];
        double predicted = g.centsPerMm2()[mode - 1][i] * 0.05 * 10;
        double a = x - 0.005;
        double b = x + 0.005;
        ThicknessProfile notch = ThicknessProfile.of(new double[] {0, a, a + 1e-6, b - 1e-6, b, L},
                new double[] {0.022, 0.022, 0.02195, 0.02195, 0.022, 0.022});
        double f0 = BarAnalyzer.bendingFrequencies(bar, theory, 3)[mode - 1];
        double f1 = BarAnalyzer.bendingFrequencies(bar.withSection(new RectangleSection(0.06, notch), L), theory, 3)[mode - 1];
        double actual = Cents.between(f1, f0);
        assertThat(predicted).isCloseTo(actual, within(0.08 * Math.abs(actual) + 0.002));
        if (sign != 0) {
            assertThat(Math.signum(predicted)).isEqualTo((double) sign);
        }
    }
}
