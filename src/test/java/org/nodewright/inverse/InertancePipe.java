package org.nodewright.inverse;

import java.util.Locale;

/**
 * A synthetic measured impedance for the calibration tests (unit and browser): a 13 mm x 280 mm
 * cylinder behind a lumped window inertance, in closed form, independent of the tool's model.
 */
public final class InertancePipe {

    public static final double L_MM = 280;
    public static final double A_MM = 6.5;
    /**
     * The player's end of the synthetic tube: a lumped inertance rho l / S_w in series, written as
     * its length in the bore's area, L_i = l S / S_w, mm (longer than a 4 x 8 mm window gives, ~27 mm).
     */
    public static final double INERTANCE_MM = 36;

    /** Dry air at 20 C: c = 331.3 sqrt(1 + T / 273.15) m/s (ideal gas; common handbook form). */
    public static final double C = 331.3 * Math.sqrt(1 + 20 / 273.15);

    /** The tube and its unflanged far end's 0.6133 a (Levine & Schwinger 1948), m. */
    public static final double L_PIPE = (L_MM + 0.6133 * A_MM) * 1e-3;

    /**
     * The input impedance over Z0 of a lossy cylinder open at its effective far end, behind a
     * series inertance (the lumped window of Fletcher & Rossing 1998 ch. 17, from memory):
     * Z / Z0 = j k L_i + j tan((k - j alpha) L), with the wall-loss attenuation
     * alpha = 3e-5 sqrt(f) / a (a in m; Fletcher & Rossing 1998 eq. (8.18), from memory) and
     * tan(x - j y) = (sin 2x - j sinh 2y) / (cos 2x + cosh 2y).
     */
    private InertancePipe() {
    }

    public static double[] impedance(double f) {
        double k = 2 * Math.PI * f / C;
        double x = k * L_PIPE;
        double y = 3e-5 * Math.sqrt(f) / (A_MM * 1e-3) * L_PIPE;
        double den = Math.cos(2 * x) + Math.cosh(2 * y);
        double re = Math.sin(2 * x) / den + k * INERTANCE_MM * 1e-3;
        double im = -Math.sinh(2 * y) / den;
        return new double[] {-im, re}; // j (re + j im)
    }

    /** The lossless minima: roots of tan(kL) + k L_i = 0, one per branch (n - 1/2) pi < kL < n pi, by bisection. */
    public static double minimumHz(int n) {
        double lo = (n - 0.5) * Math.PI + 1e-9;
        double hi = n * Math.PI;
        for (int i = 0; i < 200; i++) {
            double mid = (lo + hi) / 2;
            double g = Math.tan(mid) + mid / L_PIPE * INERTANCE_MM * 1e-3;
            if (g < 0) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return (lo + hi) / 2 / L_PIPE * C / (2 * Math.PI);
    }

    /** The curve as the bench's CSV: frequencyHz, magnitude (over Z0), phase in radians. */
    public static String csv(double fromHz, double toHz, double stepHz) {
        StringBuilder csv = new StringBuilder("frequencyHz,magnitude,phaseRad\n");
        for (double f = fromHz; f <= toHz; f += stepHz) {
            double[] z = impedance(f);
            csv.append(String.format(Locale.ROOT, "%.3f,%.9g,%.9g%n", f, Math.hypot(z[0], z[1]), Math.atan2(z[1], z[0])));
        }
        return csv.toString();
    }
}
