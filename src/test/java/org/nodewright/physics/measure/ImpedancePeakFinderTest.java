package org.nodewright.physics.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.Test;

class ImpedancePeakFinderTest {

    /**
     * A sum of resonances, Z = Σ 1/(1 + iQ(f/f0 − f0/f)): the velocity response of a driven, damped
     * oscillator (Fletcher & Rossing 1998, §1.6), whose magnitude peaks exactly at f0 with a
     * half-power bandwidth of exactly f0/Q.
     */
    private static ImpedanceCurve resonances(double[] f0, double[] q, double step) {
        int n = (int) (3000 / step);
        double[] f = new double[n];
        double[] m = new double[n];
        double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            f[i] = 50 + i * step;
            double re = 0;
            double im = 0;
            for (int k = 0; k < f0.length; k++) {
                double x = f[i] / f0[k];
                double di = q[k] * (x - 1 / x);
                double d = 1 + di * di;
                re += 1 / d;
                im += -di / d;
            }
            m[i] = Math.hypot(re, im);
            p[i] = Math.atan2(im, re);
        }
        return new ImpedanceCurve(f, m, p);
    }

    @Test
    void findsEachResonanceWithItsQ() {
        double[] f0 = {220, 660, 1100, 1540};
        double[] q = {30, 40, 45, 50};
        List<ImpedancePeak> peaks = ImpedancePeakFinder.find(resonances(f0, q, 0.5), false, 3.0);
        assertThat(peaks).hasSize(4);
        for (int k = 0; k < 4; k++) {
            // The neighbours' tails shift each peak a little: within 0.1 % here.
            assertThat(peaks.get(k).frequencyHz()).isCloseTo(f0[k], within(f0[k] * 1e-3));
            assertThat(peaks.get(k).q()).isCloseTo(q[k], within(q[k] * 0.05));
        }
        List<ImpedancePeak> minima = ImpedancePeakFinder.find(resonances(f0, q, 0.5), true, 3.0);
        assertThat(minima).hasSizeGreaterThanOrEqualTo(3);
        assertThat(minima.get(0).frequencyHz()).isBetween(220.0, 660.0);
    }

    @Test
    void ignoresRipplesBelowTheProminence() {
        ImpedanceCurve clean = resonances(new double[] {300}, new double[] {25}, 1.0);
        double[] m = clean.magnitude();
        for (int i = 0; i < m.length; i++) {
            m[i] *= 1 + 0.01 * Math.sin(i * 1.7); // 0.09 dB ripple
        }
        ImpedanceCurve rippled = new ImpedanceCurve(clean.frequencyHz(), m, clean.phaseRad());
        assertThat(ImpedancePeakFinder.find(rippled, false, 3.0)).singleElement()
                .satisfies(p -> assertThat(p.frequencyHz()).isCloseTo(300, within(1.0))); // one grid step
    }
}
