package org.nodewright.physics.aircolumn;

/**
 * Radiation impedance of an open circular pipe end, from its reflection coefficient
 * R = -|R| e^{-2jk l} (e^{j omega t} convention), Zr = Zc (1 + R) / (1 - R).
 *
 * <ul>
 *   <li>unflanged (thin wall): Levine &amp; Schwinger, Phys. Rev. 73, 383 (1948), through the fit of
 *       Silva, Guillemain, Kergomard, Mallaroni &amp; Norris, J. Sound Vib. 322, 255 (2009):
 *       |R| = (1 + 0.2 ka - 0.084 (ka)^2) / (1 + 0.2 ka + (0.5 - 0.084)(ka)^2),
 *       l/a = 0.6133 (1 + 0.044 (ka)^2) / (1 + 0.19 (ka)^2) - 0.02 sin^2(2ka), for ka &lt; 3.5;</li>
 *   <li>infinite flange: Norris &amp; Sheng, J. Sound Vib. 135, 85 (1989):
 *       |R| = (1 + 0.323 ka - 0.077 (ka)^2) / (1 + 0.323 ka + (1 - 0.077)(ka)^2),
 *       l/a = 0.8216 / (1 + (0.77 ka)^2 / (1 + 0.77 ka)), for ka &lt; 3.5.</li>
 * </ul>
 * Coefficients from memory of those papers; at low ka they give the classical end corrections
 * 0.6133 a and 0.8216 a and |R| = 1 - (ka)^2/2 and 1 - (ka)^2.
 */
public final class Radiation {

    private Radiation() {
    }

    /** End correction l / a for an unflanged pipe (Silva et al. 2009 fit to Levine &amp; Schwinger 1948). */
    public static double unflangedEndCorrection(double ka) {
        double x2 = ka * ka;
        double s = Math.sin(2 * ka);
        return 0.6133 * (1 + 0.044 * x2) / (1 + 0.19 * x2) - 0.02 * s * s;
    }

    /** |R| for an unflanged pipe (Silva et al. 2009). */
    public static double unflangedModulus(double ka) {
        double x2 = ka * ka;
        return (1 + 0.2 * ka - 0.084 * x2) / (1 + 0.2 * ka + (0.5 - 0.084) * x2);
    }

    /** End correction l / a for a pipe in an infinite flange (Norris &amp; Sheng 1989). */
    public static double flangedEndCorrection(double ka) {
        double y = 0.77 * ka;
        return 0.8216 / (1 + y * y / (1 + y));
    }

    /** |R| for a pipe in an infinite flange (Norris &amp; Sheng 1989). */
    public static double flangedModulus(double ka) {
        double x2 = ka * ka;
        return (1 + 0.323 * ka - 0.077 * x2) / (1 + 0.323 * ka + (1 - 0.077) * x2);
    }

    /**
     * Normalised radiation impedance Zr / Zc written into out[0] (real) and out[1] (imaginary).
     *
     * @param flanged true for the infinite flange, false for the unflanged pipe
     * @param ka      Helmholtz number, &gt;= 0
     */
    public static void normalisedImpedance(boolean flanged, double ka, double[] out) {
        // Beyond the fits' range (ka > 3.5) the quadratic |R| would turn negative: hold it in [0, 1].
        double mod = Math.max(0, Math.min(1, flanged ? flangedModulus(ka) : unflangedModulus(ka)));
        double l = flanged ? flangedEndCorrection(ka) : unflangedEndCorrection(ka);
        double phi = -2 * ka * l; // R = -|R| e^{j phi}
        double rr = -mod * SmallAngle.cos(phi);
        double ri = -mod * SmallAngle.sin(phi);
        // (1 + R) / (1 - R)
        double nr = 1 + rr;
        double ni = ri;
        double dr = 1 - rr;
        double di = -ri;
        double den = dr * dr + di * di;
        out[0] = (nr * dr + ni * di) / den;
        out[1] = (ni * dr - nr * di) / den;
    }

    /**
     * The state {P, U} (arbitrary scale, P/U = the load impedance / rho c) at an output end of
     * the given radius: closed U = 0, ideal open P = 0, else the radiation impedance above over
     * pi r^2.
     */
    static void outputLoad(OutputEnd end, double k, double radius, DuctKernel.State s) {
        switch (end) {
            case CLOSED -> s.set(1, 0, 0, 0);
            case IDEAL_OPEN -> s.set(0, 0, 1, 0);
            default -> {
                double[] zr = new double[2];
                normalisedImpedance(end == OutputEnd.OPEN_FLANGED, k * radius, zr);
                double invS = 1 / (Math.PI * radius * radius);
                s.set(zr[0] * invS, zr[1] * invS, 1, 0);
            }
        }
    }
}
