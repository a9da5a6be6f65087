package org.nodewright.inverse;

import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.inverse.ToneHoleSolution;

/**
 * A finished solve as the API shows it: each fingering's target, start and achieved frequency and
 * cents, each hole's new position and diameter and how far it moved, and the adjusted bore (the
 * request's bore with the new holes and foot) to apply or open in the bore bench.
 */
record ToneHoleResult(double toleranceCents, boolean withinTolerance, double worstCents, List<Note> notes,
        List<Hole> holes, double footMovedMm, int iterations, int evaluations, AirColumnRequest bore) {

    record Note(String fingering, double targetHz, double startHz, double startCents, double achievedHz,
            double achievedCents) {
    }

    /** {@code hole} is the index into bore.holes (as in closedHoles); {@code number} counts from 1. */
    record Hole(int hole, int number, double positionMm, double movedMm, double diameterMm, double diameterChangeMm) {
    }

    static ToneHoleResult of(ToneHoleSolution s, double tolerance, AirColumnRequest original) {
        return new ToneHoleResult(tolerance, s.withinTolerance(), s.worstAbsCents(),
                s.notes().stream().map(n -> new Note(n.fingering(), n.targetHz(), n.startHz(), n.startCents(),
                        n.achievedHz(), n.achievedCents())).toList(),
                s.holes().stream().map(h -> new Hole(h.hole(), h.hole() + 1, h.positionMm(), h.movedMm(),
                        h.diameterMm(), h.diameterChangeMm())).toList(),
                s.footMovedMm(), s.iterations(), s.evaluations(), BoreMapping.applied(original, s.layout()));
    }
}
