package org.nodewright.physics.bars;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.tuning.Cents;

/** Bending modes against published roots, closed forms and an independent shooting reference. */
class BarBendingTest {

    // A rosewood-like test bar: 380 x 60 x 22 mm, 1000 kg/m³, E 20 GPa, G 1.5 GPa (invented values).
    private static final double L = 0.380;
    private static final double B = 0.060;
    private static final double T = 0.022;
    private static final double RHO = 1000;
    private static final double E = 20e9;
    private static final double G = 1.5e9;

    private static Bar uniform(BarEnds ends) {
        return new Bar(L, RectangleSection.uniform(B, T, L), RHO, E, G, ends);
    }

    /** f = (βL)² / (2π L²) · √(EI / ρA), the Euler–Bernoulli frequency for a root βL. */
    private static double eulerBernoulliHz(double betaL) {
        double i = B * T * T * T / 12;
        double a = B * T;
        return betaL * betaL / (2 * Math.PI * L * L) * Math.sqrt(E * i / (RHO * a));
    }

    // Blevins, Formulas for Natural Frequency and Mode Shape (1979), Table 8-1: roots βL of the
    // free–free beam (cos βL cosh βL = 1, the same as clamped–clamped) and the clamped–free beam
    // (cos βL cosh βL = −1), and βL = nπ for pinned–pinned. The table's 4 decimals round βL by
    // 5e-5 at most, 0.04 cent in frequency; tolerance 0.1 cent (the bench promises 0.5).
    @ParameterizedTest(name = "{0} mode {1}: βL = {2}")
    @CsvSource(textBlock = """
            FREE_FREE,       1, 4.7300,  0.1
            FREE_FREE,       2, 7.8532,  0.1
            FREE_FREE,       3, 10.9956, 0.1
            FREE_FREE,       4, 14.1372, 0.1
            FREE_FREE,       5, 17.2788, 0.1
            FREE_FREE,       6, 20.4204, 0.1
            CLAMPED_CLAMPED, 1, 4.7300,  0.1
            CLAMPED_CLAMPED, 2, 7.8532,  0.1
            CLAMPED_CLAMPED, 3, 10.9956, 0.1
            CLAMPED_FREE,    1, 1.8751,  0.1
            CLAMPED_FREE,    2, 4.6941,  0.1
            CLAMPED_FREE,    3, 7.8548,  0.1
            PINNED_PINNED,   1, 3.14159, 0.1
            PINNED_PINNED,   2, 6.28319, 0.1
            PINNED_PINNED,   3, 9.42478, 0.1
            """)
    void eulerBernoulliFrequenciesMatchTheTabulatedRoots(BarEnds ends, int n, double betaL, double cents) {
        BarAnalysis a = BarAnalyzer.analyze(uniform(ends), BeamTheory.EULER_BERNOULLI, 6, false);
        BarMode m = a.bending().get(n - 1);
        assertThat(m.n()).isEqualTo(n);
        assertThat(m.family()).isEqualTo(ModeFamily.BENDING);
        assertThat(Cents.between(m.frequencyHz(), eulerBernoulliHz(betaL))).isCloseTo(0.0, within(cents));
    }

    // Uniform free–free bar, Euler–Bernoulli: f2/f1 = 2.756 and f3/f1 = 5.404 (Blevins 1979,
    // Table 8-1, ratios of (βL)²; also the usual figures for an unturned bar — common practice).
    @ParameterizedTest(name = "f{0}/f1 = {1}")
    @CsvSource(textBlock = """
            2, 2.756, 0.001
            3, 5.404, 0.001
            """)
    void uniformFreeFreeRatios(int n, double ratio, double tol) {
        BarAnalysis a = BarAnalyzer.analyze(uniform(BarEnds.FREE_FREE), BeamTheory.EULER_BERNOULLI, 3, false);
        assertThat(a.bending().get(n - 1).frequencyHz() / a.fundamentalHz()).isCloseTo(ratio, within(tol));
    }

