package org.nodewright.physics.strings;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.nodewright.physics.Require;

/**
 * Tension that makes the sounding fundamental equal a target pitch, stiffness included.
 * Flexible: T = μ(2Lf)². Pinned stiff: f1² = T/(4L²μ) + π²EI/(4L⁴μ) from Fletcher's f1 = f0·√(1+B),
 * so T = 4L²μf² − π²EI/L² in closed form. Clamped: f1(T) rises monotonically with T, solved with a
 * bracketing Brent solver below the pinned tension (clamped ends sound higher at equal tension).
 */
public final class TensionSolver {

    private static final double RELATIVE_ACCURACY = 1e-14;
    private static final int MAX_EVALUATIONS = 200;

    private final ModeSolver modes = new ModeSolver();

    /**
     * @throws PitchUnreachableException when the target lies at or below what the string gives
     *                                   with no tension at all (a stiff bar's own pitch)
     */
    public double tensionFor(double lengthM, double linearDensityKgPerM, double bendingStiffnessNm2,
            EndCondition end, double targetHz) {
        Require.positive("targetHz", targetHz);
        double flexible = IdealString.tensionN(lengthM, linearDensityKgPerM, targetHz);
        if (bendingStiffnessNm2 == 0) {
            return flexible;
        }
        if (end == EndCondition.PINNED) {
            double t = flexible - Math.PI * Math.PI * bendingStiffnessNm2 / (lengthM * lengthM);
            if (!(t > 0)) {
                throw unreachable(targetHz);
            }
            return t;
        }
        // Clamped ends are stiffer than pinned ones, so the pinned tension bounds the answer from
        // above; half of it is a tight lower bound whenever B is modest, else fall back to T → 0.
        double pinned = flexible - Math.PI * Math.PI * bendingStiffnessNm2 / (lengthM * lengthM);
        double hi = pinned > 0 ? pinned : flexible;
        double lo = hi / 2;
        if (fundamental(lengthM, lo, linearDensityKgPerM, bendingStiffnessNm2, end) >= targetHz) {
            lo = flexible * 1e-12;
            if (fundamental(lengthM, lo, linearDensityKgPerM, bendingStiffnessNm2, end) >= targetHz) {
                throw unreachable(targetHz);
            }
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(RELATIVE_ACCURACY, 1e-300, 5);
        return solver.solve(MAX_EVALUATIONS,
                t -> fundamental(lengthM, t, linearDensityKgPerM, bendingStiffnessNm2, end) - targetHz,
                lo, hi, AllowedSolution.ANY_SIDE);
    }

    /** Sounding fundamental for a tension (pitch from tension). */
    public double fundamental(double lengthM, double tensionN, double linearDensityKgPerM,
            double bendingStiffnessNm2, EndCondition end) {
        return modes.fundamentalHz(new StringModel(lengthM, tensionN, linearDensityKgPerM, bendingStiffnessNm2, end));
    }

    private static PitchUnreachableException unreachable(double targetHz) {
        return new PitchUnreachableException("a target of " + targetHz
                + " Hz is at or below the pitch this string has from its stiffness alone; no tension reaches it");
    }
}
