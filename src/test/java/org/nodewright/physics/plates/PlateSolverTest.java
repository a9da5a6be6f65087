package org.nodewright.physics.plates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.tuning.Cents;

class PlateSolverTest {

    // Aluminium-like isotropic plate for the frequency-parameter tables: λ = ω a² √(ρh/D), D = E h³ / (12(1 − ν²)).
    private static final double E = 70e9;
    private static final double NU = 0.3;
    private static final double RHO = 2700;
    private static final double H = 0.002;
    private static final double D = E * H * H * H / (12 * (1 - NU * NU));
    private static final PlateMaterial ALU = PlateMaterial.isotropic(RHO, E, NU);

    private static double lambda(PlateMode mode, double a) {
        return 2 * Math.PI * mode.frequencyHz() * a * a * Math.sqrt(RHO * H / D);
    }

    private static PlateAnalysis rectangle(double a, double b, PlateMaterial m, EdgeCondition edge, int modes) {
        return new PlateSolver().analyze(new Plate(Outline.rectangle(a, b), m, ThicknessField.uniform(H), edge, List.of()),
                modes);
    }

    /**
     * Exact simply supported orthotropic rectangle, the double-sine solution (Leissa 1969, NASA SP-160, eq. 11.15;
     * isotropic: eq. 4.20): ω_mn = π² √[(D11 (m/a)⁴ + 2(D12 + 2 D66)(m/a)²(n/b)² + D22 (n/b)⁴) / (ρh)].
     */
    private static List<Double> exactSimplySupported(double a, double b, PlateMaterial m, int count) {
        Rigidities d = m.rigidities(H);
        List<Double> f = new ArrayList<>();
        for (int i = 1; i <= 30; i++) {
            for (int j = 1; j <= 30; j++) {
                double p = Math.pow(i / a, 2);
                double q = Math.pow(j / b, 2);
                double omega = Math.PI * Math.PI
                        * Math.sqrt((d.d11() * p * p + 2 * (d.d12() + 2 * d.d66()) * p * q + d.d22() * q * q)
                        / (m.densityKgPerM3() * H));
                f.add(omega / (2 * Math.PI));
            }
        }
        f.sort(Double::compare);
        return f.subList(0, count);
    }

    // Rectangles of several aspect ratios, isotropic and orthotropic (spruce-like constants, E_y/E_x = 0.078,
    // G/E_x = 0.064, nu_xy = 0.372; and the same rotated: stiffer across than along). Tolerance 0.1 cent.
    @ParameterizedTest(name = "{0} x {1} m, E_x {2}, E_y {3}, G {4}, nu {5}")
    @CsvSource({
        "0.30, 0.30, 70e9,   70e9,   26.923e9, 0.3",
        "0.40, 0.20, 70e9,   70e9,   26.923e9, 0.3",
        "0.50, 0.35, 11.0e9, 0.858e9, 0.704e9, 0.372",
        "0.20, 0.45, 11.0e9, 0.858e9, 0.704e9, 0.372",
        "0.30, 0.30, 0.858e9, 11.0e9, 0.704e9, 0.029",
    })
    void simplySupportedRectanglesMatchTheDoubleSineSolution(double a, double b, double ex, double ey, double g,
                                                             double nu) {
        PlateMaterial m = new PlateMaterial(450, ex, ey, g, nu);
        PlateAnalysis analysis = rectangle(a, b, m, EdgeCondition.SIMPLY_SUPPORTED, 12);
        List<Double> exact = exactSimplySupported(a, b, m, 12);
        for (int i = 0; i < 12; i++) {
            assertThat(Cents.between(analysis.modes().get(i).frequencyHz(), exact.get(i)))
                    .as("mode %d", i + 1).isCloseTo(0, within(0.1));
        }
    }

    // Free square plate, nu = 0.3: λ = ω a² √(ρh/D) of the first eight flexural modes (Leissa 1969, ch. 4, the
    // free square plate table, values from memory: 13.468, 19.596, 24.270, 34.801 (twice), 61.093 (twice), 63.686).
    // Clamped square plate: 35.985, 73.394 (twice), 108.22, 131.58, 132.20 (Leissa 1969, ch. 4, clamped square
    // table, from memory). Tolerance 0.05 %.
    @ParameterizedTest(name = "{0} mode {1}: λ = {2}")
    @CsvSource({
        "FREE, 1, 13.468", "FREE, 2, 19.596", "FREE, 3, 24.270", "FREE, 4, 34.801", "FREE, 5, 34.801",
        "FREE, 6, 61.093", "FREE, 7, 61.093", "FREE, 8, 63.686",
        "CLAMPED, 1, 35.985", "CLAMPED, 2, 73.394", "CLAMPED, 3, 73.394", "CLAMPED, 4, 108.22",
        "CLAMPED, 5, 131.58", "CLAMPED, 6, 132.20",
    })
    void squarePlatesMatchLeissasTables(EdgeCondition edge, int mode, double expected) {
        PlateAnalysis analysis = rectangle(0.3, 0.3, ALU, edge, 8);
        assertThat(lambda(analysis.modes().get(mode - 1), 0.3)).isCloseTo(expected, within(expected * 5e-4));
    }

