package org.nodewright.physics.aircolumn;

import org.hipparchus.complex.Complex;

/**
 * The one place a duct's transfer matrix is applied, by the impedance sweep and by the standing
 * waves alike. State (P, U) is carried upstream: [P1; U1] = [[A, B], [C, D]] [P2; U2], impedances
 * divided by rho c (units 1/m^2).
 *
 * <p>Cylinder: A = D = cosh GL, B = z sinh GL / (pi r^2), C = (S/z) sinh GL. Conical frustum, the
 * exact spherical-wave matrix with the signed apex distances x1, x2 of its ends (Fletcher &amp;
 * Rossing, The Physics of Musical Instruments, 2nd ed. (1998), ch. 8): A = (x2/x1) cos kL - sin kL
 * / (k x1), B = j sin kL / (pi r1 r2), C = j S1 [(x2/x1 + 1/(k x1)^2) sin kL - L cos kL / (k x1^2)],
 * D = (x1/x2) cos kL + sin kL / (k x2). With losses k becomes the complex wavenumber -j Gamma
 * (sin kL = -j sinh GL, cos kL = cosh GL) and z the characteristic-impedance factor, both at the
 * mean radius: Keefe's expansion (J. Acoust. Soc. Am. 75, 58 (1984)) for rv &gt;= 8, the exact
 * Zwikker-Kosten form below.
 *
 * <p>Speed: primitive-double complex arithmetic, no objects per call, and no sine, cosine,
 * exponential or division for the usual short element: the caller supplies e^{-jkL} (the sweep
 * advances it by one rotation per frequency), cosh and sinh of Gamma L = a + j theta are formed
 * from cos/sin theta and short series in a and b = theta - kL. The work is split into three
 * methods small enough for the JIT to inline into the sweep's loop.
 */
final class DuctKernel {

    private static final double H2 = 1.0 / 2, H6 = 1.0 / 6, H12 = 1.0 / 12;
    /** Below this |a| and |b| the series for cosh, sinh, cos and sin are used (see {@link #hyperbolic}). */
    static final double SERIES_LIMIT = 0.01;

    private DuctKernel() {
    }

    /** Pressure and volume flow {P, U} (complex, arbitrary common scale). */
    static final class State {
        double pr;
        double pi;
        double ur;
        double ui;

        void set(double pRe, double pIm, double uRe, double uIm) {
            pr = pRe;
            pi = pIm;
            ur = uRe;
            ui = uIm;
        }

        State copy() {
            State s = new State();
            s.set(pr, pi, ur, ui);
            return s;
        }
    }

    /**
     * What every element needs at one frequency (and scratch for the element being applied). One
     * per thread: {@link #at} rewrites it for the next frequency.
     */
    static final class Frequency {
        final AirProperties air;
        final KeefeExpansion keefe;
        final boolean losses;
        private final double c;
        private final double rhoOverMu;
        final double[] holeScratch = new double[4];

        double f;
        double k;
        double invK;
        /** sqrt(rho omega / mu), so that rv = r sw; 0 without losses. */
        double sw;
        double invSw;
        /** k / sw and 1 / (k sw). */
        double kws;
        double kv;

        // The duct being applied: Gamma L = a + j(kL + b), zS = z/(pi r1 r2), yS = S1/z, ik = 1/k_c;
        // cosh and sinh of Gamma L.
        double a;
        double b;
        double zSr;
        double zSi;
        double ySr;
        double ySi;
        double ikr;
        double iki;
        double chr;
        double chi;
        double shr;
        double shi;
        /** A cone's C element. */
        double cr;
        double ci;

        Frequency(AirProperties air, KeefeExpansion keefe, boolean losses) {
            this.air = air;
            this.keefe = keefe;
            this.losses = losses;
            this.c = air.speedOfSound();
            this.rhoOverMu = air.density() / air.viscosity();
        }

        /** Sets the terms for frequency f (Hz, &gt; 0). */
        Frequency at(double frequency) {
            f = frequency;
            double omega = 2 * Math.PI * frequency;
            k = omega / c;
            sw = losses ? Math.sqrt(rhoOverMu * omega) : 0;
            invSw = losses ? 1 / sw : 0;
            invK = 1 / k;
            kws = k * invSw;
            kv = invK * invSw;
            return this;
        }
    }

