package org.nodewright.strings;

import java.util.List;
import org.nodewright.physics.strings.Materials;
import org.nodewright.web.FieldProblem;

/** Cross-field checks shared by the string requests. */
final class StringChecks {

    private StringChecks() {
    }

    /** The value when it is present and finite (its own constraints report anything else). */
    static Double usable(Double v) {
        return v != null && Double.isFinite(v) ? v : null;
    }

    static void material(List<FieldProblem> out, String field, String id) {
        if (id != null && id.length() <= 64 && Materials.find(id).isEmpty()) {
            out.add(new FieldProblem(field, StringAnalysisRequest.unknownMaterial(id)));
        }
    }

    /** A wrap needs both its material and its diameter. {@code prefix} is "" or "strings[3]." */
    static void wrapPair(List<FieldProblem> out, String prefix, String wrapMaterial, Double wrapDiameterMm) {
        if (wrapMaterial != null && wrapDiameterMm == null) {
            out.add(new FieldProblem(prefix + "wrapDiameterMm", "is required when wrapMaterial is given"));
        }
        if (wrapMaterial == null && wrapDiameterMm != null) {
            out.add(new FieldProblem(prefix + "wrapMaterial", "is required when wrapDiameterMm is given"));
        }
    }
}
