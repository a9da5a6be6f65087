package org.nodewright.physics.aircolumn;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Nearest note of twelve-tone equal temperament and the offset in cents (1200 log2 of the ratio;
 * common practice), with A4 at a settable reference (440 Hz by default, ISO 16). MIDI numbering:
 * A4 = 69, C4 = 60 (common practice).
 *
 * @param name      e.g. "A4", "C#5"
 * @param centsOff  cents of the frequency above (positive) or below the named note
 * @param noteHz    the equal-tempered frequency of the named note
 */
public record NoteName(String name, double centsOff, double noteHz) {

    private static final String[] NAMES = {"C", "C#", "D", "D#", "E", "F", "F#", "G", "G#", "A", "A#", "B"};
    private static final Pattern NOTE = Pattern.compile("([A-Ga-g])([#b]?)(-?\\d{1,2})");

    /** The nearest equal-tempered note to f. */
    public static NoteName nearest(double f, double a4) {
        if (!(f > 0) || !(a4 > 0)) {
            throw new IllegalArgumentException("frequency and A4 must be positive: f=" + f + " a4=" + a4);
        }
        double midi = 69 + 12 * Math.log(f / a4) / Math.log(2);
        long m = Math.round(midi);
        double noteHz = a4 * Math.pow(2, (m - 69) / 12.0);
        int pc = (int) Math.floorMod(m, 12L);
        long octave = Math.floorDiv(m, 12L) - 1;
        return new NoteName(NAMES[pc] + octave, cents(f, noteHz), noteHz);
    }

    /** Cents from b to a: 1200 log2(a/b). */
    public static double cents(double a, double b) {
        return 1200 * Math.log(a / b) / Math.log(2);
    }

    /** True when s reads as a note name such as "D5", "F#4" or "Bb3". */
    public static boolean isNoteName(String s) {
        return s != null && NOTE.matcher(s.trim()).matches();
    }

    /**
     * Frequency of a note name ("A4", "F#3", "Bb5") at the given A4.
     *
     * @throws IllegalArgumentException when the text is not a note name
     */
    public static double frequencyOf(String note, double a4) {
        Matcher mt = note == null ? null : NOTE.matcher(note.trim());
        if (mt == null || !mt.matches()) {
            throw new IllegalArgumentException("not a note name: " + note);
        }
        int pc = switch (mt.group(1).toUpperCase(Locale.ROOT)) {
            case "C" -> 0;
            case "D" -> 2;
            case "E" -> 4;
            case "F" -> 5;
            case "G" -> 7;
            case "A" -> 9;
            default -> 11;
        };
        pc += "#".equals(mt.group(2)) ? 1 : "b".equals(mt.group(2)) ? -1 : 0;
        int octave = Integer.parseInt(mt.group(3));
        int midi = (octave + 1) * 12 + pc;
        return a4 * Math.pow(2, (midi - 69) / 12.0);
    }
}
