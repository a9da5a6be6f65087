package org.nodewright.physics.bars;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Measuring the blank: the "measured" frequencies are written here from closed forms with a known E
 * (and G); the fit must give them back.
 */
class BlankFitterTest {

    private static final double L = 0.40;
    private static final double B = 0.05;
    private static final double T = 0.020;
    private static final double RHO = 850;

    /**
     * Free–free Euler–Bernoulli: f_n = (β_nL)² / (2π L²) · √(E I / (ρ A)), I/A = t²/12, with the roots
     * β_nL of Blevins, Formulas for Natural Frequency and Mode Shape, 1979, Table 8-1 (4.73004,
     * 7.85320, 10.9956). E is fitted from a catalogue start 30 % off. Tolerance: 2e-4 relative
     * (the elements' 0.05-cent bound is 6e-5 in E; the roots are given to 6 digits).
     */
    @ParameterizedTest
    @CsvSource({
        "1, 12.0e9",
        "2, 12.0e9",
        "3, 17.5e9",
    })
    void eulerBernoulliFreeFreeGivesBackE(int modes, double trueE) {
        double[] roots = {4.73004, 7.85320, 10.9956};
        List<MeasuredMode> measured = new java.util.ArrayList<>();
        for (int n = 1; n <= modes; n++) {
            double beta = roots[n - 1];
            double f = beta * beta / (2 * Math.PI * L * L) * Math.sqrt(trueE * T * T / 12 / RHO);
            measured.add(new MeasuredMode(n, f));
        }
        Bar start = new Bar(L, RectangleSection.uniform(B, T, L), RHO, trueE * 1.3, 1.0e9, BarEnds.FREE_FREE);
        BlankFit fit = BlankFitter.fit(start, BeamTheory.EULER_BERNOULLI, measured, true);
        assertThat(fit.youngsModulus()).isCloseTo(trueE, within(2e-4 * trueE));
        assertThat(fit.shearFitted()).isFalse(); // Euler–Bernoulli has no G
        assertThat(fit.shearModulus()).isEqualTo(1.0e9);
        assertThat(fit.rmsCents()).isLessThan(0.3);
    }

    /**
     * A thick pinned–pinned steel-like bar (L = 120 mm, t = 20 mm, b = 10 mm), Timoshenko theory:
     * ω² from the closed form ρA·ρI ω⁴ − [ρA(EI k² + κGA) + ρI κGA k²] ω² + κGA k² EI k² = 0 with
     * k = nπ/L (Han, Benaroya and Wei, J. Sound Vib. 225, 1999, the hinged–hinged case), κ = Cowper's
     * 10(1 + ν)/(12 + 11ν) for a rectangle (Cowper, J. Appl. Mech. 33, 1966) at ν = E/2G − 1.
     * Three modes known: both E and G are fitted, from a start 20 % and 40 % off. Tolerance: 1e-3
     * relative on E, 1e-2 on G (G moves the modes far less than E).
     */
    @Test
    void timoshenkoPinnedGivesBackEAndG() {
        double l = 0.12;
        double b = 0.010;
        double t = 0.020;
        double rho = 7850;
        double e = 200e9;
        double g = 80e9;
        List<MeasuredMode> measured = new java.util.ArrayList<>();
        for (int n = 1; n <= 3; n++) {
            measured.add(new MeasuredMode(n, pinnedTimoshenkoHz(n, l, b, t, rho, e, g)));
        }
        Bar start = new Bar(l, RectangleSection.uniform(b, t, l), rho, e * 0.8, g * 1.4, BarEnds.PINNED_PINNED);
        BlankFit fit = BlankFitter.fit(start, BeamTheory.TIMOSHENKO, measured, true);
        assertThat(fit.shearFitted()).isTrue();
        assertThat(fit.youngsModulus()).isCloseTo(e, within(1e-3 * e));
        assertThat(fit.shearModulus()).isCloseTo(g, within(1e-2 * g));
        assertThat(fit.rmsCents()).isLessThan(0.1);
        assertThat(fit.evaluations()).isLessThan(400);
    }

