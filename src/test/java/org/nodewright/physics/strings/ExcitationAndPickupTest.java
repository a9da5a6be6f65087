package org.nodewright.physics.strings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.hipparchus.analysis.UnivariateFunction;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ExcitationAndPickupTest {

    private static final IterativeLegendreGaussIntegrator GAUSS = new IterativeLegendreGaussIntegrator(32, 1e-13, 1e-14);

    // Textbook Fourier series of a string plucked at its middle (Fletcher & Rossing eq. 2.21 with
    // x_p = L/2): b_n/h = 8/(n²π²)·sin(nπ/2): 0.810569, 0, −0.090063, 0, 0.032423 (worked by hand).
    @ParameterizedTest(name = "n={0}")
    @CsvSource(textBlock = """
            1,  0.8105694691
            2,  0.0
            3, -0.0900632743
            4,  0.0
            5,  0.0324227788
            """)
    void middlePluckHasOnlyOddHarmonics(int n, double bn) {
        assertThat(Excitation.pluck(n, 0.65, 0.325)).isCloseTo(bn, within(1e-9));
    }

    // The same coefficients computed independently: project the triangle y(x) (height 1 at x_p) on
    // sin(nπx/L): b_n = (2/L)∫ y(x)·sin(nπx/L) dx, by Gauss–Legendre quadrature on each side of x_p.
    @ParameterizedTest(name = "x_p={1} n={2}")
    @CsvSource(textBlock = """
            0.65, 0.120, 1
            0.65, 0.120, 2
            0.65, 0.120, 7
            0.65, 0.050, 13
            0.65, 0.600, 24
            1.00, 0.333, 5
            """)
    void pluckCoefficientsEqualTheTriangleProjection(double l, double xp, int n) {
        UnivariateFunction rise = x -> (x / xp) * Math.sin(n * Math.PI * x / l);
        UnivariateFunction fall = x -> ((l - x) / (l - xp)) * Math.sin(n * Math.PI * x / l);
        double projected = 2 / l * (GAUSS.integrate(1_000_000, rise, 0, xp) + GAUSS.integrate(1_000_000, fall, xp, l));
        assertThat(Excitation.pluck(n, l, xp)).isCloseTo(projected, within(1e-10));
    }

    // Common practice: a string plucked (or struck) at 1/k of its length lacks the k-th harmonic and
    // its multiples (Young's law).
    @ParameterizedTest(name = "1/{0} of the length")
    @CsvSource(textBlock = """
            3
            5
            7
            12
            """)
    void pluckingAtOneKthOfTheLengthRemovesTheKthHarmonic(int k) {
        double l = 0.65;
        double xp = l / k;
        for (int m = 1; m <= 3; m++) {
            assertThat(Excitation.pluck(k * m, l, xp)).isCloseTo(0.0, within(1e-12));
            assertThat(Excitation.strike(k * m, l, xp)).isCloseTo(0.0, within(1e-12));
        }
        assertThat(Math.abs(Excitation.pluck(k - 1, l, xp))).isGreaterThan(1e-3);
    }

    // Point impulse at x_h: displacement amplitude sin(nπx_h/L)/n (velocity ∝ sin, divided by ω_n ∝ n).
    @ParameterizedTest(name = "n={0}")
    @CsvSource(textBlock = """
            1, 0.2, 0.5877852523
            2, 0.2, 0.4755282581
            3, 0.2, 0.3170188388
            """)
    void strikeAmplitudes(int n, double fraction, double expected) {
        assertThat(Excitation.strike(n, 1.0, fraction)).isCloseTo(expected, within(1e-9));
    }

    // Pickup gain = mode shape averaged over the aperture. Closed form for sines checked against
    // numerical quadrature of sin(nπx/L) over the aperture (1e-9, well inside the 1e-6 target).
    @ParameterizedTest(name = "n={0} x={1} w={2}")
    @CsvSource(textBlock = """
            1,  0.150, 0.000
            1,  0.150, 0.020
            5,  0.150, 0.017
            12, 0.600, 0.030
            24, 0.100, 0.0001
            24, 0.325, 0.650
            """)
    void sineGainIsTheApertureAverage(int n, double x, double w) {
        double l = 0.65;
        Pickup p = new Pickup(x, w);
        double gain = p.gain(new SineShape(n), l);
        double expected = w == 0 ? Math.sin(n * Math.PI * x / l)
                : GAUSS.integrate(1_000_000, s -> Math.sin(n * Math.PI * s / l), x - w / 2, x + w / 2) / w;
        assertThat(gain).isCloseTo(expected, within(1e-9));
    }

    @ParameterizedTest(name = "tau={0} n={1}")
    @CsvSource(textBlock = """
            25,    1, 0.100, 0.040
            25,    3, 0.010, 0.020
            3.7e5, 7, 0.150, 0.018
            3.7e5, 24, 0.030, 0.006
            1e9,   12, 0.600, 0.0
            """)
    void clampedGainIsTheApertureAverageOfTheComputedShape(double tau, int n, double x, double w) {
        double l = 0.65;
        StringModel s = new StringModel(l, 70, 5e-4, 70 * l * l / tau, EndCondition.CLAMPED);
        ModeShape shape = new ModeSolver().modes(s, n).get(n - 1).shape();
        double gain = new Pickup(x, w).gain(shape, l);
        double expected = w == 0 ? shape.value(x / l)
                : GAUSS.integrate(1_000_000, shape::value, (x - w / 2) / l, (x + w / 2) / l) / (w / l);
        assertThat(gain).isCloseTo(expected, within(1e-9));
    }
}