    /**
     * Applies duct d at the frequency of w to s. (er, ei) = e^{-jkL} for the lossless wavenumber.
     */
    static void propagate(Duct d, Frequency w, double er, double ei, State s) {
        lossTerms(d, w);
        hyperbolic(w, er, ei);
        if (d.cone) {
            applyCone(d, w, s);
        } else {
            applyCylinder(w, s);
        }
    }

    /**
     * The loss terms a, b, zS, yS and 1/k_c of d at w: Keefe's polynomials in 1/sqrt(rho omega/mu)
     * with d's factors folded in (one Horner step each), or the exact Bessel form below rv = 8.
     */
    static void lossTerms(Duct d, Frequency w) {
        if (!w.losses) {
            w.a = 0;
            w.b = 0;
            w.zSr = d.zBase;
            w.zSi = 0;
            w.ySr = d.yBase;
            w.ySi = 0;
            w.ikr = w.invK * d.invKappa;
            w.iki = 0;
        } else if (d.invRmSigma * w.invSw <= KeefeExpansion.MAX_INV_RV) {
            keefeTerms(d, w);
        } else {
            exactTerms(d, w);
        }
    }

    /** Keefe's expansion, rv &gt;= 8: each term one Horner step in 1/sqrt(rho omega/mu). */
    private static void keefeTerms(Duct d, Frequency w) {
        double[] lc = d.lossCoef;
        double v = w.invSw;
        double kws = w.kws;
        double kv = w.kv;
        w.a = kws * (lc[0] + v * (lc[1] + v * lc[2]));
        w.b = kws * (lc[3] + v * (lc[4] + v * lc[5]));
        w.zSr = d.zBase + v * (lc[6] + v * (lc[7] + v * lc[8]));
        w.zSi = v * (lc[9] + v * (lc[10] + v * lc[11]));
        w.ySr = d.yBase + v * (lc[12] + v * (lc[13] + v * lc[14]));
        w.ySi = v * (lc[15] + v * (lc[16] + v * lc[17]));
        w.ikr = w.invK * d.invKappa + kv * (lc[18] + v * (lc[19] + v * lc[20]));
        w.iki = kv * (lc[21] + v * (lc[22] + v * lc[23]));
    }

    /** The exact Zwikker-Kosten form at the mean radius (narrow ducts at low frequency). */
    private static void exactTerms(Duct d, Frequency w) {
        LocalAir la = d.localAir;
        double[] ex = exactLoss(1 / (d.invRmSigma * w.invSw), la.air().gamma(), Math.sqrt(la.air().prandtl()));
        double kl = w.k * d.kappa * d.length;
        w.a = -kl * ex[1];
        w.b = kl * ex[0];
        w.zSr = ex[2] * d.zBase;
        w.zSi = ex[3] * d.zBase;
        w.ySr = ex[4] * d.yBase;
        w.ySi = ex[5] * d.yBase;
        double ik = w.invK * d.invKappa;
        w.ikr = (1 + ex[6]) * ik;
        w.iki = ex[7] * ik;
    }

    /**
     * cosh and sinh of Gamma L = a + j theta, theta = kL + b, from cos/sin theta (the given e^{-jkL}
     * times e^{-jb}) and cosh/sinh a. For |a|, |b| &lt; {@link #SERIES_LIMIT} the Taylor series
     * (Abramowitz &amp; Stegun 4.3.65-66, 4.5.62-63) to x^4 and x^5: the first omitted terms,
     * x^6/720 and x^5/120 relative, are below 1.4e-15 and 8.4e-13.
     */
    static void hyperbolic(Frequency w, double er, double ei) {
        double cth = er;
        double sth = -ei;
        double cha = 1;
        double sha = 0;
        if (w.losses) {
            double a = w.a;
            double b = w.b;
            double cb;
            double sb;
            if (Math.abs(a) < SERIES_LIMIT && Math.abs(b) < SERIES_LIMIT) {
                double a2 = a * a;
                cha = 1 + a2 * H2 * (1 + a2 * H12);
                sha = a * (1 + a2 * H6);
                double b2 = b * b;
                cb = 1 - b2 * H2 * (1 - b2 * H12);
                sb = b * (1 - b2 * H6);
            } else {
                cha = Math.cosh(a);
                sha = Math.sinh(a);
                cb = Math.cos(b);
                sb = Math.sin(b);
            }
            // e^{-j theta} = (er + j ei)(cb - j sb)
            cth = er * cb + ei * sb;
            sth = er * sb - ei * cb;
        }
        w.chr = cha * cth;
        w.chi = sha * sth;
        w.shr = sha * cth;
        w.shi = cha * sth;
    }

