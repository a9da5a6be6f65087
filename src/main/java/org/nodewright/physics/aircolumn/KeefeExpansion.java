package org.nodewright.physics.aircolumn;

import org.hipparchus.complex.Complex;

/**
 * Keefe's large-radius expansion of the Zwikker-Kosten wall losses (D. H. Keefe, J. Acoust. Soc.
 * Am. 75, 58-62 (1984)): Gamma/(jk) and Zc/(rho c/S) as polynomials in 1/rv to third order, with
 * coefficients worked out here for the actual gamma and Prandtl number of the air (Keefe printed
 * them for air at 300 K: Gamma = k[1.045/rv + 1.080/rv^2 + 0.750/rv^3 + j(1 + 1.045/rv)],
 * Zc = Z0[1 + 0.369/rv - j(0.369/rv + 1.149/rv^2 + 0.303/rv^3)]).
 *
 * <p>Derivation: Hankel's expansion F(x) = 2J1(x)/(xJ0(x)) = -2j/x + 1/x^2 - j/(4x^3) with
 * x = r e^{-j pi/4}, then the truncated power series of sqrt(u/v), (uv)^-1/2 and their inverses.
 * Validity: rv &gt;= {@link #MIN_RV}; there the relative error of the loss part (value - 1) against
 * the exact Bessel form is below 6e-4 for Gamma and 3.5e-3 for Zc, falling as 1/rv^4 (checked in
 * the tests). Below it the caller must use {@link ZwikkerKosten}.
 */
public final class KeefeExpansion {

    /** Smallest rv for which the expansion is used (see the class comment for its accuracy). */
    public static final double MIN_RV = 8.0;
    /** 1 / MIN_RV. */
    public static final double MAX_INV_RV = 1 / MIN_RV;

    /** Coefficients [order 1..3][re, im] of Gamma/(jk) - 1, Zc S/(rho c) - 1, and their reciprocals. */
    final double[] g = new double[6];
    final double[] z = new double[6];
    final double[] gInv = new double[6];
    final double[] zInv = new double[6];

    /**
     * @param gamma ratio of specific heats (&gt; 1)
     * @param nu    sqrt of the Prandtl number (&gt; 0)
     */
    public KeefeExpansion(double gamma, double nu) {
        if (!(gamma > 1) || !(nu > 0)) {
            throw new IllegalArgumentException("need gamma > 1 and nu > 0, got " + gamma + ", " + nu);
        }
        // F = A e + B e^2 + C e^3, e = 1/r (Hankel's expansion at x = r e^{-j pi/4}).
        Complex a = new Complex(Math.sqrt(2), -Math.sqrt(2));
        Complex b = Complex.I;
        Complex c = new Complex(1, 1).divide(4 * Math.sqrt(2));
        double gm1 = gamma - 1;
        Complex[] u = {Complex.ZERO, a.multiply(gm1 / nu), b.multiply(gm1 / (nu * nu)),
            c.multiply(gm1 / (nu * nu * nu))};
        Complex[] v = {Complex.ZERO, a.negate(), b.negate(), c.negate()};
        Complex[] gs = times(power(u, 0.5), power(v, -0.5));
        Complex[] zs = times(power(u, -0.5), power(v, -0.5));
        Complex[] gi = times(power(u, -0.5), power(v, 0.5));
        Complex[] zi = times(power(u, 0.5), power(v, 0.5));
        for (int n = 1; n <= 3; n++) {
            put(g, n, gs[n]);
            put(z, n, zs[n]);
            put(gInv, n, gi[n]);
            put(zInv, n, zi[n]);
        }
    }

    public static KeefeExpansion forAir(AirProperties air) {
        return new KeefeExpansion(air.gamma(), Math.sqrt(air.prandtl()));
    }

    /** Gamma/(jk) at rv (to third order in 1/rv). */
    public Complex propagation(double rv) {
        return eval(g, 1 / rv);
    }

    /** Zc/(rho c / S) at rv. */
    public Complex characteristic(double rv) {
        return eval(z, 1 / rv);
    }

    /** Coefficient of order n (1..3) of Gamma/(jk). */
    public Complex propagationCoefficient(int n) {
        return new Complex(g[2 * n - 2], g[2 * n - 1]);
    }

    /** Coefficient of order n (1..3) of Zc/(rho c/S). */
    public Complex characteristicCoefficient(int n) {
        return new Complex(z[2 * n - 2], z[2 * n - 1]);
    }

    private static Complex eval(double[] c, double e) {
        double re = 1 + e * (c[0] + e * (c[2] + e * c[4]));
        double im = e * (c[1] + e * (c[3] + e * c[5]));
        return new Complex(re, im);
    }

    private static void put(double[] dst, int n, Complex v) {
        dst[2 * n - 2] = v.getReal();
        dst[2 * n - 1] = v.getImaginary();
    }

    /** (1 + w)^p truncated at order 3, w = w1 e + w2 e^2 + w3 e^3 (binomial series). */
    private static Complex[] power(Complex[] w, double p) {
        Complex[] w2 = times(w, w);
        Complex[] w3 = times(w2, w);
        double c1 = p;
        double c2 = p * (p - 1) / 2;
        double c3 = p * (p - 1) * (p - 2) / 6;
        Complex[] out = new Complex[4];
        out[0] = Complex.ONE;
        for (int n = 1; n <= 3; n++) {
            out[n] = w[n].multiply(c1).add(w2[n].multiply(c2)).add(w3[n].multiply(c3));
        }
        return out;
    }

    /** Product of two series truncated at order 3. */
    private static Complex[] times(Complex[] x, Complex[] y) {
        Complex[] out = new Complex[4];
        for (int n = 0; n <= 3; n++) {
            Complex s = Complex.ZERO;
            for (int i = 0; i <= n; i++) {
                s = s.add(x[i].multiply(y[n - i]));
            }
            out[n] = s;
        }
        return out;
    }
}
