package org.nodewright.physics.plates;

import java.util.Arrays;
import java.util.Optional;

/**
 * A plate's outline: a simple polygon in metres, stored counter-clockwise (x along the grain).
 * A rectangle {@code [0, L] x [0, W]} is flagged so that the solver can use its tensor-product basis.
 */
public final class Outline {

    /** Fewest corners of a polygon outline. */
    public static final int MIN_POINTS = 3;

    private final double[] x;
    private final double[] y;
    private final boolean rectangle;

    private Outline(double[] x, double[] y, boolean rectangle) {
        this.x = x;
        this.y = y;
        this.rectangle = rectangle;
    }

    /** The rectangle [0, length] x [0, width]. */
    public static Outline rectangle(double lengthM, double widthM) {
        if (!(lengthM > 0) || !(widthM > 0) || Double.isInfinite(lengthM) || Double.isInfinite(widthM)) {
            throw new IllegalArgumentException("rectangle sides must be positive and finite, got " + lengthM + " x " + widthM);
        }
        return new Outline(new double[] {0, lengthM, lengthM, 0}, new double[] {0, 0, widthM, widthM}, true);
    }

    /** A polygon through the points (either orientation; kept counter-clockwise). */
    public static Outline polygon(double[] xs, double[] ys) {
        problem(xs, ys).ifPresent(message -> {
            throw new IllegalArgumentException(message);
        });
        double[] px = xs.clone();
        double[] py = ys.clone();
        if (signedArea(px, py) < 0) {
            reverse(px);
            reverse(py);
        }
        return new Outline(px, py, false);
    }

    /**
     * A symmetric outline from one half: the points run from the centre line y = 0 round one side back to
     * it (first and last point on y = 0); the other side is their mirror image in y = 0.
     */
    public static Outline mirroredHalf(double[] xs, double[] ys) {
        return polygon(mirror(xs, ys)[0], mirror(xs, ys)[1]);
    }

    /** The full point list of a mirrored half (see {@link #mirroredHalf}); the half's end points are not repeated. */
    public static double[][] mirror(double[] xs, double[] ys) {
        int n = xs.length;
        int inner = Math.max(0, n - 2);
        double[] fx = new double[n + inner];
        double[] fy = new double[n + inner];
        for (int i = 0; i < n; i++) {
            fx[i] = xs[i];
            fy[i] = ys[i];
        }
        for (int k = 0; k < inner; k++) {
            int i = n - 2 - k;
            fx[n + k] = xs[i];
            fy[n + k] = -ys[i];
        }
        return new double[][] {fx, fy};
    }

