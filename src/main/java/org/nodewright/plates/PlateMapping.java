package org.nodewright.plates;

import static org.nodewright.physics.Units.MM;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.nodewright.physics.plates.Brace;
import org.nodewright.physics.plates.CatalogueMaterial;
import org.nodewright.physics.plates.Outline;
import org.nodewright.physics.plates.Plate;
import org.nodewright.physics.plates.PlateMaterial;
import org.nodewright.physics.plates.PlateMaterials;
import org.nodewright.physics.plates.ThicknessField;
import org.nodewright.web.FieldProblem;
import tools.jackson.databind.JsonNode;

/**
 * The one mapper between the plate request (mm, JSON words) and the core's {@link Plate} (metres, enums),
 * and the request's cross-field rules, which need the same parsing (the outline, the material choice).
 */
public final class PlateMapping {

    static final String RECTANGLE = "rectangle";

    private PlateMapping() {
    }

    /** Problems among fields that are each valid on their own (checked with guards: single fields may be bad). */
    static List<FieldProblem> problems(PlateAnalysisRequest r) {
        List<FieldProblem> out = new ArrayList<>();
        Optional<Outline> outline = outline(r, out);
        thickness(r, out);
        material(r, out);
        outline.ifPresent(o -> braces(r, o, out));
        return out;
    }

    private static boolean finite(Double v) {
        return v != null && Double.isFinite(v);
    }

    private static Optional<Outline> outline(PlateAnalysisRequest r, List<FieldProblem> out) {
        JsonNode node = r.outline();
        boolean rectangle = node == null || node.isNull() || (node.isString() && RECTANGLE.equals(node.asString()));
        if (rectangle) {
            if (Boolean.TRUE.equals(r.mirrorHalf())) {
                out.add(new FieldProblem("mirrorHalf", "is only for a polygon outline"));
            }
            if (r.lengthMm() == null) {
                out.add(new FieldProblem("lengthMm", "is required for a rectangle"));
            }
            if (r.widthMm() == null) {
                out.add(new FieldProblem("widthMm", "is required for a rectangle"));
            }
            if (finite(r.lengthMm()) && finite(r.widthMm()) && r.lengthMm() > 0 && r.widthMm() > 0) {
                return Optional.of(Outline.rectangle(r.lengthMm() * MM, r.widthMm() * MM));
            }
            return Optional.empty();
        }
        if (!node.isArray()) {
            out.add(new FieldProblem("outline", "must be \"rectangle\" or a polygon [[xMm, yMm], ...]"));
            return Optional.empty();
        }
        if (r.lengthMm() != null) {
            out.add(new FieldProblem("lengthMm", "is only for outline \"rectangle\" (a polygon has its own size)"));
        }
        if (r.widthMm() != null) {
            out.add(new FieldProblem("widthMm", "is only for outline \"rectangle\" (a polygon has its own size)"));
        }
        int n = node.size();
        boolean half = Boolean.TRUE.equals(r.mirrorHalf());
        int least = half ? 2 : Outline.MIN_POINTS;
        if (n < least) {
            out.add(new FieldProblem("outline", "needs at least " + least + " points [xMm, yMm], got " + n));
            return Optional.empty();
        }
        if (n > PlateAnalysisRequest.MAX_OUTLINE_POINTS) {
            out.add(new FieldProblem("outline", "has " + n + " points, at most "
                    + PlateAnalysisRequest.MAX_OUTLINE_POINTS + " are taken"));
            return Optional.empty();
        }
        double[] xs = new double[n];
        double[] ys = new double[n];
        boolean ok = true;
        for (int i = 0; i < n; i++) {
            JsonNode p = node.get(i);
            if (p == null || !p.isArray() || p.size() != 2 || !p.get(0).isNumber() || !p.get(1).isNumber()
                    || !Double.isFinite(p.get(0).doubleValue()) || !Double.isFinite(p.get(1).doubleValue())
                    || Math.abs(p.get(0).doubleValue()) > 1e5 || Math.abs(p.get(1).doubleValue()) > 1e5) {
                out.add(new FieldProblem("outline[" + i + "]", "must be [xMm, yMm], two finite numbers within 100 m"));
                ok = false;
                continue;
            }
            xs[i] = p.get(0).doubleValue() * MM;
            ys[i] = p.get(1).doubleValue() * MM;
        }
        if (!ok) {
            return Optional.empty();
        }
        if (half) {
            if (ys[0] != 0) {
                out.add(new FieldProblem("outline[0]", "a mirrored half starts on the centre line y = 0"));
                return Optional.empty();
            }
            if (ys[n - 1] != 0) {
                out.add(new FieldProblem("outline[" + (n - 1) + "]", "a mirrored half ends on the centre line y = 0"));
                return Optional.empty();
            }
            double[][] full = Outline.mirror(xs, ys);
            xs = full[0];
            ys = full[1];
        }
        Optional<String> problem = Outline.problem(xs, ys);
        if (problem.isPresent()) {
            out.add(new FieldProblem("outline", problem.get()));
            return Optional.empty();
        }
        double[] scaled = xs.clone();
        Outline o = Outline.polygon(scaled, ys);
        double[] b = o.bounds();
        if (b[2] - b[0] < 1 * MM || b[3] - b[1] < 1 * MM) {
            out.add(new FieldProblem("outline", "must span at least 1 mm each way"));
            return Optional.empty();
        }
        return Optional.of(o);
    }