    /** A slender bar's modes hardly feel G: only E is fitted, and G stays where it started. */
    @Test
    void slenderBarLeavesGAlone() {
        double e = 12e9;
        double[] roots = {4.73004, 7.85320};
        double l = 0.40;
        double t = 0.004;
        List<MeasuredMode> measured = new java.util.ArrayList<>();
        for (int n = 1; n <= 2; n++) {
            measured.add(new MeasuredMode(n, roots[n - 1] * roots[n - 1] / (2 * Math.PI * l * l)
                    * Math.sqrt(e * t * t / 12 / RHO)));
        }
        Bar start = new Bar(l, RectangleSection.uniform(B, t, l), RHO, e, 1.0e9, BarEnds.FREE_FREE);
        BlankFit fit = BlankFitter.fit(start, BeamTheory.TIMOSHENKO, measured, true);
        assertThat(fit.shearFitted()).isFalse();
        assertThat(fit.shearModulus()).isEqualTo(1.0e9);
        // Timoshenko sits below Euler–Bernoulli (shear and rotary inertia soften the modes, here by
        // about ½(βt)²/12 · (1 + E/κG) ≈ 0.4 % for mode 2 at E/G = 12: Timoshenko 1921's first-order
        // correction), so the fitted E lies above the Euler–Bernoulli one by under 1 %.
        assertThat(fit.youngsModulus()).isGreaterThan(e).isLessThan(1.01 * e);
    }

    /**
     * Peaks of a recording: Blevins' free–free ratios 2.7565 and 5.4039 (Table 8-1: (7.8532/4.7300)²,
     * (10.9956/4.7300)²) above a 200 Hz fundamental, a louder unrelated peak at 333 Hz and a quiet one
     * at 1000 Hz: modes 1..3 are numbered, the others left out.
     */
    @Test
    void matchNumbersPeaksByTheBarsRatiosNotAHarmonicSeries() {
        Bar bar = new Bar(L, RectangleSection.uniform(B, 0.010, L), RHO, 12e9, 1.0e9, BarEnds.FREE_FREE);
        double[] hz = {333.0, 200.0, 551.3, 1000.0, 1080.8};
        double[] db = {-6, -10, -20, -40, -30};
        List<MeasuredMode> m = BlankFitter.match(bar, BeamTheory.EULER_BERNOULLI, hz, db, 3);
        assertThat(m).extracting(MeasuredMode::n).containsExactly(1, 2, 3);
        assertThat(m).extracting(MeasuredMode::frequencyHz).containsExactly(200.0, 551.3, 1080.8);
    }

    @Test
    void refusesAModeMeasuredTwice() {
        Bar bar = new Bar(L, RectangleSection.uniform(B, T, L), RHO, 12e9, 1.0e9, BarEnds.FREE_FREE);
        assertThatThrownBy(() -> BlankFitter.fit(bar, BeamTheory.TIMOSHENKO,
                List.of(new MeasuredMode(1, 200), new MeasuredMode(1, 210)), true))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("mode 1");
    }

    static double pinnedTimoshenkoHz(int n, double l, double b, double t, double rho, double e, double g) {
        double nu = e / (2 * g) - 1;
        double kappa = 10 * (1 + nu) / (12 + 11 * nu);
        double area = b * t;
        double i = b * t * t * t / 12;
        double k = n * Math.PI / l;
        double kga = kappa * g * area;
        double a2 = rho * area * rho * i;
        double a1 = -(rho * area * (e * i * k * k + kga) + rho * i * kga * k * k);
        double a0 = kga * k * k * e * i * k * k;
        double w2 = (-a1 - Math.sqrt(a1 * a1 - 4 * a2 * a0)) / (2 * a2);
        return Math.sqrt(w2) / (2 * Math.PI);
    }
}
