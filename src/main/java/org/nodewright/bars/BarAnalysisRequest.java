package org.nodewright.bars;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;
import java.util.List;
import org.nodewright.physics.bars.BarAnalyzer;
import org.nodewright.physics.bars.BarEnds;
import org.nodewright.physics.bars.BeamTheory;
import org.nodewright.physics.bars.SectionShape;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * Body of {@code POST /api/v1/bars/analyze}. Lengths in mm, SI otherwise. Defaults when omitted:
 * ends "free-free", theory "timoshenko", modeCount 6, referenceA4Hz 440, otherFamilies true.
 * Validating the record alone finds every problem, cross-field rules included ({@link BarRules}).
 */
@CrossFieldChecked
public record BarAnalysisRequest(
        @NotNull @Finite @DecimalMin(value = "1", message = "must be at least 1 mm")
        @DecimalMax(value = "10000", message = "must be at most 10000 mm") Double lengthMm,
        @NotNull SectionShape section,
        @Finite @DecimalMin(value = "0", inclusive = false, message = "must be greater than 0 mm")
        @DecimalMax(value = "1000", message = "must be at most 1000 mm") Double widthMm,
        @Finite @DecimalMin(value = "0", inclusive = false, message = "must be greater than 0 mm")
        @DecimalMax(value = "1000", message = "must be at most 1000 mm") Double thicknessMm,
        @Finite @DecimalMin(value = "0", inclusive = false, message = "must be greater than 0 mm")
        @DecimalMax(value = "1000", message = "must be at most 1000 mm") Double diameterMm,
        @Finite @DecimalMin(value = "0", inclusive = false, message = "must be greater than 0 mm")
        @DecimalMax(value = "1000", message = "must be at most 1000 mm") Double boreMm,
        @Valid @Size(min = 2, max = MAX_PROFILE_POINTS) List<@NotNull @Valid ProfilePoint> profile,
        @Size(max = 64) String material,
        @Finite @DecimalMin(value = "1", message = "must be at least 1 kg/m³")
        @DecimalMax(value = "30000", message = "must be at most 30000 kg/m³") Double densityKgPerM3,
        @Finite @DecimalMin(value = "1e6", message = "must be at least 1e6 Pa")
        @DecimalMax(value = "1e13", message = "must be at most 1e13 Pa") Double youngsModulusPa,
        @Finite @DecimalMin(value = "1e5", message = "must be at least 1e5 Pa")
        @DecimalMax(value = "1e13", message = "must be at most 1e13 Pa") Double shearModulusPa,
        BarEnds ends,
        BeamTheory theory,
        @Min(1) @Max(BarAnalyzer.MAX_MODES) Integer modeCount,
        @Finite @DecimalMin(value = "100", message = "must be at least 100 Hz")
        @DecimalMax(value = "1000", message = "must be at most 1000 Hz") Double referenceA4Hz,
        Boolean otherFamilies) implements CrossFieldChecked.Rules {

    public static final int DEFAULT_MODE_COUNT = 6;
    public static final int MAX_PROFILE_POINTS = 400;

    /** One point of the thickness along the bar. */
    public record ProfilePoint(
            @NotNull @Finite @DecimalMin(value = "0", message = "must be at least 0 mm")
            @DecimalMax(value = "10000", message = "must be at most 10000 mm") Double positionMm,
            @NotNull @Finite @DecimalMin(value = "0", inclusive = false, message = "must be greater than 0 mm")
            @DecimalMax(value = "1000", message = "must be at most 1000 mm") Double thicknessMm) {
    }

    public BarEnds endsOrDefault() {
        return ends == null ? BarEnds.FREE_FREE : ends;
    }

    public BeamTheory theoryOrDefault() {
        return theory == null ? BeamTheory.TIMOSHENKO : theory;
    }

    public int modeCountOrDefault() {
        return modeCount == null ? DEFAULT_MODE_COUNT : modeCount;
    }

    public double referenceA4OrDefault() {
        return referenceA4Hz == null ? EqualTemperament.ISO_16_A4_HZ : referenceA4Hz;
    }

    public boolean otherFamiliesOn() {
        return otherFamilies == null || otherFamilies;
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        return BarRules.problems(this, "");
    }
}
