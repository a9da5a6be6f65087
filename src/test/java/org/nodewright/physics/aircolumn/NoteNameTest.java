package org.nodewright.physics.aircolumn;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.data.Offset.offset;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class NoteNameTest {

    // Equal-tempered frequencies at A4 = 440 Hz (ISO 16; standard tables, e.g. C4 = 261.626 Hz).
    @ParameterizedTest
    @CsvSource({"A4, 440.0", "C4, 261.6256", "C#5, 554.3653", "Bb3, 233.0819", "E2, 82.4069", "D5, 587.3295"})
    void noteNamesAndFrequencies(String name, double hz) {
        assertThat(NoteName.frequencyOf(name, 440)).isCloseTo(hz, offset(1e-3));
        NoteName n = NoteName.nearest(NoteName.frequencyOf(name, 440) * Math.pow(2, 10.0 / 1200), 440);
        assertThat(n.centsOff()).isCloseTo(10.0, offset(1e-6));
        assertThat(NoteName.frequencyOf(n.name(), 440)).isCloseTo(hz, offset(1e-3));
    }
}
