package org.nodewright.physics.aircolumn;

/**
 * One piece of bore, in metres: a cylinder when the radii are equal, else a conical frustum.
 *
 * @param length       axial length, m (&gt; 0)
 * @param inputRadius  radius at the end nearer the input, m (&gt; 0)
 * @param outputRadius radius at the end nearer the output, m (&gt; 0)
 */
public record BoreSegment(double length, double inputRadius, double outputRadius) {

    public BoreSegment {
        if (!(length > 0 && Double.isFinite(length)) || !(inputRadius > 0 && Double.isFinite(inputRadius))
                || !(outputRadius > 0 && Double.isFinite(outputRadius))) {
            throw new IllegalArgumentException("segment length and radii must be positive and finite: length="
                    + length + " inputRadius=" + inputRadius + " outputRadius=" + outputRadius);
        }
    }

    public boolean isCylinder() {
        return inputRadius == outputRadius;
    }

    /** Radius at distance s from the segment's input end (linear taper). */
    public double radiusAt(double s) {
        return inputRadius + (outputRadius - inputRadius) * (s / length);
    }
}
