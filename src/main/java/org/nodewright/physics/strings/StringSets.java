package org.nodewright.physics.strings;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.physics.tuning.Note;

/** Tension of every string of a set at its target pitch and the total load on the neck. */
public final class StringSets {

    private StringSets() {
    }

    /**
     * @param stiff  include bending stiffness (core only) when solving each tension
     * @param end    end condition for the stiffness
     */
    public static Result analyze(List<SetString> strings, boolean stiff, EndCondition end, double a4Hz) {
        if (strings == null || strings.isEmpty()) {
            throw new IllegalArgumentException("a set needs at least one string");
        }
        TensionSolver solver = new TensionSolver();
        EqualTemperament et = new EqualTemperament(a4Hz);
        List<Member> members = new ArrayList<>(strings.size());
        double total = 0;
        for (SetString s : strings) {
            StringConstruction c = s.construction();
            double mu = c.linearDensityKgPerM();
            double ei = stiff ? c.bendingStiffnessNm2() : 0;
            double t = solver.tensionFor(s.lengthM(), mu, ei, end, s.targetHz());
            StressCheck stress = StressCheck.of(t, c.coreDiameterM(), c.core().tensileStrengthPa());
            members.add(new Member(s, t, mu, stress, et.nearest(s.targetHz())));
            total += t;
        }
        return new Result(members, total);
    }

    /** One string's answer. */
    public record Member(SetString string, double tensionN, double linearDensityKgPerM, StressCheck stress, Note note) {
    }

    /** Every string's answer and Σ T, the load on the neck. */
    public record Result(List<Member> members, double totalTensionN) {
        public Result {
            members = List.copyOf(members);
        }
    }
}