    private static void thickness(PlateAnalysisRequest r, List<FieldProblem> out) {
        boolean graduated = r.thicknessPoints() != null && !r.thicknessPoints().isEmpty();
        if (graduated && r.thicknessMm() != null) {
            out.add(new FieldProblem("thicknessMm", "give either thicknessMm or thicknessPoints, not both"));
        } else if (!graduated && r.thicknessMm() == null) {
            out.add(new FieldProblem("thicknessMm", "is required (or a graduation in thicknessPoints)"));
        }
    }

    private static void material(PlateAnalysisRequest r, List<FieldProblem> out) {
        String[] names = {"densityKgPerM3", "elasticAlongPa", "elasticAcrossPa", "shearPa", "poissonAlongAcross"};
        Double[] values = {r.densityKgPerM3(), r.elasticAlongPa(), r.elasticAcrossPa(), r.shearPa(),
            r.poissonAlongAcross()};
        if (r.material() != null) {
            if (PlateMaterials.byId(r.material()).isEmpty()) {
                out.add(new FieldProblem("material", "is not a known plate material (see GET /api/v1/plate-materials)"));
            }
            for (int i = 0; i < names.length; i++) {
                if (values[i] != null) {
                    out.add(new FieldProblem(names[i], "give either material or all five constants, not both"));
                }
            }
            return;
        }
        boolean any = false;
        for (Double v : values) {
            any |= v != null;
        }
        if (!any) {
            out.add(new FieldProblem("material",
                    "is required: an id from GET /api/v1/plate-materials, or the five elastic constants and density"));
            return;
        }
        boolean all = true;
        for (int i = 0; i < names.length; i++) {
            if (values[i] == null) {
                out.add(new FieldProblem(names[i], "is required when no material id is given"));
                all = false;
            }
        }
        if (all && finite(r.elasticAlongPa()) && finite(r.elasticAcrossPa()) && finite(r.poissonAlongAcross())
                && r.elasticAlongPa() > 0 && r.elasticAcrossPa() > 0
                && !PlateMaterial.isPositiveDefinite(r.elasticAlongPa(), r.elasticAcrossPa(), r.poissonAlongAcross())) {
            out.add(new FieldProblem("poissonAlongAcross", "makes the stiffness matrix indefinite: nu_xy^2 * "
                    + "elasticAcrossPa / elasticAlongPa must stay below 1"));
        }
    }

    private static void braces(PlateAnalysisRequest r, Outline outline, List<FieldProblem> out) {
        List<PlateAnalysisRequest.BraceJson> braces = r.bracesOrEmpty();
        for (int i = 0; i < braces.size(); i++) {
            PlateAnalysisRequest.BraceJson b = braces.get(i);
            if (b == null || !point(b.fromMm()) || !point(b.toMm())) {
                continue;
            }
            double x1 = b.fromMm().get(0) * MM;
            double y1 = b.fromMm().get(1) * MM;
            double x2 = b.toMm().get(0) * MM;
            double y2 = b.toMm().get(1) * MM;
            String path = "braces[" + i + "]";
            if (!outline.contains(x1, y1)) {
                out.add(new FieldProblem(path + ".fromMm", "lies outside the outline"));
            } else if (!outline.contains(x2, y2)) {
                out.add(new FieldProblem(path + ".toMm", "lies outside the outline"));
            } else if (x1 == x2 && y1 == y2) {
                out.add(new FieldProblem(path + ".toMm", "must differ from fromMm"));
            } else if (finite(b.widthMm()) && finite(b.heightMm()) && b.widthMm() > 0 && b.heightMm() > 0
                    && !Plate.braceInside(outline, new Brace(x1, y1, x2, y2, b.widthMm() * MM, b.heightMm() * MM))) {
                out.add(new FieldProblem(path, "leaves the outline between its ends"));
            }
        }
    }

    private static boolean point(List<Double> p) {
        return p != null && p.size() == 2 && finite(p.get(0)) && finite(p.get(1));
    }

    /** The core plate of a valid request. */
    public static Plate toPlate(PlateAnalysisRequest r) {
        List<FieldProblem> ignored = new ArrayList<>();
        Outline outline = outline(r, ignored).orElseThrow(() -> new IllegalArgumentException("invalid outline"));
        ThicknessField thickness;
        if (r.thicknessPoints() != null && !r.thicknessPoints().isEmpty()) {
            thickness = ThicknessField.graduated(r.thicknessPoints().stream()
                    .map(p -> new org.nodewright.physics.plates.ThicknessPoint(p.xMm() * MM, p.yMm() * MM,
                            p.thicknessMm() * MM))
                    .toList());
        } else {
            thickness = ThicknessField.uniform(r.thicknessMm() * MM);
        }
        List<Brace> braces = r.bracesOrEmpty().stream()
                .map(b -> new Brace(b.fromMm().get(0) * MM, b.fromMm().get(1) * MM, b.toMm().get(0) * MM,
                        b.toMm().get(1) * MM, b.widthMm() * MM, b.heightMm() * MM))
                .toList();
        return new Plate(outline, material(r), thickness, r.edgesOrDefault(), braces);
    }

    static PlateMaterial material(PlateAnalysisRequest r) {
        if (r.material() != null) {
            return PlateMaterials.byId(r.material()).map(CatalogueMaterial::material)
                    .orElseThrow(() -> new IllegalArgumentException("unknown material"));
        }
        return new PlateMaterial(r.densityKgPerM3(), r.elasticAlongPa(), r.elasticAcrossPa(), r.shearPa(),
                r.poissonAlongAcross());
    }
}
