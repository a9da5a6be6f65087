package org.nodewright.strings;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
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
 * Body of {@code POST /api/v1/strings/gauge}: the diameter that gives {@code tensionN} at
 * {@code targetHz}. Plain string: the diameter of {@code material}. Wound string (with
 * {@code wrapMaterial}): the wrap diameter on a core of {@code coreDiameterMm}.
 */
@CrossFieldChecked
public record StringGaugeRequest(
        @NotNull @LengthMm Double lengthMm,
        @NotNull @Finite @DecimalMin(value = "0.01", message = "must be at least 0.01 Hz")
        @DecimalMax(value = "100000", message = "must be at most 100000 Hz") Double targetHz,
        @NotNull @Finite @DecimalMin(value = "0.001", message = "must be at least 0.001 N")
        @DecimalMax(value = "100000", message = "must be at most 100000 N") Double tensionN,
        @NotNull @Size(max = StringRules.MATERIAL_ID_MAX) String material,
        @Size(max = StringRules.MATERIAL_ID_MAX) String wrapMaterial,
        @Finite @DecimalMin(value = "0.001", message = "must be at least 0.001 mm")
        @DecimalMax(value = "100", message = "must be at most 100 mm") Double coreDiameterMm,
        Boolean stiffness,
        EndCondition endCondition,
        @Finite @DecimalMin(value = "100", message = "must be at least 100 Hz")
        @DecimalMax(value = "1000", message = "must be at most 1000 Hz") Double referenceA4Hz)
        implements CrossFieldChecked.Rules {

    public boolean stiffnessOn() {
        return Boolean.TRUE.equals(stiffness);
    }

    public EndCondition endOrDefault() {
        return endCondition == null ? EndCondition.PINNED : endCondition;
    }

    public double referenceA4OrDefault() {
        return referenceA4Hz == null ? StringAnalysisRequest.DEFAULT_A4_HZ : referenceA4Hz;
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        return problems(this);
    }

    /** Every cross-field problem of the request. */
    public static List<FieldProblem> problems(StringGaugeRequest r) {
        List<FieldProblem> out = new ArrayList<>();
        StringRules.material(out, "material", r.material);
        StringRules.material(out, "wrapMaterial", r.wrapMaterial);
        if (r.wrapMaterial != null && r.coreDiameterMm == null) {
            out.add(new FieldProblem("coreDiameterMm", "is required for a wound string (wrapMaterial given)"));
        }
        if (r.wrapMaterial == null && r.coreDiameterMm != null) {
            out.add(new FieldProblem("wrapMaterial", "is required when coreDiameterMm is given"));
        }
        return out;
    }
}
