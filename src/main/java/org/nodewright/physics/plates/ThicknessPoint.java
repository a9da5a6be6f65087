package org.nodewright.physics.plates;

/** A thickness control point of a graduation, metres. */
public record ThicknessPoint(double x, double y, double thicknessM) {

    public ThicknessPoint {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("thickness point position must be finite");
        }
        if (!(thicknessM > 0) || Double.isInfinite(thicknessM)) {
            throw new IllegalArgumentException("thickness must be positive and finite, got " + thicknessM);
        }
    }
}
