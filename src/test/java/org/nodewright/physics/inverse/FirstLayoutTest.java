package org.nodewright.physics.inverse;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.aircolumn.Fingering;

class FirstLayoutTest {

    static final double C_MM = 343_200.0;
    static final double BORE_RADIUS_MM = 6.5;

    // x with x + Delta(x) = end for tan(k Delta) = 1 / (cot(k (prev - x)) + (b/a)^2 / (k t_e)),
    // t_e = t + 1.5 b, a = 6.5 mm, c = 343.2 m/s (Nederveen 1969 / Benade 1976 relation), computed
    // with scipy.optimize.brentq (xtol 1e-12) in numpy float64 from the same relation written out.
    @ParameterizedTest
    @CsvSource({
        // end, previousEnd, f Hz, hole d mm, chimney mm, x mm (scipy), tolerance mm
        "200, 230, 660, 6.5, 2.5, 181.0680108906355, 1e-6",
        "150, 175, 880, 7.0, 3.0, 132.21981625377794, 1e-6",
        "120, 140, 1100, 5.0, 2.5, 97.34981344682454, 1e-6",
    })
    void holePositionSolvesTheOpenHoleRelationAsScipyDoes(double end, double prev, double f, double d, double t,
            double expected, double tol) {
        double k = 2 * Math.PI * f / C_MM;
        double b = d / 2;
        double x = FirstLayout.holePosition(end, prev, k, (b / BORE_RADIUS_MM) * (b / BORE_RADIUS_MM), t + 1.5 * b);
        assertThat(x).isCloseTo(expected, within(tol));
    }

    @Test
    void atLowFrequencyTheHoleSitsWhereNederveensShortChimneyFormulaPutsIt() {
        // Nederveen 1969, low-frequency limit: Delta = L_b / (1 + L_b (b/a)^2 / t_e). With u = prev - x,
        // x + Delta = end is r u^2 - D r u - D = 0 (r = (b/a)^2 / t_e, D = prev - end): solved here by hand.
        double prev = 230;
        double end = 200;
        double ar = 0.25;
        double te = 7.375;
        double r = ar / te;
        double dd = prev - end;
        double u = (dd * r + Math.sqrt(dd * dd * r * r + 4 * r * dd)) / (2 * r);
        double k = 2 * Math.PI * 1.0 / C_MM; // 1 Hz: k L far below 1
        assertThat(FirstLayout.holePosition(end, prev, k, ar, te)).isCloseTo(prev - u, within(1e-3));
        // scipy brentq on the full relation at 1 Hz: 181.68333618885993 (the limit differs by 1.3e-6 mm)
        assertThat(prev - u).isCloseTo(181.68333618885993, within(1e-5));
    }

    @Test
    void aBiggerHoleSitsFurtherDownTheTube() {
        // common practice: a smaller hole is drilled nearer the input for the same note
        double k = 2 * Math.PI * 660 / C_MM;
        double small = FirstLayout.holePosition(200, 230, k, Math.pow(2.0 / 6.5, 2), 2.5 + 3.0);
        double large = FirstLayout.holePosition(200, 230, k, Math.pow(4.0 / 6.5, 2), 2.5 + 6.0);
        assertThat(small).isLessThan(large);
    }

    @Test
    void theFootIsCutSoTheAllClosedNoteHasHalfItsWavelengthAsEffectiveLength() {
        // open-open pipe: L_eff = c / 2f (Benade 1976, ch. 20), less the two end corrections
        FirstLayout.Tube tube = new FirstLayout.Tube(300, 13, 343.2, 25, 0.6133 * 6.5, false);
        List<Fingering> chart = List.of(new Fingering("D5", Set.of(0, 1), 587.33, 1),
                new Fingering("E5", Set.of(0), 659.26, 1), new Fingering("F#5", Set.of(), 739.99, 1));
        HoleLayout l = FirstLayout.estimate(tube, 0, new double[] {6, 6}, new double[] {2.5, 2.5}, chart, true);
        assertThat(l.footLengthMm()).isCloseTo(343_200 / (2 * 587.33) - 25 - 0.6133 * 6.5, within(1e-9));
        assertThat(l.position(0)).isLessThan(l.position(1));
        assertThat(l.position(1)).isLessThan(l.footLengthMm());
        // each hole above the note's own effective end (x + Delta = c/2f - input correction)
        assertThat(l.position(1)).isLessThan(343_200 / (2 * 659.26) - 25);
        assertThat(l.position(0)).isLessThan(343_200 / (2 * 739.99) - 25);
    }
}
