package org.nodewright.physics.tuning;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class EqualTemperamentTest {

    // Equal-temperament formula f = 440·2^((m−69)/12) with A4 = 440 Hz (ISO 16); the frequencies are
    // those printed in standard note-frequency tables to 4 decimals (from memory, and re-derivable
    // by hand from the formula).
    @ParameterizedTest(name = "{0} = {2} Hz")
    @CsvSource(textBlock = """
            A4,  69, 440.0000
            A3,  57, 220.0000
            C4,  60, 261.6256
            E4,  64, 329.6276
            E2,  40,  82.4069
            A#4, 70, 466.1638
            C8, 108, 4186.0090
            A0,  21,  27.5000
            """)
    void namesAndFrequenciesOfTheTwelveToneScale(String name, int midi, double hz) {
        EqualTemperament et = EqualTemperament.iso16();
        assertThat(et.frequencyOf(midi)).isCloseTo(hz, within(5e-5));
        Note note = et.nearest(hz);
        assertThat(note.name()).isEqualTo(name);
        assertThat(note.midi()).isEqualTo(midi);
        assertThat(note.centsOff()).isCloseTo(0.0, within(1e-3));
    }

    // Cents: 1200·log2(f/f_ref) (Ellis 1885). A pitch 1.0 % sharp of A4 is 17.226 cents sharp
    // (1200·log2(1.01) = 17.2264, computed by hand); 430 Hz is 39.80 cents flat of 440 Hz (-39.8002); 329 Hz is 3.2991 cents flat of E4.
    @ParameterizedTest(name = "{0} Hz is {1} {2} cents")
    @CsvSource(textBlock = """
            444.4, A4,  17.2264
            430.0, A4, -39.8002
            329.0, E4,  -3.2991
            """)
    void centsOffTheNearestNote(double hz, String name, double cents) {
        Note note = EqualTemperament.iso16().nearest(hz);
        assertThat(note.name()).isEqualTo(name);
        assertThat(note.centsOff()).isCloseTo(cents, within(1e-3));
    }

    @Test
    void referencePitchIsSettable() {
        // Baroque pitch A4 = 415 Hz: 415 Hz is then A4 exactly, and at 440 Hz G#4 lies at 415.3047 Hz.
        assertThat(new EqualTemperament(415).nearest(415).name()).isEqualTo("A4");
        Note n = EqualTemperament.iso16().nearest(415.3047);
        assertThat(n.name()).isEqualTo("G#4");
        assertThat(n.centsOff()).isCloseTo(0.0, within(1e-3));
    }
}
