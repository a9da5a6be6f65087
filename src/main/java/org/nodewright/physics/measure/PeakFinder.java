package org.nodewright.physics.measure;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

/**
 * Finds the spectral peaks of a recording: from the onset, a Blackman–Harris window, zero-padding
 * to at least twice the next power of two, Hipparchus' radix-2 FFT, local maxima above the noise
 * floor, and each peak refined by quadratic interpolation of the log magnitude through the
 * highest bin and its two neighbours (J. O. Smith and X. Serra, "PARSHL", Proc. ICMC 1987; also
 * T. Grandke, IEEE Trans. Instrum. Meas. 32, 1983).
 */
public final class PeakFinder {

    /** Longest stretch analysed (2^20 samples, about 22 s at 48 kHz): a pluck has died away by then. */
    public static final int MAX_ANALYSIS_SAMPLES = 1 << 20;
    /** Shortest recording worth analysing: 4096 samples (85 ms at 48 kHz). */
    public static final int MIN_ANALYSIS_SAMPLES = 4096;
    /** Zero-padding factor over the next power of two: halves the interpolation bias of a bare FFT. */
    private static final int PADDING = 2;
    /** A peak must stand this far above the median spectrum level (the noise floor), in dB: noise peaks reach about 20 dB above it. */
    private static final double FLOOR_MARGIN_DB = 25.0;
    /** … and no further than this below the strongest peak, in dB. */
    private static final double DYNAMIC_RANGE_DB = 100.0;
    /** The onset is the first sample reaching this fraction of the recording's peak (common practice). */
    private static final double ONSET_FRACTION = 0.1;
    /** Length of the window's rise at the onset, s: its leakage falls off beyond about 1/20 ms = 50 Hz. */
    private static final double RISE_SECONDS = 0.02;
    /** A peak must be the highest bin within this many unpadded bins (the half window's main lobe). */
    private static final double GUARD_BINS = 2.0;
    /** Envelope block for finding where the sound has died into the noise. */
    private static final int BLOCK = 1024;
    /** The analysis ends where the block level falls below 3 × the quietest blocks' level or −80 dB. */
    private static final double NOISE_FACTOR = 3.0;
    private static final double TAIL_FRACTION = 1e-4;
    /** No noise tail to cut when the quietest blocks are within 40 dB of the loudest. */
    private static final double NO_TAIL_FRACTION = 1e-2;

    private PeakFinder() {
    }

    /**
     * @param recording the signal
     * @param maxPeaks  how many peaks to return at most (the strongest), positive
     * @return peaks in ascending frequency
     */
    public static List<SpectralPeak> find(MonoRecording recording, int maxPeaks) {
        if (maxPeaks < 1) {
            throw new IllegalArgumentException("maxPeaks must be positive, got " + maxPeaks);
        }
        double[] x = recording.samples();
        int start = onset(x);
        int n = Math.min(audibleLength(x, start), MAX_ANALYSIS_SAMPLES);
        if (n < MIN_ANALYSIS_SAMPLES) {
            throw new UnreadableInputException("the recording is too short after its onset: " + n
                    + " samples, at least " + MIN_ANALYSIS_SAMPLES + " are needed");
        }
        int size = Integer.highestOneBit(n - 1) << 1;
        size *= PADDING;
        int rise = (int) Math.min(n / 8, Math.round(RISE_SECONDS * recording.sampleRateHz()));
        double[] w = BlackmanHarrisWindow.decaying(n, rise);
        double wsum = 0;
        double[] windowed = new double[n];
        for (int i = 0; i < n; i++) {
            windowed[i] = x[start + i] * w[i];
            wsum += w[i];
        }
        double[] power = RealSpectrum.power(windowed, size);
        // Scale so that a full-scale steady sine reads 0 dB: |X| = A * sum(w) / 2.
        double scale = 2.0 / wsum;
        return pickPeaks(power, scale * scale, recording.sampleRateHz() / size, (int) Math.ceil(GUARD_BINS * size / n),
                maxPeaks);
    }

