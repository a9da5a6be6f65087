package org.nodewright.physics.measure;

import java.util.List;

/**
 * From a recording of a plucked string or a struck bar to its fitted partial series: spectral
 * peaks ({@link PeakFinder}), mode numbers ({@link PartialMatcher}), then f1 and B
 * ({@link StiffStringFit}).
 */
public final class PartialAnalyzer {

    /** Default highest mode number matched. */
    public static final int DEFAULT_MAX_PARTIALS = 40;
    /** Peaks kept per partial sought: room for noise peaks and unrelated resonances. */
    private static final int PEAKS_PER_PARTIAL = 4;

    private PartialAnalyzer() {
    }

    /**
     * @param recording     the recording
     * @param expectedF1Hz  expected f1, or null to estimate it
     * @param maxPartials   highest mode number to match, 1 … 200
     * @throws UnreadableInputException when too few partials are found to fit
     */
    public static PartialFit analyze(MonoRecording recording, Double expectedF1Hz, int maxPartials) {
        checkMaxPartials(maxPartials);
        List<SpectralPeak> peaks = PeakFinder.find(recording, Math.max(64, PEAKS_PER_PARTIAL * maxPartials));
        return fitPeaks(peaks, expectedF1Hz, maxPartials);
    }

    /** Matches and fits already measured peaks (a CSV of frequencies without mode numbers). */
    public static PartialFit fitPeaks(List<SpectralPeak> peaks, Double expectedF1Hz, int maxPartials) {
        checkMaxPartials(maxPartials);
        List<MatchedPartial> matched = PartialMatcher.match(peaks, expectedF1Hz, maxPartials);
        if (matched.size() < 2) {
            throw new UnreadableInputException("found " + matched.size() + " partial(s) of a harmonic series in "
                    + peaks.size() + " spectral peak(s): at least two are needed to fit f1 and B");
        }
        return StiffStringFit.fit(matched);
    }

    private static void checkMaxPartials(int maxPartials) {
        if (maxPartials < 1 || maxPartials > 200) {
            throw new IllegalArgumentException("maxPartials must be 1 to 200, got " + maxPartials);
        }
    }
}