    // Clamped circular plate, radius a: λ = ω a² √(ρh/D) = k² with J_n(k) I_{n+1}(k) + I_n(k) J_{n+1}(k) = 0
    // (Leissa 1969, eq. 2.5); roots by scipy.special.jv/iv and scipy.optimize.brentq (python3-scipy):
    // 10.215826 (n = 0), 21.260398 (n = 1, twice), 34.877035 (n = 2, twice), 39.771148 (n = 0, s = 2).
    // The outline is a polygon of N points on the circle. Tolerance 1 cent (3 cents for 24 points).
    @ParameterizedTest(name = "{0} points, mode {1}")
    @CsvSource({
        "48, 1, 10.215826, 1", "48, 2, 21.260398, 1", "48, 3, 21.260398, 1", "48, 4, 34.877035, 1",
        "48, 6, 39.771148, 1",
        "128, 1, 10.215826, 1", "128, 4, 34.877035, 1", "360, 1, 10.215826, 1", "24, 1, 10.215826, 3",
    })
    void clampedCircleGivenAsAPolygonMatchesItsBesselEquation(int points, int mode, double expected, double cents) {
        double r = 0.15;
        PlateAnalysis analysis = new PlateSolver().analyze(new Plate(circle(r, points), ALU, ThicknessField.uniform(H),
                EdgeCondition.CLAMPED, List.of()), 6);
        double omega = expected / (r * r) / Math.sqrt(RHO * H / D);
        assertThat(Cents.between(analysis.modes().get(mode - 1).frequencyHz(), omega / (2 * Math.PI)))
                .isCloseTo(0, within(cents));
    }

    static Outline circle(double r, int points) {
        double[] xs = new double[points];
        double[] ys = new double[points];
        for (int i = 0; i < points; i++) {
            xs[i] = r + r * Math.cos(2 * Math.PI * i / points);
            ys[i] = r + r * Math.sin(2 * Math.PI * i / points);
        }
        return Outline.polygon(xs, ys);
    }

    // A square drawn as a polygon goes through the general path (Legendre basis, edge springs): the same exact
    // double-sine solution (simply supported) and Leissa's clamped values apply. Tolerance 1 cent.
    @ParameterizedTest(name = "{0} mode {1}")
    @CsvSource({
        "SIMPLY_SUPPORTED, 1, 19.7392", "SIMPLY_SUPPORTED, 2, 49.3480", "SIMPLY_SUPPORTED, 4, 78.9568",
        "CLAMPED, 1, 35.985", "CLAMPED, 2, 73.394", "FREE, 1, 13.468", "FREE, 3, 24.270",
    })
    void squareAsPolygonMatchesTheRectangleValues(EdgeCondition edge, int mode, double expected) {
        double a = 0.3;
        Outline square = Outline.polygon(new double[] {0, a, a, 0}, new double[] {0, 0, a, a});
        PlateAnalysis analysis = new PlateSolver().analyze(new Plate(square, ALU, ThicknessField.uniform(H), edge,
                List.of()), 6);
        double omega = expected / (a * a) / Math.sqrt(RHO * H / D);
        assertThat(Cents.between(analysis.modes().get(mode - 1).frequencyHz(), omega / (2 * Math.PI)))
                .isCloseTo(0, within(1.0));
    }

    @Test
    void ritzFrequenciesFallTowardTheReferenceAsTheBasisGrows() {
        // Rayleigh–Ritz gives upper bounds that fall with the basis (clamped square, 35.985, Leissa 1969, from memory).
        double last = Double.POSITIVE_INFINITY;
        for (int terms : new int[] {3, 4, 6, 8, 12}) {
            PlateAnalysis a = new PlateSolver(terms, 0, PlateSolver.DEFAULT_SPRING_FACTOR).analyze(
                    new Plate(Outline.rectangle(0.3, 0.3), ALU, ThicknessField.uniform(H), EdgeCondition.CLAMPED,
                            List.of()), 1);
            double l = lambda(a.modes().get(0), 0.3);
            assertThat(l).isLessThanOrEqualTo(last + 1e-9).isGreaterThan(35.985 * (1 - 1e-4));
            last = l;
        }
        assertThat(last).isCloseTo(35.985, within(0.002));
        // Clamped circle (10.215826, scipy as above) against the polygon basis degree.
        double previousError = Double.POSITIVE_INFINITY;
        for (int degree : new int[] {4, 6, 8}) {
            PlateAnalysis a = new PlateSolver(0, degree, PlateSolver.DEFAULT_SPRING_FACTOR).analyze(
                    new Plate(circle(0.15, 96), ALU, ThicknessField.uniform(H), EdgeCondition.CLAMPED, List.of()), 1);
            double error = Math.abs(lambda(a.modes().get(0), 0.15) - 10.215826);
            assertThat(error).isLessThan(previousError);
            previousError = error;
        }
        assertThat(previousError).isLessThan(10.215826 * 5e-4);
    }

