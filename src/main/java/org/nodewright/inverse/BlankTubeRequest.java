package org.nodewright.inverse;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.aircolumns.AirColumnRules;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * Holes for a blank tube: the bore as the bore bench sends it but with no holes, how many holes to
 * make and the wall they go through, the fingering chart (closedHoles index the holes to be made,
 * hole 0 nearest the input), the maker's limits and when to stop. Defaults differ from the
 * tone-hole solve where a blank asks for it: diameters vary, the foot may be cut but not lengthened
 * (maxFootMm defaults to the blank's last section), and the tolerance is {@value #DEFAULT_TOLERANCE_CENTS} cents.
 */
@CrossFieldChecked
record BlankTubeRequest(
        @NotNull @Valid AirColumnRequest bore,
        @NotNull @Min(1) @Max(MAX_HOLES) Integer holeCount,
        @NotNull @Finite @PositiveOrZero @DecimalMax("200") Double chimneyMm,
        @NotNull @Size(min = 1, max = AirColumnRequest.MAX_FINGERINGS)
        List<AirColumnRequest.@NotNull @Valid FingeringSpec> fingerings,
        @Size(min = 1, max = MAX_STARTS) List<@NotNull @Finite @Positive @DecimalMax("2000") Double> startDiametersMm,
        @Valid ToneHoleSolveRequest.Limits limits,
        @Finite @DecimalMin("0.01") @DecimalMax("50") Double toleranceCents,
        @Min(1) @Max(5000) Integer maxEvaluationsPerStart,
        @Valid MouthLimits mouthLimits) implements CrossFieldChecked.Rules {

    /**
     * Whether the solve may also move the player's end, and within what: the headspace (a window's
     * or an embouchure's; default 0 mm up to the bore's input diameter, or the given headspace if
     * longer) and a window's length along the bore (default 50 %..150 % of the given length). Bounds
     * only count with their {@code vary} switch on.
     */
    record MouthLimits(
            Boolean varyHeadspace,
            @Finite @PositiveOrZero @DecimalMax("2000") Double minHeadspaceMm,
            @Finite @PositiveOrZero @DecimalMax("2000") Double maxHeadspaceMm,
            Boolean varyWindowLength,
            @Finite @Positive @DecimalMax("500") Double minWindowLengthMm,
            @Finite @Positive @DecimalMax("500") Double maxWindowLengthMm) {
    }

    /** The same request with other mouth limits (the demo's, a test's). */
    BlankTubeRequest withMouthLimits(MouthLimits m) {
        return new BlankTubeRequest(bore, holeCount, chimneyMm, fingerings, startDiametersMm, limits, toleranceCents,
                maxEvaluationsPerStart, m);
    }

    static final int MAX_HOLES = 16;
    static final int MAX_STARTS = 8;
    static final double DEFAULT_TOLERANCE_CENTS = 3.0;
    static final int DEFAULT_MAX_EVALUATIONS_PER_START = 500;
    /** Starting diameters as fractions of the bore, tried in this order (common practice: holes of half the bore). */
    static final double[] DEFAULT_START_FRACTIONS = {0.5, 0.62, 0.4, 0.72};

    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        if (bore == null) {
            return out;
        }
        if (!bore.holesOrEmpty().isEmpty()) {
            out.add(new FieldProblem("bore.holes", "a blank tube has no holes yet: leave holes out "
                    + "(to move holes already drilled use /api/v1/inverse/tone-holes)"));
        }
        if (!bore.fingeringsOrEmpty().isEmpty()) {
            out.add(new FieldProblem("bore.fingerings", "give the fingering chart as fingerings beside the bore"));
        }
        if (fingerings != null && holeCount != null && holeCount >= 1 && holeCount <= MAX_HOLES) {
            AirColumnRules.fingerings(out, "", fingerings, holeCount);
        }
        BlankTubeSetup.problems(out, this);
        BlankTubeSetup.mouthProblems(out, this);
        return out;
    }

    ToneHoleSolveRequest.Limits limitsOrNone() {
        return limits == null ? ToneHoleSolveRequest.Limits.NONE : limits;
    }

    double toleranceOrDefault() {
        return toleranceCents == null ? DEFAULT_TOLERANCE_CENTS : toleranceCents;
    }

    int evaluationsOrDefault() {
        return maxEvaluationsPerStart == null ? DEFAULT_MAX_EVALUATIONS_PER_START : maxEvaluationsPerStart;
    }
}
