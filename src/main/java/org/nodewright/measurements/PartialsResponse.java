package org.nodewright.measurements;

import java.util.List;
import org.nodewright.physics.measure.FittedPartial;
import org.nodewright.physics.measure.PartialFit;

/**
 * Answer of the partials endpoints (contract "Measured partials"): the matched peaks with their
 * residuals and the fitted f_n = n·f1·√(1+B·n²). {@code sampleRateHz} is null for a CSV table.
 */
record PartialsResponse(Double sampleRateHz, Double durationSeconds, String source, List<Peak> peaks, Fit fit,
        String method) {

    static final String METHOD = "Onset-aligned falling half of a 4-term Blackman-Harris window (Harris 1978), "
            + "zero-padded FFT (Hipparchus), quadratic interpolation of the log magnitude (Smith & Serra 1987), "
            + "mode numbers by walking the stiff-string series, Levenberg-Marquardt fit of f1 and B in cents "
            + "(Fletcher 1964, eq. 11)";

    record Peak(int n, double frequencyHz, Double levelDb, double fittedHz, double residualCents, boolean usedInFit) {
    }

    record Fit(double f1Hz, double inharmonicityB, double rmsCents, double fundamentalHz, Double f1StdErrorHz,
            Double inharmonicityBStdError, int partialsUsed) {
    }

    static PartialsResponse of(Double sampleRateHz, Double durationSeconds, String source, PartialFit fit,
            boolean levelsKnown) {
        List<Peak> peaks = fit.partials().stream()
                .map((FittedPartial p) -> new Peak(p.n(), p.frequencyHz(), levelsKnown ? p.levelDb() : null, p.fittedHz(),
                        p.residualCents(), p.usedInFit()))
                .toList();
        int used = (int) fit.partials().stream().filter(FittedPartial::usedInFit).count();
        return new PartialsResponse(sampleRateHz, durationSeconds, source, peaks,
                new Fit(fit.f1Hz(), fit.inharmonicityB(), fit.rmsCents(), fit.fundamentalHz(), finite(fit.f1StdErrorHz()),
                        finite(fit.bStdError()), used),
                METHOD);
    }

    private static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
