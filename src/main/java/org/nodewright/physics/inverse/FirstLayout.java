package org.nodewright.physics.inverse;

import java.util.List;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.nodewright.physics.Require;
import org.nodewright.physics.aircolumn.Fingering;

/**
 * A first tone-hole layout for a blank tube, in closed form, from the bottom hole up: each hole is
 * put where the tube, cut off there by the open hole, sounds the note of the fingering that opens
 * it first (every hole nearer the input closed).
 *
 * <p>The open hole is a lumped inertance M_h = rho t_e / (pi b^2) in parallel with the bore below
 * it, of length L_b up to the previous note's effective end; the pair acts as a bare tube ending
 * Delta beyond the hole, with (Nederveen 1969, "Acoustical Aspects of Woodwind Instruments", the
 * open side hole in a cylinder; Benade 1976, "Fundamentals of Musical Acoustics", ch. 21)
 * <pre>   tan(k Delta) = 1 / ( cot(k L_b) + (b/a)^2 / (k t_e) )</pre>
 * whose low-frequency limit is Nederveen's Delta = L_b / (1 + L_b (b/a)^2 / t_e). t_e is the
 * chimney height plus the hole's inner and outer end corrections, taken together as t + 1.5 b
 * (Benade 1976, from memory). Closed holes, wall losses and the bore's taper are left to the
 * optimiser that follows; the bore is treated as a cylinder of the given diameter.
 *
 * <p>A note's effective length is c / (2 f) for a tube open (or flue-voiced) at the input, and
 * c / (4 f) for a cylinder closed at the input (Benade 1976, ch. 20: the open and stopped pipe).
 * Effective ends are measured from x = 0, so the input end correction is subtracted from them.
 */
public final class FirstLayout {

    /** t_e = t + 1.5 b: the inner and outer end corrections of a side hole together (Benade 1976, from memory). */
    static final double HOLE_END_CORRECTION_PER_RADIUS = 1.5;

    private FirstLayout() {
    }

    /**
     * The blank tube as the first layout sees it.
     *
     * @param lengthMm            the blank's length from x = 0 to the output end
     * @param boreDiameterMm      the bore (treated as a cylinder)
     * @param speedOfSound        m/s
     * @param inputCorrectionMm   the player's end's end correction (from the model's blank-tube pitch)
     * @param outputCorrectionMm  the output end's end correction (0.6133 a unflanged, Levine &amp; Schwinger 1948)
     * @param quarterWave         true for a cylinder closed at the input (odd harmonics)
     */
    public record Tube(double lengthMm, double boreDiameterMm, double speedOfSound, double inputCorrectionMm,
            double outputCorrectionMm, boolean quarterWave) {

        public Tube {
            Require.positive("lengthMm", lengthMm);
            Require.positive("boreDiameterMm", boreDiameterMm);
            Require.positive("speedOfSound", speedOfSound);
            Require.finite("inputCorrectionMm", inputCorrectionMm);
            Require.nonNegative("outputCorrectionMm", outputCorrectionMm);
        }

        /** The effective acoustic length of a note, mm: c / 2f, or c / 4f when quarter-wave. */
        double effectiveLengthMm(double hz) {
            return speedOfSound * 1e3 / ((quarterWave ? 4 : 2) * hz);
        }
    }

