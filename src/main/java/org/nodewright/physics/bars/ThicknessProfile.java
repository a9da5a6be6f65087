package org.nodewright.physics.bars;

import java.util.Arrays;
import org.nodewright.physics.Require;

/**
 * A piecewise-linear thickness along a bar (an undercut), metres. The points are strictly
 * ascending in position, the first at 0 and the last at the bar's length, each thickness positive.
 */
public final class ThicknessProfile {

    private final double[] positions;
    private final double[] thicknesses;

    private ThicknessProfile(double[] positions, double[] thicknesses) {
        this.positions = positions;
        this.thicknesses = thicknesses;
    }

    /**
     * @throws IllegalArgumentException if fewer than two points, positions not strictly ascending
     *         from 0, or a thickness not positive
     */
    public static ThicknessProfile of(double[] positions, double[] thicknesses) {
        if (positions.length != thicknesses.length || positions.length < 2) {
            throw new IllegalArgumentException("a profile needs at least two points of position and thickness, got "
                    + positions.length + " and " + thicknesses.length);
        }
        if (positions[0] != 0) {
            throw new IllegalArgumentException("a profile must start at position 0, got " + positions[0]);
        }
        for (int i = 0; i < positions.length; i++) {
            Require.finite("position[" + i + "]", positions[i]);
            Require.positive("thickness[" + i + "]", thicknesses[i]);
            if (i > 0 && !(positions[i] > positions[i - 1])) {
                throw new IllegalArgumentException("profile positions must ascend strictly, got " + positions[i - 1]
                        + " then " + positions[i]);
            }
        }
        return new ThicknessProfile(positions.clone(), thicknesses.clone());
    }

    /** A constant thickness over {@code length}. */
    public static ThicknessProfile uniform(double length, double thickness) {
        return of(new double[] {0, Require.positive("length", length)},
                new double[] {thickness, thickness});
    }

    /** The position of the last point: the length the profile covers. */
    public double length() {
        return positions[positions.length - 1];
    }

    public int size() {
        return positions.length;
    }

    public double position(int i) {
        return positions[i];
    }

    public double thickness(int i) {
        return thicknesses[i];
    }

    /** Linear interpolation between the points; clamped to the end values outside 0..length. */
    public double thicknessAt(double x) {
        if (x <= 0) {
            return thicknesses[0];
        }
        int last = positions.length - 1;
        if (x >= positions[last]) {
            return thicknesses[last];
        }
        int i = Arrays.binarySearch(positions, x);
        if (i >= 0) {
            return thicknesses[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double t = (x - positions[lo]) / (positions[hi] - positions[lo]);
        return thicknesses[lo] + t * (thicknesses[hi] - thicknesses[lo]);
    }

    /** The thinnest point of the profile. */
    public double minimumThickness() {
        return Arrays.stream(thicknesses).min().orElseThrow();
    }

    /** The thickest point of the profile. */
    public double maximumThickness() {
        return Arrays.stream(thicknesses).max().orElseThrow();
    }

    /** The breakpoints (a copy). */
    public double[] positions() {
        return positions.clone();
    }

    /** The thicknesses at the breakpoints (a copy). */
    public double[] thicknesses() {
        return thicknesses.clone();
    }
}
