package org.nodewright.physics.strings;

import java.util.List;
import org.nodewright.physics.Require;

/**
 * Everything needed to analyse one string, in SI units.
 *
 * @param lengthM               vibrating length
 * @param tensionN              tension, or null to solve it from {@code targetHz}
 * @param targetHz              wanted sounding fundamental, or null when the tension is given
 * @param linearDensityKgPerM   μ
 * @param bendingStiffnessNm2   E·I of the core (0 = flexible string)
 * @param endCondition          bending boundary condition
 * @param coreDiameterM         load-bearing core diameter for the stress check, or null
 * @param tensileStrengthPa     the core material's strength, or null when unknown
 * @param modeCount             how many modes, 1..{@link ModeSolver#MAX_MODES}
 * @param excitationKind        pluck or strike, or null for none
 * @param excitationPositionM   where the string is plucked or struck (ignored without a kind)
 * @param pickups               sensors, possibly none
 * @param combination           how to combine exactly two pickups, or null
 * @param a4Hz                  reference A4 for note names
 */
public record StringDesign(double lengthM, Double tensionN, Double targetHz, double linearDensityKgPerM,
        double bendingStiffnessNm2, EndCondition endCondition, Double coreDiameterM, Double tensileStrengthPa,
        int modeCount, ExcitationKind excitationKind, double excitationPositionM, List<Pickup> pickups,
        PickupCombination combination, double a4Hz) {

    public StringDesign {
        Require.positive("lengthM", lengthM);
        if ((tensionN == null) == (targetHz == null)) {
            throw new IllegalArgumentException("give exactly one of tensionN and targetHz");
        }
        Require.positive("linearDensityKgPerM", linearDensityKgPerM);
        Require.nonNegative("bendingStiffnessNm2", bendingStiffnessNm2);
        Require.between("modeCount", modeCount, 1, ModeSolver.MAX_MODES);
        if (excitationKind != null && !(excitationPositionM > 0 && excitationPositionM < lengthM)) {
            throw new IllegalArgumentException("the excitation point must lie strictly between the ends");
        }
        pickups = pickups == null ? List.of() : List.copyOf(pickups);
        if (combination != null && pickups.size() != 2) {
            throw new IllegalArgumentException("a pickup combination needs exactly two pickups");
        }
        Require.positive("a4Hz", a4Hz);
    }
}
