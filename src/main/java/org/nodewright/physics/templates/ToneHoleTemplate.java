package org.nodewright.physics.templates;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.nodewright.physics.Require;

/**
 * A tone-hole drilling template laid along a bore: the bore's profile (inside diameter) at 1:1
 * about its axis, the input end (x = 0) and output end, each hole as a circle of its diameter on
 * the axis with a centre cross, its distance from the input end, and a 100 mm calibration ruler.
 * The input end sits at {@link #MARGIN_MM} from the sheet's left edge.
 *
 * @param sections bore sections from the input end (lengths and end diameters)
 * @param holes    holes by centre position from the input end
 */
public record ToneHoleTemplate(String name, List<Section> sections, List<Hole> holes) {

    public static final double MARGIN_MM = 15.0;

    /** One cylinder or cone frustum of the bore. */
    public record Section(double lengthMm, double inputDiameterMm, double outputDiameterMm) {
        public Section {
            Require.positive("lengthMm", lengthMm);
            Require.positive("inputDiameterMm", inputDiameterMm);
            Require.positive("outputDiameterMm", outputDiameterMm);
        }
    }

    /** A hole: centre from the input end, diameter. */
    public record Hole(double positionMm, double diameterMm) {
        public Hole {
            Require.finite("positionMm", positionMm);
            Require.positive("diameterMm", diameterMm);
        }
    }

    /** name: printed at the head of the sheet; null or blank for none (the title then starts with the bore). */
    public ToneHoleTemplate {
        name = name == null ? "" : name.strip();
        sections = List.copyOf(sections);
        holes = List.copyOf(holes);
        if (sections.isEmpty()) {
            throw new IllegalArgumentException("a bore needs at least one section");
        }
        double length = sections.stream().mapToDouble(Section::lengthMm).sum();
        for (Hole h : holes) {
            if (h.positionMm() < 0 || h.positionMm() > length) {
                throw new IllegalArgumentException("hole at " + h.positionMm() + " mm lies outside the bore (0.."
                        + length + " mm)");
            }
        }
    }

    public double lengthMm() {
        return sections.stream().mapToDouble(Section::lengthMm).sum();
    }

    public Sheet draw() {
        double length = lengthMm();
        double maxBore = sections.stream().mapToDouble(s -> Math.max(s.inputDiameterMm(), s.outputDiameterMm()))
                .max().orElseThrow();
        double maxHole = holes.stream().mapToDouble(Hole::diameterMm).max().orElse(0);
        double half = Math.max(maxBore, maxHole) / 2;
        double axis = 22.0 + half;
        double dimensionRow = axis + half + 8.0;
        double rulerBase = dimensionRow + 3.5 * Math.min(holes.size(), 3) + 14.0;
        double width = Math.max(length, CalibrationRuler.LENGTH_MM) + 2 * MARGIN_MM;
        double height = rulerBase + CalibrationRuler.HEIGHT_MM + MARGIN_MM;
        double x0 = MARGIN_MM;

        List<Mark> marks = new ArrayList<>();
        marks.add(new Mark.Stroke(x0 - 5, axis, x0 + length + 5, axis, 0.15, Mark.Role.CENTRE, Map.of("line", "axis")));
        double x = x0;
        for (int i = 0; i < sections.size(); i++) {
            Section s = sections.get(i);
            Map<String, String> data = Map.of("section", Integer.toString(i));
            marks.add(new Mark.Stroke(x, axis - s.inputDiameterMm() / 2, x + s.lengthMm(),
                    axis - s.outputDiameterMm() / 2, 0.2, Mark.Role.OUTLINE, data));
            marks.add(new Mark.Stroke(x, axis + s.inputDiameterMm() / 2, x + s.lengthMm(),
                    axis + s.outputDiameterMm() / 2, 0.2, Mark.Role.OUTLINE, data));
            x += s.lengthMm();
        }
        Section first = sections.get(0);
        Section last = sections.get(sections.size() - 1);
        marks.add(new Mark.Stroke(x0, axis - first.inputDiameterMm() / 2 - 4, x0, dimensionRow, 0.3, Mark.Role.NUT,
                Map.of("end", "input")));
        marks.add(new Mark.Stroke(x0 + length, axis - last.outputDiameterMm() / 2 - 4, x0 + length, dimensionRow,
                0.3, Mark.Role.SADDLE, Map.of("end", "output", "from-input-mm", mm(length))));
        marks.add(Mark.Caption.of(x0, axis - half - 6, "input end, x = 0", 2.5, Mark.Caption.Anchor.START));
        marks.add(Mark.Caption.of(x0 + length, axis - half - 6, "output end " + mm(length), 2.5,
                Mark.Caption.Anchor.END));
        for (int i = 0; i < holes.size(); i++) {
            Hole h = holes.get(i);
            double cx = x0 + h.positionMm();
            String number = Integer.toString(i + 1);
            marks.add(new Mark.Ring(cx, axis, h.diameterMm() / 2, 0.2, Mark.Role.HOLE, Map.of("hole", number,
                    "from-input-mm", mm(h.positionMm()), "diameter-mm", mm(h.diameterMm()))));
            double arm = Math.max(h.diameterMm() / 2 + 1.5, 3.0);
            marks.add(new Mark.Stroke(cx - arm, axis, cx + arm, axis, 0.1, Mark.Role.CENTRE, Map.of("hole-centre", number)));
            marks.add(new Mark.Stroke(cx, axis - arm, cx, axis + arm, 0.1, Mark.Role.CENTRE, Map.of("hole-centre", number)));
            double row = dimensionRow + 3.5 * (i % 3);
            marks.add(new Mark.Stroke(cx, axis + arm, cx, row - 2.5, 0.1, Mark.Role.DIMENSION, Map.of("hole-leader", number)));
            marks.add(Mark.Caption.of(cx, row, "H" + number + " d " + mm(h.diameterMm()) + " at " + mm(h.positionMm()),
                    2.0, Mark.Caption.Anchor.MIDDLE));
        }
        marks.addAll(CalibrationRuler.at(x0, rulerBase));
        String title = String.format(Locale.ROOT, "Tone holes: %sbore %s mm, %d holes, distances from the input end",
                name.isEmpty() ? "" : name + ", ", mm(length), holes.size());
        marks.add(Mark.Caption.of(x0, 8, title, 3.0, Mark.Caption.Anchor.START));
        return new Sheet(title, width, height, marks);
    }

    static String mm(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }
}
