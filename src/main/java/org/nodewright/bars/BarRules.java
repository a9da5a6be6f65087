package org.nodewright.bars;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.bars.BarMaterial;
import org.nodewright.physics.bars.BarMaterials;
import org.nodewright.web.FieldProblem;

/**
 * The cross-field rules of a bar, shared by every request that carries one (the bench, the tuning
 * solver, the blank fit). {@code prefix} is "" for a request that is itself the bar, or e.g.
 * {@code "bar."} for a bar nested in another request.
 */
public final class BarRules {

    /** How far (mm) a profile's last point may sit from lengthMm and still cover the bar (typing rounding). */
    static final double COVER_TOLERANCE_MM = 1e-6;

    private BarRules() {
    }

    public static List<FieldProblem> problems(BarAnalysisRequest r, String prefix) {
        List<FieldProblem> out = new ArrayList<>();
        if (r.section() != null) {
            switch (r.section()) {
                case RECTANGLE -> rectangle(out, r, prefix);
                case ROUND -> {
                    required(out, prefix + "diameterMm", r.diameterMm(), "a round section");
                    unused(out, prefix + "boreMm", r.boreMm(), "a round section (use \"tube\")");
                    unused(out, prefix + "widthMm", r.widthMm(), "a round section");
                    unused(out, prefix + "thicknessMm", r.thicknessMm(), "a round section");
                    unused(out, prefix + "profile", r.profile(), "a round section");
                }
                case TUBE -> {
                    required(out, prefix + "diameterMm", r.diameterMm(), "a tube");
                    required(out, prefix + "boreMm", r.boreMm(), "a tube");
                    if (usable(r.diameterMm()) && usable(r.boreMm()) && !(r.boreMm() < r.diameterMm())) {
                        out.add(new FieldProblem(prefix + "boreMm", "must be smaller than diameterMm ("
                                + r.diameterMm() + " mm), got " + r.boreMm() + " mm"));
                    }
                    unused(out, prefix + "widthMm", r.widthMm(), "a tube");
                    unused(out, prefix + "thicknessMm", r.thicknessMm(), "a tube");
                    unused(out, prefix + "profile", r.profile(), "a tube");
                }
                default -> throw new IllegalStateException("section " + r.section());
            }
        }
        material(out, r, prefix);
        return out;
    }

    private static void rectangle(List<FieldProblem> out, BarAnalysisRequest r, String prefix) {
        required(out, prefix + "widthMm", r.widthMm(), "a rectangle");
        unused(out, prefix + "diameterMm", r.diameterMm(), "a rectangle");
        unused(out, prefix + "boreMm", r.boreMm(), "a rectangle");
        if (r.profile() == null) {
            required(out, prefix + "thicknessMm", r.thicknessMm(), "a rectangle without a profile");
            return;
        }
        List<BarAnalysisRequest.ProfilePoint> p = r.profile();
        if (p.size() < 2 || p.contains(null)) {
            return; // Bean Validation names these
        }
        for (int i = 1; i < p.size(); i++) {
            Double a = p.get(i - 1).positionMm();
            Double b = p.get(i).positionMm();
            if (usable(a) && usable(b) && !(b > a)) {
                out.add(new FieldProblem(prefix + "profile[" + i + "].positionMm",
                        "must be greater than the previous point's " + a + " mm (positions ascend strictly)"));
            }
        }
        Double first = p.get(0).positionMm();
        if (usable(first) && first != 0) {
            out.add(new FieldProblem(prefix + "profile[0].positionMm",
                    "must be 0: the profile must cover the bar from x = 0, got " + first + " mm"));
        }
        Double last = p.get(p.size() - 1).positionMm();
        if (usable(last) && usable(r.lengthMm()) && Math.abs(last - r.lengthMm()) > COVER_TOLERANCE_MM) {
            out.add(new FieldProblem(prefix + "profile[" + (p.size() - 1) + "].positionMm",
                    "must equal lengthMm (" + r.lengthMm() + " mm): the profile must cover the bar to its end, got "
                            + last + " mm"));
        }
    }

    private static void material(List<FieldProblem> out, BarAnalysisRequest r, String prefix) {
        if (r.material() != null) {
            if (r.material().length() <= 64 && BarMaterials.byId(r.material()).isEmpty()) {
                out.add(new FieldProblem(prefix + "material", "is not a known bar material: '" + r.material()
                        + "' (see GET /api/v1/bar-materials; known: " + String.join(", ",
                        BarMaterials.all().stream().map(BarMaterial::id).toList()) + ")"));
            }
            return;
        }
        String why = "is required unless material is given";
        if (r.densityKgPerM3() == null) {
            out.add(new FieldProblem(prefix + "densityKgPerM3", why));
        }
        if (r.youngsModulusPa() == null) {
            out.add(new FieldProblem(prefix + "youngsModulusPa", why));
        }
        if (r.shearModulusPa() == null) {
            out.add(new FieldProblem(prefix + "shearModulusPa", why));
        }
    }

    private static void required(List<FieldProblem> out, String field, Object value, String what) {
        if (value == null) {
            out.add(new FieldProblem(field, "is required for " + what));
        }
    }

    private static void unused(List<FieldProblem> out, String field, Object value, String what) {
        if (value != null) {
            out.add(new FieldProblem(field, "is not used by " + what + "; leave it out or null"));
        }
    }

    private static boolean usable(Double v) {
        return v != null && Double.isFinite(v);
    }
}
