package org.nodewright.physics.plates;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.nodewright.physics.Require;
import org.nodewright.physics.templates.CalibrationRuler;
import org.nodewright.physics.templates.Mark;
import org.nodewright.physics.templates.Sheet;

/**
 * A plate's graduation template at 1:1: the outline seen from the face the braces are glued to, x (along the grain)
 * to the right and y upwards, the thickness contours every {@code stepMm} labelled in mm (marching squares on the
 * thickness field, as for node lines), the graduation's control points with their thicknesses, each brace's footprint
 * and centre line, a 100 mm calibration ruler and the caution lines it is given. Sheet coordinates in mm (SVG
 * convention: y down), the plate's bounding box corner (x min, y max) at the top-left margin.
 */
public final class GraduationTemplate {

    public static final double MARGIN_MM = 15.0;
    /** Band above the plate for the title. */
    static final double TITLE_MM = 16.0;
    /** Finest contour grid: 1 mm between nodes, at most {@link #MAX_NODES} per side. */
    static final double GRID_MM = 1.0;
    static final int MAX_NODES = 400;
    /** At most this many contour levels (a finer step is widened to a round one). */
    static final int MAX_LEVELS = 40;
    /** Contours shorter than this carry no label. */
    static final double LABEL_MIN_MM = 12.0;
    static final double CAUTION_LINE_MM = 4.0;

    private GraduationTemplate() {
    }

    /** The contour step for a thickness range: the given step, widened (0.1, 0.2, 0.25, 0.5, 1, 2 mm) to fit. */
    static double step(double rangeMm, double stepMm) {
        double s = stepMm;
        double[] round = {0.05, 0.1, 0.2, 0.25, 0.5, 1, 2, 5, 10};
        for (double r : round) {
            if (rangeMm / s <= MAX_LEVELS) {
                break;
            }
            s = Math.max(s, r);
        }
        return s;
    }

    /**
     * @param name         printed in the title
     * @param stepMm       contour step, mm (positive)
     * @param cautionLines printed under the ruler, one line each (the trade's cautions: tools and dust)
     */
    public static Sheet draw(Plate plate, String name, double stepMm, List<String> cautionLines) {
        Require.positive("stepMm", stepMm);
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("template name must not be blank");
        }
        Outline outline = plate.outline();
        double[] b = outline.bounds();
        double lx = (b[2] - b[0]) * 1e3;
        double ly = (b[3] - b[1]) * 1e3;
        double top = MARGIN_MM + TITLE_MM;
        double rulerBase = top + ly + 22;
        double width = Math.max(lx, CalibrationRuler.LENGTH_MM + 60) + 2 * MARGIN_MM;
        double height = rulerBase + CalibrationRuler.HEIGHT_MM + CAUTION_LINE_MM * cautionLines.size() + MARGIN_MM;
        Frame f = new Frame(b[0], b[3], MARGIN_MM, top);
        List<Mark> marks = new ArrayList<>();

        int n = outline.isRectangle() ? 4 : outline.size();
        double[][] corners = outline.isRectangle()
                ? new double[][] {{b[0], b[1]}, {b[2], b[1]}, {b[2], b[3]}, {b[0], b[3]}} : null;
        for (int i = 0; i < n; i++) {
            double x1 = corners != null ? corners[i][0] : outline.x(i);
            double y1 = corners != null ? corners[i][1] : outline.y(i);
            int k = (i + 1) % n;
            double x2 = corners != null ? corners[k][0] : outline.x(k);
            double y2 = corners != null ? corners[k][1] : outline.y(k);
            marks.add(new Mark.Stroke(f.x(x1), f.y(y1), f.x(x2), f.y(y2), 0.3, Mark.Role.OUTLINE, Map.of()));
        }

