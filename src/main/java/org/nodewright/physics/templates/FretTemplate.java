package org.nodewright.physics.templates;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.nodewright.physics.Require;
import org.nodewright.physics.strings.Fret;
import org.nodewright.physics.strings.Frets;

/**
 * A fret slotting template: nut line (fret 0), one line per fret, the saddle line at the scale
 * length, numbered, each fret's distance from the nut, extra labelled positions (pickups, bridge,
 * supports) and a 100 mm calibration ruler. The string runs along x; the nut line sits at
 * {@link #MARGIN_MM} from the sheet's left edge.
 *
 * @param scaleLengthMm      nut to saddle, the uncompensated scale length
 * @param count              number of frets (1 to 48)
 * @param divisionsPerOctave equal divisions of the octave (1 to 96; 12 for 12-TET)
 * @param lineLengthMm       length of each slot line across the fingerboard
 * @param positions          labelled positions from the nut to mark as well (may be empty)
 */
public record FretTemplate(double scaleLengthMm, int count, int divisionsPerOctave, double lineLengthMm,
        List<PositionMark> positions) {

    /** Blank margin around the drawing on the sheet. */
    public static final double MARGIN_MM = 15.0;
    /** Distance from the sheet top to the top of the slot lines (leaves room for the fret numbers). */
    public static final double LINES_TOP_MM = 22.0;
    public static final int MAX_FRETS = 48;
    public static final int MAX_DIVISIONS = 96;

    public FretTemplate {
        Require.positive("scaleLengthMm", scaleLengthMm);
        Require.positive("lineLengthMm", lineLengthMm);
        if (count < 1 || count > MAX_FRETS) {
            throw new IllegalArgumentException("count must be 1.." + MAX_FRETS + ", was " + count);
        }
        if (divisionsPerOctave < 1 || divisionsPerOctave > MAX_DIVISIONS) {
            throw new IllegalArgumentException("divisionsPerOctave must be 1.." + MAX_DIVISIONS + ", was "
                    + divisionsPerOctave);
        }
        positions = List.copyOf(positions);
        for (PositionMark p : positions) {
            if (p.positionMm() > 2 * scaleLengthMm) {
                throw new IllegalArgumentException("position " + p.label() + " lies beyond twice the scale length");
            }
        }
    }

    /** Distances of frets 0 (the nut) to count from the nut, mm, from the string core's equal divisions. */
    public double[] fretsMm() {
        double[] x = new double[count + 1];
        for (Fret f : Frets.equalDivisions(scaleLengthMm * 1e-3, count, divisionsPerOctave)) {
            x[f.fret()] = f.fromNutM() * 1e3;
        }
        return x;
    }

    /** Draws the template on a sheet wide enough for the saddle line (or the farthest position). */
    public Sheet draw() {
        double far = scaleLengthMm;
        for (PositionMark p : positions) {
            far = Math.max(far, p.positionMm());
        }
        double width = Math.max(far, CalibrationRuler.LENGTH_MM) + 2 * MARGIN_MM;
        double top = LINES_TOP_MM;
        double bottom = top + lineLengthMm;
        double textRow = bottom + 4.0;
        double positionsRow = textRow + 9.0;
        double rulerBase = positionsRow + (positions.isEmpty() ? 0 : 10.0) + CalibrationRuler.MAJOR_TICK_MM + 4.0;
        double height = rulerBase + CalibrationRuler.HEIGHT_MM + MARGIN_MM;

        double[] frets = fretsMm();
        List<Mark> marks = new ArrayList<>();
        double x0 = MARGIN_MM;
        double mid = (top + bottom) / 2;
        marks.add(new Mark.Stroke(x0, mid, x0 + scaleLengthMm, mid, 0.15, Mark.Role.OUTLINE, Map.of("line", "string")));
        marks.add(new Mark.Stroke(x0, top, x0, bottom, 0.3, Mark.Role.NUT, Map.of("fret", "0")));
        marks.add(Mark.Caption.of(x0, top - 3, "nut", 2.5, Mark.Caption.Anchor.MIDDLE));
        for (int n = 1; n <= count; n++) {
            double x = x0 + frets[n];
            marks.add(new Mark.Stroke(x, top, x, bottom, 0.2, Mark.Role.FRET, Map.of("fret", Integer.toString(n))));
            marks.add(new Mark.Caption(x, top - 3 - (n % 2 == 0 ? 4 : 0), Integer.toString(n), 2.5,
                    Mark.Caption.Anchor.MIDDLE, Mark.Role.TEXT, Map.of("fret-label", Integer.toString(n))));
            marks.add(Mark.Caption.of(x, textRow + (n % 2 == 0 ? 3.5 : 0), mm(frets[n]), 1.8,
                    Mark.Caption.Anchor.MIDDLE));
        }
        double xs = x0 + scaleLengthMm;
        marks.add(new Mark.Stroke(xs, top, xs, bottom, 0.3, Mark.Role.SADDLE,
                Map.of("saddle", mm(scaleLengthMm))));
        marks.add(Mark.Caption.of(xs, top - 3, "saddle " + mm(scaleLengthMm), 2.5, Mark.Caption.Anchor.MIDDLE));
        for (int i = 0; i < positions.size(); i++) {
            PositionMark p = positions.get(i);
            double x = x0 + p.positionMm();
            marks.add(new Mark.Stroke(x, mid - 4, x, positionsRow + 2, 0.2, Mark.Role.POSITION,
                    Map.of("position", p.label(), "from-nut-mm", mm(p.positionMm()))));
            marks.add(Mark.Caption.of(x, positionsRow + 5 + (i % 2) * 3.5, p.label() + " " + mm(p.positionMm()), 2.2,
                    Mark.Caption.Anchor.MIDDLE));
        }
        marks.addAll(CalibrationRuler.at(x0, rulerBase));
        String title = String.format(Locale.ROOT, "Fret slots: scale %s mm, %d frets, %d per octave",
                mm(scaleLengthMm), count, divisionsPerOctave);
        marks.add(Mark.Caption.of(x0, 6, title, 3.0, Mark.Caption.Anchor.START));
        return new Sheet(title, width, height, marks);
    }

    static String mm(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