    /**
     * Samples from {@code start} to the last block still above the noise: the quietest tenth of
     * the blocks (common practice for a noise-floor estimate) times {@link #NOISE_FACTOR}, or
     * {@link #TAIL_FRACTION} of the loudest block, whichever is higher.
     */
    static int audibleLength(double[] x, int start) {
        int blocks = (x.length - start) / BLOCK;
        if (blocks < 10) {
            return x.length - start;
        }
        double[] rms = new double[blocks];
        double loudest = 0;
        for (int b = 0; b < blocks; b++) {
            double ss = 0;
            for (int i = start + b * BLOCK, e = i + BLOCK; i < e; i++) {
                ss += x[i] * x[i];
            }
            rms[b] = Math.sqrt(ss / BLOCK);
            loudest = Math.max(loudest, rms[b]);
        }
        double[] sorted = rms.clone();
        Arrays.sort(sorted);
        double quiet = sorted[blocks / 10];
        if (quiet > NO_TAIL_FRACTION * loudest) {
            return x.length - start; // the sound is still well above the noise at the end: use it all
        }
        double threshold = Math.max(NOISE_FACTOR * quiet, TAIL_FRACTION * loudest);
        int last = blocks - 1;
        while (last > 0 && rms[last] < threshold) {
            last--;
        }
        return last == blocks - 1 ? x.length - start : Math.max(MIN_ANALYSIS_SAMPLES, (last + 1) * BLOCK);
    }

    static int onset(double[] x) {
        double peak = 0;
        for (double v : x) {
            peak = Math.max(peak, Math.abs(v));
        }
        double threshold = ONSET_FRACTION * peak;
        for (int i = 0; i < x.length; i++) {
            if (Math.abs(x[i]) >= threshold) {
                return i;
            }
        }
        return 0;
    }

    /**
     * Local maxima of the power spectrum above the thresholds; levels in dB are taken only for the
     * three bins around each candidate (a logarithm per bin of a million-point spectrum would cost
     * more than the rest of the picking).
     */
    private static List<SpectralPeak> pickPeaks(double[] power, double scale2, double binHz, int guard, int maxPeaks) {
        double floor = median(power);
        double max = 0;
        for (int k = guard; k < power.length - 1; k++) {
            max = Math.max(max, power[k]);
        }
        double threshold = Math.max(floor * Math.pow(10, FLOOR_MARGIN_DB / 10), max * Math.pow(10, -DYNAMIC_RANGE_DB / 10));
        List<SpectralPeak> peaks = new ArrayList<>();
        // Skip the DC lobe: bins closer to 0 Hz than one main-lobe half-width.
        for (int k = Math.max(guard, 1); k < power.length - 1; k++) {
            double pb = power[k];
            if (pb < threshold || pb < power[k - 1] || pb <= power[k + 1] || !highestWithin(power, k, guard)) {
                continue;
            }
            double a = db(power[k - 1], scale2);
            double b = db(pb, scale2);
            double c = db(power[k + 1], scale2);
            // Quadratic through (−1, a), (0, b), (1, c): vertex offset p and height (Smith & Serra 1987).
            double p = 0.5 * (a - c) / (a - 2 * b + c);
            double level = b - 0.25 * (a - c) * p;
            peaks.add(new SpectralPeak((k + p) * binHz, level));
        }
        if (peaks.size() > maxPeaks) {
            peaks.sort(Comparator.comparingDouble(SpectralPeak::levelDb).reversed());
            peaks = new ArrayList<>(peaks.subList(0, maxPeaks));
        }
        peaks.sort(Comparator.comparingDouble(SpectralPeak::frequencyHz));
        return List.copyOf(peaks);
    }

    private static double db(double power, double scale2) {
        return 10 * Math.log10(power * scale2 + 1e-300);
    }

    /** True when bin k is the highest within ±guard bins: side lobes and ripples do not count. */
    private static boolean highestWithin(double[] db, int k, int guard) {
        int lo = Math.max(0, k - guard);
        int hi = Math.min(db.length - 1, k + guard);
        for (int j = lo; j <= hi; j++) {
            if (db[j] > db[k]) {
                return false;
            }
        }
        return true;
    }

    /** Median of every 8th bin: the noise floor, at an eighth of the cost of sorting them all. */
    private static double median(double[] v) {
        int step = 8;
        double[] s = new double[(v.length + step - 1) / step];
        for (int i = 0; i < s.length; i++) {
            s[i] = v[i * step];
        }
        Arrays.sort(s);
        return s[s.length / 2];
    }
}