        ThicknessField t = plate.thickness();
        int gx = Math.min(MAX_NODES, (int) Math.ceil(lx / GRID_MM) + 1);
        int gy = Math.min(MAX_NODES, (int) Math.ceil(ly / GRID_MM) + 1);
        double[] xs = new double[gx];
        double[] ys = new double[gy];
        for (int i = 0; i < gx; i++) {
            xs[i] = b[0] + (b[2] - b[0]) * i / (gx - 1);
        }
        for (int j = 0; j < gy; j++) {
            ys[j] = b[1] + (b[3] - b[1]) * j / (gy - 1);
        }
        double[][] hMm = new double[gx][gy];
        boolean[][] inside = new boolean[gx][gy];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < gx; i++) {
            for (int j = 0; j < gy; j++) {
                hMm[i][j] = t.at(xs[i], ys[j]) * 1e3;
                inside[i][j] = outline.isRectangle() || outline.contains(xs[i], ys[j]);
                if (inside[i][j]) {
                    lo = Math.min(lo, hMm[i][j]);
                    hi = Math.max(hi, hMm[i][j]);
                }
            }
        }
        double step = step(hi - lo, stepMm);
        int levels = 0;
        if (!t.isUniform() && t.controlPoints().size() > 1) {
            for (double level = Math.ceil(lo / step - 1e-9) * step; level < hi - 1e-9; level += step) {
                if (level <= lo + 1e-9) {
                    continue;
                }
                levels++;
                double[][] shifted = new double[gx][gy];
                for (int i = 0; i < gx; i++) {
                    for (int j = 0; j < gy; j++) {
                        shifted[i][j] = hMm[i][j] - level;
                    }
                }
                String label = mm(level, step);
                for (double[][] line : NodalLines.trace(xs, ys, shifted, inside, outline)) {
                    double length = 0;
                    for (int p = 0; p + 1 < line.length; p++) {
                        marks.add(new Mark.Stroke(f.x(line[p][0]), f.y(line[p][1]), f.x(line[p + 1][0]),
                                f.y(line[p + 1][1]), 0.2, Mark.Role.CONTOUR, Map.of("level-mm", label)));
                        length += Math.hypot(line[p + 1][0] - line[p][0], line[p + 1][1] - line[p][1]) * 1e3;
                    }
                    if (length >= LABEL_MIN_MM) {
                        double[] mid = line[line.length / 2];
                        marks.add(new Mark.Caption(f.x(mid[0]), f.y(mid[1]) - 0.6, label, 2.2,
                                Mark.Caption.Anchor.MIDDLE, Mark.Role.TEXT, Map.of("contour-label", label)));
                    }
                }
            }
        }
        List<ThicknessPoint> points = t.controlPoints();
        for (int i = 0; i < points.size(); i++) {
            ThicknessPoint p = points.get(i);
            String label = String.format(Locale.ROOT, "%.2f", p.thicknessM() * 1e3);
            marks.add(new Mark.Ring(f.x(p.x()), f.y(p.y()), 1.2, 0.2, Mark.Role.CENTRE,
                    Map.of("thickness-point", Integer.toString(i), "thickness-mm", label)));
            marks.add(Mark.Caption.of(f.x(p.x()) + 2.0, f.y(p.y()) + 3.2, "T" + (i + 1) + " " + label, 2.4,
                    Mark.Caption.Anchor.START));
        }
        if (t.isUniform() || points.size() <= 1) {
            double cx = f.x((b[0] + b[2]) / 2);
            double cy = f.y((b[1] + b[3]) / 2);
            marks.add(new Mark.Caption(cx, cy, String.format(Locale.ROOT, "uniform thickness %.2f mm",
                    t.minimum() * 1e3), 3.0, Mark.Caption.Anchor.MIDDLE, Mark.Role.TEXT, Map.of("uniform", "true")));
        }

        for (int i = 0; i < plate.braces().size(); i++) {
            Brace br = plate.braces().get(i);
            double len = br.length();
            double nx = -(br.y2() - br.y1()) / len * br.widthM() / 2;
            double ny = (br.x2() - br.x1()) / len * br.widthM() / 2;
            Map<String, String> data = Map.of("brace", Integer.toString(i),
                    "height-mm", String.format(Locale.ROOT, "%.2f", br.heightM() * 1e3),
                    "width-mm", String.format(Locale.ROOT, "%.2f", br.widthM() * 1e3));
            marks.add(new Mark.Stroke(f.x(br.x1()), f.y(br.y1()), f.x(br.x2()), f.y(br.y2()), 0.15, Mark.Role.BRACE,
                    data));
            for (int side = -1; side <= 1; side += 2) {
                marks.add(new Mark.Stroke(f.x(br.x1() + side * nx), f.y(br.y1() + side * ny), f.x(br.x2() + side * nx),
                        f.y(br.y2() + side * ny), 0.3, Mark.Role.BRACE, Map.of("brace-edge", Integer.toString(i))));
            }
            double mx = (br.x1() + br.x2()) / 2;
            double my = (br.y1() + br.y2()) / 2;
            marks.add(Mark.Caption.of(f.x(mx + 2 * nx) + 1, f.y(my + 2 * ny) - 1, String.format(Locale.ROOT,
                    "B%d %.1f x %.1f mm", i + 1, br.widthM() * 1e3, br.heightM() * 1e3), 2.2, Mark.Caption.Anchor.START));
        }

        String title = String.format(Locale.ROOT, "Graduation: %s, %.2f-%.2f mm%s, x along the grain ->", name, lo, hi,
                levels > 0 ? ", contours every " + mm(step, step) + " mm" : "");
        marks.add(Mark.Caption.of(MARGIN_MM, MARGIN_MM + 4, title, 3.5, Mark.Caption.Anchor.START));
        marks.add(Mark.Caption.of(MARGIN_MM, MARGIN_MM + 9, "y upwards as on the bench's maps; T = thickness control"
                + " point, B = brace (width x height)", 2.5, Mark.Caption.Anchor.START));
        marks.addAll(CalibrationRuler.at(MARGIN_MM, rulerBase));
        double y = rulerBase + CalibrationRuler.HEIGHT_MM;
        marks.addAll(Mark.Caption.cautions(MARGIN_MM, y, CAUTION_LINE_MM, cautionLines, 0));
        return new Sheet(title, width, height, marks);
    }

    /** A thickness level with as many decimals as the step needs. */
    static String mm(double v, double step) {
        int decimals = step >= 1 ? 0 : step >= 0.1 && Math.abs(step * 10 - Math.round(step * 10)) < 1e-9 ? 1 : 2;
        return String.format(Locale.ROOT, "%." + Math.max(1, decimals) + "f", v);
    }

    /** Plate metres to sheet millimetres: x to the right from the left margin, y flipped downwards from the top. */
    private record Frame(double xMin, double yMax, double left, double top) {
        double x(double xm) {
            return left + (xm - xMin) * 1e3;
        }

        double y(double ym) {
            return top + (yMax - ym) * 1e3;
        }
    }
}
