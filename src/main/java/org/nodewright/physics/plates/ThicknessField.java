package org.nodewright.physics.plates;

import java.util.List;

/** Plate thickness over the outline, metres. */
public interface ThicknessField {

    double at(double x, double y);

    /** True when the thickness is the same everywhere. */
    boolean isUniform();

    /** The thinnest value anywhere. */
    double minimum();

    /** The graduation's control points (metres), empty for a uniform plate. */
    default List<ThicknessPoint> controlPoints() {
        return List.of();
    }

    static ThicknessField uniform(double thicknessM) {
        if (!(thicknessM > 0) || Double.isInfinite(thicknessM)) {
            throw new IllegalArgumentException("thickness must be positive and finite, got " + thicknessM);
        }
        return new ThicknessField() {
            @Override
            public double at(double x, double y) {
                return thicknessM;
            }

            @Override
            public boolean isUniform() {
                return true;
            }

            @Override
            public double minimum() {
                return thicknessM;
            }
        };
    }

    /** A graduation from control points, interpolated by Shepard's inverse-distance weighting. */
    static ThicknessField graduated(List<ThicknessPoint> points) {
        return new ShepardThickness(points);
    }
}
