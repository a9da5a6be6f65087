package org.nodewright.physics.aircolumn;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;

/**
 * The hand-optimised sweep (rotation recurrence, cosh/sinh of Gamma L from series without a
 * division, inlined matrices, two threads) against the straightforward per-element path used for
 * the standing waves (library sine and cosine of every element, E and 1/E), on a bore where no
 * element can be joined: a quadratic (curved) flare cut into 200 distinct frusta, open and closed
 * holes, wall losses on, and a narrow cylinder whose losses take the exact Bessel form at low
 * frequency and whose long elements take the library exp/sin/cos branch at high frequency.
 */
class CurvedBoreSweepTest {

    static final AirProperties AIR = AirProperties.at(20, 50);

    static TransferMatrixSolver curvedBore() {
        List<BoreSegment> segs = new ArrayList<>();
        int n = 200;
        double len = 0.600;
        for (int i = 0; i < n; i++) {
            double ua = (double) i / n;
            double ub = (double) (i + 1) / n;
            segs.add(new BoreSegment(len / n, 0.006 + 0.018 * ua * ua, 0.006 + 0.018 * ub * ub));
        }
        // A narrow cylinder at the bell end: rv below 8 at the lowest frequencies (exact form).
        segs.add(new BoreSegment(0.25, 0.024, 0.024));
        List<ToneHole> holes = new ArrayList<>();
        for (int h = 0; h < 8; h++) {
            holes.add(new ToneHole(0.2505 + 0.040 * h, 0.0025, 0.004, h != 3));
        }
        return new TransferMatrixSolver(new AirColumn(segs, holes, InputEnd.CLOSED, OutputEnd.OPEN_UNFLANGED, AIR,
                true));
    }

    @Test
    void optimisedSweepMatchesPerElementPathOnCurvedBore() {
        TransferMatrixSolver solver = curvedBore();
        assertThat(solver.elementCount()).isGreaterThan(200);
        int n = 4000;
        double f0 = 20;
        double df = (3000.0 - 20) / (n - 1);
        double[] re = new double[n];
        double[] im = new double[n];
        solver.inputImpedance(f0, df, n, re, im);
        int checked = 0;
        for (int i = 0; i < n; i += 7) {
            double[][] s = StandingWaveProfile.field(solver, f0 + i * df, new double[] {0.0});
            Complex z = new Complex(s[0][0], s[1][0]).divide(new Complex(s[2][0], s[3][0]))
                    .multiply(solver.inputArea());
            // 1e-9 relative: far tighter than the 0.01 cent / 0.1 % Q the optimisation may cost.
            assertThat(z.subtract(new Complex(re[i], im[i])).norm() / z.norm()).as("f = %s Hz", f0 + i * df)
                    .isLessThan(1e-9);
            checked++;
        }
        assertThat(checked).isGreaterThan(500);
    }

    @Test
    void narrowLongCylinderUsesBothLossBranches() {
        // 2 mm radius, 0.3 m: rv = a sqrt(rho omega / mu) is below 8 at 20 Hz (exact Bessel form) and
        // the loss phase k Re(G) L exceeds 0.01 at 3 kHz (library exp/sin/cos branch).
        AirColumn col = new AirColumn(List.of(new BoreSegment(0.3, 0.002, 0.002), new BoreSegment(0.1, 0.002, 0.004)),
                List.of(), InputEnd.CLOSED, OutputEnd.OPEN_FLANGED, AIR, true);
        TransferMatrixSolver solver = new TransferMatrixSolver(col);
        int n = 600;
        double[] re = new double[n];
        double[] im = new double[n];
        solver.inputImpedance(20, 5, n, re, im);
        for (int i = 0; i < n; i += 3) {
            double[][] s = StandingWaveProfile.field(solver, 20 + 5.0 * i, new double[] {0.0});
            Complex z = new Complex(s[0][0], s[1][0]).divide(new Complex(s[2][0], s[3][0]))
                    .multiply(solver.inputArea());
            assertThat(z.subtract(new Complex(re[i], im[i])).norm() / z.norm()).isLessThan(1e-9);
        }
    }
}
