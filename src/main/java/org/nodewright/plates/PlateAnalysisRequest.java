package org.nodewright.plates;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.List;
import org.nodewright.physics.plates.EdgeCondition;
import org.nodewright.physics.plates.PlateSolver;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;
import tools.jackson.databind.JsonNode;

/**
 * Body of {@code POST /api/v1/plates/analyze}; lengths in mm, moduli in Pa, x along the grain.
 * {@code outline} is the word "rectangle" (with lengthMm, widthMm) or a polygon [[xMm, yMm], ...];
 * {@code mirrorHalf} true mirrors a half outline drawn from the centre line y = 0 round one side back to it.
 * {@code thicknessPoints} (optional) is a graduation that replaces the uniform {@code thicknessMm}.
 * Defaults: outline "rectangle", edges "free", no braces, modeCount 10.
 */
@CrossFieldChecked
public record PlateAnalysisRequest(
        JsonNode outline,
        Boolean mirrorHalf,
        @Finite @DecimalMin(value = "1", message = "must be at least 1 mm")
        @DecimalMax(value = "10000", message = "must be at most 10000 mm") Double lengthMm,
        @Finite @DecimalMin(value = "1", message = "must be at least 1 mm")
        @DecimalMax(value = "10000", message = "must be at most 10000 mm") Double widthMm,
        @Finite @DecimalMin(value = "0", inclusive = false, message = "must be more than 0 mm")
        @DecimalMax(value = "200", message = "must be at most 200 mm") Double thicknessMm,
        @Valid @Size(max = MAX_THICKNESS_POINTS) List<@NotNull @Valid ThicknessPoint> thicknessPoints,
        @Size(max = 64) String material,
        @Finite @DecimalMin(value = "1", message = "must be at least 1 kg/m3")
        @DecimalMax(value = "30000", message = "must be at most 30000 kg/m3") Double densityKgPerM3,
        @Finite @DecimalMin(value = "1e5", message = "must be at least 1e5 Pa")
        @DecimalMax(value = "1e13", message = "must be at most 1e13 Pa") Double elasticAlongPa,
        @Finite @DecimalMin(value = "1e5", message = "must be at least 1e5 Pa")
        @DecimalMax(value = "1e13", message = "must be at most 1e13 Pa") Double elasticAcrossPa,
        @Finite @DecimalMin(value = "1e4", message = "must be at least 1e4 Pa")
        @DecimalMax(value = "1e13", message = "must be at most 1e13 Pa") Double shearPa,
        @Finite @DecimalMin(value = "-0.99", message = "must be at least -0.99")
        @DecimalMax(value = "10", message = "must be at most 10") Double poissonAlongAcross,
        EdgeCondition edges,
        @Valid @Size(max = MAX_BRACES) List<@NotNull @Valid BraceJson> braces,
        @Min(1) @Max(PlateSolver.MAX_MODES) Integer modeCount) implements CrossFieldChecked.Rules {

    public static final int DEFAULT_MODE_COUNT = 10;
    public static final int MAX_OUTLINE_POINTS = 2000;
    public static final int MAX_BRACES = 32;
    public static final int MAX_THICKNESS_POINTS = 64;

    /** A brace glued on one face, of the plate's material. */
    public record BraceJson(
            @NotNull @Size(min = 2, max = 2, message = "must be [x, y] in mm") List<@NotNull @Finite Double> fromMm,
            @NotNull @Size(min = 2, max = 2, message = "must be [x, y] in mm") List<@NotNull @Finite Double> toMm,
            @NotNull @Finite @DecimalMin(value = "0", inclusive = false, message = "must be more than 0 mm")
            @DecimalMax(value = "500", message = "must be at most 500 mm") Double widthMm,
            @NotNull @Finite @DecimalMin(value = "0", inclusive = false, message = "must be more than 0 mm")
            @DecimalMax(value = "500", message = "must be at most 500 mm") Double heightMm) {
    }

    /** A graduation control point. */
    public record ThicknessPoint(
            @NotNull @Finite Double xMm,
            @NotNull @Finite Double yMm,
            @NotNull @Finite @DecimalMin(value = "0", inclusive = false, message = "must be more than 0 mm")
            @DecimalMax(value = "200", message = "must be at most 200 mm") Double thicknessMm) {
    }

    /** The same plate with other thicknesses and braces (the thickness solver's answer), everything else kept. */
    public PlateAnalysisRequest withThicknessAndBraces(Double newThicknessMm, List<ThicknessPoint> newPoints,
            List<BraceJson> newBraces) {
        return new PlateAnalysisRequest(outline, mirrorHalf, lengthMm, widthMm, newThicknessMm, newPoints, material,
                densityKgPerM3, elasticAlongPa, elasticAcrossPa, shearPa, poissonAlongAcross, edges, newBraces, modeCount);
    }

    public int modeCountOrDefault() {
        return modeCount == null ? DEFAULT_MODE_COUNT : modeCount;
    }

    public EdgeCondition edgesOrDefault() {
        return edges == null ? EdgeCondition.FREE : edges;
    }

    public List<BraceJson> bracesOrEmpty() {
        return braces == null ? List.of() : braces;
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        return PlateMapping.problems(this);
    }
}
