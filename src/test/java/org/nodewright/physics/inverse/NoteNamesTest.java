package org.nodewright.physics.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class NoteNamesTest {

    // Equal-tempered frequencies at A4 = 440 Hz (ISO 16), as in the usual table of note
    // frequencies (e.g. the one in Fletcher & Rossing's appendix; from memory, 0.01 Hz).
    @ParameterizedTest
    @CsvSource({"A4, 440.00", "C4, 261.63", "E2, 82.41", "F#5, 739.99", "Bb3, 233.08", "D5, 587.33", "C#6, 1108.73"})
    void namesGiveTheTableFrequencies(String name, double hz) {
        assertThat(NoteNames.frequencyHz(name, 440.0)).isCloseTo(hz, within(0.01));
    }

    @ParameterizedTest
    @ValueSource(strings = {"H4", "E", "4", "E#x", ""})
    void nonNamesAreRefused(String name) {
        assertThatThrownBy(() -> NoteNames.frequencyHz(name, 440.0)).isInstanceOf(IllegalArgumentException.class);
    }
}
