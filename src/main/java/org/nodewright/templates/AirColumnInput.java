package org.nodewright.templates;

import com.fasterxml.jackson.annotation.JsonProperty;
import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.templates.ToneHoleTemplate;
import org.nodewright.web.BadRequestException;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * The air-column request of the HTTP contract ({@code POST /api/v1/air-columns/analyze}), as the
 * templates and the tone-hole solver take it: the same fields, units and words, so a bore can be
 * passed from the bore bench unchanged. Frequency-range fields are accepted and checked but only
 * the analysis uses them.
 */
public record AirColumnInput(
        @NotEmpty @Size(max = 200) List<@Valid @NotNull Segment> segments,
        InputEnd inputEnd,
        OutputEnd outputEnd,
        @Size(max = 40) List<@Valid @NotNull Hole> holes,
        @Finite @DecimalMin("-50") @DecimalMax("60") Double temperatureC,
        @Finite @DecimalMin("0") @DecimalMax("100") Double relativeHumidityPct,
        Boolean losses,
        @Finite @Positive @DecimalMax("100000") Double fMinHz,
        @Finite @Positive @DecimalMax("100000") Double fMaxHz,
        @Min(2) @Max(20000) Integer points) {

    public record Segment(
            @NotNull @Finite @Positive @DecimalMax("10000") Double lengthMm,
            @NotNull @Finite @Positive @DecimalMax("1000") Double inputDiameterMm,
            @NotNull @Finite @Positive @DecimalMax("1000") Double outputDiameterMm) {
    }

    public record Hole(
            @NotNull @Finite @Positive Double positionMm,
            @NotNull @Finite @Positive @DecimalMax("200") Double diameterMm,
            @Finite @PositiveOrZero @DecimalMax("200") Double chimneyMm,
            Boolean open) {
    }

    public enum InputEnd {
        @JsonProperty("closed") CLOSED,
        @JsonProperty("open") OPEN
    }

    public enum OutputEnd {
        @JsonProperty("open-unflanged") OPEN_UNFLANGED,
        @JsonProperty("open-flanged") OPEN_FLANGED,
        @JsonProperty("ideal-open") IDEAL_OPEN,
        @JsonProperty("closed") CLOSED
    }

    public double lengthMm() {
        return segments.stream().mapToDouble(Segment::lengthMm).sum();
    }

    public List<Hole> holesOrEmpty() {
        return holes == null ? List.of() : holes;
    }

    /** Cross-field rules: holes inside the bore, in order, not wider than the bore they sit in. */
    public void check(String prefix) {
        List<FieldProblem> problems = new ArrayList<>();
        double length = lengthMm();
        List<Hole> hs = holesOrEmpty();
        for (int i = 0; i < hs.size(); i++) {
            Hole h = hs.get(i);
            if (h.positionMm() >= length) {
                problems.add(new FieldProblem(prefix + "holes[" + i + "].positionMm",
                        "must lie inside the bore (shorter than " + length + " mm)"));
            } else if (h.diameterMm() > boreDiameterAt(h.positionMm()) * 1.5) {
                problems.add(new FieldProblem(prefix + "holes[" + i + "].diameterMm",
                        "is more than 1.5 times the bore diameter there"));
            }
            if (i > 0 && h.positionMm() <= hs.get(i - 1).positionMm()) {
                problems.add(new FieldProblem(prefix + "holes[" + i + "].positionMm",
                        "holes must be listed from the input end, each farther than the one before"));
            }
        }
        if (fMinHz != null && fMaxHz != null && fMinHz >= fMaxHz) {
            problems.add(new FieldProblem(prefix + "fMaxHz", "must be greater than fMinHz"));
        }
        if (!problems.isEmpty()) {
            throw new BadRequestException(problems);
        }
    }

    public double boreDiameterAt(double xMm) {
        double start = 0;
        for (Segment s : segments) {
            if (xMm <= start + s.lengthMm()) {
                double t = (xMm - start) / s.lengthMm();
                return s.inputDiameterMm() + (s.outputDiameterMm() - s.inputDiameterMm()) * t;
            }
            start += s.lengthMm();
        }
        return segments.get(segments.size() - 1).outputDiameterMm();
    }

    ToneHoleTemplate toTemplate(String name) {
        return new ToneHoleTemplate(name,
                segments.stream().map(s -> new ToneHoleTemplate.Section(s.lengthMm(), s.inputDiameterMm(),
                        s.outputDiameterMm())).toList(),
                holesOrEmpty().stream().map(h -> new ToneHoleTemplate.Hole(h.positionMm(), h.diameterMm())).toList());
    }
}
