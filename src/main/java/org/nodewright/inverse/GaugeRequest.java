package org.nodewright.inverse;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.strings.StringRules;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * Gauges for a set (or one string): each string's pitch (note name or Hz) and target tension, or a
 * set-wide {@code tensionProfile} from the first string's target to the last's, interpolated
 * linearly for strings without their own.
 */
@CrossFieldChecked
record GaugeRequest(
        @NotNull @Finite @Positive @DecimalMax("5000") Double lengthMm,
        @Finite @DecimalMin("300") @DecimalMax("600") Double referenceA4Hz,
        @NotEmpty @Size(max = 24) List<@Valid @NotNull StringTarget> strings,
        @Valid TensionProfile tensionProfile,
        @Size(min = 1, max = 500) List<@NotNull @Finite @Positive @DecimalMax("20") Double> availableGaugesMm)
        implements CrossFieldChecked.Rules {

    /** Each string: its pitch (note or Hz), its tension (own or from the profile), known materials. */
    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        if (strings == null) {
            return out;
        }
        for (int i = 0; i < strings.size(); i++) {
            StringTarget s = strings.get(i);
            if (s == null) {
                continue;
            }
            String at = "strings[" + i + "].";
            StringRules.pitch(out, at, s.note(), s.targetHz());
            if (s.targetTensionN() == null && tensionProfile == null) {
                out.add(new FieldProblem(at + "targetTensionN", "is required without a tensionProfile"));
            }
            StringRules.material(out, at + "material", s.material());
            StringRules.material(out, at + "wrapMaterial", s.wrapMaterial());
        }
        return out;
    }

    /** The A4 that note names are read at. */
    double referenceA4OrDefault() {
        return referenceA4Hz == null ? EqualTemperament.ISO_16_A4_HZ : referenceA4Hz;
    }

    record StringTarget(
            @Size(max = StringRules.NOTE_MAX) String note,
            @Finite @Positive @DecimalMax("20000") Double targetHz,
            @Finite @Positive @DecimalMax("2000") Double targetTensionN,
            @NotNull @Size(max = 40) String material,
            @Size(max = 40) String wrapMaterial,
            @Finite @DecimalMin("0.2") @DecimalMax("0.8") Double coreRatio,
            @Finite @Positive @DecimalMax("5000") Double lengthMm) {
    }

    record TensionProfile(
            @NotNull @Finite @Positive @DecimalMax("2000") Double firstN,
            @NotNull @Finite @Positive @DecimalMax("2000") Double lastN) {
    }
}
