package org.nodewright.physics.plates;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Node lines (contour w = 0) of a gridded mode by marching squares (Lorensen &amp; Cline 1987 in two
 * dimensions), saddle cells resolved by the cell-centre mean, segments clipped to the outline and
 * chained into polylines.
 */
final class NodalLines {

    private NodalLines() {
    }

    /**
     * @param w      values on the grid, defined over the whole bounding box (the Ritz solution extends past the outline)
     * @param inside whether each grid node lies inside the outline
     */
    static List<double[][]> trace(double[] xs, double[] ys, double[][] w, boolean[][] inside, Outline outline) {
        List<double[]> segments = new ArrayList<>();
        for (int i = 0; i + 1 < xs.length; i++) {
            for (int j = 0; j + 1 < ys.length; j++) {
                boolean any = inside[i][j] || inside[i + 1][j] || inside[i][j + 1] || inside[i + 1][j + 1];
                if (!any) {
                    continue;
                }
                cell(xs, ys, w, i, j, segments);
            }
        }
        List<double[]> clipped = new ArrayList<>();
        for (double[] s : segments) {
            boolean a = inside(outline, s[0], s[1]);
            boolean b = inside(outline, s[2], s[3]);
            if (a && b) {
                clipped.add(s);
            } else if (a) {
                double f = outline.exitFraction(s[0], s[1], s[2], s[3]);
                clipped.add(new double[] {s[0], s[1], s[0] + f * (s[2] - s[0]), s[1] + f * (s[3] - s[1])});
            } else if (b) {
                double f = outline.exitFraction(s[2], s[3], s[0], s[1]);
                clipped.add(new double[] {s[2] + f * (s[0] - s[2]), s[3] + f * (s[1] - s[3]), s[2], s[3]});
            }
        }
        return chain(clipped);
    }

    private static boolean inside(Outline outline, double x, double y) {
        return outline.isRectangle() || outline.contains(x, y);
    }

    /** Crossing of the grid edge between two nodes, interpolated linearly, always from the lower node. */
    private static double[] crossing(double xa, double ya, double va, double xb, double yb, double vb) {
        double t = va / (va - vb);
        return new double[] {xa + t * (xb - xa), ya + t * (yb - ya)};
    }

    private static void cell(double[] xs, double[] ys, double[][] w, int i, int j, List<double[]> out) {
        double v00 = w[i][j];
        double v10 = w[i + 1][j];
        double v11 = w[i + 1][j + 1];
        double v01 = w[i][j + 1];
        boolean p00 = v00 >= 0;
        boolean p10 = v10 >= 0;
        boolean p11 = v11 >= 0;
        boolean p01 = v01 >= 0;
        double[] bottom = p00 != p10 ? crossing(xs[i], ys[j], v00, xs[i + 1], ys[j], v10) : null;
        double[] right = p10 != p11 ? crossing(xs[i + 1], ys[j], v10, xs[i + 1], ys[j + 1], v11) : null;
        double[] top = p01 != p11 ? crossing(xs[i], ys[j + 1], v01, xs[i + 1], ys[j + 1], v11) : null;
        double[] left = p00 != p01 ? crossing(xs[i], ys[j], v00, xs[i], ys[j + 1], v01) : null;
        List<double[]> pts = new ArrayList<>(4);
        for (double[] p : new double[][] {bottom, right, top, left}) {
            if (p != null) {
                pts.add(p);
            }
        }
        if (pts.size() == 2) {
            out.add(new double[] {pts.get(0)[0], pts.get(0)[1], pts.get(1)[0], pts.get(1)[1]});
        } else if (pts.size() == 4) {
            boolean centre = (v00 + v10 + v11 + v01) >= 0;
            if (centre == p00) {
                out.add(new double[] {bottom[0], bottom[1], right[0], right[1]});
                out.add(new double[] {top[0], top[1], left[0], left[1]});
            } else {
                out.add(new double[] {bottom[0], bottom[1], left[0], left[1]});
                out.add(new double[] {top[0], top[1], right[0], right[1]});
            }
        }
    }

    private static String key(double x, double y) {
        return Double.doubleToLongBits(x) + ":" + Double.doubleToLongBits(y);
    }

    private static List<double[][]> chain(List<double[]> segments) {
        Map<String, List<Integer>> at = new HashMap<>();
        for (int s = 0; s < segments.size(); s++) {
            double[] g = segments.get(s);
            at.computeIfAbsent(key(g[0], g[1]), k -> new ArrayList<>()).add(s);
            at.computeIfAbsent(key(g[2], g[3]), k -> new ArrayList<>()).add(s);
        }
        boolean[] used = new boolean[segments.size()];
        List<double[][]> lines = new ArrayList<>();
        // open lines first, starting at an end met by one segment only
        for (int pass = 0; pass < 2; pass++) {
            for (int s = 0; s < segments.size(); s++) {
                if (used[s]) {
                    continue;
                }
                double[] g = segments.get(s);
                String ka = key(g[0], g[1]);
                String kb = key(g[2], g[3]);
                boolean openEnd = at.get(ka).size() == 1 || at.get(kb).size() == 1;
                if (pass == 0 && !openEnd) {
                    continue;
                }
                List<double[]> line = new ArrayList<>();
                boolean forward = pass == 1 || at.get(ka).size() == 1;
                double[] start = forward ? new double[] {g[0], g[1]} : new double[] {g[2], g[3]};
                double[] next = forward ? new double[] {g[2], g[3]} : new double[] {g[0], g[1]};
                line.add(start);
                line.add(next);
                used[s] = true;
                while (true) {
                    Integer found = null;
                    for (Integer c : at.get(key(next[0], next[1]))) {
                        if (!used[c]) {
                            found = c;
                            break;
                        }
                    }
                    if (found == null) {
                        break;
                    }
                    used[found] = true;
                    double[] h = segments.get(found);
                    boolean same = Double.doubleToLongBits(h[0]) == Double.doubleToLongBits(next[0])
                            && Double.doubleToLongBits(h[1]) == Double.doubleToLongBits(next[1]);
                    next = same ? new double[] {h[2], h[3]} : new double[] {h[0], h[1]};
                    line.add(next);
                }
                lines.add(line.toArray(new double[0][]));
            }
        }
        return lines;
    }
}
