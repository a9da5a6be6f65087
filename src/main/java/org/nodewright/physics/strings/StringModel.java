package org.nodewright.physics.strings;

import org.nodewright.physics.Require;

/**
 * A uniform string under tension with optional bending stiffness, fixed at both ends.
 *
 * @param lengthM              vibrating length L
 * @param tensionN             tension T
 * @param linearDensityKgPerM  mass per unit length μ
 * @param bendingStiffnessNm2  E·I (0 = ideal flexible string)
 * @param endCondition         bending boundary at both ends (irrelevant when E·I = 0)
 */
public record StringModel(double lengthM, double tensionN, double linearDensityKgPerM,
        double bendingStiffnessNm2, EndCondition endCondition) {

    public StringModel {
        Require.positive("lengthM", lengthM);
        Require.positive("tensionN", tensionN);
        Require.positive("linearDensityKgPerM", linearDensityKgPerM);
        Require.nonNegative("bendingStiffnessNm2", bendingStiffnessNm2);
        if (endCondition == null) {
            throw new IllegalArgumentException("endCondition is required");
        }
    }

    public boolean isStiff() {
        return bendingStiffnessNm2 > 0;
    }

    /** Transverse wave speed c = √(T/μ) (Mersenne–Taylor). */
    public double waveSpeedMps() {
        return Math.sqrt(tensionN / linearDensityKgPerM);
    }

    /** Ideal flexible-string fundamental f1 = (1/2L)·√(T/μ) (Mersenne's laws). */
    public double idealFundamentalHz() {
        return IdealString.frequencyHz(1, lengthM, tensionN, linearDensityKgPerM);
    }

    /** Fletcher's B = π²·E·I/(T·L²) = π³·E·d⁴/(64·T·L²) (Fletcher 1964, J. Acoust. Soc. Am. 36, 203). */
    public double inharmonicityB() {
        return Math.PI * Math.PI * bendingStiffnessNm2 / (tensionN * lengthM * lengthM);
    }

    /** Dimensionless tension τ = T·L²/(E·I) = π²/B; infinite for a flexible string. */
    public double tensionParameter() {
        return isStiff() ? tensionN * lengthM * lengthM / bendingStiffnessNm2 : Double.POSITIVE_INFINITY;
    }
}
