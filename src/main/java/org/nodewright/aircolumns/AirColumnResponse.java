package org.nodewright.aircolumns;

import java.util.List;
import org.nodewright.web.ChartPrecision;
import tools.jackson.databind.annotation.JsonSerialize;

/**
 * The answer of {@code POST /api/v1/air-columns/analyze}. Contract fields: speedOfSoundMps,
 * resonances[n, frequencyHz, q, pressureNodesMm, pressureAntinodesMm], impedance. The others are
 * additions: air properties, notes, register alignment, profiles, fingerings and warnings.
 */
public record AirColumnResponse(
        double speedOfSoundMps,
        Air air,
        List<ResonanceItem> resonances,
        Impedance impedance,
        String series,
        List<Profile> profiles,
        List<FingeringItem> fingerings,
        List<String> warnings,
        Mouth mouth) {

    /**
     * The room's air (SI); with a breath, {@code alongBore} gives the air inside at evenly spaced
     * points from the input to the output end (null without a breath).
     */
    public record Air(double temperatureC, double relativeHumidityPct, double densityKgPerM3, double viscosityPaS,
            double thermalConductivityWPerMK, double ratioOfSpecificHeats, double specificHeatJPerKgK,
            List<AirAlongBore> alongBore) {
    }

    /** The air inside at one point of the bore while playing. */
    public record AirAlongBore(double xMm, double temperatureC, double relativeHumidityPct, double co2Pct,
            double speedOfSoundMps, double densityKgPerM3, double viscosityPaS, double thermalConductivityWPerMK,
            double ratioOfSpecificHeats) {
    }

    /**
     * What the mouth does: {@code endCorrectionMm}, the bare cylinder of the first segment's input
     * diameter that shifts the lowest resonance as the mouth does; each resonance against the same
     * bore with a bare input end; the cup's Helmholtz frequency (cup only) and, for a reed on a
     * diverging first segment, the volume of the cone's missing apex (null otherwise).
     */
    public record Mouth(String kind, Double endCorrectionMm, List<MouthResonance> resonances, Double helmholtzHz,
            Double missingApexVolumeMm3) {
    }

    /** One resonance with the mouth, the bare bore's, and the shift in cents. */
    public record MouthResonance(int n, double frequencyHz, Double withoutMouthHz, Double cents) {
    }

    /** Nearest equal-tempered note. */
    public record Note(String name, double centsOff) {
    }

    /**
     * One resonance. {@code q} is null when the peak has no finite bandwidth (lossless and
     * non-radiating). {@code ratioToFirst}, {@code seriesMember} and {@code centsFromSeries} give
     * the register alignment against the series named in the response's {@code series}.
     */
    public record ResonanceItem(int n, double frequencyHz, Double q, Double magnitude, Note note,
            double ratioToFirst, int seriesMember, double centsFromSeries, List<Double> pressureNodesMm,
            List<Double> pressureAntinodesMm, Double mouthCents) {
    }

    /** Input impedance / (rho c / S_input): magnitude and phase on the requested grid. */
    public record Impedance(double[] frequencyHz, double[] magnitude, double[] phaseRad) {
    }

    /**
     * Signed standing-wave shapes (largest magnitude 1) of pressure and volume flow at resonance n,
     * chart samples written to six significant digits ({@link ChartPrecision}).
     */
    public record Profile(int n, double frequencyHz, @JsonSerialize(using = ChartPrecision.class) double[] xMm,
            @JsonSerialize(using = ChartPrecision.class) double[] pressure,
            @JsonSerialize(using = ChartPrecision.class) double[] flow) {
    }

    /** A fingering's predicted pitch (null fields when its register was not found in range). */
    public record FingeringItem(int index, String name, List<Integer> closedHoles, double targetHz, int register,
            Double predictedHz, Double centsFromTarget, Note note, Double q) {
    }
}
