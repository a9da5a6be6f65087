package org.nodewright.physics.measure;

/**
 * A measured partial with its mode number.
 *
 * @param n           mode number, 1 for the fundamental
 * @param frequencyHz measured frequency
 * @param levelDb     measured level (dB re full scale), or 0 when the level is unknown (CSV input)
 */
public record MatchedPartial(int n, double frequencyHz, double levelDb) {

    public MatchedPartial {
        if (n < 1) {
            throw new IllegalArgumentException("mode number must be at least 1, got " + n);
        }
        if (!(frequencyHz > 0) || !Double.isFinite(frequencyHz)) {
            throw new IllegalArgumentException("partial frequency must be positive and finite, got " + frequencyHz);
        }
        if (!Double.isFinite(levelDb)) {
            throw new IllegalArgumentException("partial level must be finite, got " + levelDb);
        }
    }
}
