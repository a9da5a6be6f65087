package org.nodewright.physics.templates;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class IntonationCompensationTest {

    // With no action there is no fretting stretch and the setback is the classical stiffness
    // length 2 kappa = 2 sqrt(E I / T), I = pi d^4 / 64 (Fletcher 1964; the same stiffness term as in
    // Varieschi & Gower 2010, from memory). Rows: plain steel 0.25 mm at 70 N, nylon 0.71 mm at 70 N,
    // steel 0.43 mm at 80 N. The next order of Fletcher's factor moves it by under 5 %.
    @ParameterizedTest
    @CsvSource({
        "0.25e-3, 200e9, 70",
        "0.71e-3, 4.0e9, 70",
        "0.43e-3, 200e9, 80"
    })
    void withoutActionTheSetbackIsTwiceTheStiffnessLength(double d, double e, double t) {
        double area = Math.PI * d * d / 4;
        double ei = e * Math.PI * Math.pow(d, 4) / 64;
        var s = new IntonationCompensation.Setup(650, t, 7850 * area, e, area, ei, 0, 0, 12);
        double expectedMm = 2 * Math.sqrt(ei / t) * 1e3;
        var r = IntonationCompensation.solve(s, false);
        assertThat(r.saddleSetbackMm()).isCloseTo(expectedMm, within(0.05 * expectedMm));
        assertThat(r.worstCompensated()).isLessThan(0.5);
    }

    @Test
    void actionMakesFrettedNotesSharpAndTheSetbackBringsThemBack() {
        // Plain steel 0.33 mm at 72 N on 648 mm; 0.5 mm at the nut, 3.5 mm at the saddle (2 mm at the
        // 12th fret, common practice for a steel-string acoustic).
        double d = 0.33e-3;
        double area = Math.PI * d * d / 4;
        var s = new IntonationCompensation.Setup(648, 72, 7850 * area, 200e9, area, 200e9 * Math.PI * Math.pow(d, 4) / 64,
                0.5, 3.5, 12);
        var r = IntonationCompensation.solve(s, false);
        assertThat(r.uncompensatedCents()[11]).isGreaterThan(3.0);
        assertThat(Math.abs(r.compensatedCents()[11])).isLessThan(1.0);
        // Common practice for steel strings: setbacks of about 1 to 5 mm (from memory).
        assertThat(r.saddleSetbackMm()).isBetween(1.0, 5.0);
        var both = IntonationCompensation.solve(s, true);
        assertThat(both.worstCompensated()).isLessThanOrEqualTo(r.worstCompensated() + 1e-9);
    }
}
