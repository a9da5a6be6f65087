package org.nodewright.aircolumns;

import jakarta.validation.Constraint;
import jakarta.validation.ConstraintValidator;
import jakarta.validation.ConstraintValidatorContext;
import jakarta.validation.Payload;
import java.lang.annotation.Documented;
import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import java.util.List;
import java.util.Locale;
import org.nodewright.physics.tuning.NoteNames;

/**
 * Cross-field rules of {@link AirColumnRequest}, each reported on its own dotted path: fMaxHz
 * above fMinHz, the bore no longer than 20 m, every hole inside the bore and no wider than the
 * bore where it sits, fingering hole indices within the hole list, exactly one target per
 * fingering and a readable note name. Fields that are missing are left to their own constraints.
 */
@Documented
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@Constraint(validatedBy = ValidAirColumn.Validator.class)
public @interface ValidAirColumn {

    String message() default "is not a consistent air column";

    Class<?>[] groups() default {};

    Class<? extends Payload>[] payload() default {};

    /** Checks the cross-field rules. */
    class Validator implements ConstraintValidator<ValidAirColumn, AirColumnRequest> {

        @Override
        public boolean isValid(AirColumnRequest r, ConstraintValidatorContext ctx) {
            if (r == null) {
                return true;
            }
            ctx.disableDefaultConstraintViolation();
            boolean ok = true;
            if (r.fMinHz() != null && r.fMaxHz() != null && Double.isFinite(r.fMinHz())
                    && Double.isFinite(r.fMaxHz()) && !(r.fMaxHz() > r.fMinHz())) {
                ok = fail(ctx, "fMaxHz", "must be greater than fMinHz (" + r.fMinHz() + ")");
            }
            double total = totalLength(r.segments());
            if (total > AirColumnRequest.MAX_TOTAL_LENGTH_MM) {
                ok = fail(ctx, "segments", "the bore may be at most " + AirColumnRequest.MAX_TOTAL_LENGTH_MM
                        + " mm long in total, was " + total);
            }
            if (Double.isFinite(total) && total > 0 && r.fMinHz() != null && r.fMaxHz() != null
                    && r.fMaxHz() > r.fMinHz()) {
                double work = work(r, total);
                if (work > MAX_WORK) {
                    ok = fail(ctx, "points", String.format(Locale.ROOT, "this bore, frequency range, number of points "
                            + "and fingerings ask for about %.2g element-frequency evaluations (limit %.0g): narrow "
                            + "the range or use fewer points, segments or fingerings", work, MAX_WORK));
                }
            }
            List<AirColumnRequest.Hole> holes = r.holes();
            if (holes != null && Double.isFinite(total)) {
                for (int i = 0; i < holes.size(); i++) {
                    AirColumnRequest.Hole h = holes.get(i);
                    if (h == null || h.positionMm() == null || !Double.isFinite(h.positionMm())) {
                        continue;
                    }
                    if (!(h.positionMm() < total)) {
                        ok = fail(ctx, "holes[" + i + "].positionMm", "must lie inside the bore (before its end at "
                                + fmt(total) + " mm)");
                        continue;
                    }
                    double bore = diameterAt(r.segments(), h.positionMm());
                    if (h.diameterMm() != null && Double.isFinite(h.diameterMm()) && bore > 0
                            && h.diameterMm() > bore) {
                        ok = fail(ctx, "holes[" + i + "].diameterMm", "must not exceed the bore diameter there ("
                                + fmt(bore) + " mm)");
                    }
                }
            }
            boolean[] mouthOk = {true};
            MouthRules.check(r, (field, message) -> mouthOk[0] = fail(ctx, field, message));
            ok &= mouthOk[0];
            List<AirColumnRequest.FingeringSpec> fs = r.fingerings();
            if (fs != null) {
                int holeCount = holes == null ? 0 : holes.size();
                for (int i = 0; i < fs.size(); i++) {
                    ok &= checkFingering(ctx, fs.get(i), i, holeCount);
                }
            }
            return ok;
        }

