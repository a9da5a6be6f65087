package org.nodewright.physics.templates;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.nodewright.physics.Require;

/**
 * A bar's undercut template at 1:1, seen from the side with the top (struck) face up: the bar's
 * outline, the undercut profile along its underside (thickness t(x) below the top face), the
 * thickness written at each profile point, the cord holes (drilled across the width, drawn at half
 * the local thickness) with their distances from the end x = 0, the cautions passed in and a 100 mm
 * calibration ruler. The end x = 0 sits at {@link #MARGIN_MM} from the sheet's left edge.
 *
 * @param profile       thickness along the bar from x = 0 to the length, x ascending
 * @param cordHolesMm   cord-hole centres from x = 0
 * @param cordHoleMm    the cord hole's diameter
 * @param cautions      lines printed under the drawing (already in the reader's language)
 */
public record UndercutTemplate(String name, double widthMm, List<Point> profile, List<Double> cordHolesMm,
        double cordHoleMm, List<String> cautions) {

    public static final double MARGIN_MM = 15.0;
    /** Height of a caution line on the sheet. */
    static final double CAUTION_LINE_MM = 4.5;

    /** One point of the thickness profile. */
    public record Point(double positionMm, double thicknessMm) {
        public Point {
            Require.nonNegative("positionMm", positionMm);
            Require.positive("thicknessMm", thicknessMm);
        }
    }

    public UndercutTemplate {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("template name must not be blank");
        }
        Require.positive("widthMm", widthMm);
        Require.positive("cordHoleMm", cordHoleMm);
        profile = List.copyOf(profile);
        cordHolesMm = List.copyOf(cordHolesMm);
        cautions = List.copyOf(cautions);
        if (profile.size() < 2 || profile.get(0).positionMm() != 0) {
            throw new IllegalArgumentException("the profile needs two or more points from x = 0");
        }
        for (int i = 1; i < profile.size(); i++) {
            if (!(profile.get(i).positionMm() > profile.get(i - 1).positionMm())) {
                throw new IllegalArgumentException("profile positions must ascend, got " + profile.get(i - 1)
                        .positionMm() + " then " + profile.get(i).positionMm());
            }
        }
        double length = profile.get(profile.size() - 1).positionMm();
        for (double x : cordHolesMm) {
            if (!(x >= 0 && x <= length)) {
                throw new IllegalArgumentException("cord hole at " + x + " mm lies outside the bar (0.." + length + " mm)");
            }
        }
    }

    public double lengthMm() {
        return profile.get(profile.size() - 1).positionMm();
    }

    /** The thickness at x by linear interpolation of the profile. */
    public double thicknessAt(double x) {
        for (int i = 1; i < profile.size(); i++) {
            Point a = profile.get(i - 1);
            Point b = profile.get(i);
            if (x <= b.positionMm()) {
                double s = (x - a.positionMm()) / (b.positionMm() - a.positionMm());
                return a.thicknessMm() + s * (b.thicknessMm() - a.thicknessMm());
            }
        }
        return profile.get(profile.size() - 1).thicknessMm();
    }

    public Sheet draw() {
        double length = lengthMm();
        double thickest = profile.stream().mapToDouble(Point::thicknessMm).max().orElseThrow();
        double x0 = MARGIN_MM;
        double top = 24.0;
        double labels = top + thickest + 7.0;
        double holeRow = labels + 9.0;
        double rulerBase = holeRow + 3.5 * Math.min(cordHolesMm.size(), 2) + 16.0;
        double cautionTop = rulerBase + CalibrationRuler.HEIGHT_MM + 2.0;
        double width = Math.max(length, CalibrationRuler.LENGTH_MM) + 2 * MARGIN_MM;
        double height = cautionTop + CAUTION_LINE_MM * cautions.size() + MARGIN_MM;

        List<Mark> marks = new ArrayList<>();
        // outline: the top face, the two ends, the underside along the profile
        marks.add(new Mark.Stroke(x0, top, x0 + length, top, 0.25, Mark.Role.OUTLINE, Map.of("face", "top")));
        Point first = profile.get(0);
        Point last = profile.get(profile.size() - 1);
        marks.add(new Mark.Stroke(x0, top, x0, top + first.thicknessMm(), 0.25, Mark.Role.NUT,
                Map.of("end", "start")));
        marks.add(new Mark.Stroke(x0 + length, top, x0 + length, top + last.thicknessMm(), 0.25, Mark.Role.SADDLE,
                Map.of("end", "finish", "from-start-mm", mm(length))));
        for (int i = 1; i < profile.size(); i++) {
            Point a = profile.get(i - 1);
            Point b = profile.get(i);
            marks.add(new Mark.Stroke(x0 + a.positionMm(), top + a.thicknessMm(), x0 + b.positionMm(),
                    top + b.thicknessMm(), 0.25, Mark.Role.OUTLINE, Map.of("face", "underside", "segment",
                    Integer.toString(i))));
        }
        // thickness at each profile point: a short tick under the underside and the figure, two rows
        for (int i = 0; i < profile.size(); i++) {
            Point p = profile.get(i);
            double x = x0 + p.positionMm();
            marks.add(new Mark.Stroke(x, top + p.thicknessMm(), x, top + p.thicknessMm() + 2.0, 0.1,
                    Mark.Role.POSITION, Map.of("point", Integer.toString(i), "from-start-mm", mm(p.positionMm()),
                    "thickness-mm", mm(p.thicknessMm()))));
            double row = labels + 3.0 * (i % 2);
            marks.add(Mark.Caption.of(x, row, mm1(p.thicknessMm()), 2.0, Mark.Caption.Anchor.MIDDLE));
        }
        marks.add(Mark.Caption.of(x0, top - 6, "end x = 0 (top face up; the undercut is on the underside)", 2.5,
                Mark.Caption.Anchor.START));
        marks.add(Mark.Caption.of(x0 + length, top - 6, "end " + mm(length), 2.5, Mark.Caption.Anchor.END));
        // cord holes across the width, at half the local thickness
        for (int i = 0; i < cordHolesMm.size(); i++) {
            double pos = cordHolesMm.get(i);
            double cx = x0 + pos;
            double cy = top + thicknessAt(pos) / 2;
            String number = Integer.toString(i + 1);
            marks.add(new Mark.Ring(cx, cy, cordHoleMm / 2, 0.2, Mark.Role.HOLE, Map.of("cord-hole", number,
                    "from-start-mm", mm(pos), "diameter-mm", mm(cordHoleMm))));
            double arm = cordHoleMm / 2 + 2.0;
            marks.add(new Mark.Stroke(cx - arm, cy, cx + arm, cy, 0.1, Mark.Role.CENTRE, Map.of("cord-hole-centre", number)));
            marks.add(new Mark.Stroke(cx, top - 3, cx, top + thickest + 3, 0.1, Mark.Role.CENTRE,
                    Map.of("cord-hole-centre", number)));
            double row = holeRow + 3.5 * (i % 2);
            marks.add(Mark.Caption.of(cx, row, "cord hole " + number + " at " + mm(pos) + " (node of mode 1)", 2.0,
                    Mark.Caption.Anchor.MIDDLE));
        }
        marks.addAll(CalibrationRuler.at(x0, rulerBase));
        marks.addAll(Mark.Caption.cautions(x0, cautionTop, CAUTION_LINE_MM, cautions, 1));
        String title = String.format(Locale.ROOT, "Undercut: %s, %s x %s mm, thinnest %s mm, distances from x = 0",
                name, mm(length), mm(widthMm), mm(profile.stream().mapToDouble(Point::thicknessMm).min().orElseThrow()));
        marks.add(Mark.Caption.of(x0, 8, title, 3.0, Mark.Caption.Anchor.START));
        return new Sheet(title, width, height, marks);
    }

    static String mm(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }

    private static String mm1(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }
}
