package org.nodewright.aircolumns;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.function.BiConsumer;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.web.EnumWords;
import org.nodewright.web.FieldProblem;

/**
 * Cross-field rules of a request's {@code mouth}: the kind agrees with {@code inputEnd}, the
 * fields of the kind are given and no others, an embouchure hole is round or oval (not both), and
 * a window or hole is no wider than the bore's circumference at the input. Each problem is
 * reported to {@code fail} as (dotted field, message).
 */
final class MouthRules {

    private MouthRules() {
    }

    static java.util.List<FieldProblem> problems(AirColumnRequest r) {
        java.util.List<FieldProblem> out = new java.util.ArrayList<>();
        check(r, (field, message) -> out.add(new FieldProblem(field, message)));
        return out;
    }

    private static void check(AirColumnRequest r, BiConsumer<String, String> fail) {
        AirColumnRequest.MouthSpec m = r.mouth();
        if (m == null || m.kind() == null) {
            return;
        }
        String kind = EnumWords.word(m.kind());
        InputEnd wanted = m.kind().inputEnd();
        if (r.inputEnd() != null && wanted != r.inputEnd()) {
            fail.accept("mouth.kind", "a " + kind + " mouth plays at inputEnd \"" + EnumWords.word(wanted)
                    + "\", but inputEnd is \"" + EnumWords.word(r.inputEnd()) + "\"");
        }
        Map<String, Double> given = new LinkedHashMap<>();
        given.put("holeDiameterMm", m.holeDiameterMm());
        given.put("holeLengthMm", m.holeLengthMm());
        given.put("holeWidthMm", m.holeWidthMm());
        given.put("wallMm", m.wallMm());
        given.put("headspaceMm", m.headspaceMm());
        given.put("lipCoveragePct", m.lipCoveragePct());
        given.put("windowLengthMm", m.windowLengthMm());
        given.put("windowWidthMm", m.windowWidthMm());
        given.put("equivalentVolumeMm3", m.equivalentVolumeMm3());
        given.put("cupVolumeMm3", m.cupVolumeMm3());
        given.put("throatDiameterMm", m.throatDiameterMm());
        given.put("throatLengthMm", m.throatLengthMm());
        java.util.List<String> allowed;
        java.util.List<String> required;
        switch (m.kind()) {
            case EMBOUCHURE -> {
                allowed = java.util.List.of("holeDiameterMm", "holeLengthMm", "holeWidthMm", "wallMm", "headspaceMm",
                        "lipCoveragePct");
                required = java.util.List.of("wallMm", "headspaceMm");
                boolean round = m.holeDiameterMm() != null;
                boolean oval = m.holeLengthMm() != null || m.holeWidthMm() != null;
                if (round == oval) {
                    fail.accept("mouth.holeDiameterMm", round ? "give holeDiameterMm or holeLengthMm with "
                            + "holeWidthMm, not both" : "give holeDiameterMm, or holeLengthMm with holeWidthMm");
                } else if (oval && (m.holeLengthMm() == null || m.holeWidthMm() == null)) {
                    fail.accept(m.holeLengthMm() == null ? "mouth.holeLengthMm" : "mouth.holeWidthMm",
                            "an oval hole needs both holeLengthMm and holeWidthMm");
                }
                Double across = round ? m.holeDiameterMm() : m.holeWidthMm();
                widerThanBore(r, across, round ? "mouth.holeDiameterMm" : "mouth.holeWidthMm", fail);
            }
            case WINDOW -> {
                allowed = java.util.List.of("windowLengthMm", "windowWidthMm", "wallMm", "headspaceMm");
                required = java.util.List.of("windowLengthMm", "windowWidthMm", "wallMm");
                widerThanBore(r, m.windowWidthMm(), "mouth.windowWidthMm", fail);
            }
            case REED -> {
                allowed = java.util.List.of("equivalentVolumeMm3");
                required = allowed;
            }
            default -> {
                allowed = java.util.List.of("cupVolumeMm3", "throatDiameterMm", "throatLengthMm");
                required = allowed;
            }
        }
        for (Map.Entry<String, Double> e : given.entrySet()) {
            if (e.getValue() != null && !allowed.contains(e.getKey())) {
                fail.accept("mouth." + e.getKey(), "is not a field of a " + kind + " mouth (its fields: "
                        + String.join(", ", allowed) + ")");
            }
        }
        for (String f : required) {
            if (given.get(f) == null) {
                fail.accept("mouth." + f, "is required for a " + kind + " mouth");
            }
        }
    }

    /** A width across the bore may not exceed the bore's circumference at the input, pi d. */
    private static void widerThanBore(AirColumnRequest r, Double width, String field, BiConsumer<String, String> fail) {
        if (width == null || !Double.isFinite(width) || r.segments() == null || r.segments().isEmpty()
                || r.segments().get(0) == null || r.segments().get(0).inputDiameterMm() == null) {
            return;
        }
        double d = r.segments().get(0).inputDiameterMm();
        if (width > Math.PI * d) {
            fail.accept(field, String.format(Locale.ROOT, "must not exceed the bore's circumference at the input "
                    + "(pi x %.3f mm = %.3f mm)", d, Math.PI * d));
        }
    }
}