        private static boolean checkFingering(ConstraintValidatorContext ctx, AirColumnRequest.FingeringSpec f, int i,
                int holeCount) {
            if (f == null) {
                return true;
            }
            boolean ok = true;
            String base = "fingerings[" + i + "]";
            if (f.closedHoles() != null) {
                for (int j = 0; j < f.closedHoles().size(); j++) {
                    Integer idx = f.closedHoles().get(j);
                    if (idx != null && idx >= holeCount) {
                        ok = fail(ctx, base + ".closedHoles[" + j + "]", "must be the index of a hole (0.."
                                + (holeCount - 1) + ")");
                    }
                }
            }
            boolean hasNote = f.targetNote() != null;
            boolean hasHz = f.targetHz() != null;
            if (hasNote == hasHz) {
                ok = fail(ctx, base + ".targetHz", hasNote ? "give targetHz or targetNote, not both"
                        : "give targetHz or targetNote");
            } else if (hasNote && !NoteNames.isNoteName(f.targetNote())) {
                ok = fail(ctx, base + ".targetNote", "must be a note name such as D5, F#4 or Bb3");
            }
            return ok;
        }

        private static boolean fail(ConstraintValidatorContext ctx, String path, String message) {
            ConstraintValidatorContext.ConstraintViolationBuilder b = ctx.buildConstraintViolationWithTemplate(
                    message.replace("{", "(").replace("}", ")").replace("$", ""));
            // Paths used here: "name", "list[i].name" and "list[i].inner[j]".
            java.util.regex.Matcher m = java.util.regex.Pattern
                    .compile("(\\w+)\\[(\\d+)]\\.(\\w+)(?:\\[(\\d+)])?").matcher(path);
            if (!m.matches()) {
                b.addPropertyNode(path).addConstraintViolation();
            } else if (m.group(4) == null) {
                b.addPropertyNode(m.group(1)).addPropertyNode(m.group(3)).inIterable()
                        .atIndex(Integer.parseInt(m.group(2))).addConstraintViolation();
            } else {
                b.addPropertyNode(m.group(1)).addPropertyNode(m.group(3)).inIterable()
                        .atIndex(Integer.parseInt(m.group(2))).addBeanNode().inIterable()
                        .atIndex(Integer.parseInt(m.group(4))).addConstraintViolation();
            }
            return false;
        }

        /** Upper bound of the work one request may ask for (element-frequency evaluations). */
        static final double MAX_WORK = 1e8;

        /**
         * Estimated element-frequency evaluations: the sweep plus, per fingering, a detection grid
         * fine enough to separate resonances (24 cells per c/2L, c taken as 343 m/s).
         */
        static double work(AirColumnRequest r, double totalMm) {
            int elements = (r.segments() == null ? 0 : r.segments().size()) + (r.holes() == null ? 0 : r.holes().size());
            int points = r.points() == null ? 2000 : r.points();
            double detection = Math.min(60_000, Math.max(64, (r.fMaxHz() - r.fMinHz())
                    / (343.0 / (2 * totalMm * 1e-3) / 24)));
            int fingerings = r.fingerings() == null ? 0 : r.fingerings().size();
            return (double) elements * (Math.max(points, detection) + fingerings * detection);
        }

        private static double totalLength(List<AirColumnRequest.Segment> segments) {
            if (segments == null) {
                return 0;
            }
            double sum = 0;
            for (AirColumnRequest.Segment s : segments) {
                if (s == null || s.lengthMm() == null || !Double.isFinite(s.lengthMm()) || s.lengthMm() <= 0) {
                    return Double.NaN;
                }
                sum += s.lengthMm();
            }
            return sum;
        }

        /** Bore diameter at x (mm) from the input end, or -1 if a segment is incomplete. */
        static double diameterAt(List<AirColumnRequest.Segment> segments, double x) {
            double startMm = 0;
            for (AirColumnRequest.Segment s : segments) {
                if (s == null || s.lengthMm() == null || s.inputDiameterMm() == null || s.outputDiameterMm() == null) {
                    return -1;
                }
                if (x <= startMm + s.lengthMm()) {
                    double t = (x - startMm) / s.lengthMm();
                    return s.inputDiameterMm() + (s.outputDiameterMm() - s.inputDiameterMm()) * t;
                }
                startMm += s.lengthMm();
            }
            return -1;
        }

        private static String fmt(double v) {
            return String.format(Locale.ROOT, "%.3f", v);
        }
    }
}
