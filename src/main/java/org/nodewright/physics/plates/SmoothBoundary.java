package org.nodewright.physics.plates;

/**
 * The boundary the solver integrates over: a drawn outline samples a smooth curve, so where it turns by less
 * than {@link #CORNER_DEGREES} at a point, the edges next to it follow the Catmull–Rom cubic through the
 * points (Catmull &amp; Rom 1974; cubic Hermite pieces with tangents along the neighbours' chord); at sharper
 * corners the edges stay straight (a rectangle, a trapezoid). A polygon of many points around a circle thus
 * stands for the circle, not for a chain of chords on which a polynomial basis would lock.
 */
final class SmoothBoundary {

    /** Points where the outline turns by less than this many degrees lie on a smooth stretch. */
    static final double CORNER_DEGREES = 20;

    private final Outline outline;
    private final double[][] t0;
    private final double[][] t1;
    private final boolean[] curved;

    SmoothBoundary(Outline outline) {
        this.outline = outline;
        int count = outline.size();
        boolean[] smooth = new boolean[count];
        for (int i = 0; i < count; i++) {
            int prev = (i + count - 1) % count;
            int next = (i + 1) % count;
            double ax = outline.x(i) - outline.x(prev);
            double ay = outline.y(i) - outline.y(prev);
            double bx = outline.x(next) - outline.x(i);
            double by = outline.y(next) - outline.y(i);
            double turn = Math.abs(Math.atan2(ax * by - ay * bx, ax * bx + ay * by));
            smooth[i] = !outline.isRectangle() && Math.toDegrees(turn) < CORNER_DEGREES;
        }
        t0 = new double[count][];
        t1 = new double[count][];
        curved = new boolean[count];
        for (int e = 0; e < count; e++) {
            int f = (e + 1) % count;
            double cx = outline.x(f) - outline.x(e);
            double cy = outline.y(f) - outline.y(e);
            double chord = Math.hypot(cx, cy);
            t0[e] = tangent(e, smooth[e], cx, cy, chord);
            t1[e] = tangent(f, smooth[f], cx, cy, chord);
            curved[e] = smooth[e] || smooth[f];
        }
    }

    int size() {
        return outline.size();
    }

    boolean curved(int e) {
        return curved[e];
    }

    double chord(int e) {
        int f = (e + 1) % outline.size();
        return Math.hypot(outline.x(f) - outline.x(e), outline.y(f) - outline.y(e));
    }

    /** {x, y, dx/dt, dy/dt} on edge e at t in [0, 1]. */
    double[] at(int e, double t) {
        int f = (e + 1) % outline.size();
        double t2 = t * t;
        double t3 = t2 * t;
        double h00 = 2 * t3 - 3 * t2 + 1;
        double h10 = t3 - 2 * t2 + t;
        double h01 = -2 * t3 + 3 * t2;
        double h11 = t3 - t2;
        double d00 = 6 * t2 - 6 * t;
        double d10 = 3 * t2 - 4 * t + 1;
        double d01 = -6 * t2 + 6 * t;
        double d11 = 3 * t2 - 2 * t;
        double x0 = outline.x(e);
        double y0 = outline.y(e);
        double x1 = outline.x(f);
        double y1 = outline.y(f);
        return new double[] {
            h00 * x0 + h10 * t0[e][0] + h01 * x1 + h11 * t1[e][0],
            h00 * y0 + h10 * t0[e][1] + h01 * y1 + h11 * t1[e][1],
            d00 * x0 + d10 * t0[e][0] + d01 * x1 + d11 * t1[e][0],
            d00 * y0 + d10 * t0[e][1] + d01 * y1 + d11 * t1[e][1]};
    }

    private double[] tangent(int i, boolean smooth, double cx, double cy, double chord) {
        if (!smooth) {
            return new double[] {cx, cy};
        }
        int count = outline.size();
        int prev = (i + count - 1) % count;
        int next = (i + 1) % count;
        double tx = outline.x(next) - outline.x(prev);
        double ty = outline.y(next) - outline.y(prev);
        double len = Math.hypot(tx, ty);
        return new double[] {tx / len * chord, ty / len * chord};
    }
}