    /**
     * Why the points do not make a simple polygon (too few, repeated, zero area, self-crossing),
     * or empty when they do. The one home of this check, shared by the web layer.
     */
    public static Optional<String> problem(double[] xs, double[] ys) {
        int n = xs.length;
        if (n != ys.length) {
            return Optional.of("x and y lists differ in length");
        }
        if (n < MIN_POINTS) {
            return Optional.of("an outline needs at least " + MIN_POINTS + " points, got " + n);
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(xs[i]) || !Double.isFinite(ys[i])) {
                return Optional.of("point " + i + " is not finite");
            }
            int j = (i + 1) % n;
            if (xs[i] == xs[j] && ys[i] == ys[j]) {
                return Optional.of("points " + i + " and " + j + " coincide");
            }
        }
        double area = Math.abs(signedArea(xs, ys));
        double[] box = bounds(xs, ys);
        double span = Math.max(box[2] - box[0], box[3] - box[1]);
        if (!(area > 1e-9 * span * span)) {
            return Optional.of("the outline encloses no area");
        }
        for (int i = 0; i < n; i++) {
            int i2 = (i + 1) % n;
            for (int j = i + 1; j < n; j++) {
                int j2 = (j + 1) % n;
                if (j == i2 || j2 == i) {
                    continue;
                }
                if (segmentsTouch(xs[i], ys[i], xs[i2], ys[i2], xs[j], ys[j], xs[j2], ys[j2])) {
                    return Optional.of("the outline crosses itself (edges " + i + " and " + j + ")");
                }
            }
        }
        return Optional.empty();
    }

    public boolean isRectangle() {
        return rectangle;
    }

    public int size() {
        return x.length;
    }

    public double x(int i) {
        return x[i];
    }

    public double y(int i) {
        return y[i];
    }

    /** {minX, minY, maxX, maxY}. */
    public double[] bounds() {
        return bounds(x, y);
    }

    public double area() {
        return signedArea(x, y);
    }

    public double perimeter() {
        double p = 0;
        for (int i = 0; i < x.length; i++) {
            int j = (i + 1) % x.length;
            p += Math.hypot(x[j] - x[i], y[j] - y[i]);
        }
        return p;
    }

    /** Inside or on the outline (within a tolerance of 1e-9 of its size). */
    public boolean contains(double px, double py) {
        double[] b = bounds();
        double tol = 1e-9 * Math.max(b[2] - b[0], b[3] - b[1]);
        int n = x.length;
        boolean inside = false;
        for (int i = 0, j = n - 1; i < n; j = i++) {
            if (distanceToSegment(px, py, x[j], y[j], x[i], y[i]) <= tol) {
                return true;
            }
            if ((y[i] > py) != (y[j] > py)) {
                double xc = x[j] + (py - y[j]) * (x[i] - x[j]) / (y[i] - y[j]);
                if (px < xc) {
                    inside = !inside;
                }
            }
        }
        return inside;
    }

    /**
     * Where the segment from an inside point (ax, ay) towards (bx, by) first meets the outline, as a
     * fraction of the segment in [0, 1] (1 when it does not leave).
     */
    double exitFraction(double ax, double ay, double bx, double by) {
        double best = 1;
        int n = x.length;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            double ex = x[j] - x[i];
            double ey = y[j] - y[i];
            double dx = bx - ax;
            double dy = by - ay;
            double den = dx * ey - dy * ex;
            if (den == 0) {
                continue;
            }
            double t = ((x[i] - ax) * ey - (y[i] - ay) * ex) / den;
            double u = ((x[i] - ax) * dy - (y[i] - ay) * dx) / den;
            if (t >= 0 && t <= best && u >= 0 && u <= 1) {
                best = t;
            }
        }
        return best;
    }

    static double signedArea(double[] xs, double[] ys) {
        double a = 0;
        int n = xs.length;
        for (int i = 0; i < n; i++) {
            int j = (i + 1) % n;
            a += xs[i] * ys[j] - xs[j] * ys[i];
        }
        return a / 2;
    }

    private static double[] bounds(double[] xs, double[] ys) {
        return new double[] {Arrays.stream(xs).min().orElse(0), Arrays.stream(ys).min().orElse(0),
                Arrays.stream(xs).max().orElse(0), Arrays.stream(ys).max().orElse(0)};
    }

    private static void reverse(double[] a) {
        for (int i = 0, j = a.length - 1; i < j; i++, j--) {
            double t = a[i];
            a[i] = a[j];
            a[j] = t;
        }
    }

    static double distanceToSegment(double px, double py, double ax, double ay, double bx, double by) {
        double dx = bx - ax;
        double dy = by - ay;
        double len2 = dx * dx + dy * dy;
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / len2));
        return Math.hypot(px - ax - t * dx, py - ay - t * dy);
    }

    private static double orient(double ax, double ay, double bx, double by, double cx, double cy) {
        return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
    }

    private static boolean segmentsTouch(double ax, double ay, double bx, double by,
                                         double cx, double cy, double dx, double dy) {
        double d1 = orient(cx, cy, dx, dy, ax, ay);
        double d2 = orient(cx, cy, dx, dy, bx, by);
        double d3 = orient(ax, ay, bx, by, cx, cy);
        double d4 = orient(ax, ay, bx, by, dx, dy);
        if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
            return true;
        }
        return (d1 == 0 && onSegment(cx, cy, dx, dy, ax, ay)) || (d2 == 0 && onSegment(cx, cy, dx, dy, bx, by))
                || (d3 == 0 && onSegment(ax, ay, bx, by, cx, cy)) || (d4 == 0 && onSegment(ax, ay, bx, by, dx, dy));
    }

    private static boolean onSegment(double ax, double ay, double bx, double by, double px, double py) {
        return Math.min(ax, bx) <= px && px <= Math.max(ax, bx) && Math.min(ay, by) <= py && py <= Math.max(ay, by);
    }
}
