package org.nodewright.measurements;

import java.util.List;

/** Answer of {@code POST /api/v1/measurements/peaks}: the recording's strongest spectral peaks, ascending in frequency. */
record PeaksResponse(double sampleRateHz, double durationSeconds, List<Peak> peaks) {

    /** Peaks returned unless maxPeaks is sent. */
    static final int DEFAULT_PEAKS = 12;
    /** Peaks searched before the band and count are applied. */
    static final int SEARCHED = 400;

    record Peak(double frequencyHz, double levelDb) {
    }
}
