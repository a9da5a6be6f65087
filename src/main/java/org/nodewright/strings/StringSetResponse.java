package org.nodewright.strings;

import java.util.List;

/**
 * Answer of {@code POST /api/v1/string-sets/analyze}. {@code stressLimits} are the shares of the
 * typical strength where {@code stressLevel} turns "warning" and "danger", so that a page can mark
 * them on its drawing without a copy of the limits of its own.
 */
public record StringSetResponse(List<StringJson> strings, double totalTensionN, double totalTensionKgf,
        List<String> warnings, String caution, String neckCaution, StressLimits stressLimits) {

    /** The stress levels' thresholds as shares of the typical strength (0.75 = 75 %). */
    public record StressLimits(double warningFraction, double dangerFraction) {
    }

    /** One string: its tension at pitch, stress (and its {@link StressLevel} word) and nearest note. */
    public record StringJson(int index, String label, double lengthMm, double targetHz, double tensionN,
            double tensionKgf, double linearDensityKgPerM, double stressPa, double tensileStrengthPa,
            double stressFraction, List<String> warnings, StringAnalysisResponse.NoteJson note, String stressLevel) {
    }
}
