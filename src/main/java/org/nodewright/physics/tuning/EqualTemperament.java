package org.nodewright.physics.tuning;

import org.nodewright.physics.Require;

/**
 * Twelve-tone equal temperament around a settable A4 (ISO 16: 440 Hz by default).
 *
 * @param a4Hz the reference pitch of A4 in hertz
 */
public record EqualTemperament(double a4Hz) {

    /** ISO 16:1975 standard tuning frequency: the only default A4 of the application. */
    public static final double ISO_16_A4_HZ = 440.0;

    private static final String[] NAMES = {"C", "C#", "D", "D#", "E", "F", "F#", "G", "G#", "A", "A#", "B"};

    /** MIDI number of A4 (MIDI 1.0 convention: middle C = 60). */
    private static final int A4_MIDI = 69;

    public EqualTemperament {
        Require.positive("a4Hz", a4Hz);
    }

    public static EqualTemperament iso16() {
        return new EqualTemperament(ISO_16_A4_HZ);
    }

    /** f = A4 · 2^((m − 69)/12), the equal-temperament formula. */
    public double frequencyOf(int midi) {
        return a4Hz * Math.pow(2.0, (midi - A4_MIDI) / 12.0);
    }

    /** The nearest equal-tempered note to {@code frequencyHz} and how many cents it sits off it. */
    public Note nearest(double frequencyHz) {
        Require.positive("frequencyHz", frequencyHz);
        double semitones = Cents.between(frequencyHz, a4Hz) / 100.0;
        int midi = (int) Math.round(semitones) + A4_MIDI;
        double noteHz = frequencyOf(midi);
        return new Note(nameOf(midi), midi, noteHz, Cents.between(frequencyHz, noteHz));
    }

    /** Scientific pitch name: C4 is middle C (MIDI 60), octave number = floor(m/12) − 1. */
    public static String nameOf(int midi) {
        int pc = Math.floorMod(midi, 12);
        int octave = Math.floorDiv(midi, 12) - 1;
        return NAMES[pc] + octave;
    }
}
