package org.nodewright.physics.inverse;

import java.util.List;

/**
 * What the tone-hole solver found.
 *
 * @param layout      the adjusted holes and foot
 * @param notes       per fingering: the target, what the model says it now sounds, cents off
 * @param holes       per hole: new position and diameter and how far each moved from the start
 * @param footMovedMm change of the last section's length (positive = longer)
 * @param withinTolerance whether every fingering is within the requested tolerance
 * @param modelChanges the model's own figures the solve was let move (see {@link ModelFreedom}), start and end
 */
public record ToneHoleSolution(HoleLayout layout, List<Note> notes, List<HoleChange> holes, double footMovedMm,
        int iterations, int evaluations, boolean withinTolerance, List<ModelFreedom.Change> modelChanges) {

    public record Note(String fingering, double targetHz, double startHz, double achievedHz, double startCents,
            double achievedCents) {
    }

    public record HoleChange(int hole, double positionMm, double movedMm, double diameterMm, double diameterChangeMm) {
    }

    public ToneHoleSolution {
        notes = List.copyOf(notes);
        holes = List.copyOf(holes);
        modelChanges = List.copyOf(modelChanges);
    }

    public double worstAbsCents() {
        return notes.stream().mapToDouble(n -> Math.abs(n.achievedCents())).max().orElse(0);
    }
}
