package org.nodewright.templates;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.templates.FretTemplate;
import org.nodewright.physics.templates.PositionMark;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * A fret template with marked positions (JSON body of the POST forms).
 *
 * @param positions pickups, bridge, supports: labelled distances from the nut
 */
@CrossFieldChecked
record FretTemplateRequest(
        @NotNull @Finite @Positive @DecimalMax("3000") Double scaleLengthMm,
        @NotNull @Min(1) @Max(FretTemplate.MAX_FRETS) Integer count,
        @Min(1) @Max(FretTemplate.MAX_DIVISIONS) Integer divisionsPerOctave,
        @Finite @Positive @DecimalMax("200") Double lineLengthMm,
        @Size(max = 20) List<@Valid @NotNull Position> positions) implements CrossFieldChecked.Rules {

    record Position(@NotBlank @Size(max = 40) String label,
            @NotNull @Finite @PositiveOrZero Double positionMm) {
    }

    /** Every marked position lies within twice the scale length. */
    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        if (positions == null || scaleLengthMm == null || !Double.isFinite(scaleLengthMm)) {
            return out;
        }
        for (int i = 0; i < positions.size(); i++) {
            Position p = positions.get(i);
            if (p != null && p.positionMm() != null && p.positionMm() > 2 * scaleLengthMm) {
                out.add(new FieldProblem("positions[" + i + "].positionMm",
                        "must lie within twice the scale length (" + 2 * scaleLengthMm + " mm)"));
            }
        }
        return out;
    }

    FretTemplate toTemplate() {
        List<Position> given = positions == null ? List.of() : positions;
        return new FretTemplate(scaleLengthMm, count, divisionsPerOctave == null ? 12 : divisionsPerOctave,
                lineLengthMm == null ? 50.0 : lineLengthMm,
                given.stream().map(p -> new PositionMark(p.label(), p.positionMm())).toList());
    }
}
