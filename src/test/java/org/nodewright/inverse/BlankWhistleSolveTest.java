package org.nodewright.inverse;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.aircolumn.Fingering;
import org.nodewright.physics.inverse.BlankTubeSolver;
import org.nodewright.physics.inverse.ModelFreedom;
import org.nodewright.physics.inverse.PlayingFrequencyModel;
import org.nodewright.physics.inverse.SolveProgress;
import org.nodewright.physics.inverse.ToneHoleSolution;

/**
 * The case: a blank 13 mm x 280 mm tube with a 4 x 8 mm window, six holes, the D-major
 * chart over two registers (13 fingerings), headspace free to move (the demo request), solved as
 * the blank-tube endpoint solves it. Every note must sound within 3 cents of its equal-tempered
 * target by the tool's own model (what the issue asks; the model's own accuracy is checked
 * elsewhere against outside references).
 */
class BlankWhistleSolveTest {

    /** MIDI numbers of the chart's notes (D5 = 74, common practice) and 12-TET on A4 = 440 Hz (ISO 16). */
    static final Map<String, Integer> MIDI = Map.ofEntries(Map.entry("D5", 74), Map.entry("E5", 76),
            Map.entry("F#5", 78), Map.entry("G5", 79), Map.entry("A5", 81), Map.entry("B5", 83),
            Map.entry("C#6", 85), Map.entry("D6", 86), Map.entry("E6", 88), Map.entry("F#6", 90),
            Map.entry("G6", 91), Map.entry("A6", 93), Map.entry("B6", 95));

    static double equalTempered(String note) {
        return 440.0 * Math.pow(2, (MIDI.get(note) - 69) / 12.0);
    }

    @Test
    void everyNoteOfBothRegistersEndsWithinThreeCents() {
        BlankTubeSetup s = BlankTubeSetup.of(DemoRequests.blankWhistle());
        assertThat(s.fingerings()).hasSize(13);
        assertThat(s.freedom().size()).isPositive();
        BlankTubeSolver.Result r = new BlankTubeSolver(BlankTubeRequest.DEFAULT_TOLERANCE_CENTS,
                BlankTubeRequest.DEFAULT_MAX_EVALUATIONS_PER_START).solve(s.model(), s.tube(), s.chimneysMm(),
                s.model().lengthBeforeFootMm(), s.fingerings(), s.limits(), s.freedom(), s.startDiametersMm(),
                SolveProgress.NONE, () -> false);
        ToneHoleSolution best = r.best().solution();
        // the model at the solved mouth, asked afresh for every fingering from its equal-tempered target
        double[] figures = best.modelChanges().stream().mapToDouble(ModelFreedom.Change::value).toArray();
        PlayingFrequencyModel model = s.freedom().family().apply(figures);
        List<Fingering> chart = s.fingerings();
        for (Fingering f : chart) {
            double target = equalTempered(f.name());
            double hz = model.soundingHz(best.layout(), f, target);
            double cents = 1200 * Math.log(hz / target) / Math.log(2);
            assertThat(Math.abs(cents)).as(f.name() + " at " + hz + " Hz").isLessThanOrEqualTo(3.0);
        }
        assertThat(best.withinTolerance()).isTrue();
        // the holes the maker drills stay inside the limits: 3..11 mm, 40 mm from the window, 3 mm wall
        for (int h = 0; h < 6; h++) {
            assertThat(best.layout().diameter(h)).isBetween(3.0, 11.0);
            assertThat(best.layout().position(h)).isGreaterThanOrEqualTo(40.0);
        }
        for (int h = 0; h + 1 < 6; h++) {
            double wall = best.layout().position(h + 1) - best.layout().position(h)
                    - (best.layout().diameter(h) + best.layout().diameter(h + 1)) / 2;
            assertThat(wall).isGreaterThanOrEqualTo(3.0 - 0.05);
        }
        assertThat(best.layout().footLengthMm()).isLessThanOrEqualTo(280.0);
        for (ModelFreedom.Change c : best.modelChanges()) {
            assertThat(c.value()).isBetween(0.0, 13.0);
        }
    }
}
