package org.nodewright.physics.aircolumn;

import java.util.List;

/**
 * A bore to analyse: segments from the input end, side holes, the two end conditions, the room's
 * air, whether visco-thermal wall losses are included, and optionally the player's end
 * ({@code mouth}, null for a bare input end) and the air inside while playing ({@code breath},
 * null for the room's air throughout).
 */
public record AirColumn(List<BoreSegment> segments, List<ToneHole> holes, InputEnd inputEnd, OutputEnd outputEnd,
        AirProperties air, boolean losses, Mouth mouth, Breath breath) {

    /** A bore with a bare input end in the room's air. */
    public AirColumn(List<BoreSegment> segments, List<ToneHole> holes, InputEnd inputEnd, OutputEnd outputEnd,
            AirProperties air, boolean losses) {
        this(segments, holes, inputEnd, outputEnd, air, losses, null, null);
    }

    public AirColumn {
        if (segments == null || segments.isEmpty()) {
            throw new IllegalArgumentException("an air column needs at least one segment");
        }
        if (inputEnd == null || outputEnd == null || air == null) {
            throw new IllegalArgumentException("inputEnd, outputEnd and air are required");
        }
        if (mouth != null && mouth.kind().inputEnd() != inputEnd) {
            throw new IllegalArgumentException("a " + mouth.kind() + " mouth plays at a " + mouth.kind().inputEnd()
                    + " input end, got " + inputEnd);
        }
        segments = List.copyOf(segments);
        holes = holes == null ? List.of() : List.copyOf(holes);
        double total = segments.stream().mapToDouble(BoreSegment::length).sum();
        for (ToneHole h : holes) {
            if (!(h.position() < total)) {
                throw new IllegalArgumentException("hole at " + h.position() + " m lies beyond the bore end " + total);
            }
        }
    }

    /** Total axial length, m. */
    public double length() {
        return segments.stream().mapToDouble(BoreSegment::length).sum();
    }

    /** Bore radius at x from the input end (the upstream segment's value at a junction). */
    public double radiusAt(double x) {
        double start = 0;
        for (BoreSegment s : segments) {
            if (x <= start + s.length()) {
                return s.radiusAt(Math.max(0, x - start));
            }
            start += s.length();
        }
        return segments.get(segments.size() - 1).outputRadius();
    }

    public AirColumn withHoles(List<ToneHole> newHoles) {
        return new AirColumn(segments, newHoles, inputEnd, outputEnd, air, losses, mouth, breath);
    }

    /** The same bore with another mouth (null: a bare input end). */
    public AirColumn withMouth(Mouth newMouth) {
        return new AirColumn(segments, holes, inputEnd, outputEnd, air, losses, newMouth, breath);
    }

    /** The same bore with other segments. */
    public AirColumn withSegments(List<BoreSegment> newSegments) {
        return new AirColumn(newSegments, holes, inputEnd, outputEnd, air, losses, mouth, breath);
    }

    /** The air inside at fraction u (0..1) of the bore: the breath's, or the room's without one. */
    public AirProperties innerAirAt(double u) {
        return breath == null ? air : breath.airAt(u);
    }

    /** The air the impedances are referred to: the air inside at x = 0. */
    public AirProperties referenceAir() {
        return innerAirAt(0);
    }

    /**
     * Mean speed of sound along the bore, m/s: the length over the travel time, L / integral dx/c
     * (the room's or the breath's).
     */
    public double meanSpeedOfSound() {
        if (breath == null || !breath.hasGradient()) {
            return referenceAir().speedOfSound();
        }
        int n = 64;
        double t = 0;
        for (int i = 0; i < n; i++) {
            t += 1 / breath.airAt((i + 0.5) / n).speedOfSound();
        }
        return n / t;
    }

    /** True when every segment is a cylinder of the same radius. */
    public boolean isUniformCylinder() {
        double r = segments.get(0).inputRadius();
        return segments.stream().allMatch(s -> s.inputRadius() == r && s.outputRadius() == r);
    }
}
