package org.nodewright.strings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.aircolumns.AirColumnWordingTest;
import org.nodewright.physics.strings.StressCheck;

class StressWordingTest {

    private final StressWording wording = new StressWording(AirColumnWordingTest.texts());

    // Warnings above 75 % and 90 % of the typical tensile strength (our thresholds), each with the
    // caution (eye protection, the string maker's data: common practice).
    @ParameterizedTest(name = "{0} of strength")
    @CsvSource(textBlock = """
            0.50, 0, '',      ''
            0.74, 0, '',      ''
            0.76, 1, Warning, 76 %
            0.89, 1, Warning, 89 %
            0.91, 1, DANGER,  91 %
            1.20, 1, DANGER,  120 %
            """)
    void stressWarnings(double fraction, int count, String word, String pct) {
        double d = 0.3e-3;
        double strength = 2.6e9;
        double t = fraction * strength * Math.PI * d * d / 4;
        List<String> warnings = wording.warnings(StressCheck.of(t, d, strength));
        assertThat(warnings).hasSize(count);
        if (count > 0) {
            // the level (by the thresholds), the figure, and the caution attached; the sentence itself is the
            // messages file's to word
            assertThat(warnings.get(0)).startsWith(word).contains(" " + pct + " ").endsWith(wording.caution());
        }
    }

    @ParameterizedTest
    @CsvSource(textBlock = """
            0, ,       'string 1: W'
            2, treble, 'string 3 (treble): W'
            1, '{0} it''s', 'string 2 ({0} it''s): W'
            """)
    void setMembersAreNamedByNumberAndLabel(int index, String label, String expected) {
        assertThat(wording.memberWarning(index, label, "W")).isEqualTo(expected);
    }
}
