package org.nodewright.physics.plates;

/**
 * A straight brace glued on one face of the plate from (x1, y1) to (x2, y2), metres, of the plate's own material.
 *
 * @param widthM  width on the plate
 * @param heightM height above the plate's face
 */
public record Brace(double x1, double y1, double x2, double y2, double widthM, double heightM) {

    public Brace {
        for (double v : new double[] {x1, y1, x2, y2}) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("brace end points must be finite");
            }
        }
        if (x1 == x2 && y1 == y2) {
            throw new IllegalArgumentException("a brace needs two different end points");
        }
        if (!(widthM > 0) || !(heightM > 0) || Double.isInfinite(widthM) || Double.isInfinite(heightM)) {
            throw new IllegalArgumentException("brace width and height must be positive and finite, got "
                    + widthM + ", " + heightM);
        }
    }

    public double length() {
        return Math.hypot(x2 - x1, y2 - y1);
    }

    /** With another height (for the brace-height solver). */
    public Brace withHeight(double h) {
        return new Brace(x1, y1, x2, y2, widthM, h);
    }
}