    /**
     * The closed-form layout.
     *
     * @param tube        the blank
     * @param lengthBeforeFootMm the bore before its last section (the section that may be cut)
     * @param diametersMm each hole's diameter (hole 0 nearest the input)
     * @param chimneysMm  each hole's chimney height
     * @param fingerings  the chart; register-1 fingerings that close exactly the holes above one hole place it
     * @param trimFoot    whether the tube may be cut so that the all-closed fingering sounds its note
     * @return positions from x = 0 and the foot (the last section's length as cut), mm; holes no fingering
     *         places are spread evenly between their placed neighbours
     */
    public static HoleLayout estimate(Tube tube, double lengthBeforeFootMm, double[] diametersMm, double[] chimneysMm, List<Fingering> fingerings,
            boolean trimFoot) {
        int n = diametersMm.length;
        if (chimneysMm.length != n || n == 0) {
            throw new IllegalArgumentException("need a diameter and a chimney for each of at least one hole");
        }
        double total = tube.lengthMm();
        Double lowest = noteOpening(fingerings, n, n);
        if (trimFoot && lowest != null) {
            double cut = tube.effectiveLengthMm(lowest) - tube.inputCorrectionMm() - tube.outputCorrectionMm();
            if (cut > lengthBeforeFootMm && cut < tube.lengthMm()) {
                total = cut;
            }
        }
        double foot = total - lengthBeforeFootMm;
        double a = tube.boreDiameterMm() / 2;
        double previousEnd = total + tube.outputCorrectionMm();
        double[] x = new double[n];
        boolean[] placed = new boolean[n];
        for (int h = n - 1; h >= 0; h--) {
            Double hz = noteOpening(fingerings, h, n);
            if (hz == null) {
                continue;
            }
            double end = tube.effectiveLengthMm(hz) - tube.inputCorrectionMm();
            if (!(end < previousEnd)) {
                continue;
            }
            double b = diametersMm[h] / 2;
            double te = chimneysMm[h] + HOLE_END_CORRECTION_PER_RADIUS * b;
            double k = 2 * Math.PI * hz / (tube.speedOfSound() * 1e3);
            x[h] = holePosition(end, previousEnd, k, (b / a) * (b / a), te);
            if (Double.isFinite(x[h]) && x[h] > 0) {
                placed[h] = true;
                previousEnd = end;
            }
        }
        spreadUnplaced(x, placed, total);
        return new HoleLayout(x, diametersMm, foot);
    }

    /**
     * Delta of the open hole at x: the bore below it (to previousEnd) in parallel with the hole,
     * as an equivalent bare length beyond x (Nederveen 1969; Benade 1976), mm.
     */
    static double openHoleDeltaMm(double x, double previousEnd, double k, double areaRatio, double te) {
        double lb = previousEnd - x;
        double cot = 1 / Math.tan(k * lb);
        return Math.atan(1 / (cot + areaRatio / (k * te))) / k;
    }

    /** The x at which x + Delta(x) = end, by Brent's method (Hipparchus {@link BrentSolver}); NaN if not bracketed. */
    static double holePosition(double end, double previousEnd, double k, double areaRatio, double te) {
        // x = end gives x + Delta > end; far enough up the tube Delta tends to its long-tube value,
        // below t_e / areaRatio, so the root lies within that distance below end.
        // Below previousEnd - pi / k the bore under the hole would hold a half wave: not this note's branch.
        double low = Math.max(Math.max(1e-6, previousEnd - 0.95 * Math.PI / k),
                end - 4 * te / areaRatio - 4 * (previousEnd - end));
        double high = end;
        java.util.function.DoubleUnaryOperator g = x -> x + openHoleDeltaMm(x, previousEnd, k, areaRatio, te) - end;
        if (!(g.applyAsDouble(low) < 0 && g.applyAsDouble(high) >= 0)) {
            return Double.NaN;
        }
        return new BrentSolver(1e-9).solve(200, g::applyAsDouble, low, high);
    }

    /** The register-1 target of a fingering closing exactly holes 0..h-1 (hole h the first open one); n: all closed. */
    private static Double noteOpening(List<Fingering> fingerings, int h, int n) {
        Double best = null;
        int bestOpenBelow = -1;
        for (Fingering f : fingerings) {
            if (f.register() != 1) {
                continue;
            }
            boolean fits = true;
            for (int i = 0; i < Math.min(h, n); i++) {
                fits &= f.closedHoles().contains(i);
            }
            if (h < n) {
                fits &= !f.closedHoles().contains(h);
            }
            if (!fits) {
                continue;
            }
            int openBelow = 0;
            for (int i = h + 1; i < n; i++) {
                openBelow += f.closedHoles().contains(i) ? 0 : 1;
            }
            // prefer the plain fingering: every hole below the first open one open as well
            if (openBelow > bestOpenBelow) {
                bestOpenBelow = openBelow;
                best = f.targetHz();
            }
        }
        return best;
    }

    /** Holes no fingering placed: evenly between their placed neighbours (or the tube's ends). */
    private static void spreadUnplaced(double[] x, boolean[] placed, double length) {
        int n = x.length;
        int i = 0;
        while (i < n) {
            if (placed[i]) {
                i++;
                continue;
            }
            int j = i;
            while (j < n && !placed[j]) {
                j++;
            }
            double left = i == 0 ? 0.35 * length : x[i - 1];
            double right = j == n ? 0.92 * length : x[j];
            for (int m = i; m < j; m++) {
                x[m] = left + (right - left) * (m - i + 1) / (j - i + 1);
            }
            i = j;
        }
    }
}
