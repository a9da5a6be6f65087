package org.nodewright.strings;

import java.util.List;
import org.nodewright.web.ChartPrecision;
import tools.jackson.databind.annotation.JsonSerialize;

/**
 * Answer of {@code POST /api/v1/strings/analyze}: every contract field plus extras for the page
 * (ideal f1, stress fraction, caution, shape samples, pickup outputs and combinations). {@code stressLevel}
 * is "ok", "warning" or "danger" (see {@link StressLevel}), null when the strength is unknown.
 */
public record StringAnalysisResponse(
        double tensionN,
        double linearDensityKgPerM,
        double waveSpeedMps,
        double fundamentalHz,
        double idealFundamentalHz,
        double inharmonicityB,
        Double stressPa,
        Double tensileStrengthPa,
        Double stressFraction,
        List<String> warnings,
        String caution,
        NoteJson note,
        double referenceA4Hz,
        String endCondition,
        boolean stiffness,
        String modeShapes,
        String pickupCombination,
        List<ModeJson> modes,
        String stressLevel) {

    /** Nearest 12-TET note of the sounding f1. */
    public record NoteJson(String name, int midi, double frequencyHz, double centsOff) {
    }

    /**
     * One mode. Positions in mm from the nut ({@code nodesMm}, {@code antinodesMm}, ascending) and
     * from the bridge ({@code nodesFromBridgeMm}, {@code antinodesFromBridgeMm}, ascending from the
     * bridge). {@code pickupOutput} = excitation × gain; {@code combinedResponse} = g1 ± g2.
     * {@code shapeX} (mm) and {@code shape} are chart samples, written to six significant digits
     * ({@link ChartPrecision}); both null for {@code ?shapes=none}.
     */
    public record ModeJson(
            int n,
            double frequencyHz,
            double harmonicHz,
            double centsFromHarmonic,
            List<Double> nodesMm,
            List<Double> antinodesMm,
            List<Double> nodesFromBridgeMm,
            List<Double> antinodesFromBridgeMm,
            Double excitation,
            List<Double> pickupResponse,
            List<Double> pickupOutput,
            Double combinedResponse,
            Double combinedOutput,
            @JsonSerialize(using = ChartPrecision.class) double[] shapeX,
            @JsonSerialize(using = ChartPrecision.class) double[] shape) {
    }
}