    // Node positions as fractions of L, Euler–Bernoulli, Blevins 1979, Table 8-1 (3 decimals,
    // tolerance 0.0006 L); 0.224 L for mode 1 of a free bar is also where makers put the cords
    // (common practice). A free end is never a node; a held end always is.
    @ParameterizedTest(name = "{0} mode {1}: {2}")
    @CsvSource(textBlock = """
            FREE_FREE,    1, 0.224 0.776
            FREE_FREE,    2, 0.132 0.500 0.868
            FREE_FREE,    3, 0.094 0.356 0.644 0.906
            CLAMPED_FREE, 1, 0
            CLAMPED_FREE, 2, 0 0.783
            CLAMPED_FREE, 3, 0 0.504 0.868
            """)
    void nodesMatchTheTable(BarEnds ends, int n, String fractions) {
        BarMode m = BarAnalyzer.analyze(uniform(ends), BeamTheory.EULER_BERNOULLI, 3, false).bending().get(n - 1);
        String[] f = fractions.trim().split("\\s+");
        assertThat(m.nodes()).hasSize(f.length);
        for (int i = 0; i < f.length; i++) {
            assertThat(m.nodes().get(i) / L).isCloseTo(Double.parseDouble(f[i]), within(0.0006));
        }
    }

    // Independent reference: shooting on the beam equations with scipy 1.17 (solve_ivp DOP853,
    // rtol 1e-12, brentq on the end determinant and on w for the nodes), src/test/python/bar_reference.py.
    // The 380 x 60 mm test bar, uniform 22 mm or undercut (profile below), κ = 5/6.
    // Columns: theory, profile, mode, frequency Hz, first two nodes mm; tolerances 0.1 cent, 0.02 mm.
    @ParameterizedTest(name = "{0} {1} mode {2}")
    @CsvSource(textBlock = """
            EULER_BERNOULLI, uniform,  1, 700.373584,  85.1799, 294.8201
            EULER_BERNOULLI, uniform,  2, 1930.606755, 50.2010, 190.0
            EULER_BERNOULLI, uniform,  4, 6256.402457, 27.9121, 105.1764
            EULER_BERNOULLI, undercut, 1, 328.140164,  79.7721, 300.2279
            EULER_BERNOULLI, undercut, 2, 1398.681355, 51.8644, 190.0
            EULER_BERNOULLI, undercut, 3, 3113.172666, 39.3436, 137.3879
            EULER_BERNOULLI, undercut, 4, 4924.024341, 31.7241, 112.9946
            TIMOSHENKO,      uniform,  1, 677.659744,  85.6031, 294.3969
            TIMOSHENKO,      uniform,  2, 1738.677764, 50.9481, 190.0
            TIMOSHENKO,      uniform,  3, 3108.466249, 37.0798, 135.7821
            TIMOSHENKO,      uniform,  4, 4637.841469, 29.3605, 106.4187
            TIMOSHENKO,      undercut, 1, 324.350667,  79.8142, 300.1858
            TIMOSHENKO,      undercut, 2, 1294.945641, 51.9231, 190.0
            TIMOSHENKO,      undercut, 3, 2722.130359, 39.8373, 136.6836
            TIMOSHENKO,      undercut, 4, 4034.968299, 32.4023, 111.9242
            """)
    void freeFreeBarsMatchTheShootingReference(BeamTheory theory, String profile, int n, double hz, double node1Mm,
            double node2Mm) {
        ThicknessProfile p = profile.equals("uniform") ? ThicknessProfile.uniform(L, T) : undercut();
        Bar bar = new Bar(L, new RectangleSection(B, p), RHO, E, G, BarEnds.FREE_FREE);
        BarMode m = BarAnalyzer.analyze(bar, theory, 6, false).bending().get(n - 1);
        assertThat(Cents.between(m.frequencyHz(), hz)).isCloseTo(0.0, within(0.1));
        assertThat(m.nodes().get(0) * 1000).isCloseTo(node1Mm, within(0.02));
        assertThat(m.nodes().get(1) * 1000).isCloseTo(node2Mm, within(0.02));
    }

