package org.nodewright.physics.aircolumn;

import java.util.List;

/**
 * A bore to analyse: segments from the input end, side holes, the two end conditions, the air and
 * whether visco-thermal wall losses are included.
 */
public record AirColumn(List<BoreSegment> segments, List<ToneHole> holes, InputEnd inputEnd, OutputEnd outputEnd,
        AirProperties air, boolean losses) {

    public AirColumn {
        if (segments == null || segments.isEmpty()) {
            throw new IllegalArgumentException("an air column needs at least one segment");
        }
        if (inputEnd == null || outputEnd == null || air == null) {
            throw new IllegalArgumentException("inputEnd, outputEnd and air are required");
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
        return new AirColumn(segments, newHoles, inputEnd, outputEnd, air, losses);
    }

    /** True when every segment is a cylinder of the same radius. */
    public boolean isUniformCylinder() {
        double r = segments.get(0).inputRadius();
        return segments.stream().allMatch(s -> s.inputRadius() == r && s.outputRadius() == r);
    }
}
