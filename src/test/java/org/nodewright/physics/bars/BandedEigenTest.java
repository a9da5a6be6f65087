package org.nodewright.physics.bars;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The shift-invert subspace iteration against values from outside the code: a closed form for
 * linear elements, and scipy for a banded pencil with rigid-body modes.
 */
class BandedEigenTest {

    /**
     * A free–free rod of N = 60 linear elements (h = 1/N), K = (1/h)[1 −1; −1 1], consistent mass
     * M = (h/6)[2 1; 1 2] per element: λ_k = (6/h²)(1 − cos θ)/(2 + cos θ), θ = kπ/N, k = 0, 1, ...
     * (the discrete dispersion relation of linear elements with consistent mass; Strang and Fix, An
     * Analysis of the Finite Element Method, 1973, §6.4; the first eight also checked with
     * scipy.linalg.eigh(K, M)). Tolerance: relative 1e-11.
     */
    @Test
    void linearElementRodMatchesTheDiscreteDispersionRelation() {
        int ne = 60;
        int n = ne + 1;
        double h = 1.0 / ne;
        double[][] k = new double[n][n];
        double[][] m = new double[n][n];
        for (int e = 0; e < ne; e++) {
            k[e][e] += 1 / h;
            k[e + 1][e + 1] += 1 / h;
            k[e][e + 1] -= 1 / h;
            k[e + 1][e] -= 1 / h;
            m[e][e] += 2 * h / 6;
            m[e + 1][e + 1] += 2 * h / 6;
            m[e][e + 1] += h / 6;
            m[e + 1][e] += h / 6;
        }
        GeneralizedEigen eig = BandedEigen.lowest(k, m, 8);
        assertThat(eig.values).hasSize(8);
        assertThat(Math.abs(eig.values[0])).isLessThan(1e-9);
        for (int q = 1; q < 8; q++) {
            double theta = q * Math.PI / ne;
            double exact = 6 / (h * h) * (1 - Math.cos(theta)) / (2 + Math.cos(theta));
            assertThat(eig.values[q]).as("mode %d", q).isCloseTo(exact, within(1e-11 * exact));
        }
        assertMOrthonormalEigenvectors(k, m, eig);
    }

    /**
     * K = D₂ᵀD₂ with D₂ the (n−2)×n second-difference matrix (rows 1, −2, 1: null space = constants and
     * straight lines, the two rigid-body modes of a free beam), M with diagonal 4/6 + 0.1 cos²(i), first
     * off-diagonal 1/6 and third off-diagonal 0.05, n = 120. Expected: scipy.linalg.eigh(K, M)
     * (scipy 1.17, LAPACK dsygvd), eigenvalues 3..10 (the first two are zero to 1e-14). Tolerance:
     * relative 1e-8: either solver is only good to about ε‖K‖/λ ≈ 2e-16 · 16 / 2e-6 ≈ 2e-9 here.
     */
    @ParameterizedTest
    @CsvSource({
        "2, 2.137514865425677e-06",
        "3, 1.625951734924977e-05",
        "4, 6.25848430031373e-05",
        "5, 0.00017136561936705288",
        "6, 0.00038336475292211406",
        "7, 0.0007500737303626926",
        "8, 0.0013340782354965513",
        "9, 0.002209472026270853",
    })
    void bandedPencilWithRigidModesMatchesScipy(int index, double expected) {
        double[][][] km = secondDifferencePencil(120);
        GeneralizedEigen eig = BandedEigen.lowest(km[0], km[1], 10);
        assertThat(eig.values[index]).isCloseTo(expected, within(1e-8 * expected));
        assertThat(Math.abs(eig.values[0])).isLessThan(1e-12);
        assertThat(Math.abs(eig.values[1])).isLessThan(1e-12);
    }

    @Test
    void bandedPencilVectorsAreMOrthonormalEigenvectors() {
        double[][][] km = secondDifferencePencil(120);
        assertMOrthonormalEigenvectors(km[0], km[1], BandedEigen.lowest(km[0], km[1], 10));
    }

    @Test
    void halfBandwidthIsTheFarthestNonZeroFromTheDiagonal() {
        double[][][] km = secondDifferencePencil(20);
        assertThat(BandedEigen.halfBandwidth(km[0], km[1])).isEqualTo(3);
    }

    static double[][][] secondDifferencePencil(int n) {
        double[][] k = new double[n][n];
        for (int r = 0; r < n - 2; r++) {
            double[] d = {1, -2, 1};
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    k[r + a][r + b] += d[a] * d[b];
                }
            }
        }
        double[][] m = new double[n][n];
        for (int i = 0; i < n; i++) {
            m[i][i] = 4.0 / 6 + 0.1 * Math.pow(Math.cos(i), 2);
            if (i + 1 < n) {
                m[i][i + 1] = m[i + 1][i] = 1.0 / 6;
            }
            if (i + 3 < n) {
                m[i][i + 3] = m[i + 3][i] = 0.05;
            }
        }
        return new double[][][] {k, m};
    }

    /** ‖K x − λ M x‖ ≤ 1e-8 ‖K x‖ + tiny, and xᵢᵀ M xⱼ = δᵢⱼ to 1e-10 (definitions, no reference needed). */
    private static void assertMOrthonormalEigenvectors(double[][] k, double[][] m, GeneralizedEigen eig) {
        int n = k.length;
        for (int q = 0; q < eig.values.length; q++) {
            double[] x = eig.vectors[q];
            double[] kx = times(k, x);
            double[] mx = times(m, x);
            double res = 0;
            double scale = 0;
            for (int i = 0; i < n; i++) {
                res += Math.pow(kx[i] - eig.values[q] * mx[i], 2);
                scale += Math.pow(eig.values[q] * mx[i], 2);
            }
            assertThat(Math.sqrt(res)).as("residual of mode %d", q).isLessThan(1e-7 * Math.sqrt(scale) + 1e-12);
            for (int p = 0; p < eig.values.length; p++) {
                double dot = 0;
                for (int i = 0; i < n; i++) {
                    dot += eig.vectors[p][i] * mx[i];
                }
                assertThat(dot).as("x%d M x%d", p, q).isCloseTo(p == q ? 1.0 : 0.0, within(1e-10));
            }
        }
    }

    private static double[] times(double[][] a, double[] x) {
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            for (int j = 0; j < x.length; j++) {
                y[i] += a[i][j] * x[j];
            }
        }
        return y;
    }
}
