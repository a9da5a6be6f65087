package org.nodewright.physics.aircolumn;

import org.hipparchus.complex.Complex;

/**
 * Visco-thermal wall losses in a rigid cylindrical duct: the Zwikker-Kosten model (Zwikker &amp;
 * Kosten, Sound Absorbing Materials, 1949), exact Bessel form, e^{j omega t} convention.
 *
 * <p>Series impedance per unit length Zv = j omega rho / (S (1 - Fv)), shunt admittance
 * Yt = j omega S / (rho c^2) (1 + (gamma - 1) Ft), with F(x) = 2 J1(x) / (x J0(x)) at
 * x = r e^{-j pi/4}, r = rv = a sqrt(rho omega / mu) (viscous) or rt = rv sqrt(Pr) (thermal).
 * Propagation constant Gamma = sqrt(Zv Yt), characteristic impedance Zc = sqrt(Zv / Yt).
 * Valid for any radius (narrow tubes included) while the wave stays plane (ka below the first
 * cross-mode cut-on, 1.84) and the tube is much narrower than a wavelength (the low reduced
 * frequency regime of Tijdeman, J. Sound Vib. 39, 1 (1975)).
 *
 * <p>This exact form is the reference for tests and the slow path for narrow tubes at low
 * frequency (rv below {@link KeefeExpansion#MIN_RV}); the hot loop uses {@link KeefeExpansion}.
 */
public final class ZwikkerKosten {

    private ZwikkerKosten() {
    }

    /** F(r) = 2 J1(x) / (x J0(x)) at x = r e^{-j pi/4}, r > 0. */
    public static Complex besselRatio(double r) {
        if (!(r > 0) || !Double.isFinite(r)) {
            throw new IllegalArgumentException("r must be positive and finite, was " + r);
        }
        if (r <= 50) {
            // Power series: with y = -x^2/4 = j r^2/4,
            // 2 J1(x)/x = sum y^m / (m! (m+1)!), J0(x) = sum y^m / (m!)^2 (Abramowitz & Stegun 9.1.10).
            double yr = 0;
            double yi = r * r / 4;
            double t0r = 1, t0i = 0; // y^m/(m!)^2
            double t1r = 1, t1i = 0; // y^m/(m!(m+1)!)
            double s0r = 1, s0i = 0, s1r = 1, s1i = 0;
            for (int m = 1; m < 400; m++) {
                double nr = t0r * yr - t0i * yi;
                double ni = t0r * yi + t0i * yr;
                double d0 = (double) m * m;
                t0r = nr / d0;
                t0i = ni / d0;
                nr = t1r * yr - t1i * yi;
                ni = t1r * yi + t1i * yr;
                double d1 = (double) m * (m + 1);
                t1r = nr / d1;
                t1i = ni / d1;
                s0r += t0r;
                s0i += t0i;
                s1r += t1r;
                s1i += t1i;
                if (Math.hypot(t0r, t0i) < 1e-18 * Math.hypot(s0r, s0i) && m > 2) {
                    break;
                }
            }
            return new Complex(s1r, s1i).divide(new Complex(s0r, s0i));
        }
        // Large argument: Hankel's expansion gives J1/J0 = -j + 1/(2x) - j/(8x^2) + ... (A&S 9.2.5),
        // so F = -2j/x + 1/x^2 - j/(4 x^3) (truncation error below 1e-7 for r > 50).
        Complex x = new Complex(r / Math.sqrt(2), -r / Math.sqrt(2));
        Complex ix = x.reciprocal();
        return Complex.I.multiply(-2).multiply(ix).add(ix.multiply(ix))
                .subtract(Complex.I.multiply(0.25).multiply(ix.multiply(ix).multiply(ix)));
    }

    /**
     * Gamma / (j k) and Zc / (rho c / S) for a duct of radius a at angular frequency omega.
     *
     * @return {Gamma/(jk), Zc S/(rho c)}
     */
    public static Complex[] normalised(AirProperties air, double radius, double omega) {
        double rv = radius * Math.sqrt(air.density() * omega / air.viscosity());
        return normalisedAt(rv, air.gamma(), Math.sqrt(air.prandtl()));
    }

    /** The same from rv, gamma and nu = sqrt(Pr). */
    static Complex[] normalisedAt(double rv, double gamma, double nu) {
        Complex fv = besselRatio(rv);
        Complex ft = besselRatio(rv * nu);
        Complex u = Complex.ONE.add(ft.multiply(gamma - 1)); // Yt / (j omega S/(rho c^2))
        Complex v = Complex.ONE.subtract(fv); // (j omega rho/S) / Zv
        Complex g = u.divide(v).sqrt();
        Complex z = u.multiply(v).sqrt().reciprocal();
        return new Complex[] {g, z};
    }
}