    /** A = D = cosh, B = zS sinh, C = yS sinh. */
    private static void applyCylinder(Frequency w, State s) {
        double chr = w.chr;
        double chi = w.chi;
        double shr = w.shr;
        double shi = w.shi;
        double br = w.zSr * shr - w.zSi * shi;
        double bi = w.zSr * shi + w.zSi * shr;
        double cr = w.ySr * shr - w.ySi * shi;
        double ci = w.ySr * shi + w.ySi * shr;
        double pr = s.pr;
        double pi = s.pi;
        double ur = s.ur;
        double ui = s.ui;
        s.pr = chr * pr - chi * pi + br * ur - bi * ui;
        s.pi = chr * pi + chi * pr + br * ui + bi * ur;
        s.ur = cr * pr - ci * pi + chr * ur - chi * ui;
        s.ui = cr * pi + ci * pr + chr * ui + chi * ur;
    }

    /** The cone's A, B, C, D (class comment) with sin kL = -j sinh, cos kL = cosh, 1/k = 1/k_c. */
    private static void applyCone(Duct d, Frequency w, State s) {
        coneC(d, w);
        double chr = w.chr;
        double chi = w.chi;
        double shr = w.shr;
        double shi = w.shi;
        double ikr = w.ikr;
        double iki = w.iki;
        double br = w.zSr * shr - w.zSi * shi;
        double bi = w.zSr * shi + w.zSi * shr;
        // j sinh / k_c
        double jsr = -(shr * iki + shi * ikr);
        double jsi = shr * ikr - shi * iki;
        double ar = d.r21 * chr + jsr * d.ix1;
        double ai = d.r21 * chi + jsi * d.ix1;
        double dr = d.r12 * chr - jsr * d.ix2;
        double di = d.r12 * chi - jsi * d.ix2;
        double cr = w.cr;
        double ci = w.ci;
        double pr = s.pr;
        double pi = s.pi;
        double ur = s.ur;
        double ui = s.ui;
        s.pr = ar * pr - ai * pi + br * ur - bi * ui;
        s.pi = ar * pi + ai * pr + br * ui + bi * ur;
        s.ur = cr * pr - ci * pi + dr * ur - di * ui;
        s.ui = cr * pi + ci * pr + dr * ui + di * ur;
    }

    /** The cone's C = yS [ -j L cosh / (k_c x1^2) + sinh (x2/x1 + 1/(k_c x1)^2) ], into w.cr, w.ci. */
    private static void coneC(Duct d, Frequency w) {
        double chr = w.chr;
        double chi = w.chi;
        double ikr = w.ikr;
        double iki = w.iki;
        double lx = d.lx12;
        double ix = d.ix12;
        double t1r = (chr * ikr - chi * iki) * lx;
        double t1i = (chr * iki + chi * ikr) * lx;
        double fr = d.r21 + (ikr * ikr - iki * iki) * ix;
        double fi = 2 * ikr * iki * ix;
        double wr = t1i + w.shr * fr - w.shi * fi;
        double wi = -t1r + w.shr * fi + w.shi * fr;
        w.cr = w.ySr * wr - w.ySi * wi;
        w.ci = w.ySr * wi + w.ySi * wr;
    }

    /** {G re, G im, z re, z im, 1/z re, 1/z im, q re, q im} from the exact Bessel form at rv. */
    static double[] exactLoss(double rv, double gamma, double nu) {
        Complex[] ex = ZwikkerKosten.normalisedAt(rv, gamma, nu);
        Complex zInv = ex[1].reciprocal();
        Complex q = ex[0].reciprocal();
        return new double[] {ex[0].getReal() - 1, ex[0].getImaginary(), ex[1].getReal(), ex[1].getImaginary(),
            zInv.getReal(), zInv.getImaginary(), q.getReal() - 1, q.getImaginary()};
    }
}
