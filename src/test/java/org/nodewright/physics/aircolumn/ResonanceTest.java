package org.nodewright.physics.aircolumn;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import java.util.List;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ResonanceTest {

    static final AirProperties AIR = AirProperties.at(20, 0);
    static final double C = AIR.speedOfSound();

    static AirColumnAnalysis analyse(List<BoreSegment> segs, List<ToneHole> holes, InputEnd in, OutputEnd out,
            boolean losses, double fMax, int points) {
        AirColumn col = new AirColumn(segs, holes, in, out, AIR, losses);
        return new AirColumnAnalyzer(440, 101).analyze(col, 20, fMax, points, List.of());
    }

    static double cents(double a, double b) {
        return 1200 * Math.log(a / b) / Math.log(2);
    }

    // Lossless cylinders (textbook, e.g. Fletcher & Rossing, The Physics of Musical Instruments, ch. 8):
    // closed-open (2n-1)c/4L, open-open and closed-closed nc/2L, open-closed (2n-1)c/4L.
    @ParameterizedTest
    @CsvSource({
        "closed, IDEAL_OPEN, 0.300, 4, 1",
        "open,   IDEAL_OPEN, 0.300, 2, 0",
        "closed, CLOSED,     0.450, 2, 0",
        "open,   CLOSED,     0.450, 4, 1",
    })
    void losslessCylinders(String input, OutputEnd out, double len, int denominator, int odd) {
        InputEnd in = "closed".equals(input) ? InputEnd.CLOSED : InputEnd.OPEN;
        AirColumnAnalysis a = analyse(List.of(new BoreSegment(len, 0.0075, 0.0075)), List.of(), in, out, false, 4000,
                3000);
        assertThat(a.resonances()).hasSizeGreaterThanOrEqualTo(4);
        for (AirColumnAnalysis.ResonanceResult r : a.resonances()) {
            int n = r.resonance().n();
            double expected = (odd == 1 ? 2 * n - 1 : n) * C / (denominator * len);
            assertThat(cents(r.resonance().frequencyHz(), expected)).as("n=%d", n).isCloseTo(0, offset(0.05));
            assertThat(r.centsFromSeries()).isCloseTo(0, offset(0.1));
        }
        assertThat(a.series()).isEqualTo(odd == 1 ? HarmonicSeries.ODD : HarmonicSeries.HARMONIC);
    }

    @Test
    void truncatedConeClosedAtItsNarrowEnd() {
        // Closed at the narrow end x1 from the apex, p = 0 at the wide end: tan kL = -k x1
        // (Fletcher & Rossing, The Physics of Musical Instruments, 2nd ed., section 8.7; Benade 1976).
        double len = 0.5;
        double ra = 0.004;
        double rb = 0.024;
        double x1 = ra * len / (rb - ra);
        AirColumnAnalysis a = analyse(List.of(new BoreSegment(len, ra, rb)), List.of(), InputEnd.CLOSED,
                OutputEnd.IDEAL_OPEN, false, 3000, 2000);
        BrentSolver brent = new BrentSolver(1e-13);
        for (AirColumnAnalysis.ResonanceResult r : a.resonances()) {
            int n = r.resonance().n();
            // n-th root of sin kL + k x1 cos kL = 0 lies in ((n - 1/2) pi, n pi) / L.
            double k = brent.solve(200, kk -> Math.sin(kk * len) + kk * x1 * Math.cos(kk * len),
                    (n - 0.5) * Math.PI / len + 1e-9, n * Math.PI / len);
            double expected = k * C / (2 * Math.PI);
            assertThat(cents(r.resonance().frequencyHz(), expected)).as("n=%d", n).isCloseTo(0, offset(0.05));
        }
        assertThat(a.resonances()).hasSizeGreaterThanOrEqualTo(4);
    }

    @Test
    void coneEqualsAFineStaircaseOfCylinders() {
        // Exact cone matrices against 4000 short cylinders (the staircase converges to the cone).
        double len = 0.4;
        List<BoreSegment> stairs = new java.util.ArrayList<>();
        int n = 4000;
        for (int i = 0; i < n; i++) {
            double r = 0.005 + 0.010 * (i + 0.5) / n;
            stairs.add(new BoreSegment(len / n, r, r));
        }
        AirColumnAnalysis cone = analyse(List.of(new BoreSegment(len, 0.005, 0.015)), List.of(), InputEnd.CLOSED,
                OutputEnd.OPEN_UNFLANGED, false, 2500, 1500);
        AirColumnAnalysis stair = analyse(stairs, List.of(), InputEnd.CLOSED, OutputEnd.OPEN_UNFLANGED, false, 2500,
                1500);
        for (int i = 0; i < 4; i++) {
            assertThat(cents(cone.resonances().get(i).resonance().frequencyHz(),
                    stair.resonances().get(i).resonance().frequencyHz())).isCloseTo(0, offset(0.5));
        }
    }

    // End corrections at low ka: 0.6133 a unflanged (Levine & Schwinger 1948) and 0.8216 a flanged
    // (Norris & Sheng 1989), read from the first resonance of a long closed-input cylinder:
    // L + delta = c / (4 f1).
    @ParameterizedTest
    @CsvSource({"OPEN_UNFLANGED, 0.6133", "OPEN_FLANGED, 0.8216"})
    void endCorrectionsAtLowKa(OutputEnd out, double expected) {
        double a = 0.005;
        double len = 3.0;
        AirColumnAnalysis r = analyse(List.of(new BoreSegment(len, a, a)), List.of(), InputEnd.CLOSED, out, false,
                60, 4000);
        double f1 = r.resonances().get(0).resonance().frequencyHz();
        double ka = 2 * Math.PI * f1 / C * a;
        assertThat(ka).isLessThan(0.005);
        double delta = C / (4 * f1) - len;
        assertThat(delta / a).isCloseTo(expected, offset(0.002));
    }

    @Test
    void radiationFitsReduceToTheClassicalLowFrequencyLimits() {
        // Levine & Schwinger 1948: |R| ~ 1 - (ka)^2/2; infinite flange: |R| ~ 1 - (ka)^2 (Norris & Sheng 1989).
        double ka = 0.01;
        assertThat(1 - Radiation.unflangedModulus(ka)).isCloseTo(ka * ka / 2, offset(ka * ka * 0.05));
        assertThat(1 - Radiation.flangedModulus(ka)).isCloseTo(ka * ka, offset(ka * ka * 0.05));
        // Levine & Schwinger's end correction decreases with ka from its low-frequency value and stays
        // positive up to the first cross-mode (their figure).
        assertThat(Radiation.unflangedEndCorrection(1.0)).isLessThan(0.6133).isGreaterThan(0.4);
        assertThat(Radiation.unflangedEndCorrection(3.5)).isPositive();
    }

    // Closed-input cylinder (a = 7.5 mm, L = 600 mm) with wall losses only (ideal open end), in the air
    // the code uses at 20 C dry (c 343.3595 m/s, rho 1.204557 kg/m3, mu 1.813322e-5 Pa s, gamma
    // 1.402166, Pr 0.706285; those are checked against handbook tables in AirPropertiesTest).
    // Expected peaks of |Zin| and their half-power Q, computed for this table with scipy 1.17 from the
    // exact Zwikker & Kosten (1949) Bessel form, F(r) = 2 J1(r e^{-j pi/4}) / (r e^{-j pi/4} J0(..))
    // (scipy.special.jv), Gamma = jk sqrt((1 + (gamma-1) F(rt)) / (1 - F(rv))), Zc = 1/sqrt((1 - F(rv))
    // (1 + (gamma-1) F(rt))), Zin = Zc tanh(Gamma L); peak by scipy.optimize.minimize_scalar, the
    // half-power points |Zin|/sqrt 2 by brentq. Not the code's ZwikkerKosten or Keefe expansion.
    // Tolerances: the code uses Keefe's expansion (relative error under 2e-4 in the loss part at these
    // rv, WallLossTest) and reads Q from its 0.5 Hz grid with interpolated half-power points, so 0.02 %
    // on the frequency and 0.5 % on Q; a 5 % error in the boundary-layer loss moves Q by 5 %.
    @ParameterizedTest
    @CsvSource({
        "1, 140.4860, 27.235",
        "2, 424.7295, 47.588",
        "3, 709.5616, 61.647",
        "4, 994.6372, 73.110",
        "5, 1279.8559, 83.052",
        "6, 1565.1716, 91.965",
        "7, 1850.5589, 100.123",
    })
    void lossyCylinderResonancesHaveTheExactBoundaryLayerQ(int n, double expectedHz, double expectedQ) {
        double a = 0.0075;
        double len = 0.6;
        AirColumnAnalysis r = analyse(List.of(new BoreSegment(len, a, a)), List.of(), InputEnd.CLOSED,
                OutputEnd.IDEAL_OPEN, true, 2000, 4000);
        assertThat(r.resonances()).hasSize(7);
        var rr = r.resonances().get(n - 1).resonance();
        assertThat(rr.frequencyHz()).isCloseTo(expectedHz, offset(expectedHz * 2e-4));
        assertThat(rr.q()).isCloseTo(expectedQ, offset(expectedQ * 0.005));
        // Losses lower the resonances below (2n-1)c/4L (boundary-layer dispersion).
        assertThat(rr.frequencyHz()).isLessThan((2 * n - 1) * C / (4 * len));
    }

    @Test
    void pressureNodesOfAnOpenPipeFallAtTheTextbookPlaces() {
        // Open-open ideal cylinder, mode n: p ~ sin(n pi x / L), nodes at x = m L / n (m = 0..n).
        double len = 0.5;
        AirColumnAnalysis a = analyse(List.of(new BoreSegment(len, 0.008, 0.008)), List.of(), InputEnd.OPEN,
                OutputEnd.IDEAL_OPEN, false, 1500, 1500);
        for (AirColumnAnalysis.ResonanceResult r : a.resonances()) {
            int n = r.resonance().n();
            List<Double> nodes = r.profile().pressureNodes();
            assertThat(nodes).hasSize(n + 1);
            for (int m = 0; m <= n; m++) {
                assertThat(nodes.get(m)).isCloseTo(m * len / n, offset(1e-5));
            }
            List<Double> anti = r.profile().pressureAntinodes();
            assertThat(anti).hasSize(n);
            assertThat(anti.get(0)).isCloseTo(len / (2 * n), offset(1e-5));
        }
    }

    @Test
    void sweepAndStandingWavePathsAgree() {
        // The hot sweep (rotation recurrence, inlined matrices) and the profile path (direct sines and
        // cosines) must give the same input impedance: a lossy cone with open and closed holes.
        List<BoreSegment> segs = List.of(new BoreSegment(0.2, 0.006, 0.009), new BoreSegment(0.25, 0.009, 0.009),
                new BoreSegment(0.15, 0.009, 0.02));
        List<ToneHole> holes = List.of(new ToneHole(0.25, 0.003, 0.004, true), new ToneHole(0.35, 0.004, 0.003,
                false), new ToneHole(0.5, 0.005, 0.002, true));
        AirColumn col = new AirColumn(segs, holes, InputEnd.CLOSED, OutputEnd.OPEN_FLANGED, AIR, true);
        TransferMatrixSolver solver = new TransferMatrixSolver(col);
        int n = 1500;
        double[] re = new double[n];
        double[] im = new double[n];
        solver.inputImpedance(15, 2.0, n, re, im);
        for (int i = 0; i < n; i += 37) {
            double[][] s = StandingWaveProfile.field(solver, 15 + 2.0 * i, new double[] {0.0});
            org.hipparchus.complex.Complex z = new org.hipparchus.complex.Complex(s[0][0], s[1][0])
                    .divide(new org.hipparchus.complex.Complex(s[2][0], s[3][0])).multiply(solver.inputArea());
            assertThat(z.subtract(new org.hipparchus.complex.Complex(re[i], im[i])).norm() / z.norm())
                    .isLessThan(1e-9);
        }
    }
}
