package org.nodewright.physics.measure;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.nodewright.physics.tuning.Cents;

/**
 * Gives spectral peaks their mode numbers. Starting from a trial f1, it walks up the series
 * n = 1, 2, 3 …, predicts each partial from the stiff-string law fitted to the partials matched so
 * far ({@link StiffStringLaw#lineFit}), and takes the strongest peak within a fifth of f1 of the
 * prediction; a partial with no peak there is missing (a node at the pluck point, for instance).
 * Without an expected f1 the strongest and the lowest loud peaks, and their halves and thirds, are tried as f1, and the trial
 * that explains the most peaks while predicting the fewest missing ones wins (a harmonic sieve,
 * common practice; the penalty for a missing partial is half a matched one).
 */
public final class PartialMatcher {

    /** Search half-width around a prediction, as a fraction of f1: neighbours are one f1 away. */
    private static final double TOLERANCE_OF_F1 = 0.2;
    /** … narrowed once three partials pin the law down. */
    private static final double NARROW_TOLERANCE_OF_F1 = 0.1;
    /** A peak this far below the strongest of the last three partials matched is noise, not a partial. */
    private static final double MAX_DROP_DB = 40.0;
    /** Weight of a predicted partial that has no peak, against 1 for a matched one. */
    private static final double MISSING_PENALTY = 0.5;
    /** Trials: the strongest peaks, each also divided by 2 and 3 (fundamental weak or absent). */
    private static final int TRIAL_PEAKS = 12;
    private static final int TRIAL_DIVISORS = 3;
    /** … and the lowest few loud peaks. */
    private static final int LOWEST_TRIAL_PEAKS = 8;
    /** A matched peak further than this from the walk's own fitted law is a stray, in cents. */
    private static final double STRAY_CENTS = 15.0;
    /** Above this many consecutive missing partials the series has ended. */
    private static final int MAX_CONSECUTIVE_MISSING = 6;

    private PartialMatcher() {
    }

    /**
     * @param peaks         candidate peaks
     * @param expectedF1Hz  the f1 the user expects (its octave is trusted), or null to estimate it
     * @param maxPartials   highest mode number to match
     * @return matched partials in ascending n; empty when nothing fits
     */
    public static List<MatchedPartial> match(List<SpectralPeak> peaks, Double expectedF1Hz, int maxPartials) {
        if (maxPartials < 1) {
            throw new IllegalArgumentException("maxPartials must be positive, got " + maxPartials);
        }
        if (peaks.isEmpty()) {
            return List.of();
        }
        List<SpectralPeak> sorted = new ArrayList<>(peaks);
        sorted.sort(Comparator.comparingDouble(SpectralPeak::frequencyHz));
        double fMax = sorted.get(sorted.size() - 1).frequencyHz() * 1.02;
        if (expectedF1Hz != null) {
            if (!(expectedF1Hz > 0) || !Double.isFinite(expectedF1Hz)) {
                throw new IllegalArgumentException("expected f1 must be positive and finite, got " + expectedF1Hz);
            }
            // The user knows the octave, not the exact pitch: start from the strongest peak within a
            // semitone of the expectation, else from the expectation itself.
            double start = expectedF1Hz;
            SpectralPeak near = strongestWithin(sorted, expectedF1Hz, expectedF1Hz * 0.06);
            if (near != null) {
                start = near.frequencyHz();
            }
            return walk(sorted, start, maxPartials, fMax).partials;
        }
        Trial best = null;
        for (SpectralPeak trialPeak : trialPeaks(sorted)) {
            for (int k = 1; k <= TRIAL_DIVISORS; k++) {
                double f1 = trialPeak.frequencyHz() / k;
                Trial t = walk(sorted, f1, Integer.MAX_VALUE, fMax);
                if (best == null || t.score > best.score + 1e-9
                        || (Math.abs(t.score - best.score) <= 1e-9 && t.levelSum > best.levelSum)) {
                    best = t;
                }
            }
        }
        List<MatchedPartial> all = best.partials;
        return all.stream().filter(p -> p.n() <= maxPartials).toList();
    }

