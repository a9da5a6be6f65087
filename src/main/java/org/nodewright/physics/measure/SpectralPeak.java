package org.nodewright.physics.measure;

/**
 * One peak of a magnitude spectrum after sub-bin interpolation.
 *
 * @param frequencyHz interpolated centre frequency
 * @param levelDb     interpolated peak level in dB relative to full scale: a steady full-scale sine
 *                    through the same window reads 0 dB
 */
public record SpectralPeak(double frequencyHz, double levelDb) {

    public SpectralPeak {
        if (!(frequencyHz > 0) || !Double.isFinite(frequencyHz)) {
            throw new IllegalArgumentException("peak frequency must be positive and finite, got " + frequencyHz);
        }
        if (!Double.isFinite(levelDb)) {
            throw new IllegalArgumentException("peak level must be finite, got " + levelDb);
        }
    }
}
