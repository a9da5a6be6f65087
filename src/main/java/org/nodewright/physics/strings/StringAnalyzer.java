package org.nodewright.physics.strings;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.tuning.EqualTemperament;

/** Analyses a {@link StringDesign}: tension, modes, excitation, pickup gains, stress and note. */
public final class StringAnalyzer {

    private final ModeSolver modeSolver = new ModeSolver();
    private final TensionSolver tensionSolver = new TensionSolver();

    public StringAnalysis analyze(StringDesign d) {
        double tension = d.tensionN() != null ? d.tensionN()
                : tensionSolver.tensionFor(d.lengthM(), d.linearDensityKgPerM(), d.bendingStiffnessNm2(),
                        d.endCondition(), d.targetHz());
        StringModel model = new StringModel(d.lengthM(), tension, d.linearDensityKgPerM(), d.bendingStiffnessNm2(),
                d.endCondition());
        List<Mode> modes = modeSolver.modes(model, d.modeCount());
        List<StringAnalysis.ModeResponse> responses = new ArrayList<>(modes.size());
        for (Mode mode : modes) {
            responses.add(respond(d, mode));
        }
        double f1 = modes.get(0).frequencyHz();
        StressCheck stress = d.coreDiameterM() == null ? null
                : StressCheck.of(tension, d.coreDiameterM(),
                        d.tensileStrengthPa() == null ? Double.NaN : d.tensileStrengthPa());
        return new StringAnalysis(model, f1, stress, new EqualTemperament(d.a4Hz()).nearest(f1), responses);
    }

    private static StringAnalysis.ModeResponse respond(StringDesign d, Mode mode) {
        Double excitation = null;
        if (d.excitationKind() == ExcitationKind.PLUCK) {
            excitation = Excitation.pluck(mode.n(), d.lengthM(), d.excitationPositionM());
        } else if (d.excitationKind() == ExcitationKind.STRIKE) {
            excitation = Excitation.strike(mode.n(), d.lengthM(), d.excitationPositionM());
        }
        List<Double> gains = new ArrayList<>(d.pickups().size());
        for (Pickup p : d.pickups()) {
            gains.add(p.gain(mode.shape(), d.lengthM()));
        }
        Double combined = null;
        if (d.combination() == PickupCombination.SUM) {
            combined = gains.get(0) + gains.get(1);
        } else if (d.combination() == PickupCombination.OPPOSITE) {
            combined = gains.get(0) - gains.get(1);
        }
        return new StringAnalysis.ModeResponse(mode, excitation, gains, combined);
    }
}
