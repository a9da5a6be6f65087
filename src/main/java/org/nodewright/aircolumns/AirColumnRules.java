package org.nodewright.aircolumns;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.nodewright.physics.tuning.NoteNames;
import org.nodewright.web.FieldProblem;

/**
 * Cross-field rules of {@link AirColumnRequest} (through {@link org.nodewright.web.CrossFieldChecked}),
 * each reported on its own dotted path: fMaxHz above fMinHz, the bore no longer than 20 m, the work
 * bounded, every hole inside the bore and no wider than the bore where it sits, fingering hole
 * indices within the hole list, exactly one target per fingering and a readable note name, and the
 * mouth's rules ({@link MouthRules}). Fields
 * that are missing are left to their own constraints.
 */
public final class AirColumnRules {

    /** Upper bound of the work one request may ask for (element-frequency evaluations). */
    static final double MAX_WORK = 1e8;

    private AirColumnRules() {
    }

    static List<FieldProblem> problems(AirColumnRequest r) {
        List<FieldProblem> out = new ArrayList<>();
        if (r.fMinHz() != null && r.fMaxHz() != null && Double.isFinite(r.fMinHz())
                && Double.isFinite(r.fMaxHz()) && !(r.fMaxHz() > r.fMinHz())) {
            out.add(new FieldProblem("fMaxHz", "must be greater than fMinHz (" + r.fMinHz() + ")"));
        }
        double total = totalLength(r.segments());
        if (total > AirColumnRequest.MAX_TOTAL_LENGTH_MM) {
            out.add(new FieldProblem("segments", "the bore may be at most " + AirColumnRequest.MAX_TOTAL_LENGTH_MM
                    + " mm long in total, was " + total));
        }
        if (Double.isFinite(total) && total > 0 && r.fMinHz() != null && r.fMaxHz() != null
                && r.fMaxHz() > r.fMinHz()) {
            double work = work(r, total);
            if (work > MAX_WORK) {
                out.add(new FieldProblem("points", String.format(Locale.ROOT, "this bore, frequency range, number of "
                        + "points and fingerings ask for about %.2g element-frequency evaluations (limit %.0g): "
                        + "narrow the range or use fewer points, segments or fingerings", work, MAX_WORK)));
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
                    out.add(new FieldProblem("holes[" + i + "].positionMm", "must lie inside the bore (before its end at "
                            + fmt(total) + " mm)"));
                    continue;
                }
                double bore = diameterAt(r.segments(), h.positionMm());
                if (h.diameterMm() != null && Double.isFinite(h.diameterMm()) && bore > 0 && h.diameterMm() > bore) {
                    out.add(new FieldProblem("holes[" + i + "].diameterMm", "must not exceed the bore diameter there ("
                            + fmt(bore) + " mm)"));
                }
            }
        }
        out.addAll(MouthRules.problems(r));
        List<AirColumnRequest.FingeringSpec> fs = r.fingerings();
        if (fs != null) {
            int holeCount = holes == null ? 0 : holes.size();
            fingerings(out, "", fs, holeCount);
        }
        return out;
    }

    /**
     * The rules of a fingering chart for a bore of holeCount holes (closed holes that exist, the
     * target given once and readable), fields named from prefix ("" for the bore's own chart).
     */
    public static void fingerings(List<FieldProblem> out, String prefix, List<AirColumnRequest.FingeringSpec> fs,
            int holeCount) {
        for (int i = 0; i < fs.size(); i++) {
            fingering(out, fs.get(i), prefix + "fingerings[" + i + "]", holeCount);
        }
    }

    private static void fingering(List<FieldProblem> out, AirColumnRequest.FingeringSpec f, String base, int holeCount) {
        if (f == null) {
            return;
        }
        if (f.closedHoles() != null) {
            for (int j = 0; j < f.closedHoles().size(); j++) {
                Integer idx = f.closedHoles().get(j);
                if (idx != null && idx >= holeCount) {
                    // The field path counts from 0 (the contract); the words number holes from 1, as the pages do.
                    out.add(new FieldProblem(base + ".closedHoles[" + j + "]", "names hole " + (idx + 1)
                            + ", but the bore has " + (holeCount == 0 ? "no holes" : "holes 1 to " + holeCount)));
                }
            }
        }
        boolean hasNote = f.targetNote() != null;
        boolean hasHz = f.targetHz() != null;
        if (hasNote == hasHz) {
            out.add(new FieldProblem(base + ".targetHz", hasNote ? "give the target pitch once: as a note or in Hz, not both"
                    : "enter the target pitch: a note such as D5, or a frequency in Hz"));
        } else if (hasNote && !NoteNames.isPitch(f.targetNote())) {
            out.add(new FieldProblem(base + ".targetNote", "must be a note name such as " + NoteNames.EXAMPLES
                    + ", or a frequency such as 329.63 Hz"));
        }
    }

    /**
     * Estimated element-frequency evaluations: the sweep plus, per fingering, a detection grid
     * fine enough to separate resonances (24 cells per c/2L, c taken as 343 m/s).
     */
    static double work(AirColumnRequest r, double totalMm) {
        int elements = (r.segments() == null ? 0 : r.segments().size()) + (r.holes() == null ? 0 : r.holes().size());
        int points = r.pointsOrDefault();
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
