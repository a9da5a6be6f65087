package org.nodewright.physics.inverse;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Scientific pitch names ("D5", "F#5", "Bb4") to equal-tempered frequencies. */
public final class NoteNames {

    private static final Pattern NAME = Pattern.compile("([A-Ga-g])([#b]?)(-?\\d{1,2})");
    private static final int[] PITCH_CLASS = {9, 11, 0, 2, 4, 5, 7}; // A B C D E F G

    private NoteNames() {
    }

    /**
     * f = A4 · 2^((m − 69)/12) with m the MIDI number, middle C = C4 = 60 (MIDI 1.0 convention;
     * equal temperament).
     *
     * @throws IllegalArgumentException for a name that is not a note or a non-positive A4
     */
    public static double frequencyHz(String name, double a4Hz) {
        if (!(a4Hz > 0) || !Double.isFinite(a4Hz)) {
            throw new IllegalArgumentException("A4 must be positive, was " + a4Hz);
        }
        Matcher m = name == null ? null : NAME.matcher(name.trim());
        if (m == null || !m.matches()) {
            throw new IllegalArgumentException("not a note name (like D5, F#5 or Bb4): " + name);
        }
        int pc = PITCH_CLASS[m.group(1).toUpperCase(Locale.ROOT).charAt(0) - 'A'];
        int accidental = "#".equals(m.group(2)) ? 1 : "b".equals(m.group(2)) ? -1 : 0;
        int octave = Integer.parseInt(m.group(3));
        int midi = (octave + 1) * 12 + pc + accidental;
        return a4Hz * Math.pow(2.0, (midi - 69) / 12.0);
    }
}