    // Same reference, a steel tine 60 x 3 x 1 mm clamped at x = 0, Timoshenko with Cowper's
    // rectangle coefficient at ν = E/2G − 1 = 0.25 (κ = 0.8475).
    @ParameterizedTest(name = "tine mode {0}")
    @CsvSource(textBlock = """
            1, 226.446532,  -1
            2, 1417.319027, 47.0048
            3, 3960.450842, 30.2044
            """)
    void steelTineMatchesTheShootingReference(int n, double hz, double firstInteriorNodeMm) {
        Bar tine = new Bar(0.060, RectangleSection.uniform(0.003, 0.001, 0.060), 7850, 200e9, 80e9,
                BarEnds.CLAMPED_FREE);
        BarAnalysis a = BarAnalyzer.analyze(tine, BeamTheory.TIMOSHENKO, 3, false);
        assertThat(a.shearCoefficient()).isCloseTo(10 * 1.25 / (12 + 11 * 0.25), within(1e-12));
        BarMode m = a.bending().get(n - 1);
        assertThat(Cents.between(m.frequencyHz(), hz)).isCloseTo(0.0, within(0.1));
        assertThat(m.nodes().get(0)).isEqualTo(0.0);
        if (firstInteriorNodeMm > 0) {
            assertThat(m.nodes().get(1) * 1000).isCloseTo(firstInteriorNodeMm, within(0.02));
        } else {
            assertThat(m.nodes()).hasSize(1);
        }
        assertThat(m.antinodes()).last().isEqualTo(0.060);
    }

    // Timoshenko's frequency equation for the simply supported (pinned–pinned) uniform beam, exact
    // for every mode with w = W sin(nπx/L), ψ = Ψ cos(nπx/L) (Han, Benaroya and Wei, "Dynamics of
    // transversely vibrating beams using four engineering theories", J. Sound Vib. 225, 1999, §5):
    // (ρAω² − κGAk²)(ρIω² − EIk² − κGA) = (κGAk)², k = nπ/L; the lower root is the bending mode.
    // Tolerance 0.05 cent.
    @ParameterizedTest(name = "mode {0}")
    @CsvSource(textBlock = """
            1
            2
            3
            4
            5
            6
            """)
    void pinnedPinnedTimoshenkoMatchesTheClosedFrequencyEquation(int n) {
        BarAnalysis a = BarAnalyzer.analyze(uniform(BarEnds.PINNED_PINNED), BeamTheory.TIMOSHENKO, 6, false);
        double kappa = a.shearCoefficient();
        assertThat(kappa).isCloseTo(5.0 / 6.0, within(1e-12));
        assertThat(Cents.between(a.bending().get(n - 1).frequencyHz(), timoshenkoPinnedHz(n, kappa)))
                .isCloseTo(0.0, within(0.05));
    }

    static double timoshenkoPinnedHz(int n, double kappa) {
        double area = B * T;
        double i = B * T * T * T / 12;
        double k = n * Math.PI / L;
        double kga = kappa * G * area;
        double a2 = RHO * area * RHO * i;
        double a1 = -(RHO * area * (E * i * k * k + kga) + RHO * i * kga * k * k);
        double a0 = kga * k * k * (E * i * k * k + kga) - kga * kga * k * k;
        double w2 = (-a1 - Math.sqrt(a1 * a1 - 4 * a2 * a0)) / (2 * a2);
        return Math.sqrt(w2) / (2 * Math.PI);
    }

    // Shapes: largest |sample| is 1; a free end is an antinode; nodes ascend.
    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
            EULER_BERNOULLI
            TIMOSHENKO
            """)
    void shapesAreScaledAndOrdered(BeamTheory theory) {
        Bar bar = new Bar(L, new RectangleSection(B, undercut()), RHO, E, G, BarEnds.FREE_FREE);
        List<BarMode> modes = BarAnalyzer.analyze(bar, theory, 6, false).bending();
        double previous = 0;
        for (BarMode m : modes) {
            assertThat(m.frequencyHz()).isGreaterThan(previous);
            previous = m.frequencyHz();
            double max = 0;
            for (double s : m.shape()) {
                max = Math.max(max, Math.abs(s));
            }
            assertThat(max).isEqualTo(1.0);
            assertThat(m.nodes()).isSorted().hasSize(m.n() + 1).doesNotContain(0.0, L);
            assertThat(m.antinodes()).isSorted().hasSize(m.n() + 2).startsWith(0.0).endsWith(L);
            for (double node : m.nodes()) {
                assertThat(Math.abs(m.line().valueAt(node))).isLessThan(1e-9);
            }
        }
    }

    /** The undercut of the shooting reference (mm): flat 80 mm ends, 9 mm at the centre. */
    static ThicknessProfile undercut() {
        return ThicknessProfile.of(new double[] {0, 0.08, 0.12, 0.16, 0.19, 0.22, 0.26, 0.30, 0.38},
                new double[] {0.022, 0.022, 0.018, 0.011, 0.009, 0.011, 0.018, 0.022, 0.022});
    }
}
