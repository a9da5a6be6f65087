package org.nodewright.physics.strings;

import java.util.function.DoubleFunction;
import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.nodewright.physics.Require;

/**
 * The diameter that gives a wanted tension at a wanted pitch. For a flexible plain string it is
 * closed form, T = μ(2Lf)² with μ = ρπd²/4, so d = √(T/(π·ρ))/(L·f). Otherwise (stiffness on, or a
 * wound string whose wrap diameter is sought) the needed tension T(d) from {@link TensionSolver} is
 * matched to the wanted one with a bracketing Brent solver, searching upwards from the flexible
 * plain-string estimate.
 */
public final class GaugeSolver {

    private static final double RELATIVE_ACCURACY = 1e-13;
    private static final int MAX_EVALUATIONS = 200;
    /** Bracket growth per step and the number of steps: covers diameters up to ~1.5^60 times the guess. */
    private static final double GROWTH = 1.5;
    private static final int MAX_STEPS = 60;

    private final TensionSolver tensions = new TensionSolver();

    /** Flexible plain string: d = √(T/(π·ρ))/(L·f), from T = μ(2Lf)² and μ = ρπd²/4. */
    public static double plainFlexibleDiameterM(double densityKgPerM3, double lengthM, double targetHz, double tensionN) {
        return Math.sqrt(tensionN / (Math.PI * densityKgPerM3)) / (lengthM * targetHz);
    }

    /**
     * The diameter d for which {@code build.apply(d)} needs {@code tensionN} to sound {@code targetHz}.
     *
     * @param build   the string for a trial diameter (the plain diameter, or a wound string's wrap)
     * @param stiff   include the core's bending stiffness
     * @throws PitchUnreachableException when no diameter in range gives that tension
     */
    public double diameterM(DoubleFunction<StringConstruction> build, double guessM, double lengthM, double targetHz,
            double tensionN, boolean stiff, EndCondition end) {
        Require.positive("guessM", guessM);
        Require.positive("tensionN", tensionN);
        java.util.function.DoubleUnaryOperator excess = d -> needed(build.apply(d), lengthM, targetHz, stiff, end) - tensionN;
        double lo = guessM;
        double fLo = safeExcess(excess, lo);
        int steps = 0;
        while (fLo > 0 && steps++ < MAX_STEPS) {
            lo /= GROWTH;
            fLo = safeExcess(excess, lo);
        }
        double hi = lo;
        double fHi = fLo;
        steps = 0;
        while (fHi < 0 && steps++ < MAX_STEPS) {
            lo = hi;
            fLo = fHi;
            hi *= GROWTH;
            fHi = safeExcess(excess, hi);
        }
        if (!(fLo <= 0 && fHi >= 0)) {
            throw new PitchUnreachableException("no diameter gives " + tensionN + " N at " + targetHz + " Hz");
        }
        if (fLo == 0) {
            return lo;
        }
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(RELATIVE_ACCURACY, 1e-15, 5);
        double d = solver.solve(MAX_EVALUATIONS, excess::applyAsDouble, lo, hi, AllowedSolution.ANY_SIDE);
        // The needed tension falls again for very stiff strings; a "root" at that edge is no answer.
        if (!(Math.abs(safeExcess(excess, d)) <= 1e-9 * tensionN)) {
            throw new PitchUnreachableException("no diameter gives " + tensionN + " N at " + targetHz + " Hz");
        }
        return d;
    }

    private double needed(StringConstruction c, double lengthM, double targetHz, boolean stiff, EndCondition end) {
        return tensions.tensionFor(lengthM, c.linearDensityKgPerM(), stiff ? c.bendingStiffnessNm2() : 0, end, targetHz);
    }

    /** A string too stiff to reach the pitch at all counts as needing "more than any" tension. */
    private static double safeExcess(java.util.function.DoubleUnaryOperator excess, double d) {
        try {
            return excess.applyAsDouble(d);
        } catch (PitchUnreachableException e) {
            return Double.POSITIVE_INFINITY;
        }
    }
}
