package org.nodewright.inverse;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.nodewright.physics.plates.PlateSolver;
import org.nodewright.plates.PlateAnalysisRequest;
import org.nodewright.strings.StringRules;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * A plate thickness solve: the plate as the plate bench sends it, the modes to tune (the n-th lowest flexural mode,
 * to a note or Hz), which thicknesses and brace heights may change, within which limits (mm), when to stop.
 * Defaults: carving only removes wood (each unknown's upper limit is its value now), down to half the thickness or
 * a third of a brace's height; 0.5 cent; 200 evaluations.
 */
@CrossFieldChecked
record PlateThicknessRequest(
        @NotNull @Valid PlateAnalysisRequest plate,
        @NotNull @Size(min = 1, max = MAX_TARGETS) List<@NotNull @Valid Target> targets,
        @NotNull @Valid Unknowns unknowns,
        @Valid Limits limits,
        @Finite @DecimalMin("0.01") @DecimalMax("50") Double toleranceCents,
        @Min(1) @Max(1000) Integer maxEvaluations) implements CrossFieldChecked.Rules {

    static final int MAX_TARGETS = 6;
    static final double DEFAULT_TOLERANCE_CENTS = 0.5;
    static final int DEFAULT_MAX_EVALUATIONS = 200;

    /** The n-th lowest flexural mode (from 1) to a note or a frequency. */
    record Target(
            @NotNull @Min(1) @Max(PlateSolver.MAX_MODES) Integer mode,
            @Size(max = StringRules.NOTE_MAX) String note,
            @Finite @DecimalMin(value = "1", message = "must be at least 1 Hz")
            @DecimalMax(value = "20000", message = "must be at most 20000 Hz") Double targetHz) {
    }

    /** What may change: the uniform thickness, graduation points (indexes into plate.thicknessPoints), braces. */
    record Unknowns(
            Boolean thickness,
            @Size(max = PlateAnalysisRequest.MAX_THICKNESS_POINTS) List<@NotNull @Min(0) Integer> thicknessPoints,
            @Size(max = PlateAnalysisRequest.MAX_BRACES) List<@NotNull @Min(0) Integer> braceHeights) {

        List<Integer> pointsOrEmpty() {
            return thicknessPoints == null ? List.of() : thicknessPoints;
        }

        List<Integer> bracesOrEmpty() {
            return braceHeights == null ? List.of() : braceHeights;
        }
    }

    /** The maker's limits, mm. */
    record Limits(
            @Finite @DecimalMin(value = "0", inclusive = false) @DecimalMax("200") Double minThicknessMm,
            @Finite @DecimalMin(value = "0", inclusive = false) @DecimalMax("200") Double maxThicknessMm,
            @Finite @DecimalMin(value = "0", inclusive = false) @DecimalMax("500") Double minBraceHeightMm,
            @Finite @DecimalMin(value = "0", inclusive = false) @DecimalMax("500") Double maxBraceHeightMm) {
    }

    double toleranceOrDefault() {
        return toleranceCents == null ? DEFAULT_TOLERANCE_CENTS : toleranceCents;
    }

    int maxEvaluationsOrDefault() {
        return maxEvaluations == null ? DEFAULT_MAX_EVALUATIONS : maxEvaluations;
    }

    /** Lower thickness limit for an unknown whose value now is {@code nowMm}. */
    double minThicknessMm(double thinnestNowMm) {
        return limits != null && limits.minThicknessMm() != null ? limits.minThicknessMm() : 0.5 * thinnestNowMm;
    }

    double maxThicknessMm(double thickestNowMm) {
        return limits != null && limits.maxThicknessMm() != null ? limits.maxThicknessMm() : thickestNowMm;
    }

    double minBraceHeightMm(double lowestNowMm) {
        return limits != null && limits.minBraceHeightMm() != null ? limits.minBraceHeightMm() : lowestNowMm / 3;
    }

    double maxBraceHeightMm(double highestNowMm) {
        return limits != null && limits.maxBraceHeightMm() != null ? limits.maxBraceHeightMm() : highestNowMm;
    }

    /** Thicknesses now of the unknowns, mm (uniform thickness or the chosen points); empty when none. */
    List<Double> thicknessesNow() {
        List<Double> out = new ArrayList<>();
        if (Boolean.TRUE.equals(unknowns.thickness()) && plate.thicknessMm() != null) {
            out.add(plate.thicknessMm());
        }
        if (plate.thicknessPoints() != null) {
            for (Integer i : unknowns.pointsOrEmpty()) {
                if (i != null && i < plate.thicknessPoints().size()) {
                    out.add(plate.thicknessPoints().get(i).thicknessMm());
                }
            }
        }
        return out;
    }

    List<Double> braceHeightsNow() {
        List<Double> out = new ArrayList<>();
        for (Integer i : unknowns.bracesOrEmpty()) {
            if (i != null && i < plate.bracesOrEmpty().size()) {
                out.add(plate.bracesOrEmpty().get(i).heightMm());
            }
        }
        return out;
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        if (targets != null) {
            Set<Integer> modes = new HashSet<>();
            for (int i = 0; i < targets.size(); i++) {
                Target t = targets.get(i);
                if (t == null) {
                    continue;
                }
                StringRules.pitch(out, "targets[" + i + "].", t.note(), t.targetHz());
                if (t.mode() != null && !modes.add(t.mode())) {
                    out.add(new FieldProblem("targets[" + i + "].mode", "mode " + t.mode() + " has a target already"));
                }
            }
        }
        if (unknowns == null || plate == null) {
            return out;
        }
        boolean any = Boolean.TRUE.equals(unknowns.thickness()) || !unknowns.pointsOrEmpty().isEmpty()
                || !unknowns.bracesOrEmpty().isEmpty();
        if (!any) {
            out.add(new FieldProblem("unknowns", "choose at least one unknown: thickness, thicknessPoints or braceHeights"));
        }
        boolean graduated = plate.thicknessPoints() != null && !plate.thicknessPoints().isEmpty();
        if (Boolean.TRUE.equals(unknowns.thickness()) && graduated) {
            out.add(new FieldProblem("unknowns.thickness",
                    "the plate is graduated: choose its thicknessPoints instead of one thickness"));
        }
        indexes(out, "unknowns.thicknessPoints", unknowns.pointsOrEmpty(),
                plate.thicknessPoints() == null ? 0 : plate.thicknessPoints().size(), "thickness point");
        indexes(out, "unknowns.braceHeights", unknowns.bracesOrEmpty(), plate.bracesOrEmpty().size(), "brace");
        try {
            List<Double> thick = thicknessesNow();
            if (!thick.isEmpty()) {
                double lo = minThicknessMm(thick.stream().mapToDouble(Double::doubleValue).min().orElseThrow());
                double hi = maxThicknessMm(thick.stream().mapToDouble(Double::doubleValue).max().orElseThrow());
                if (!(lo <= hi)) {
                    out.add(new FieldProblem("limits.maxThicknessMm", "must be at least minThicknessMm (" + lo + " mm)"));
                } else if (thick.stream().anyMatch(t -> t < lo || t > hi)) {
                    out.add(new FieldProblem("limits.minThicknessMm", "the plate's thicknesses now (" + thick
                            + " mm) must lie within " + lo + " .. " + hi + " mm"));
                }
            }
            List<Double> heights = braceHeightsNow();
            if (!heights.isEmpty()) {
                double lo = minBraceHeightMm(heights.stream().mapToDouble(Double::doubleValue).min().orElseThrow());
                double hi = maxBraceHeightMm(heights.stream().mapToDouble(Double::doubleValue).max().orElseThrow());
                if (!(lo <= hi)) {
                    out.add(new FieldProblem("limits.maxBraceHeightMm", "must be at least minBraceHeightMm (" + lo
                            + " mm)"));
                } else if (heights.stream().anyMatch(h -> h < lo || h > hi)) {
                    out.add(new FieldProblem("limits.minBraceHeightMm", "the chosen braces' heights now (" + heights
                            + " mm) must lie within " + lo + " .. " + hi + " mm"));
                }
            }
        } catch (RuntimeException e) {
            return out; // a field that is bad on its own: its own constraint speaks
        }
        return out;
    }

    private static void indexes(List<FieldProblem> out, String field, List<Integer> chosen, int size, String what) {
        Set<Integer> seen = new HashSet<>();
        for (int i = 0; i < chosen.size(); i++) {
            Integer k = chosen.get(i);
            if (k == null) {
                continue;
            }
            if (k >= size) {
                out.add(new FieldProblem(field + "[" + i + "]", "the plate has no " + what + " " + k + " (it has "
                        + size + ", counted from 0)"));
            } else if (!seen.add(k)) {
                out.add(new FieldProblem(field + "[" + i + "]", what + " " + k + " is chosen twice"));
            }
        }
    }
}
