package org.nodewright.physics.templates;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;
import org.nodewright.physics.Require;
import org.nodewright.physics.tuning.Cents;

/**
 * Saddle (and optionally nut) compensation of one fretted string, after the intonation model of
 * Varieschi &amp; Gower, "Intonation and compensation of fretted string instruments", Am. J. Phys.
 * 78, 47 (2010): fretting stretches the string, raising its tension, and bending stiffness makes it
 * sound as if shorter; the setbacks that minimise the squared cents errors over the frets are the
 * compensation. The geometry and formulas as implemented here (from memory of that approach):
 *
 * <ul>
 *   <li>side view, x along the string from the nominal nut, y up, fret crowns at y = 0; the string
 *       leaves the nut at (-dN, hN) and the saddle at (L + dS, hS), a straight line when open;</li>
 *   <li>fretted at fret n (x_n = L(1 - 2^(-n/12))) it runs straight from the nut to the crown of fret
 *       n at (x_n, 0) and on to the saddle; friction is neglected, so the stretch spreads over the
 *       whole string and the tension rises by dT = E A (L'_n - L'_0) / L'_0 (Hooke's law; E and A of
 *       the load-bearing core);</li>
 *   <li>the vibrating length is fret crown to saddle; each frequency is Mersenne's
 *       f = (1/2l) sqrt(T/mu) times Fletcher's clamped-end stiff-string factor for the fundamental
 *       sqrt(1 + B) (1 + (2/pi) sqrt(B) + (4/pi^2) B) with B = pi^2 E I / (T l^2) (Fletcher,
 *       J. Acoust. Soc. Am. 36, 203 (1964));</li>
 *   <li>the player tunes the open string, so each fret's error is 1200 log2(f_n / (f_0 2^(n/12))).</li>
 * </ul>
 * With no action (hN = hS = 0) the stretch vanishes and the optimum is the classical stiffness
 * setback dS = 2 sqrt(E I / T).
 */
public final class IntonationCompensation {

    /** Finite-difference step of the least-squares Jacobian, mm. */
    private static final double STEP_MM = 1e-4;

    private IntonationCompensation() {
    }

    /**
     * One string on the instrument.
     *
     * @param scaleLengthMm        nominal nut-to-saddle length
     * @param openTensionN         tension at the open pitch
     * @param linearDensityKgPerM  mass per length
     * @param coreModulusPa        Young's modulus of the core
     * @param coreAreaM2           cross-section of the core (carries the stretch)
     * @param bendingStiffnessNm2  E I (0 for no stiffness)
     * @param nutHeightMm          string above the fret-crown plane at the nut
     * @param saddleHeightMm       string above the fret-crown plane at the saddle
     * @param frets                frets to intonate, 1..frets
     */
    public record Setup(double scaleLengthMm, double openTensionN, double linearDensityKgPerM, double coreModulusPa,
            double coreAreaM2, double bendingStiffnessNm2, double nutHeightMm, double saddleHeightMm, int frets) {
        public Setup {
            Require.positive("scaleLengthMm", scaleLengthMm);
            Require.positive("openTensionN", openTensionN);
            Require.positive("linearDensityKgPerM", linearDensityKgPerM);
            Require.positive("coreModulusPa", coreModulusPa);
            Require.positive("coreAreaM2", coreAreaM2);
            if (!(bendingStiffnessNm2 >= 0) || !(nutHeightMm >= 0) || !(saddleHeightMm >= 0)
                    || !Double.isFinite(bendingStiffnessNm2 + nutHeightMm + saddleHeightMm)) {
                throw new IllegalArgumentException("stiffness and heights must be finite and >= 0");
            }
            if (frets < 1 || frets > 36) {
                throw new IllegalArgumentException("frets must be 1..36, was " + frets);
            }
        }
    }

    /**
     * @param saddleSetbackMm dS, positive = saddle moved away from the nut
     * @param nutSetbackMm    dN, positive = nut moved away from the frets (0 unless asked)
     * @param uncompensatedCents error at each fret 1..N with dS = dN = 0
     * @param compensatedCents   error at each fret with the setbacks
     */
    public record Result(double saddleSetbackMm, double nutSetbackMm, double[] uncompensatedCents,
            double[] compensatedCents) {

        public double worstCompensated() {
            double w = 0;
            for (double c : compensatedCents) {
                w = Math.max(w, Math.abs(c));
            }
            return w;
        }
    }

    public static Result solve(Setup s, boolean compensateNut) {
        int p = compensateNut ? 2 : 1;
        LeastSquaresBuilder b = new LeastSquaresBuilder()
                .model(point -> valueAndJacobian(s, point, p))
                .target(new double[s.frets()])
                .start(new double[p])
                .maxEvaluations(1000)
                .maxIterations(1000);
        double[] x = new LevenbergMarquardtOptimizer().optimize(b.build()).getPoint().toArray();
        double dS = x[0];
        double dN = compensateNut ? x[1] : 0;
        return new Result(dS, dN, errors(s, 0, 0), errors(s, dS, dN));
    }

    private static Pair<RealVector, RealMatrix> valueAndJacobian(Setup s, RealVector point, int p) {
        double dS = point.getEntry(0);
        double dN = p > 1 ? point.getEntry(1) : 0;
        double[] r0 = errors(s, dS, dN);
        double[][] j = new double[r0.length][p];
        for (int k = 0; k < p; k++) {
            double[] rk = k == 0 ? errors(s, dS + STEP_MM, dN) : errors(s, dS, dN + STEP_MM);
            for (int i = 0; i < r0.length; i++) {
                j[i][k] = (rk[i] - r0[i]) / STEP_MM;
            }
        }
        return new Pair<>(new ArrayRealVector(r0, false), new Array2DRowRealMatrix(j, false));
    }

    /** Cents error of frets 1..N for the given setbacks (mm). */
    public static double[] errors(Setup s, double dS, double dN) {
        double mm = 1e-3;
        double saddleX = (s.scaleLengthMm() + dS) * mm;
        double nutX = -dN * mm;
        double hN = s.nutHeightMm() * mm;
        double hS = s.saddleHeightMm() * mm;
        double open = Math.hypot(saddleX - nutX, hS - hN);
        double f0 = frequency(s, open, s.openTensionN());
        double[] e = new double[s.frets()];
        for (int n = 1; n <= s.frets(); n++) {
            double xn = s.scaleLengthMm() * mm * (1 - Math.pow(2, -n / 12.0));
            double pressed = Math.hypot(xn - nutX, hN) + Math.hypot(saddleX - xn, hS);
            double tension = s.openTensionN() + s.coreModulusPa() * s.coreAreaM2() * (pressed - open) / open;
            double vibrating = Math.hypot(saddleX - xn, hS);
            double fn = frequency(s, vibrating, tension);
            e[n - 1] = Cents.between(fn, f0 * Math.pow(2, n / 12.0));
        }
        return e;
    }

    /** Mersenne's law with Fletcher's clamped-end factor for n = 1: sqrt(1 + B) (1 + (2/pi) sqrt(B) + (4/pi^2) B). */
    static double frequency(Setup s, double lengthM, double tensionN) {
        double ideal = Math.sqrt(tensionN / s.linearDensityKgPerM()) / (2 * lengthM);
        double bStiff = Math.PI * Math.PI * s.bendingStiffnessNm2() / (tensionN * lengthM * lengthM);
        return ideal * Math.sqrt(1 + bStiff) * (1 + 2 / Math.PI * Math.sqrt(bStiff) + 4 / (Math.PI * Math.PI) * bStiff);
    }
}
