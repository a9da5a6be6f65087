package org.nodewright.physics.strings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class IdealAndStiffStringTest {

    private static final ModeSolver SOLVER = new ModeSolver();

    // Mersenne's law f_n = n/(2L)·√(T/μ) (Fletcher & Rossing, The Physics of Musical Instruments,
    // eq. 2.14). Expected values worked by hand from the formula: 0.648 m, 70 N, 4.0e-4 kg/m gives
    // c = 418.3300 m/s and f1 = 322.785504 Hz.
    @ParameterizedTest(name = "L={0} T={1} mu={2}")
    @CsvSource(textBlock = """
            0.648, 70.0, 4.0e-4,  322.785504
            0.650, 80.0, 6.8e-3,   83.434791
            1.000, 100.0, 1.0e-2,  50.000000
            0.330, 50.0, 1.0e-3,  338.798178
            """)
    void idealFundamentalFollowsMersenne(double l, double t, double mu, double f1) {
        StringModel s = new StringModel(l, t, mu, 0, EndCondition.PINNED);
        assertThat(s.idealFundamentalHz()).isCloseTo(f1, within(1e-6));
        List<Mode> modes = SOLVER.modes(s, 8);
        for (Mode m : modes) {
            assertThat(m.frequencyHz()).isCloseTo(m.n() * f1, within(1e-5 * m.n()));
            assertThat(m.centsFromHarmonic()).isCloseTo(0.0, within(1e-9));
        }
        // Tension from pitch is the same law inverted, and round-trips.
        assertThat(IdealString.tensionN(l, mu, f1)).isCloseTo(t, within(1e-6 * t));
    }

    // Fletcher 1964 (J. Acoust. Soc. Am. 36, 203), B = π³·E·d⁴/(64·T·L²); the B values below are
    // worked by hand from that formula.
    @ParameterizedTest(name = "E={0} d={1} T={2} L={3}: B={4}")
    @CsvSource(textBlock = """
            2.00e11, 1.00e-3, 700, 0.650, 3.276234e-04
            2.00e11, 0.25e-3,  70, 0.648, 1.287691e-05
            2.06e11, 1.00e-3, 800, 1.000, 1.247518e-04
            5.00e9,  1.00e-3,  60, 0.650, 9.555682e-05
            """)
    void inharmonicityCoefficientIsFletchers(double e, double d, double t, double l, double b) {
        double ei = e * StringConstruction.secondMomentOfArea(d);
        StringModel s = new StringModel(l, t, 1e-3, ei, EndCondition.PINNED);
        assertThat(s.inharmonicityB()).isCloseTo(b, within(b * 1e-6));
    }

    // Pinned stiff string: exact f_n = n·f1·√(1+B·n²) (Fletcher 1964), checked against the dispersion
    // relation of a beam under tension with hinged ends, μω² = T·k² + E·I·k⁴ with k = nπ/L (Morse,
    // Vibration and Sound, 1948, §16), computed independently here.
    @ParameterizedTest(name = "E·I={2}")
    @CsvSource(textBlock = """
            0.648, 70.0, 1.0e-4, 4.0e-4
            0.650, 700.0, 4.9e-2, 6.2e-3
            1.000, 5.0,  3.0e-4, 1.0e-3
            """)
    void pinnedStiffPartialsMatchTheBeamDispersionRelation(double l, double t, double ei, double mu) {
        StringModel s = new StringModel(l, t, mu, ei, EndCondition.PINNED);
        for (Mode m : SOLVER.modes(s, 24)) {
            double k = m.n() * Math.PI / l;
            double exact = Math.sqrt((t * k * k + ei * k * k * k * k) / mu) / (2 * Math.PI);
            double cents = 1200 * Math.log(m.frequencyHz() / exact) / Math.log(2);
            assertThat(cents).isCloseTo(0.0, within(1e-6));
            assertThat(m.shape()).isInstanceOf(SineShape.class);
        }
    }

    // With targetHz the tension is solved so that the sounding f1 (stiffness included) is the target.
    @ParameterizedTest(name = "{4} target {3} Hz")
    @CsvSource(textBlock = """
            0.650, 5.5e-4, 8.0e-5, 329.63, PINNED
            0.650, 5.5e-4, 8.0e-5, 329.63, CLAMPED
            0.650, 6.8e-3, 1.2e-3,  82.41, CLAMPED
            0.300, 1.0e-3, 5.0e-3, 200.00, CLAMPED
            0.300, 1.0e-3, 5.0e-3, 200.00, PINNED
            0.650, 5.5e-4, 0,      329.63, PINNED
            """)
    void solvedTensionSoundsTheTarget(double l, double mu, double ei, double target, EndCondition end) {
        TensionSolver solver = new TensionSolver();
        double t = solver.tensionFor(l, mu, ei, end, target);
        double f1 = solver.fundamental(l, t, mu, ei, end);
        assertThat(1200 * Math.log(f1 / target) / Math.log(2)).isCloseTo(0.0, within(1e-6));
        assertThat(t).isLessThanOrEqualTo(IdealString.tensionN(l, mu, target) * (1 + 1e-12));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
            PINNED
            CLAMPED
            """)
    void aTargetBelowTheBarsOwnPitchIsRefused(EndCondition end) {
        // A 5 mm steel rod 0.3 m long rings near 100 Hz (pinned) with no tension at all.
        double ei = 2e11 * StringConstruction.secondMomentOfArea(5e-3);
        assertThatThrownBy(() -> new TensionSolver().tensionFor(0.3, 0.154, ei, end, 20))
                .isInstanceOf(PitchUnreachableException.class);
    }
}