    /**
     * Peaks to start trials from: the strongest, and the lowest of those within
     * {@link #MAX_DROP_DB} of the strongest (when all partials are about equally loud the
     * fundamental need not be among the strongest few).
     */
    private static List<SpectralPeak> trialPeaks(List<SpectralPeak> sorted) {
        List<SpectralPeak> byLevel = new ArrayList<>(sorted);
        byLevel.sort(Comparator.comparingDouble(SpectralPeak::levelDb).reversed());
        java.util.LinkedHashSet<SpectralPeak> trials = new java.util.LinkedHashSet<>(
                byLevel.subList(0, Math.min(TRIAL_PEAKS, byLevel.size())));
        double floor = byLevel.get(0).levelDb() - MAX_DROP_DB;
        int low = 0;
        for (SpectralPeak p : sorted) {
            if (low == LOWEST_TRIAL_PEAKS) {
                break;
            }
            if (p.levelDb() >= floor) {
                trials.add(p);
                low++;
            }
        }
        return List.copyOf(trials);
    }

    private record Trial(List<MatchedPartial> partials, double score, double levelSum) {
    }

    /** Walks the series up from a trial f1. */
    private static Trial walk(List<SpectralPeak> sorted, double f1, int maxPartials, double fMax) {
        int[] ns = new int[64];
        double[] hz = new double[64];
        int count = 0;
        List<MatchedPartial> out = new ArrayList<>();
        double fit1 = f1;
        double fitB = 0;
        int missing = 0;
        int consecutiveMissing = 0;
        double levelSum = 0;
        for (int n = 1; n <= maxPartials; n++) {
            double predicted = StiffStringLaw.frequency(n, fit1, fitB);
            if (predicted > fMax) {
                break;
            }
            double tolerance = (count >= 3 ? NARROW_TOLERANCE_OF_F1 : TOLERANCE_OF_F1) * fit1;
            double minLevel = Double.NEGATIVE_INFINITY;
            for (int j = Math.max(0, out.size() - 3); j < out.size(); j++) {
                minLevel = Math.max(minLevel, out.get(j).levelDb() - MAX_DROP_DB);
            }
            SpectralPeak p = strongestWithin(sorted, predicted, tolerance);
            if (p != null && p.levelDb() < minLevel) {
                p = null;
            }
            if (p == null) {
                missing++;
                if (++consecutiveMissing > MAX_CONSECUTIVE_MISSING && count > 0) {
                    break;
                }
                continue;
            }
            consecutiveMissing = 0;
            out.add(new MatchedPartial(n, p.frequencyHz(), p.levelDb()));
            levelSum += p.levelDb();
            if (count == ns.length) {
                ns = java.util.Arrays.copyOf(ns, count * 2);
                hz = java.util.Arrays.copyOf(hz, count * 2);
            }
            ns[count] = n;
            hz[count] = p.frequencyHz();
            count++;
            double[] fb = StiffStringLaw.lineFit(ns, hz, count);
            fit1 = fb[0];
            fitB = fb[1];
        }
        // A peak taken that the law fitted to the whole walk misses by far was noise, not a partial:
        // it counts as missing (this keeps noise from propping up a trial an octave too low).
        int found = 0;
        if (count > 0) {
            double[] fb = StiffStringLaw.lineFit(ns, hz, count);
            for (int i = 0; i < count; i++) {
                if (Math.abs(Cents.between(hz[i], StiffStringLaw.frequency(ns[i], fb[0], fb[1]))) <= STRAY_CENTS) {
                    found++;
                } else {
                    missing++;
                }
            }
        }
        return new Trial(List.copyOf(out), found - MISSING_PENALTY * missing, levelSum);
    }

    private static SpectralPeak strongestWithin(List<SpectralPeak> sorted, double hz, double halfWidth) {
        SpectralPeak best = null;
        int lo = lowerBound(sorted, hz - halfWidth);
        for (int i = lo; i < sorted.size() && sorted.get(i).frequencyHz() <= hz + halfWidth; i++) {
            SpectralPeak p = sorted.get(i);
            if (best == null || p.levelDb() > best.levelDb()) {
                best = p;
            }
        }
        return best;
    }

    private static int lowerBound(List<SpectralPeak> sorted, double hz) {
        int lo = 0;
        int hi = sorted.size();
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (sorted.get(mid).frequencyHz() < hz) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }
}
