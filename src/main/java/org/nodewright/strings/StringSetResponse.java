package org.nodewright.strings;

import java.util.List;

/** Answer of {@code POST /api/v1/string-sets/analyze}. */
public record StringSetResponse(List<StringJson> strings, double totalTensionN, double totalTensionKgf,
        List<String> warnings, String caution, String neckCaution) {

    /** One string: its tension at pitch, stress (and its {@link StressLevel} word) and nearest note. */
    public record StringJson(int index, String label, double lengthMm, double targetHz, double tensionN,
            double tensionKgf, double linearDensityKgPerM, double stressPa, double tensileStrengthPa,
            double stressFraction, List<String> warnings, StringAnalysisResponse.NoteJson note, String stressLevel) {
    }
}
