package org.nodewright.physics.templates;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.nodewright.physics.Require;

/**
 * One thing drawn on a template sheet. Coordinates are millimetres on the sheet, x to the right,
 * y downwards (the SVG convention); renderers map them to their own page units at 1:1.
 */
public sealed interface Mark permits Mark.Stroke, Mark.Ring, Mark.Caption {

    /** What a mark is for; renderers may style by role and tests find marks by it. */
    enum Role { FRET, NUT, SADDLE, POSITION, OUTLINE, RULER, RULER_TICK, HOLE, CENTRE, DIMENSION, TEXT, ALIGNMENT,
        CONTOUR, BRACE }

    Role role();

    /** Extra attributes written as {@code data-*} in SVG (e.g. {@code fret -> 3}); never null. */
    Map<String, String> data();

    /** A straight line from (x1, y1) to (x2, y2), stroke width in mm. */
    record Stroke(double x1, double y1, double x2, double y2, double widthMm, Role role, Map<String, String> data)
            implements Mark {
        public Stroke {
            Require.finite("x1", x1);
            Require.finite("y1", y1);
            Require.finite("x2", x2);
            Require.finite("y2", y2);
            Require.positive("widthMm", widthMm);
            data = Map.copyOf(data);
        }

        public static Stroke of(double x1, double y1, double x2, double y2, double widthMm, Role role) {
            return new Stroke(x1, y1, x2, y2, widthMm, role, Map.of());
        }

        public double length() {
            return Math.hypot(x2 - x1, y2 - y1);
        }
    }

    /** A circle of the given radius centred on (cx, cy), drawn as an outline. */
    record Ring(double cx, double cy, double radiusMm, double widthMm, Role role, Map<String, String> data)
            implements Mark {
        public Ring {
            Require.finite("cx", cx);
            Require.finite("cy", cy);
            Require.positive("radiusMm", radiusMm);
            Require.positive("widthMm", widthMm);
            data = Map.copyOf(data);
        }
    }

    /** A line of text whose baseline starts (or centres, or ends) at (x, y); height in mm. */
    record Caption(double x, double y, String text, double sizeMm, Anchor anchor, Role role, Map<String, String> data)
            implements Mark {
        public enum Anchor { START, MIDDLE, END }

        public Caption {
            Require.finite("x", x);
            Require.finite("y", y);
            Require.positive("sizeMm", sizeMm);
            if (text == null || text.isBlank()) {
                throw new IllegalArgumentException("caption text must not be blank");
            }
            data = Map.copyOf(data);
        }

        public static Caption of(double x, double y, String text, double sizeMm, Anchor anchor) {
            return new Caption(x, y, text, sizeMm, anchor, Role.TEXT, Map.of());
        }

        /**
         * The caution lines of a template, 2.6 mm text from x: line k (from 0) on the baseline
         * {@code top + lineMm * (k + firstNumber)}, tagged {@code data-caution} = k + firstNumber.
         */
        public static List<Mark> cautions(double x, double top, double lineMm, List<String> lines,
                int firstNumber) {
            List<Mark> out = new ArrayList<>();
            for (int i = 0; i < lines.size(); i++) {
                out.add(new Caption(x, top + lineMm * (i + firstNumber), lines.get(i), 2.6, Anchor.START, Role.TEXT,
                        Map.of("caution", Integer.toString(i + firstNumber))));
            }
            return out;
        }
    }
}
