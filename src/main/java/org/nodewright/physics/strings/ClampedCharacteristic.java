package org.nodewright.physics.strings;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.nodewright.physics.Require;

/**
 * Eigenvalues of a stiff string (Euler–Bernoulli beam under tension) clamped at both ends.
 *
 * <p>With E·I·y'''' − T·y'' + μ·ÿ = 0 and y = X(x)·e^{iωt}, X = A·cosh αx + B·sinh αx + C·cos βx +
 * D·sin βx where α² − β² = T/(E·I) and α·β = ω·√(μ/(E·I)) (Morse 1948, Vibration and Sound §16;
 * Fletcher 1964). The clamped–clamped conditions X = X' = 0 at x = 0 and x = L give the exact
 * characteristic equation 2αβ(1 − cosh αL·cos βL) + (α² − β²)·sinh αL·sin βL = 0. Divided by
 * cosh αL and written with b = βL, a = αL, τ = T·L²/(E·I) (a² = b² + τ) it never overflows:
 * g(b) = 2ab(sech a − cos b) + τ·tanh a·sin b = 0. Root n lies in (nπ, (n+1)π): at τ = 0 they are the
 * clamped-beam roots 4.7300, 7.8532, ..., and as τ → ∞ they fall to nπ.
 */
public final class ClampedCharacteristic {

    private ClampedCharacteristic() {
    }

    /** Relative accuracy of b: far below what 0.01 cent needs (≈ 6e-6). */
    private static final double RELATIVE_ACCURACY = 1e-15;
    private static final double ABSOLUTE_ACCURACY = 1e-13;
    private static final int MAX_EVALUATIONS = 200;
    private static final int SOLVER_ORDER = 5;

    /** g(b) for the dimensionless tension τ ≥ 0. */
    public static double characteristic(double b, double tau) {
        double a = Math.sqrt(b * b + tau);
        return 2 * a * b * (sech(a) - Math.cos(b)) + tau * Math.tanh(a) * Math.sin(b);
    }

    /** The n-th root b_n = β_n·L of the clamped–clamped equation for τ = T·L²/(E·I) ≥ 0. */
    public static double root(int n, double tau) {
        Require.atLeastOne("mode number", n);
        Require.nonNegative("tau", tau);
        // A fresh solver per call: Hipparchus solvers keep per-solve state and are not thread-safe.
        BracketingNthOrderBrentSolver solver =
                new BracketingNthOrderBrentSolver(RELATIVE_ACCURACY, ABSOLUTE_ACCURACY, SOLVER_ORDER);
        double lo = n * Math.PI;
        double hi = (n + 1) * Math.PI;
        // Under high tension the root sits just above nπ, at about nπ(1 + 2/a) (Fletcher 1964's
        // clamped correction); a bracket a few times that wide saves most of the iterations.
        double a0 = Math.sqrt(lo * lo + tau);
        double narrow = lo + 3 * hi / a0;
        if (narrow < hi && characteristic(lo, tau) * characteristic(narrow, tau) < 0) {
            hi = narrow;
        }
        return solver.solve(MAX_EVALUATIONS, b -> characteristic(b, tau), lo, hi, AllowedSolution.ANY_SIDE);
    }

    /** ω·L²·√(μ/(E·I)) = a·b: frequency f_n = b·√(b²·E·I/μ + T·L²/μ)/(2π·L²). */
    public static double frequencyHz(double b, StringModel s) {
        double l = s.lengthM();
        double mu = s.linearDensityKgPerM();
        return b * Math.sqrt(b * b * s.bendingStiffnessNm2() / mu + s.tensionN() * l * l / mu) / (2 * Math.PI * l * l);
    }

    static double sech(double a) {
        // 1/cosh a without overflow for large a
        double e = Math.exp(-a);
        return 2 * e / (1 + e * e);
    }
}
