package org.nodewright.strings;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.strings.EndCondition;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;
import org.nodewright.web.LengthMm;

/**
 * Body of {@code POST /api/v1/string-sets/analyze}: a set length (mm) that each string may override
 * (multi-scale), and the strings. Defaults: referenceA4Hz 440, stiffness false (flexible-string
 * tension, T = μ(2Lf)²), endCondition "pinned".
 */
@CrossFieldChecked
public record StringSetRequest(
        @LengthMm Double lengthMm,
        @Finite @DecimalMin(value = "100", message = "must be at least 100 Hz")
        @DecimalMax(value = "1000", message = "must be at most 1000 Hz") Double referenceA4Hz,
        Boolean stiffness,
        EndCondition endCondition,
        @NotNull @NotEmpty @Size(max = 64) List<@NotNull @Valid Member> strings) implements CrossFieldChecked.Rules {

    /** One string of the set. */
    public record Member(
            @Size(max = 100) String label,
            @NotNull @Finite @DecimalMin(value = "0.01", message = "must be at least 0.01 Hz")
            @DecimalMax(value = "100000", message = "must be at most 100000 Hz") Double targetHz,
            @NotNull @Size(max = StringRules.MATERIAL_ID_MAX) String material,
            @NotNull @Finite @DecimalMin(value = "0.001", message = "must be at least 0.001 mm")
            @DecimalMax(value = "100", message = "must be at most 100 mm") Double diameterMm,
            @Size(max = StringRules.MATERIAL_ID_MAX) String wrapMaterial,
            @Finite @DecimalMin(value = "0.001", message = "must be at least 0.001 mm")
            @DecimalMax(value = "100", message = "must be at most 100 mm") Double wrapDiameterMm,
            @LengthMm Double lengthMm) {
    }

    /** What an omitted top-level field means (see {@link StringAnalysisRequest#DEFAULTS}). */
    public static final java.util.Map<String, Object> DEFAULTS = java.util.Map.of(
            "referenceA4Hz", StringAnalysisRequest.DEFAULT_A4_HZ, "stiffness", false, "endCondition", "pinned");

    public double referenceA4OrDefault() {
        return referenceA4Hz == null ? StringAnalysisRequest.DEFAULT_A4_HZ : referenceA4Hz;
    }

    public boolean stiffnessOn() {
        return Boolean.TRUE.equals(stiffness);
    }

    public EndCondition endOrDefault() {
        return endCondition == null ? EndCondition.PINNED : endCondition;
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        return problems(this);
    }

    /** Every cross-field problem of the request; single-field problems are Bean Validation's. */
    public static List<FieldProblem> problems(StringSetRequest r) {
        List<FieldProblem> out = new ArrayList<>();
        if (r.strings == null) {
            return out;
        }
        for (int i = 0; i < r.strings.size(); i++) {
            Member m = r.strings.get(i);
            if (m == null) {
                continue;
            }
            String prefix = "strings[" + i + "].";
            StringRules.material(out, prefix + "material", m.material);
            StringRules.wrap(out, prefix, m.wrapMaterial, m.wrapDiameterMm);
            if (m.lengthMm == null && r.lengthMm == null) {
                out.add(new FieldProblem(prefix + "lengthMm", "is required when the set has no lengthMm"));
            }
        }
        return out;
    }
}
