package org.nodewright.physics.templates;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A 100 mm scale with a tick every millimetre (longer every 5 and 10 mm) and its numbers, so the
 * maker can check with a steel rule that the printer kept 1:1 (common practice on printed
 * templates: scaling "to fit" silently shrinks a page by a few per cent).
 */
public final class CalibrationRuler {

    /** Length of the ruler: 100 mm. */
    public static final double LENGTH_MM = 100.0;
    /** Tick lengths: 1 mm ticks 2 mm long, 5 mm ticks 3.5 mm, 10 mm ticks 5 mm (readable at arm's length). */
    public static final double MINOR_TICK_MM = 2.0;
    public static final double MID_TICK_MM = 3.5;
    public static final double MAJOR_TICK_MM = 5.0;
    /** Height the ruler takes on a sheet, numbers and label included. */
    public static final double HEIGHT_MM = 12.0;

    /** The line printed under every template's ruler. */
    public static final String LABEL = "calibration: this ruler must measure 100 mm";

    private CalibrationRuler() {
    }

    /** The ruler with its usual label ({@link #LABEL}). */
    public static List<Mark> at(double x, double y) {
        return at(x, y, LABEL);
    }

    /**
     * The ruler's marks with its base line at height {@code y}, starting at {@code x}; ticks rise
     * from the base line (towards smaller y).
     */
    public static List<Mark> at(double x, double y, String label) {
        List<Mark> marks = new ArrayList<>();
        double line = 0.2;
        marks.add(new Mark.Stroke(x, y, x + LENGTH_MM, y, line, Mark.Role.RULER, Map.of("ruler", "base")));
        for (int mm = 0; mm <= LENGTH_MM; mm++) {
            double h = mm % 10 == 0 ? MAJOR_TICK_MM : mm % 5 == 0 ? MID_TICK_MM : MINOR_TICK_MM;
            marks.add(new Mark.Stroke(x + mm, y, x + mm, y - h, 0.15, Mark.Role.RULER_TICK,
                    Map.of("mm", Integer.toString(mm))));
            if (mm % 10 == 0) {
                marks.add(Mark.Caption.of(x + mm, y - MAJOR_TICK_MM - 0.8, Integer.toString(mm), 2.2,
                        Mark.Caption.Anchor.MIDDLE));
            }
        }
        marks.add(Mark.Caption.of(x, y + 3.5, label, 2.5, Mark.Caption.Anchor.START));
        return List.copyOf(marks);
    }
}
