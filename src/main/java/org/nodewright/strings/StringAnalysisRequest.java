package org.nodewright.strings;

import static org.nodewright.web.CrossFieldChecked.Rules.usable;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.strings.EndCondition;
import org.nodewright.physics.strings.ExcitationKind;
import org.nodewright.physics.strings.ModeSolver;
import org.nodewright.physics.strings.PickupCombination;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;
import org.nodewright.web.LengthMm;

/**
 * Body of {@code POST /api/v1/strings/analyze}. Lengths in mm, tension in N, SI otherwise.
 * Defaults when omitted: endCondition "pinned", stiffness false, modeCount 12, referenceA4Hz 440,
 * mode n's shape sampled at {@link #chartIntervals(int)} equal intervals unless
 * {@code shapeSamples} asks for a fixed count (the query {@code ?shapes=none} leaves shapes out). Validating the record alone (Bean Validation) finds every problem, cross-field
 * rules included ({@link #crossFieldProblems()}).
 */
@CrossFieldChecked
public record StringAnalysisRequest(
        @NotNull @LengthMm Double lengthMm,
        @Finite @DecimalMin(value = "0.001", message = "must be at least 0.001 N")
        @DecimalMax(value = "100000", message = "must be at most 100000 N") Double tensionN,
        @Finite @DecimalMin(value = "0.01", message = "must be at least 0.01 Hz")
        @DecimalMax(value = "100000", message = "must be at most 100000 Hz") Double targetHz,
        @Finite @DecimalMin(value = "1e-9", message = "must be at least 1e-9 kg/m")
        @DecimalMax(value = "100", message = "must be at most 100 kg/m") Double linearDensityKgPerM,
        @Size(max = StringRules.MATERIAL_ID_MAX) String material,
        @Finite @DecimalMin(value = "0.001", message = "must be at least 0.001 mm")
        @DecimalMax(value = "100", message = "must be at most 100 mm") Double diameterMm,
        @Size(max = StringRules.MATERIAL_ID_MAX) String wrapMaterial,
        @Finite @DecimalMin(value = "0.001", message = "must be at least 0.001 mm")
        @DecimalMax(value = "100", message = "must be at most 100 mm") Double wrapDiameterMm,
        @Finite @DecimalMin(value = "1e3", message = "must be at least 1e3 Pa")
        @DecimalMax(value = "1e13", message = "must be at most 1e13 Pa") Double youngsModulusPa,
        EndCondition endCondition,
        Boolean stiffness,
        @Min(1) @Max(ModeSolver.MAX_MODES) Integer modeCount,
        @Valid Pluck pluck,
        @Valid @Size(max = 16) List<@NotNull @Valid Pickup> pickups,
        PickupCombination pickupCombination,
        @Finite @DecimalMin(value = "100", message = "must be at least 100 Hz")
        @DecimalMax(value = "1000", message = "must be at most 1000 Hz") Double referenceA4Hz,
        @Min(2) @Max(2001) Integer shapeSamples) implements CrossFieldChecked.Rules {

    public static final int DEFAULT_MODE_COUNT = 12;
    public static final int MIN_CHART_INTERVALS = 24;
    public static final int MAX_CHART_INTERVALS = 200;
    public static final double DEFAULT_A4_HZ = EqualTemperament.ISO_16_A4_HZ;

    /**
     * What an omitted top-level field means (JSON names and words), for comparing saved designs
     * by their effective values: the same defaults the methods below apply.
     */
    public static final java.util.Map<String, Object> DEFAULTS = java.util.Map.of("referenceA4Hz", DEFAULT_A4_HZ,
            "modeCount", DEFAULT_MODE_COUNT, "stiffness", false, "endCondition", "pinned");

    /** Where and how the string is set in motion. */
    public record Pluck(@NotNull @Finite Double positionMm, ExcitationKind kind) {
        public ExcitationKind kindOrDefault() {
            return kind == null ? ExcitationKind.PLUCK : kind;
        }
    }

    /** A sensor: aperture centre from the nut and width (0 = point sensor). */
    public record Pickup(@NotNull @Finite Double positionMm,
            @Finite @PositiveOrZero @DecimalMax(value = "100000") Double apertureMm) {
        public double apertureOrZero() {
            return apertureMm == null ? 0 : apertureMm;
        }
    }

    public boolean stiffnessOn() {
        return Boolean.TRUE.equals(stiffness);
    }

    public EndCondition endOrDefault() {
        return endCondition == null ? EndCondition.PINNED : endCondition;
    }

    public int modeCountOrDefault() {
        return modeCount == null ? DEFAULT_MODE_COUNT : modeCount;
    }

    /** Samples of mode n's shape: {@code shapeSamples} when given, else {@link #chartIntervals(int)} + 1. */
    public int shapeSamplesFor(int n) {
        return shapeSamples == null ? chartIntervals(n) + 1 : shapeSamples;
    }

    /**
     * Equal intervals along the string for mode n by default: six per half-wave, so that the nodes
     * and antinodes of a sine fall on samples and a straight line between samples stays within
     * 3.4 % of the amplitude (1 − cos 15°, under a pixel on the bench's chart rows); at least
     * {@value #MIN_CHART_INTERVALS}, at most {@value #MAX_CHART_INTERVALS} (a chart is a few hundred
     * pixels wide).
     */
    public static int chartIntervals(int n) {
        return Math.min(MAX_CHART_INTERVALS, Math.max(MIN_CHART_INTERVALS, 6 * n));
    }

    public double referenceA4OrDefault() {
        return referenceA4Hz == null ? DEFAULT_A4_HZ : referenceA4Hz;
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        return problems(this);
    }

    /** Every cross-field problem of the request; single-field problems are Bean Validation's. */
    public static List<FieldProblem> problems(StringAnalysisRequest r) {
        List<FieldProblem> out = new ArrayList<>();
        if (r.tensionN == null && r.targetHz == null) {
            out.add(new FieldProblem("tensionN", "give tensionN, or targetHz to solve the tension"));
        } else if (r.tensionN != null && r.targetHz != null) {
            out.add(new FieldProblem("targetHz", "give either tensionN or targetHz, not both"));
        }
        StringRules.material(out, "material", r.material);
        if (r.linearDensityKgPerM == null) {
            if (r.material == null) {
                out.add(new FieldProblem("material", "is required unless linearDensityKgPerM is given"));
            }
            if (r.diameterMm == null) {
                out.add(new FieldProblem("diameterMm", "is required unless linearDensityKgPerM is given"));
            }
        }
        StringRules.wrap(out, "", r.wrapMaterial, r.wrapDiameterMm);
        if (r.stiffnessOn()) {
            if (r.diameterMm == null) {
                out.add(new FieldProblem("diameterMm", "is required when stiffness is true"));
            }
            if (r.youngsModulusPa == null && r.material == null) {
                out.add(new FieldProblem("youngsModulusPa",
                        "is required when stiffness is true and no material is given"));
            }
        }
        Double length = usable(r.lengthMm);
        if (length != null) {
            lengthDependent(out, r, length);
        }
        if (r.pickupCombination != null && (r.pickups == null || r.pickups.size() != 2)) {
            out.add(new FieldProblem("pickupCombination", "needs exactly two pickups"));
        }
        return out;
    }

    private static void lengthDependent(List<FieldProblem> out, StringAnalysisRequest r, double length) {
        if (r.pluck != null && usable(r.pluck.positionMm) != null) {
            double x = r.pluck.positionMm;
            if (!(x > 0 && x < length)) {
                out.add(new FieldProblem("pluck.positionMm",
                        "must lie strictly between the nut (0) and the bridge (" + FieldProblem.figure(length) + " mm)"));
            }
        }
        if (r.pickups == null) {
            return;
        }
        for (int i = 0; i < r.pickups.size(); i++) {
            Pickup p = r.pickups.get(i);
            if (p == null || usable(p.positionMm) == null) {
                continue;
            }
            double x = p.positionMm;
            if (!(x >= 0 && x <= length)) {
                out.add(new FieldProblem("pickups[" + i + "].positionMm",
                        "must lie on the string, between 0 and " + FieldProblem.figure(length) + " mm"));
            } else if (p.apertureMm != null && Double.isFinite(p.apertureMm) && p.apertureMm >= 0
                    && (x - p.apertureMm / 2 < 0 || x + p.apertureMm / 2 > length)) {
                out.add(new FieldProblem("pickups[" + i + "].apertureMm",
                        "reaches past the end of the string"));
            }
        }
    }
}
