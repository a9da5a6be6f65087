package org.nodewright.aircolumns;

import jakarta.validation.Valid;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;
import jakarta.validation.constraints.Size;
import java.util.List;
import org.nodewright.physics.aircolumn.InputEnd;
import org.nodewright.physics.aircolumn.MouthKind;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.tuning.EqualTemperament;
import org.nodewright.web.CrossFieldChecked;
import org.nodewright.web.FieldProblem;
import org.nodewright.web.Finite;

/**
 * The body of {@code POST /api/v1/air-columns/analyze}, also the parameters of a saved air-column
 * design. Lengths in millimetres, frequencies in hertz. Validating this record alone (Bean
 * Validation) finds every problem, cross-field rules included ({@link AirColumnRules}), each
 * reported with its dotted path such as {@code segments[2].lengthMm}.
 *
 * <p>Optional fields and their defaults: {@code holes} none, {@code temperatureC} 20,
 * {@code relativeHumidityPct} 0, {@code losses} true, {@code points} 2000, {@code referenceA4Hz}
 * 440, {@code profileSamples} 201, {@code fingerings} none.
 */
@CrossFieldChecked
public record AirColumnRequest(
        @NotNull @Size(min = 1, max = MAX_SEGMENTS) List<@NotNull @Valid Segment> segments,
        @NotNull InputEnd inputEnd,
        @NotNull OutputEnd outputEnd,
        @Size(max = MAX_HOLES) List<@NotNull @Valid Hole> holes,
        @Finite @DecimalMin("-50") @DecimalMax("60") Double temperatureC,
        @Finite @DecimalMin("0") @DecimalMax("100") Double relativeHumidityPct,
        Boolean losses,
        @NotNull @Finite @Positive @DecimalMax("20000") Double fMinHz,
        @NotNull @Finite @Positive @DecimalMax("20000") Double fMaxHz,
        @Min(2) @Max(MAX_POINTS) Integer points,
        @Finite @DecimalMin("200") @DecimalMax("1000") Double referenceA4Hz,
        @Min(2) @Max(2001) Integer profileSamples,
        @Size(max = MAX_FINGERINGS) List<@NotNull @Valid FingeringSpec> fingerings,
        @Valid MouthSpec mouth,
        @Valid BreathSpec breath) implements CrossFieldChecked.Rules {

    /** The request without a mouth and a breath (the bore alone). */
    public AirColumnRequest(List<Segment> segments, InputEnd inputEnd, OutputEnd outputEnd, List<Hole> holes,
            Double temperatureC, Double relativeHumidityPct, Boolean losses, Double fMinHz, Double fMaxHz,
            Integer points, Double referenceA4Hz, Integer profileSamples, List<FingeringSpec> fingerings) {
        this(segments, inputEnd, outputEnd, holes, temperatureC, relativeHumidityPct, losses, fMinHz, fMaxHz, points,
                referenceA4Hz, profileSamples, fingerings, null, null);
    }

    @Override
    public List<FieldProblem> crossFieldProblems() {
        return AirColumnRules.problems(this);
    }

    public static final int MAX_SEGMENTS = 1000;
    public static final int MAX_HOLES = 64;
    public static final int MAX_POINTS = 20000;
    public static final int MAX_FINGERINGS = 32;
    /** Longest bore accepted, millimetres. */
    public static final double MAX_TOTAL_LENGTH_MM = 20_000;

    /**
     * One bore segment: a cylinder when the diameters are equal, else a conical frustum.
     */
    public record Segment(
            @NotNull @Finite @Positive @DecimalMax("20000") Double lengthMm,
            @NotNull @Finite @Positive @DecimalMax("2000") Double inputDiameterMm,
            @NotNull @Finite @Positive @DecimalMax("2000") Double outputDiameterMm) {
    }

    /** One side hole, positioned by its centre from the input end. {@code open} defaults to true. */
    public record Hole(
            @NotNull @Finite @Positive @DecimalMax("20000") Double positionMm,
            @NotNull @Finite @Positive @DecimalMax("2000") Double diameterMm,
            @NotNull @Finite @PositiveOrZero @DecimalMax("2000") Double chimneyMm,
            Boolean open) {
    }

    /**
     * A fingering: the holes it closes (indices into {@code holes}; all others open), its target
     * as {@code targetHz} or {@code targetNote} ("D5", "F#4", "Bb3"), and the register wanted
     * (1 = the lowest resonance in fMinHz..fMaxHz; default 1).
     */
    public record FingeringSpec(
            @Size(max = 80) String name,
            @NotNull @Size(max = MAX_HOLES) List<@NotNull @Min(0) Integer> closedHoles,
            @Size(max = 16) String targetNote,
            @Finite @Positive @DecimalMax("20000") Double targetHz,
            @Min(1) @Max(16) Integer register) {
    }

    static final double DEFAULT_TEMPERATURE_C = 20.0;
    static final double DEFAULT_HUMIDITY_PCT = 0.0;
    static final int DEFAULT_POINTS = 2000;
    static final int DEFAULT_PROFILE_SAMPLES = 201;

    /** What an omitted top-level field means (JSON names), for comparing saved designs by their effective values. */
    public static final java.util.Map<String, Object> DEFAULTS = java.util.Map.of("temperatureC", DEFAULT_TEMPERATURE_C,
            "relativeHumidityPct", DEFAULT_HUMIDITY_PCT, "losses", true, "points", DEFAULT_POINTS,
            "referenceA4Hz", EqualTemperament.ISO_16_A4_HZ, "profileSamples", DEFAULT_PROFILE_SAMPLES);
    /**
     * The player's end (see the contract's "Mouth ends and breath"): {@code kind} and the fields
     * of that kind, millimetres; fields of other kinds must be absent. Embouchure: the hole as
     * {@code holeDiameterMm} or {@code holeLengthMm} + {@code holeWidthMm}, {@code wallMm},
     * {@code headspaceMm}, {@code lipCoveragePct} (default 0). Window: {@code windowLengthMm},
     * {@code windowWidthMm}, {@code wallMm}, {@code headspaceMm} (default 0). Reed:
     * {@code equivalentVolumeMm3}. Cup: {@code cupVolumeMm3}, {@code throatDiameterMm},
     * {@code throatLengthMm}.
     */
    public record MouthSpec(
            @NotNull MouthKind kind,
            @Finite @Positive @DecimalMax("200") Double holeDiameterMm,
            @Finite @Positive @DecimalMax("200") Double holeLengthMm,
            @Finite @Positive @DecimalMax("200") Double holeWidthMm,
            @Finite @PositiveOrZero @DecimalMax("200") Double wallMm,
            @Finite @PositiveOrZero @DecimalMax("2000") Double headspaceMm,
            @Finite @DecimalMin("0") @DecimalMax("80") Double lipCoveragePct,
            @Finite @Positive @DecimalMax("500") Double windowLengthMm,
            @Finite @Positive @DecimalMax("2000") Double windowWidthMm,
            @Finite @Positive @DecimalMax("1e9") Double equivalentVolumeMm3,
            @Finite @Positive @DecimalMax("1e9") Double cupVolumeMm3,
            @Finite @Positive @DecimalMax("200") Double throatDiameterMm,
            @Finite @Positive @DecimalMax("2000") Double throatLengthMm) {
    }

    /**
     * The air inside while playing: CO2 mole fraction in per cent (0.04 = room air), relative
     * humidity, and the temperature at the input and output ends (linear between); all required.
     */
    public record BreathSpec(
            @NotNull @Finite @DecimalMin("0") @DecimalMax("20") Double co2Pct,
            @NotNull @Finite @DecimalMin("0") @DecimalMax("100") Double relativeHumidityPct,
            @NotNull @Finite @DecimalMin("-50") @DecimalMax("60") Double inputTemperatureC,
            @NotNull @Finite @DecimalMin("-50") @DecimalMax("60") Double outputTemperatureC) {
    }

    public double temperatureOrDefault() {
        return temperatureC == null ? DEFAULT_TEMPERATURE_C : temperatureC;
    }

    public double humidityOrDefault() {
        return relativeHumidityPct == null ? DEFAULT_HUMIDITY_PCT : relativeHumidityPct;
    }

    public boolean lossesOrDefault() {
        return losses == null || losses;
    }

    public int pointsOrDefault() {
        return points == null ? DEFAULT_POINTS : points;
    }

    public double referenceA4OrDefault() {
        return referenceA4Hz == null ? EqualTemperament.ISO_16_A4_HZ : referenceA4Hz;
    }

    public int profileSamplesOrDefault() {
        return profileSamples == null ? DEFAULT_PROFILE_SAMPLES : profileSamples;
    }

    public List<Hole> holesOrEmpty() {
        return holes == null ? List.of() : holes;
    }

    public List<FingeringSpec> fingeringsOrEmpty() {
        return fingerings == null ? List.of() : fingerings;
    }
}
