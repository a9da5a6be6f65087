package org.nodewright.physics.inverse;

import org.nodewright.physics.aircolumn.Fingering;

/**
 * The acoustic model the tone-hole solver drives: the frequency a fingering sounds for a hole
 * layout, searched near a guess (the previous answer or the target). Implementations wrap the
 * air-column core; they return NaN when no resonance lies near the guess.
 */
@FunctionalInterface
public interface PlayingFrequencyModel {

    double soundingHz(HoleLayout layout, Fingering fingering, double guessHz);
}
