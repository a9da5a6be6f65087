package org.nodewright.physics.bars;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.hipparchus.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.tuning.Cents;

/**
 * Convergence of the finite elements: the error against an exact solution falls at the rate of
 * the element (h⁴ for Hermite Euler–Bernoulli, h⁶ for the cubic Lagrange Timoshenko element when
 * the mesh is halved), and the default mesh is within 0.05 cent for every mode it reports.
 */
class BarConvergenceTest {

    private static final double L = 0.38;
    private static final Bar FREE = new Bar(L, RectangleSection.uniform(0.06, 0.022, L), 1000, 20e9, 1.5e9,
            BarEnds.FREE_FREE);
    private static final Bar PINNED = new Bar(L, RectangleSection.uniform(0.06, 0.022, L), 1000, 20e9, 1.5e9,
            BarEnds.PINNED_PINNED);

    /** Exact root of cos βL cosh βL = 1 near (n + ½)π, solved here by Hipparchus' Brent solver. */
    private static double freeFreeRoot(int n) {
        double guess = (n + 0.5) * Math.PI;
        return new BrentSolver(1e-14).solve(100, b -> Math.cos(b) * Math.cosh(b) - 1, guess - 0.3, guess + 0.3);
    }

    private static double eulerBernoulliHz(int n) {
        double b = freeFreeRoot(n);
        double i = 0.06 * Math.pow(0.022, 3) / 12;
        double a = 0.06 * 0.022;
        return b * b / (2 * Math.PI * L * L) * Math.sqrt(20e9 * i / (1000 * a));
    }

    @Test
    void hermiteErrorFallsAsTheFourthPowerOfTheElementLength() {
        double[] err = new double[4];
        int[] elements = {6, 12, 24, 48};
        for (int i = 0; i < elements.length; i++) {
            BeamFamily f = BeamFamily.solve(FREE, BeamTheory.EULER_BERNOULLI, false, 6, elements[i]);
            err[i] = Cents.between(f.frequencyHz(5), eulerBernoulliHz(6));
            assertThat(err[i]).isPositive(); // Rayleigh–Ritz bounds from above
        }
        for (int i = 1; i < elements.length; i++) {
            assertThat(err[i - 1] / err[i]).as("cents off with %s and %s elements: %s", elements[i - 1], elements[i],
                    java.util.Arrays.toString(err)).isGreaterThan(12.0); // 16 for h⁴
        }
    }

    @Test
    void lagrangeTimoshenkoErrorFallsAsTheSixthPower() {
        int[] elements = {3, 6, 12};
        double[] err = new double[elements.length];
        double kappa = FREE.shearCoefficient();
        for (int i = 0; i < elements.length; i++) {
            BeamFamily f = BeamFamily.solve(PINNED, BeamTheory.TIMOSHENKO, false, 4, elements[i]);
            err[i] = Cents.between(f.frequencyHz(3), BarBendingTest.timoshenkoPinnedHz(4, kappa));
        }
        for (int i = 1; i < elements.length; i++) {
            assertThat(err[i - 1] / err[i]).as("cents off with %s and %s elements: %s", elements[i - 1], elements[i],
                    java.util.Arrays.toString(err)).isGreaterThan(30.0); // 64 for h⁶
        }
    }

    @Test
    void defaultMeshIsConvergedForEveryReportedMode() {
        for (int count : new int[] {1, 3, 6, 10, BarAnalyzer.MAX_MODES}) {
            BarAnalysis a = BarAnalyzer.analyze(FREE, BeamTheory.EULER_BERNOULLI, count, false);
            for (int n = 1; n <= count; n++) {
                assertThat(Cents.between(a.bending().get(n - 1).frequencyHz(), eulerBernoulliHz(n)))
                        .as("mode %d of %d", n, count).isCloseTo(0.0, within(0.05));
            }
            BarAnalysis t = BarAnalyzer.analyze(PINNED, BeamTheory.TIMOSHENKO, count, false);
            for (int n = 1; n <= count; n++) {
                assertThat(Cents.between(t.bending().get(n - 1).frequencyHz(),
                        BarBendingTest.timoshenkoPinnedHz(n, FREE.shearCoefficient())))
                        .as("Timoshenko mode %d of %d", n, count).isCloseTo(0.0, within(0.05));
            }
        }
    }
}
