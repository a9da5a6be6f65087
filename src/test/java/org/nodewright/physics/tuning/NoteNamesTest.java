package org.nodewright.physics.tuning;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.data.Offset.offset;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class NoteNamesTest {

    /**
     * Rows of the shared grammar table src/test/resources/tuning/note-names.csv (the pages' note
     * module is tested against the same file). Its frequencies were computed outside the code with
     * Python 3 math.pow at A4 = 440 Hz (ISO 16:1975), 17 significant digits; see the file's header.
     */
    static List<Arguments> grammarTable() throws IOException {
        List<Arguments> rows = new ArrayList<>();
        try (InputStream in = NoteNamesTest.class.getResourceAsStream("/tuning/note-names.csv")) {
            assertThat(in).as("tuning/note-names.csv on the test class path").isNotNull();
            boolean header = true;
            for (String line : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n", -1)) {
                if (line.startsWith("#") || line.isEmpty()) {
                    continue;
                }
                if (header) {
                    assertThat(line).isEqualTo("text|midi|frequencyHz");
                    header = false;
                    continue;
                }
                String[] cells = line.split("\\|", -1);
                assertThat(cells).as("row %s", line).hasSize(3);
                rows.add(Arguments.of(cells[0], cells[1].isEmpty() ? null : Integer.valueOf(cells[1]),
                        cells[2].isEmpty() ? null : Double.valueOf(cells[2])));
            }
        }
        assertThat(rows).hasSizeGreaterThan(20);
        return rows;
    }

    // Tolerance: the table's 17 significant digits; 1e-12 relative is far below any audible or
    // printable difference and above the last-bit differences of pow between libraries.
    @ParameterizedTest(name = "\"{0}\" -> {1}")
    @MethodSource("grammarTable")
    void followsTheSharedGrammarTable(String text, Integer midi, Double frequencyHz) {
        if (midi == null) {
            assertThat(NoteNames.isNoteName(text)).isFalse();
            assertThatThrownBy(() -> NoteNames.parse(text)).isInstanceOf(IllegalArgumentException.class);
            assertThatThrownBy(() -> NoteNames.frequencyHz(text, EqualTemperament.ISO_16_A4_HZ))
                    .isInstanceOf(IllegalArgumentException.class);
            return;
        }
        assertThat(NoteNames.isNoteName(text)).isTrue();
        assertThat(NoteNames.parse(text)).isEqualTo(midi);
        assertThat(NoteNames.frequencyHz(text, EqualTemperament.ISO_16_A4_HZ))
                .isCloseTo(frequencyHz, within(frequencyHz * 1e-12));
    }

    // Equal-tempered frequencies at A4 = 440 Hz (ISO 16), as in the usual table of note
    // frequencies (e.g. the one in Fletcher & Rossing's appendix; from memory, 0.01 Hz).
    @ParameterizedTest
    @CsvSource({"A4, 440.00", "C4, 261.63", "E2, 82.41", "F#5, 739.99", "Bb3, 233.08", "D5, 587.33", "C#6, 1108.73"})
    void namesGiveTheTableFrequencies(String name, double hz) {
        assertThat(NoteNames.frequencyHz(name, 440.0)).isCloseTo(hz, within(0.01));
    }

    // Equal-tempered frequencies at A4 = 440 Hz (ISO 16; standard tables, e.g. C4 = 261.626 Hz); a
    // pitch 10 cents sharp of each is named after it again.
    @ParameterizedTest
    @CsvSource({"A4, 440.0", "C4, 261.6256", "C#5, 554.3653", "Bb3, 233.0819", "E2, 82.4069", "D5, 587.3295"})
    void namesAndNearestNotesAgree(String name, double hz) {
        EqualTemperament et = EqualTemperament.iso16();
        assertThat(NoteNames.frequencyHz(name, 440)).isCloseTo(hz, offset(1e-3));
        Note n = et.nearest(NoteNames.frequencyHz(name, 440) * Math.pow(2, 10.0 / 1200));
        assertThat(n.centsOff()).isCloseTo(10.0, offset(1e-6));
        assertThat(NoteNames.frequencyHz(n.name(), 440)).isCloseTo(hz, offset(1e-3));
    }

    @ParameterizedTest
    @ValueSource(strings = {"H4", "E", "4", "E#x", ""})
    void nonNamesAreRefused(String name) {
        assertThatThrownBy(() -> NoteNames.frequencyHz(name, 440.0)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void nullIsNotANoteName() {
        assertThat(NoteNames.isNoteName(null)).isFalse();
        assertThatThrownBy(() -> NoteNames.parse(null)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void theReferencePitchScalesEveryName() {
        // Baroque pitch A4 = 415 Hz (common practice): A4 is 415 Hz, A3 an octave below.
        assertThat(NoteNames.frequencyHz("A4", 415)).isEqualTo(415.0);
        assertThat(NoteNames.frequencyHz("A3", 415)).isCloseTo(207.5, within(1e-12));
        assertThatThrownBy(() -> NoteNames.frequencyHz("A4", 0)).isInstanceOf(IllegalArgumentException.class);
    }

    // A pitch typed with its unit (issue 16): "329.63 Hz" is 329.63 Hz as written; a note name is its
    // equal-tempered frequency at A4 = 440 Hz (ISO 16:1975): E4 = 440·2^(-5/12) = 329.6276 Hz (common practice).
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.CsvSource(delimiter = ';', value = {
        "329.63 Hz; 329.63",
        "329,63 Hz; 329.63",
        "329.63; 329.63",
        "440hz; 440.0",
        "E4; 329.6275569",
    })
    void aPitchIsANoteNameOrHertzWithOrWithoutItsUnit(String text, double hz) {
        assertThat(NoteNames.isPitch(text)).isTrue();
        assertThat(NoteNames.pitchHz(text, 440.0)).isCloseTo(hz, within(1e-6));
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"", "Hz", "-3 Hz", "0 Hz", "329.63 kHz", "abc", "200000 Hz"})
    void anythingElseIsNoPitch(String text) {
        assertThat(NoteNames.isPitch(text)).isFalse();
        assertThatThrownBy(() -> NoteNames.pitchHz(text, 440.0)).isInstanceOf(IllegalArgumentException.class);
    }
}
