package org.nodewright.inverse;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.physics.inverse.CalibrationParameter;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * Calibrate from what was played: the bore as built (holes and fingerings, mouth), the pitch
 * measured for some of its fingerings (by fingering name), and what to fit (default: the mouth's
 * figure when there is a mouth, else the air temperature).
 */
@CrossFieldChecked
record CalibrationRequest(
        @NotNull @Valid AirColumnRequest bore,
        @NotNull @Size(min = 1, max = AirColumnRequest.MAX_FINGERINGS) List<@NotNull @Valid Measured> measured,
        @Size(min = 1, max = 2) List<@NotNull CalibrationParameter> fit) implements CrossFieldChecked.Rules {

    /** One measured pitch: the fingering's name as in bore.fingerings, and the pitch heard. */
    record Measured(@NotNull @Size(min = 1, max = 80) String fingering,
            @NotNull @Finite @Positive @DecimalMax("20000") Double measuredHz) {
    }

    List<CalibrationParameter> fitOrDefault() {
        if (fit != null) {
            return fit;
        }
        return List.of(bore.mouth() != null ? CalibrationParameter.MOUTH : CalibrationParameter.AIR_TEMPERATURE);
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        if (bore == null) {
            return out;
        }
        Set<String> names = new HashSet<>();
        bore.fingeringsOrEmpty().forEach(f -> {
            if (f != null && f.name() != null) {
                names.add(f.name());
            }
        });
        if (measured != null) {
            Set<String> seen = new HashSet<>();
            for (int i = 0; i < measured.size(); i++) {
                Measured m = measured.get(i);
                if (m == null || m.fingering() == null) {
                    continue;
                }
                if (!names.contains(m.fingering())) {
                    out.add(new FieldProblem("measured[" + i + "].fingering", "no fingering named '" + m.fingering()
                            + "' in bore.fingerings"));
                } else if (!seen.add(m.fingering())) {
                    out.add(new FieldProblem("measured[" + i + "].fingering", "measured twice: give one pitch per fingering"));
                }
            }
        }
        if (fit != null) {
            if (fit.contains(CalibrationParameter.MOUTH) && bore.mouth() == null) {
                out.add(new FieldProblem("fit", "the bore has no mouth to fit; add one or fit air-temperature"));
            }
            if (new HashSet<>(fit).size() != fit.size()) {
                out.add(new FieldProblem("fit", "name each parameter once"));
            }
        }
        return out;
    }
}
