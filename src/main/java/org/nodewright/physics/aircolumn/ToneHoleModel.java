package org.nodewright.physics.aircolumn;

import org.hipparchus.complex.Complex;

/**
 * Shunt and series impedances of one side hole on a cylindrical (or slowly conical) main bore, from
 * Lefebvre &amp; Scavone, "Characterization of woodwind instrument toneholes with the finite element
 * method", J. Acoust. Soc. Am. 131(4), 3153-3163 (2012): a symmetric T network with series
 * impedance Za/2 on each side of a shunt impedance Zs.
 *
 * <p>With delta = b/a (hole radius over main-bore radius), chimney height t at the centre line and
 * Z0h = rho c / (pi b^2):
 * <ul>
 *   <li>matching volume t_m = b delta (1 + 0.207 delta^3) / 8;</li>
 *   <li>inner length t_i = b (0.822 - 0.095 delta - 1.566 delta^2 + 2.138 delta^3 - 1.640 delta^4
 *       + 0.502 delta^5) (open hole; the same fit is used for a closed hole here);</li>
 *   <li>series length, open t_a = b delta^2 (-0.35 + 0.06 tanh(2.7 t / b)),
 *       closed t_a = b delta^2 (-0.12 - 0.17 tanh(2.4 t / b)); Za = j Z0h k t_a;</li>
 *   <li>shunt Zs = j Z0h k t_i + Zch, where Zch is the input impedance of the chimney (length
 *       t + t_m, with wall losses when they are on) loaded at its top by the flanged radiation
 *       impedance of Norris &amp; Sheng 1989 (open) or rigidly closed.</li>
 * </ul>
 * Coefficients from memory of that paper. Valid for delta up to 1 and plane waves in the chimney.
 */
final class ToneHoleModel {

    private final double radius;
    private final double te;
    private final double ti;
    private final double ta;
    private final boolean open;
    private final double invArea;

    ToneHoleModel(ToneHole hole, double boreRadius) {
        double b = hole.radius();
        double delta = Math.min(1.0, b / boreRadius);
        this.radius = b;
        this.open = hole.open();
        double t = hole.chimney();
        double d2 = delta * delta;
        // Lefebvre & Scavone 2012: matching volume (after Nederveen) and inner length correction.
        double tm = matchingLength(b, delta);
        this.ti = innerLength(b, delta);
        // Lefebvre & Scavone 2012: series length corrections, open and closed.
        this.ta = open ? b * d2 * (-0.35 + 0.06 * Math.tanh(2.7 * t / b))
                : b * d2 * (-0.12 - 0.17 * Math.tanh(2.4 * t / b));
        this.te = t + tm;
        this.invArea = 1 / (Math.PI * b * b);
    }

    /** Matching-volume length t_m = b delta (1 + 0.207 delta^3) / 8 (Lefebvre &amp; Scavone 2012, after Nederveen). */
    static double matchingLength(double b, double delta) {
        return b * delta * (1 + 0.207 * (delta * delta) * delta) / 8;
    }

    /**
     * Inner length correction t_i = b (0.822 - 0.095 delta - 1.566 delta^2 + 2.138 delta^3
     * - 1.640 delta^4 + 0.502 delta^5) of an open hole of radius b (Lefebvre &amp; Scavone 2012).
     */
    static double innerLength(double b, double delta) {
        return b * (0.822 + delta * (-0.095 + delta * (-1.566 + delta * (2.138 + delta * (-1.640
                + delta * 0.502)))));
    }

    /**
     * Writes Zs/(rho c) and Za/(rho c) (units 1/m^2) as {zsRe, zsIm, zaRe, zaIm} into out.
     *
     * @param k      wavenumber omega / c
     * @param sw     sqrt(rho omega / mu), so that rv = b sw (ignored without losses)
     * @param rotRe  real part of e^{-2jk te} (te = {@link #chimneyLength()})
     * @param rotIm  imaginary part of e^{-2jk te}
     * @param losses include wall losses in the chimney
     */
    /** Chimney length t + t_m, m. */
    double chimneyLength() {
        return te;
    }

    void impedances(double k, double sw, double rotRe, double rotIm, boolean losses, KeefeExpansion keefe,
            AirProperties air, double[] out) {
        // Chimney propagation Gamma = jk(1 + G), characteristic factor z (normalised to Z0h).
        double gr = 0, gi = 0, zr = 1, zi = 0;
        if (losses) {
            double rv = radius * sw;
            if (rv >= KeefeExpansion.MIN_RV) {
                double e = 1 / rv;
                double[] g = keefe.g;
                double[] z = keefe.z;
                gr = e * (g[0] + e * (g[2] + e * g[4]));
                gi = e * (g[1] + e * (g[3] + e * g[5]));
                zr = 1 + e * (z[0] + e * (z[2] + e * z[4]));
                zi = e * (z[1] + e * (z[3] + e * z[5]));
            } else {
                Complex[] ex = ZwikkerKosten.normalisedAt(rv, air.gamma(), Math.sqrt(air.prandtl()));
                gr = ex[0].getReal() - 1;
                gi = ex[0].getImaginary();
                zr = ex[1].getReal();
                zi = ex[1].getImaginary();
            }
        }
        // X = Gamma te = jk te + (a + jb), a = -k gi te, b = k gr te; with E = e^{-2X},
        // tanh X = (1 - E) / (1 + E) and E = e^{-2jk te} e^{-2a} e^{-2jb}.
        double a = -k * gi * te;
        double bb = k * gr * te;
        double er = rotRe;
        double ei = rotIm;
        if (losses) {
            double ea = SmallAngle.expNeg(2 * a);
            double cb = SmallAngle.cos(2 * bb);
            double sb = SmallAngle.sin(2 * bb);
            double nr = ea * (er * cb + ei * sb);
            double ni = ea * (ei * cb - er * sb);
            er = nr;
            ei = ni;
        }
        double dnr = 1 + er;
        double dni = ei;
        double dd = dnr * dnr + dni * dni;
        double tr = ((1 - er) * dnr - ei * dni) / dd;
        double tim = (-ei * dnr - (1 - er) * dni) / dd;
        double cr;
        double ci;
        if (open) {
            double[] rad = out; // scratch: out is written only at the end
            Radiation.normalisedImpedance(true, k * radius, rad);
            // Zch = z (zl + z T)/(z + zl T), all normalised to Z0h.
            double ztr = zr * tr - zi * tim;
            double zti = zr * tim + zi * tr;
            double nr = rad[0] + ztr;
            double ni = rad[1] + zti;
            double ltr = rad[0] * tr - rad[1] * tim;
            double lti = rad[0] * tim + rad[1] * tr;
            double dr = zr + ltr;
            double di = zi + lti;
            double qd = dr * dr + di * di;
            double qr = (nr * dr + ni * di) / qd;
            double qi = (ni * dr - nr * di) / qd;
            cr = zr * qr - zi * qi;
            ci = zr * qi + zi * qr;
        } else {
            // Closed top: Zch = z / tanh(Gamma te).
            double qd = tr * tr + tim * tim;
            cr = (zr * tr + zi * tim) / qd;
            ci = (zi * tr - zr * tim) / qd;
        }
        out[0] = cr * invArea;
        out[1] = (ci + k * ti) * invArea;
        out[2] = 0;
        out[3] = k * ta * invArea;
    }
}
