package org.nodewright.physics.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.aircolumn.Fingering;

class CalibratorTest {

    static final double L_MM = 280;

    /** Speed of sound in dry air, c = 331.3 sqrt(1 + T / 273.15) m/s (ideal gas; common handbook form). */
    static double c(double t) {
        return 331.3 * Math.sqrt(1 + t / 273.15);
    }

    /** The open-open pipe: f_n = n c / (2 (L + delta)) (Benade 1976, ch. 20), delta the end corrections. */
    static double pipe(int n, double t, double deltaMm) {
        return n * c(t) * 1e3 / (2 * (L_MM + deltaMm));
    }

    static List<Fingering> measured(double t, double delta) {
        List<Fingering> out = new ArrayList<>();
        for (int n = 1; n <= 3; n++) {
            out.add(new Fingering("n" + n, Set.of(), pipe(n, t, delta), n));
        }
        return out;
    }

    // The "measured" pitches are the closed-form pipe's at the true end correction; the fit starts
    // elsewhere and must find it (values from the formula above, exact).
    @ParameterizedTest
    @CsvSource({
        // true delta mm, start mm, tolerance mm
        "21.5, 10, 1e-4",
        "33.0, 45, 1e-4",
        "4.0, 30, 1e-4",
    })
    void recoversAnEndCorrectionFromThePitchesItGives(double truth, double start, double tol) {
        Calibrator.Family family = (x, f, g) -> pipe(f.register(), 20, x[0]);
        Calibrator.Fit fit = new Calibrator(200).fit(family, new double[] {start}, new double[] {0},
                new double[] {60}, measured(20, truth));
        assertThat(fit.fitted()[0]).isCloseTo(truth, within(tol));
        assertThat(fit.rmsAfter()).isLessThan(1e-3);
        assertThat(fit.rmsBefore()).isGreaterThan(10);
        assertThat(fit.evaluations()).isLessThan(200);
    }

    @Test
    void recoversTheAirTemperature() {
        Calibrator.Family family = (x, f, g) -> pipe(f.register(), x[0], 25);
        Calibrator.Fit fit = new Calibrator(200).fit(family, new double[] {20}, new double[] {-10},
                new double[] {45}, measured(31.0, 25));
        assertThat(fit.fitted()[0]).isCloseTo(31.0, within(1e-3));
    }

    @Test
    void aMeasurementNoValueCanMatchLeavesAResidualAndStaysInsideTheBounds() {
        // pitches 100 cents above what any delta in 0..60 mm gives at its smallest (delta = 0)
        List<Fingering> m = new ArrayList<>();
        for (int n = 1; n <= 2; n++) {
            m.add(new Fingering("n" + n, Set.of(), pipe(n, 20, 0) * Math.pow(2, 100 / 1200.0), n));
        }
        Calibrator.Fit fit = new Calibrator(200).fit((x, f, g) -> pipe(f.register(), 20, x[0]), new double[] {20},
                new double[] {0}, new double[] {60}, m);
        assertThat(fit.fitted()[0]).isCloseTo(0, within(1e-9));
        for (double c : fit.after()) {
            assertThat(c).isCloseTo(-100, within(1e-6));
        }
    }

    @Test
    void noResonanceIsAClearFailure() {
        assertThatThrownBy(() -> new Calibrator(50).fit((x, f, g) -> Double.NaN, new double[] {1}, new double[] {0},
                new double[] {2}, measured(20, 20))).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("n1");
    }
}
