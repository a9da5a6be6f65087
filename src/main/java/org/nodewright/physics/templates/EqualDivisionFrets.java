package org.nodewright.physics.templates;

/** Fret positions for equal divisions of the octave, measured from the nut. */
public final class EqualDivisionFrets {

    private EqualDivisionFrets() {
    }

    /**
     * Distance from the nut of fret {@code n}: x_n = L (1 - 2^(-n/d)) (equal division of the octave;
     * each fret shortens the sounding length by the factor 2^(1/d); common practice).
     *
     * @throws IllegalArgumentException if L is not positive and finite, n is negative or d < 1
     */
    public static double fromNutMm(double scaleLengthMm, int n, int divisionsPerOctave) {
        Checks.positive("scaleLengthMm", scaleLengthMm);
        if (n < 0 || divisionsPerOctave < 1) {
            throw new IllegalArgumentException("fret " + n + " of " + divisionsPerOctave + " per octave is not defined");
        }
        return scaleLengthMm * (1.0 - Math.pow(2.0, -(double) n / divisionsPerOctave));
    }
}