    @Test
    void nodeLinesFallWhereTheExactShapesHaveThem() {
        // Simply supported 0.4 x 0.2 m: the second mode is sin(2πx/a) sin(πy/b), one node line at x = a/2.
        PlateAnalysis ss = rectangle(0.4, 0.2, ALU, EdgeCondition.SIMPLY_SUPPORTED, 3);
        PlateMode second = ss.modes().get(1);
        assertThat(second.nodalLinesX()).isEqualTo(1);
        assertThat(second.nodalLinesY()).isEqualTo(0);
        assertThat(second.shape().nodalLines()).hasSize(1);
        for (double[] p : second.shape().nodalLines().get(0)) {
            assertThat(p[0]).isCloseTo(0.2, within(1e-4));
        }
        // Free square: the first mode twists about both centre lines (node lines x = a/2 and y = a/2).
        PlateMode twist = rectangle(0.3, 0.3, ALU, EdgeCondition.FREE, 1).modes().get(0);
        assertThat(twist.name()).contains("twisting");
        boolean onX = false;
        boolean onY = false;
        for (double[][] line : twist.shape().nodalLines()) {
            for (double[] p : line) {
                boolean x = Math.abs(p[0] - 0.15) < 1e-4;
                boolean y = Math.abs(p[1] - 0.15) < 1e-4;
                assertThat(x || y).as("point %s, %s", p[0], p[1]).isTrue();
                onX |= x && !y;
                onY |= y && !x;
            }
        }
        assertThat(onX && onY).isTrue();
        // Free square, third mode: the ring mode (Chladni's ring; node line closes on itself).
        assertThat(rectangle(0.3, 0.3, ALU, EdgeCondition.FREE, 3).modes().get(2).name()).contains("ring");
    }

    @Test
    void shapesAreScaledToOneAndBlankOutsideAnOutline() {
        PlateAnalysis a = new PlateSolver().analyze(new Plate(circle(0.15, 64), ALU, ThicknessField.uniform(H),
                EdgeCondition.FREE, List.of()), 4);
        for (PlateMode m : a.modes()) {
            double max = 0;
            double[][] w = m.shape().w();
            for (double[] row : w) {
                for (double v : row) {
                    if (!Double.isNaN(v)) {
                        max = Math.max(max, Math.abs(v));
                    }
                }
            }
            assertThat(max).isCloseTo(1, within(1e-12));
            assertThat(w[0][0]).isNaN();
            assertThat(w[w.length / 2][w[0].length / 2]).isNotNaN();
        }
    }

    @Test
    void aBraceStiffensTheBendingAlongItsLine() {
        Outline o = Outline.rectangle(0.4, 0.3);
        PlateMaterial spruce = PlateMaterials.byId("spruce").orElseThrow().material();
        PlateAnalysis bare = new PlateSolver().analyze(new Plate(o, spruce, ThicknessField.uniform(0.003),
                EdgeCondition.SIMPLY_SUPPORTED, List.of()), 2);
        Brace across = new Brace(0.2, 0.0, 0.2, 0.3, 0.006, 0.010);
        PlateAnalysis braced = new PlateSolver().analyze(new Plate(o, spruce, ThicknessField.uniform(0.003),
                EdgeCondition.SIMPLY_SUPPORTED, List.of(across)), 2);
        // the (1,1) mode bends along the brace's line (the brace's own grain runs along it): it rises a lot
        assertThat(braced.modes().get(0).frequencyHz()).isGreaterThan(1.5 * bare.modes().get(0).frequencyHz());
        // the same braced plate drawn as a polygon (other basis, other quadrature) agrees within 2 %
        Outline poly = Outline.polygon(new double[] {0, 0.4, 0.4, 0}, new double[] {0, 0, 0.3, 0.3});
        PlateAnalysis other = new PlateSolver().analyze(new Plate(poly, spruce, ThicknessField.uniform(0.003),
                EdgeCondition.SIMPLY_SUPPORTED, List.of(across)), 2);
        assertThat(other.modes().get(0).frequencyHz()).isCloseTo(braced.modes().get(0).frequencyHz(),
                within(0.02 * braced.modes().get(0).frequencyHz()));
    }

    @Test
    void aUniformGraduationMatchesTheUniformPlate() {
        // Shepard interpolation of equal control values is that value: the cubature path must give the Kronecker path.
        List<ThicknessPoint> pts = List.of(new ThicknessPoint(0.1, 0.1, H), new ThicknessPoint(0.2, 0.2, H),
                new ThicknessPoint(0.05, 0.25, H));
        PlateAnalysis graded = new PlateSolver().analyze(new Plate(Outline.rectangle(0.3, 0.3), ALU,
                ThicknessField.graduated(pts), EdgeCondition.FREE, List.of()), 3);
        assertThat(lambda(graded.modes().get(0), 0.3)).isCloseTo(13.468, within(0.01));
        assertThat(lambda(graded.modes().get(2), 0.3)).isCloseTo(24.270, within(0.01));
    }
}
