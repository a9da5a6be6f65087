package org.nodewright.inverse;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.aircolumns.AirColumnRequest;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * A tone-hole solve: the bore as the bore bench sends it, whose {@code holes} are the starting
 * layout and whose {@code fingerings} are the targets; the maker's limits; when to stop.
 */
@CrossFieldChecked
record ToneHoleSolveRequest(
        @NotNull @Valid AirColumnRequest bore,
        @Valid Limits limits,
        @Finite @DecimalMin("0.001") @DecimalMax("50") Double toleranceCents,
        @Min(1) @Max(5000) Integer maxEvaluations) implements CrossFieldChecked.Rules {

    @Override
    public List<FieldProblem> crossFieldProblems() {
        List<FieldProblem> out = new ArrayList<>();
        if (bore != null) {
            ToneHoleSolveSetup.problems(out, bore, limitsOrNone());
        }
        return out;
    }

    static final double DEFAULT_TOLERANCE_CENTS = 0.1;
    static final int DEFAULT_MAX_EVALUATIONS = 600;

    /**
     * The maker's limits; every field optional. Defaults: holes at least 10 % of the bore from the
     * input end and 5 mm from the output end, 2 mm of wall between neighbouring holes, diameters
     * 2 mm to the bore diameter (only when {@code varyDiameters}), foot 50 % to 150 % of its length
     * (only when {@code varyFoot}).
     */
    record Limits(
            @Finite @PositiveOrZero @DecimalMax("20000") Double minPositionMm,
            @Finite @PositiveOrZero @DecimalMax("20000") Double endMarginMm,
            @Finite @PositiveOrZero @DecimalMax("1000") Double minWallMm,
            @Finite @Positive @DecimalMax("2000") Double minDiameterMm,
            @Finite @Positive @DecimalMax("2000") Double maxDiameterMm,
            Boolean varyDiameters,
            Boolean varyFoot,
            @Finite @Positive @DecimalMax("20000") Double minFootMm,
            @Finite @Positive @DecimalMax("20000") Double maxFootMm) {

        static final Limits NONE = new Limits(null, null, null, null, null, null, null, null, null);
    }

    double toleranceOrDefault() {
        return toleranceCents == null ? DEFAULT_TOLERANCE_CENTS : toleranceCents;
    }

    int maxEvaluationsOrDefault() {
        return maxEvaluations == null ? DEFAULT_MAX_EVALUATIONS : maxEvaluations;
    }

    Limits limitsOrNone() {
        return limits == null ? Limits.NONE : limits;
    }
}
