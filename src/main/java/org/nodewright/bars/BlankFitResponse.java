package org.nodewright.bars;

import java.util.List;

/**
 * Answer of {@code POST /api/v1/bars/measure-blank} (and its recording twin): the fitted moduli,
 * each mode heard beside the fitted model, and {@code bar}: the request's bar with the fitted
 * {@code youngsModulusPa} (and {@code shearModulusPa}) written in, ready to analyse or save.
 *
 * @param peaks the recording's spectral peaks (null for typed frequencies)
 */
public record BlankFitResponse(
        double youngsModulusPa,
        double shearModulusPa,
        boolean shearFitted,
        double densityKgPerM3,
        double startYoungsModulusPa,
        double startShearModulusPa,
        double rmsCents,
        List<MatchJson> matches,
        List<PeakJson> peaks,
        BarAnalysisRequest bar,
        List<String> cautions) {

    /** One mode heard and the fitted model's frequency. */
    public record MatchJson(int n, double measuredHz, double modelHz, double centsOff) {
    }

    /** A spectral peak of the recording. */
    public record PeakJson(double frequencyHz, double levelDb) {
    }
}
