package org.nodewright.physics.tuning;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Note names in scientific pitch notation to MIDI numbers and equal-tempered frequencies: the one
 * note-name grammar of the server (the pages' {@code js/common/notes.js} follows the same table,
 * {@code src/test/resources/tuning/note-names.csv}).
 *
 * <p>Grammar: a letter A–G (either case); then none, one or two sharps ({@code #} or ♯) or none,
 * one or two flats ({@code b} or ♭), sharps and flats never mixed; then the octave −1..10 (C4 is
 * middle C, MIDI 60, the MIDI 1.0 numbering; common practice). Blanks around the name are ignored,
 * blanks inside it are not.
 */
public final class NoteNames {

    private static final Pattern NAME = Pattern.compile("([A-Ga-g])([#\u266F]{1,2}|[b\u266D]{1,2})?(-1|10|[0-9])");
    private static final int[] PITCH_CLASS = {9, 11, 0, 2, 4, 5, 7}; // A B C D E F G

    /** The example names quoted in messages. */
    public static final String EXAMPLES = "D5, F#4 or Bb3";

    private NoteNames() {
    }

    /** True when {@code text} is a note name of the grammar. */
    public static boolean isNoteName(String text) {
        return text != null && NAME.matcher(text.strip()).matches();
    }

    /**
     * The MIDI number of a note name: m = 12·(octave + 1) + pitch class + accidentals.
     *
     * @throws IllegalArgumentException when {@code text} is not a note name
     */
    public static int parse(String text) {
        Matcher m = text == null ? null : NAME.matcher(text.strip());
        if (m == null || !m.matches()) {
            throw new IllegalArgumentException("not a note name (like " + EXAMPLES + "): " + text);
        }
        int pc = PITCH_CLASS[m.group(1).toUpperCase(Locale.ROOT).charAt(0) - 'A'];
        String accidentals = m.group(2) == null ? "" : m.group(2);
        int shift = accidentals.isEmpty() ? 0
                : (accidentals.charAt(0) == '#' || accidentals.charAt(0) == '\u266F' ? 1 : -1) * accidentals.length();
        int octave = Integer.parseInt(m.group(3));
        return (octave + 1) * 12 + pc + shift;
    }

    /**
     * The equal-tempered frequency of a note name at the given A4.
     *
     * @throws IllegalArgumentException when {@code text} is not a note name or A4 is not positive
     */
    public static double frequencyHz(String text, double a4Hz) {
        return new EqualTemperament(a4Hz).frequencyOf(parse(text));
    }

    /** A frequency written as text: digits with a decimal point or comma, optionally followed by "Hz". */
    private static final Pattern HERTZ = Pattern.compile("([0-9]+(?:[.,][0-9]*)?|[.,][0-9]+)\\s*(?:[Hh][Zz])?");

    /** The highest frequency a pitch written in hertz may have (the benches' own bound on targetHz). */
    public static final double MAX_PITCH_HZ = 100000.0;

    /** True when {@code text} is a note name, or a frequency in hertz ("329.63", "329,63 Hz") above 0 and at most 100 kHz. */
    public static boolean isPitch(String text) {
        if (isNoteName(text)) {
            return true;
        }
        double hz = hertz(text);
        return hz > 0 && hz <= MAX_PITCH_HZ;
    }

    /**
     * The frequency a pitch text names: a note name at the given A4, or the hertz written.
     *
     * @throws IllegalArgumentException when {@code text} is neither
     */
    public static double pitchHz(String text, double a4Hz) {
        if (isNoteName(text)) {
            return frequencyHz(text, a4Hz);
        }
        double hz = hertz(text);
        if (!(hz > 0 && hz <= MAX_PITCH_HZ)) {
            throw new IllegalArgumentException("not a note name (like " + EXAMPLES + ") or a frequency in Hz: " + text);
        }
        return hz;
    }

    /** The hertz of "329.63", "329,63 Hz", "440hz"; NaN when the text is not written so. */
    private static double hertz(String text) {
        if (text == null) {
            return Double.NaN;
        }
        Matcher m = HERTZ.matcher(text.strip());
        return m.matches() ? Double.parseDouble(m.group(1).replace(',', '.')) : Double.NaN;
    }
}
