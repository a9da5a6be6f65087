package org.nodewright.inverse;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.inverse.BlankTubeSolver;
import org.nodewright.physics.inverse.FirstLayout;
import org.nodewright.physics.inverse.HoleLayout;

/**
 * A finished blank-tube solve: the chosen start's solution (as a tone-hole result: each note's
 * cents at the first layout and after, each hole's place and how far it moved from the first
 * layout, the bore with its new holes and foot), the closed-form first layout, and every start
 * tried.
 *
 * @param inputCorrectionMm the player's end's correction the closed form used (from the blank's own pitch)
 */
record BlankTubeResult(ToneHoleResult solution, FirstLayoutView firstLayout, double inputCorrectionMm,
        double outputCorrectionMm, int chosenStart, List<StartView> starts, List<MouthChange> mouth, String method) {

    /** A figure of the player's end the solve moved: its field in the bore request, start, solved value, change. */
    record MouthChange(String field, double startMm, double solvedMm, double movedMm) {
    }

    record HoleView(int hole, int number, double positionMm, double diameterMm) {
    }

    record FirstLayoutView(List<HoleView> holes, double footMm, double worstCents) {
    }

    record StartView(int start, double startDiameterMm, double firstWorstCents, double worstCents, int evaluations,
            boolean withinTolerance) {
    }

    static final String METHOD = "first layout: each hole where the tube cut off by it sounds its note, the open hole a "
            + "lumped inertance beside the bore below it (Nederveen 1969; Benade 1976); then Levenberg-Marquardt "
            + "(Hipparchus) on the cents of every fingering by the transfer matrix model, one run per starting diameter, "
            + "moving the headspace or window length with the holes where mouthLimits allow";

    static BlankTubeResult of(BlankTubeSolver.Result r, FirstLayout.Tube tube, double tolerance, AirColumnRequest bore) {
        BlankTubeSolver.Start best = r.best();
        HoleLayout first = best.firstLayout();
        List<HoleView> holes = new ArrayList<>();
        for (int h = 0; h < first.holeCount(); h++) {
            holes.add(new HoleView(h, h + 1, first.position(h), first.diameter(h)));
        }
        List<StartView> starts = r.starts().stream().map(s -> new StartView(s.index(), s.startDiameterMm(),
                s.firstWorstCents(), s.solution().worstAbsCents(), s.solution().evaluations(),
                s.solution().withinTolerance())).toList();
        List<MouthChange> mouth = best.solution().modelChanges().stream().map(c -> new MouthChange("mouth." + c.name(),
                c.start(), c.value(), c.moved())).toList();
        AirColumnRequest moved = BoreMapping.withMouth(BoreMapping.applied(bore, first), best.solution().modelChanges());
        return new BlankTubeResult(ToneHoleResult.of(best.solution(), tolerance, moved),
                new FirstLayoutView(holes, first.footLengthMm(), best.firstWorstCents()), tube.inputCorrectionMm(),
                tube.outputCorrectionMm(), best.index(), starts, mouth, METHOD);
    }
}
