package org.nodewright.physics.plates;

import java.util.List;

/**
 * Demo plates of the Harrowgate Lane Workshop (invented instruments, for the demo and the benchmarks only):
 * the top of its small-bodied "Lane parlour" guitar as a mirrored half outline (mm, x along the grain from
 * the tail block, y from the centre line) with six braces, and the back of its "Lane fiddle" as a
 * violin-like half outline.
 */
public final class WorkshopPlates {

    /** Half outline of the Lane parlour top, mm: from the tail on the centre line round the bass side to the neck. */
    public static final double[][] PARLOUR_HALF_MM = {
        {0, 0}, {4, 40}, {14, 80}, {32, 115}, {60, 148}, {100, 172}, {140, 183}, {180, 180}, {220, 163},
        {255, 136}, {285, 120}, {315, 122}, {345, 133}, {375, 139}, {405, 133}, {432, 114}, {453, 85},
        {467, 52}, {474, 20}, {475, 0}};

    /** Six braces of the Lane parlour top (mm): an X below the sound hole, two tone bars, a cross bar, a tail strip. */
    public static final double[][] PARLOUR_BRACES_MM = {
        // fromX, fromY, toX, toY, width, height
        {150, -130, 300, 100, 7, 11}, {150, 130, 300, -100, 7, 11}, {335, -118, 335, 118, 8, 10},
        {70, -70, 190, -25, 5, 6}, {70, 70, 190, 25, 5, 6}, {40, 0, 130, 0, 5, 4}};

    /** Half outline of the Lane fiddle back, mm (violin-like: lower bout, C-bouts, upper bout). */
    public static final double[][] FIDDLE_HALF_MM = {
        {0, 0}, {3, 30}, {12, 60}, {30, 88}, {55, 103}, {85, 106}, {115, 101}, {140, 90}, {160, 74},
        {175, 62}, {190, 56}, {205, 58}, {220, 67}, {235, 78}, {255, 86}, {280, 87}, {305, 79}, {330, 60},
        {348, 34}, {355, 0}};

    private WorkshopPlates() {
    }

    public static Outline parlourOutline() {
        return mirrored(PARLOUR_HALF_MM);
    }

    public static Outline fiddleOutline() {
        return mirrored(FIDDLE_HALF_MM);
    }

    public static List<Brace> parlourBraces() {
        return java.util.Arrays.stream(PARLOUR_BRACES_MM)
                .map(b -> new Brace(b[0] * 1e-3, b[1] * 1e-3, b[2] * 1e-3, b[3] * 1e-3, b[4] * 1e-3, b[5] * 1e-3))
                .toList();
    }

    private static Outline mirrored(double[][] halfMm) {
        double[] xs = new double[halfMm.length];
        double[] ys = new double[halfMm.length];
        for (int i = 0; i < halfMm.length; i++) {
            xs[i] = halfMm[i][0] * 1e-3;
            ys[i] = halfMm[i][1] * 1e-3;
        }
        return Outline.mirroredHalf(xs, ys);
    }
}
