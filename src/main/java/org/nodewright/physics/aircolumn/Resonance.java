package org.nodewright.physics.aircolumn;

/**
 * One playing resonance: an input-impedance maximum (closed input end) or minimum (open input end).
 *
 * @param n           1 for the lowest resonance found in the analysed range
 * @param frequencyHz refined resonance frequency
 * @param q           quality factor f / (half-power bandwidth), NaN when the peak has no finite
 *                    bandwidth (lossless, non-radiating bore) or it could not be bracketed
 * @param magnitude   |Z| / (rho c / S_input) at the resonance
 */
public record Resonance(int n, double frequencyHz, double q, double magnitude) {

    public Resonance {
        if (n < 1 || !(frequencyHz > 0)) {
            throw new IllegalArgumentException("need n >= 1 and a positive frequency: n=" + n + " f=" + frequencyHz);
        }
    }
}
