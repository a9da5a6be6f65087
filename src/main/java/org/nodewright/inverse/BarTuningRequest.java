package org.nodewright.inverse;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.bars.BarAnalysisRequest;
import org.nodewright.physics.bars.SectionShape;
import org.nodewright.strings.StringRules;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * A bar tuning solve: the blank as the bar bench sends it (a rectangle; its thickness is the blank's,
 * any profile is ignored as the starting cut), the fundamental (note or Hz) and the overtone ratios
 * (default 1:4:10), the maker's limits, when to stop. Lengths in mm.
 */
@CrossFieldChecked
record BarTuningRequest(
        @NotNull @Valid BarAnalysisRequest bar,
        @Size(max = StringRules.NOTE_MAX) String note,
        @Finite @DecimalMin(value = "1", message = "must be at least 1 Hz")
        @DecimalMax(value = "20000", message = "must be at most 20000 Hz") Double targetHz,
        @Size(max = 4) List<@NotNull @Finite @DecimalMin(value = "1", inclusive = false)
                @DecimalMax("100") Double> ratios,
        @Valid Limits limits,
        @Finite @DecimalMin("0.01") @DecimalMax("50") Double toleranceCents,
        @Min(1) @Max(2000) Integer maxEvaluations) implements CrossFieldChecked.Rules {

    static final List<Double> MARIMBA_RATIOS = List.of(4.0, 10.0);
    static final double DEFAULT_TOLERANCE_CENTS = 0.5;
    static final int DEFAULT_MAX_EVALUATIONS = 400;

    /**
     * The maker's limits. Defaults: 20 % of the blank's thickness left at the thinnest, flat ends of
     * 15 % of the length each, the length fixed (give minLengthMm and maxLengthMm to let it vary).
     */
    record Limits(
            @Finite @DecimalMin(value = "0", inclusive = false) @DecimalMax("1000") Double minimumThicknessMm,
            @Finite @DecimalMin("0") @DecimalMax("5000") Double flatEndMm,
            @Finite @DecimalMin(value = "0", inclusive = false) @DecimalMax("10000") Double minLengthMm,
            @Finite @DecimalMin(value = "0", inclusive = false) @DecimalMax("10000") Double maxLengthMm) {
    }

    List<Double> ratiosOrDefault() {
        return ratios == null ? MARIMBA_RATIOS : ratios;
    }

    double blankThicknessMm() {
        if (bar.profile() != null) {
            return bar.profile().stream().mapToDouble(BarAnalysisRequest.ProfilePoint::thicknessMm).max().orElseThrow();
        }
        return bar.thicknessMm();
    }

    double minimumThicknessMm() {
        return limits != null && limits.minimumThicknessMm() != null ? limits.minimumThicknessMm()
                : 0.2 * blankThicknessMm();
    }

    double flatEndMm() {
        return limits != null && limits.flatEndMm() != null ? limits.flatEndMm() : 0.15 * bar.lengthMm();
    }

    double minLengthMm() {
        return limits != null && limits.minLengthMm() != null ? limits.minLengthMm() : bar.lengthMm();
    }

    double maxLengthMm() {
        return limits != null && limits.maxLengthMm() != null ? limits.maxLengthMm() : bar.lengthMm();
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        StringRules.pitch(out, "", note, targetHz);
        if (ratios != null) {
            for (int i = 1; i < ratios.size(); i++) {
                if (ratios.get(i) != null && ratios.get(i - 1) != null && !(ratios.get(i) > ratios.get(i - 1))) {
                    out.add(new FieldProblem("ratios[" + i + "]", "must be greater than the ratio before it"));
                }
            }
        }
        if (bar == null || bar.section() == null || bar.lengthMm() == null || !Double.isFinite(bar.lengthMm())) {
            return out;
        }
        if (bar.section() != SectionShape.RECTANGLE) {
            out.add(new FieldProblem("bar.section", "must be \"rectangle\": only a rectangular bar is undercut"));
            return out;
        }
        if (bar.thicknessMm() == null && bar.profile() == null) {
            return out; // the bar's own rules name it
        }
        double t0;
        try {
            t0 = blankThicknessMm();
        } catch (RuntimeException e) {
            return out; // a bad profile is named by the bar's own rules
        }
        if (!(minimumThicknessMm() < t0)) {
            out.add(new FieldProblem("limits.minimumThicknessMm", "must be less than the blank's thickness (" + t0
                    + " mm)"));
        }
        if (!(minLengthMm() <= bar.lengthMm() && bar.lengthMm() <= maxLengthMm())) {
            out.add(new FieldProblem("limits.maxLengthMm", "minLengthMm..maxLengthMm must hold the bar's lengthMm ("
                    + bar.lengthMm() + " mm)"));
        }
        if (!(2 * flatEndMm() < minLengthMm())) {
            out.add(new FieldProblem("limits.flatEndMm", "two flat ends of " + flatEndMm()
                    + " mm leave no room for an undercut in " + minLengthMm() + " mm"));
        }
        return out;
    }
}
