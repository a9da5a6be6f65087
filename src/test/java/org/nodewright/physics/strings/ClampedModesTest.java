package org.nodewright.physics.strings;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ClampedModesTest {

    // T → 0: the clamped–clamped (free beam) roots of cos βL·cosh βL = 1, as tabulated by Blevins,
    // Formulas for Natural Frequency and Mode Shape (1979), Table 8-1: 4.73004074, 7.85320462,
    // 10.9956078, 14.1371655, 17.2787597.
    @ParameterizedTest(name = "mode {0}: {1}")
    @CsvSource(textBlock = """
            1, 4.73004074
            2, 7.85320462
            3, 10.9956078
            4, 14.1371655
            5, 17.2787597
            """)
    void withoutTensionTheRootsAreTheClampedBeamRoots(int n, double beta) {
        assertThat(ClampedCharacteristic.root(n, 0.0)).isCloseTo(beta, within(1e-7));
        assertThat(ClampedCharacteristic.root(n, 1e-9)).isCloseTo(beta, within(1e-7));
    }

    // E → 0: a flexible string, f_n = n·f1 (Mersenne). τ = T·L²/(E·I) very large.
    @ParameterizedTest(name = "tau={0}")
    @CsvSource(textBlock = """
            1e10
            1e14
            1e18
            """)
    void withoutStiffnessThePartialsAreHarmonic(double tau) {
        double l = 0.65;
        double t = 70;
        StringModel s = new StringModel(l, t, 5e-4, t * l * l / tau, EndCondition.CLAMPED);
        for (Mode m : new ModeSolver().modes(s, 24)) {
            assertThat(m.centsFromHarmonic()).isCloseTo(0.0, within(0.05));
        }
    }

    // Fletcher 1964, clamped ends, small B: f_n ≈ n·f1·√(1+B·n²)·(1 + 2√B/π + 4B/π²). The approximation
    // drops terms of order B^(3/2) and n²B^(3/2), so it is checked where those are below 0.03 cent.
    @ParameterizedTest(name = "B={0}")
    @CsvSource(textBlock = """
            1e-6, 24, 0.01
            1e-5, 12, 0.005
            1e-4, 12, 0.03
            """)
    void smallStiffnessAgreesWithFletchersClampedApproximation(double b, int modes, double cents) {
        double l = 0.65;
        double t = 70;
        double ei = b * t * l * l / (Math.PI * Math.PI);
        StringModel s = new StringModel(l, t, 5e-4, ei, EndCondition.CLAMPED);
        assertThat(s.inharmonicityB()).isCloseTo(b, within(b * 1e-12));
        double f0 = s.idealFundamentalHz();
        for (Mode m : new ModeSolver().modes(s, modes)) {
            int n = m.n();
            double approx = n * f0 * Math.sqrt(1 + b * n * n) * (1 + 2 * Math.sqrt(b) / Math.PI + 4 * b / (Math.PI * Math.PI));
            assertThat(1200 * Math.log(m.frequencyHz() / approx) / Math.log(2)).isCloseTo(0.0, within(cents));
        }
    }

    // Independent computation: roots of the 4×4 boundary-condition determinant in its original
    // cosh/sinh form (not our rearranged, scaled equation), found by bisection in mpmath
    // (mp.det and 120 halvings) at 80 digits for τ ≤ 300 and 200 digits for τ = 20000, where
    // cosh² reaches 1e122. Printed to 17 significant digits.
    @ParameterizedTest(name = "tau={0} n={1}")
    @CsvSource(textBlock = """
            0.5,    1,  4.718228706592535
            0.5,    2,  7.8491844945230801
            0.5,    5, 17.277922910928352
            0.5,   12, 39.269746080916688
            0.5,   24, 76.968977815107689
            300,    1,  3.5364828936910644
            300,    2,  7.0002208517273508
            300,    5, 16.928014962349105
            300,   12, 39.180776466943069
            300,   24, 76.944307536869269
            20000,  1,  3.1866394859777296
            20000,  2,  6.37316331070838
            20000,  5, 15.930916271176855
            20000, 12, 38.209400562789935
            20000, 24, 76.28471205058228
            """)
    void rootsAgreeWithTheBoundaryDeterminantAtHighPrecision(double tau, int n, double b) {
        assertThat(ClampedCharacteristic.root(n, tau)).isCloseTo(b, within(1e-12 * b));
    }

    @ParameterizedTest(name = "tau={0}")
    @CsvSource(textBlock = """
            0.0
            25
            3.7e5
            1e9
            """)
    void shapesMeetTheClampedConditionsAndAreOrthogonal(double tau) {
        double l = 0.65;
        double t = 70;
        double ei = tau == 0 ? 1e-3 : t * l * l / tau;
        StringModel s = new StringModel(l, tau == 0 ? 1e-12 : t, 5e-4, ei, EndCondition.CLAMPED);
        List<Mode> modes = new ModeSolver().modes(s, 16);
        IterativeLegendreGaussIntegrator gauss = new IterativeLegendreGaussIntegrator(24, 1e-10, 1e-12);
        for (Mode m : modes) {
            ClampedShape x = (ClampedShape) m.shape();
            double h = 1e-7;
            assertThat(x.value(0)).isCloseTo(0.0, within(1e-12));
            assertThat(x.value(1)).isCloseTo(0.0, within(1e-9));
            assertThat(x.slope(0)).isCloseTo(0.0, within(1e-7 * (1 + Math.sqrt(tau))));
            assertThat(x.slope(1)).isCloseTo(0.0, within(1e-7 * (1 + Math.sqrt(tau))));
            assertThat(x.value(h)).isCloseTo(0.0, within(1e-5));
            // n − 1 interior nodes, n antinodes, |X| peaking at 1.
            assertThat(x.nodes()).hasSize(m.n() + 1);
            assertThat(x.antinodes()).hasSize(m.n());
            double peak = 0;
            for (double p : x.antinodes()) {
                peak = Math.max(peak, Math.abs(x.value(p)));
                assertThat(x.slope(p)).isCloseTo(0.0, within(1e-9 * (m.n() + Math.sqrt(tau))));
            }
            assertThat(peak).isCloseTo(1.0, within(1e-12));
            for (double z : x.nodes()) {
                // |X(z)| / |X'(z)| is the distance to the true zero: well under 1e-9 of L (0.05 mm is 7.7e-5).
                double slope = Math.max(Math.abs(x.slope(z)), 1e-30);
                if (z > 0 && z < 1) {
                    assertThat(Math.abs(x.value(z)) / slope).isLessThan(1e-10);
                }
            }
        }
        // Eigenfunctions of a self-adjoint problem are orthogonal: ∫X_m X_n dξ = 0 (m ≠ n).
        for (int i = 0; i < 6; i++) {
            for (int j = i + 1; j < 6; j++) {
                ModeShape p = modes.get(i).shape();
                ModeShape q = modes.get(j).shape();
                double dot = gauss.integrate(100_000, xi -> p.value(xi) * q.value(xi), 0, 1);
                assertThat(dot).as("modes %d,%d", i + 1, j + 1).isCloseTo(0.0, within(1e-7));
            }
        }
    }

    /**
     * Independent shape: the null vector of the 4×4 boundary matrix in the original cosh/sinh basis,
     * X = A·cosh aξ + B·sinh aξ + C·cos bξ + D·sin bξ, from Hipparchus' SVD (no symmetry assumed, no
     * exponential rewriting). That basis cancels catastrophically as cosh aξ grows (about e^a·1e-16),
     * so it is used only for small a, and its own error bounds the tolerance: nodes must match
     * ours to 1e-9 of the length (0.05 mm on 650 mm is 7.7e-5), the normalised shapes to 1e-6,
     * for the first four modes (a ≤ 17, cosh a ≤ 1e7).
     */
    @ParameterizedTest(name = "tau={0}")
    @CsvSource(textBlock = """
            2
            20
            80
            """)
    void shapesAndNodesAgreeWithTheBoundaryMatrixNullVector(double tau) {
        double l = 0.65;
        StringModel s = new StringModel(l, 70, 5e-4, 70 * l * l / tau, EndCondition.CLAMPED);
        org.hipparchus.analysis.solvers.BisectionSolver bisection =
                new org.hipparchus.analysis.solvers.BisectionSolver(1e-14, 1e-14);
        for (Mode m : new ModeSolver().modes(s, 4)) {
            double b = ClampedCharacteristic.root(m.n(), tau);
            double a = Math.sqrt(b * b + tau);
            org.hipparchus.linear.RealMatrix bc = org.hipparchus.linear.MatrixUtils.createRealMatrix(new double[][] {
                    {1, 0, 1, 0},
                    {0, a, 0, b},
                    {Math.cosh(a), Math.sinh(a), Math.cos(b), Math.sin(b)},
                    {a * Math.sinh(a), a * Math.cosh(a), -b * Math.sin(b), b * Math.cos(b)}});
            org.hipparchus.linear.RealMatrix v = new org.hipparchus.linear.SingularValueDecomposition(bc).getV();
            double[] k = v.getColumn(3);
            java.util.function.DoubleUnaryOperator x = xi -> k[0] * Math.cosh(a * xi) + k[1] * Math.sinh(a * xi)
                    + k[2] * Math.cos(b * xi) + k[3] * Math.sin(b * xi);
            ModeShape ours = m.shape();
            double[] nodes = ours.nodes();
            for (int i = 1; i < nodes.length - 1; i++) {
                double z = nodes[i];
                double independent = bisection.solve(10_000, x::applyAsDouble, z - 0.2 / m.n(), z + 0.2 / m.n());
                assertThat(z).isCloseTo(independent, within(1e-9));
            }
            double mid = ours.antinodes()[0];
            double scale = ours.value(mid) / x.applyAsDouble(mid);
            for (int i = 0; i <= 50; i++) {
                double xi = i / 50.0;
                assertThat(ours.value(xi)).isCloseTo(scale * x.applyAsDouble(xi), within(1e-6));
            }
        }
    }

    @Test
    void stiffClampedShapeIsNotASineNearTheEnds() {
        // τ = 25: the bending boundary layer is wide; the shape departs visibly from sin(πξ).
        StringModel s = new StringModel(0.65, 70, 5e-4, 70 * 0.65 * 0.65 / 25, EndCondition.CLAMPED);
        ModeShape x = new ModeSolver().modes(s, 1).get(0).shape();
        assertThat(x.value(0.1)).isLessThan(Math.sin(Math.PI * 0.1) - 0.05);
        assertThat(x.value(0.5)).isCloseTo(1.0, within(1e-12));
    }
}
