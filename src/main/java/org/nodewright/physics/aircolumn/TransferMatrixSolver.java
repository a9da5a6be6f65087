package org.nodewright.physics.aircolumn;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.hipparchus.complex.Complex;

/**
 * The transfer matrix method for a bore of cylinders and conical frusta with side holes: the state
 * (pressure P, volume flow U) is carried from the output end to the input end through each
 * element's 2x2 matrix, so P and U stay continuous across every step in radius. Impedances are
 * kept divided by rho c (units 1/m^2).
 *
 * <p>Cylinder: [[cosh GL, Zc sinh GL], [sinh GL / Zc, cosh GL]]. Conical frustum, exact lossless
 * matrix in terms of the distances x1, x2 of its ends from the apex (signed, x2 - x1 = L; see
 * e.g. Fletcher &amp; Rossing, The Physics of Musical Instruments, 2nd ed. (1998), ch. 8):
 * A = (x2/x1) cos kL - sin kL / (k x1), B = j rho c sin kL / (pi r1 r2),
 * C = j (S1 / rho c) [(x2/x1 + 1/(k x1)^2) sin kL - L cos kL / (k x1^2)],
 * D = (x1/x2) cos kL + sin kL / (k x2); with losses k becomes the complex wavenumber -j Gamma and
 * rho c is multiplied by the characteristic-impedance factor, both taken at the mean radius
 * (lossy cones are cut into pieces whose radii differ by at most 15 %; collinear segments are
 * first joined, see {@link #mergeCollinear}).
 *
 * <p>Speed: the hot loop uses primitive-double complex arithmetic, no objects, because allocating
 * a complex object per operation (about 60 per element and frequency) would make the garbage
 * collector and pointer chasing dominate a 200-element x 4000-frequency sweep. On a uniform
 * grid e^{-jkL} of each element is advanced by one complex rotation per frequency (re-seeded
 * exactly every 128 steps), and the wall-loss factor e^{-(Gamma - jk)L}, small for short
 * elements, by short Taylor series; so most element-frequency pairs need no sine, cosine or
 * exponential at all. cosh and sinh of Gamma L are formed from cos/sin of its imaginary part and
 * cosh/sinh of its (small) real part, so no complex reciprocal is needed, and Keefe's loss
 * polynomials carry each element's radius powers, length, 1/(pi r1 r2) and S1 in precomputed
 * coefficients ({@code lossCoef}). CurvedBoreSweepTest checks the sweep against the per-element path.
 */
public final class TransferMatrixSolver {

    private static final int RESEED = 128;
    private static final double H2 = 1.0 / 2, H3 = 1.0 / 3, H4 = 1.0 / 4, H5 = 1.0 / 5, H6 = 1.0 / 6, H7 = 1.0 / 7;
    private static final double H12 = 1.0 / 12, H20 = 1.0 / 20, H30 = 1.0 / 30, H42 = 1.0 / 42, H56 = 1.0 / 56,
            H72 = 1.0 / 72;
    /** Below this many element-frequency pairs a sweep runs on the calling thread only. */
    private static final long PARALLEL_WORK = 200_000;
    private static final int CHUNK = 512;
    private static final double MAX_LOSSY_CONE_RATIO = 1.15;
    private static final int LOSS_COEFS = 24;

    private final AirColumn column;
    private final AirProperties air;
    private final KeefeExpansion keefe;
    private final boolean losses;
    private final double nu;

    // Elements in order from the input end.
    private final int count;
    private final boolean[] isHole;
    private final double[] start;
    private final double[] len;
    private final double[] r1;
    private final double[] r2;
    private final double[] x1;
    private final double[] x2;
    private final double[] s1;
    private final double[] invPiR1R2;
    private final double[] invRm;
    private final double[] r21;
    private final double[] r12;
    private final double[] ix1;
    private final double[] ix2;
    private final double[] lx12;
    private final double[] ix12;
    private final boolean[] cone;
    /**
     * Per duct, Keefe's coefficients (order 1..3 in 1/rv) pre-multiplied by invRm^n and the factor
     * each is used with, as polynomials in 1/sqrt(rho omega/mu): [0..2] a/(k/sqrt) = -L Im G,
     * [3..5] b = L Re G, [6..11] z/(pi r1 r2) re, im, [12..17] S1/z re, im, [18..23] q re, im.
     */
    private final double[] lossCoef;
    private final ToneHoleModel[] holes;
    private final double inputArea;
    private final double outputRadius;

    public TransferMatrixSolver(AirColumn column) {
        this.column = column;
        this.air = column.air();
        this.keefe = KeefeExpansion.forAir(air);
        this.losses = column.losses();
        this.nu = Math.sqrt(air.prandtl());
        List<double[]> pieces = new ArrayList<>(); // {start, length, r1, r2} or {start, NaN, holeIndex}
        List<ToneHole> sorted = new ArrayList<>(column.holes());
        sorted.sort(Comparator.comparingDouble(ToneHole::position));
        List<ToneHoleModel> models = new ArrayList<>();
        double xs = 0;
        int h = 0;
        for (BoreSegment seg : mergeCollinear(column.segments())) {
            double xe = xs + seg.length();
            double from = xs;
            while (h < sorted.size() && sorted.get(h).position() <= xe) {
                ToneHole hole = sorted.get(h);
                double at = hole.position();
                if (at > from) {
                    addPieces(pieces, from, at - from, seg.radiusAt(from - xs), seg.radiusAt(at - xs));
                    from = at;
                }
                pieces.add(new double[] {at, Double.NaN, models.size()});
                models.add(new ToneHoleModel(hole, seg.radiusAt(at - xs)));
                h++;
            }
            if (xe > from) {
                addPieces(pieces, from, xe - from, seg.radiusAt(from - xs), seg.outputRadius());
            }
            xs = xe;
        }
        this.count = pieces.size();
        isHole = new boolean[count];
        start = new double[count];
        len = new double[count];
        r1 = new double[count];
        r2 = new double[count];
        x1 = new double[count];
        x2 = new double[count];
        s1 = new double[count];
        invPiR1R2 = new double[count];
        invRm = new double[count];
        r21 = new double[count];
        r12 = new double[count];
        ix1 = new double[count];
        ix2 = new double[count];
        lx12 = new double[count];
        ix12 = new double[count];
        cone = new boolean[count];
        holes = new ToneHoleModel[count];
        lossCoef = new double[count * LOSS_COEFS];
        for (int e = 0; e < count; e++) {
            double[] p = pieces.get(e);
            start[e] = p[0];
            if (Double.isNaN(p[1])) {
                isHole[e] = true;
                holes[e] = models.get((int) p[2]);
                continue;
            }
            len[e] = p[1];
            r1[e] = p[2];
            r2[e] = p[3];
            s1[e] = Math.PI * p[2] * p[2];
            invPiR1R2[e] = 1 / (Math.PI * p[2] * p[3]);
            invRm[e] = 2 / (p[2] + p[3]);
            cone[e] = p[2] != p[3];
            if (cone[e]) {
                // Distances from the apex, signed: x1 = r1 L / (r2 - r1), x2 = x1 + L.
                x1[e] = p[2] * p[1] / (p[3] - p[2]);
                x2[e] = x1[e] + p[1];
                r21[e] = x2[e] / x1[e];
                r12[e] = x1[e] / x2[e];
                ix1[e] = 1 / x1[e];
                ix2[e] = 1 / x2[e];
                ix12[e] = 1 / (x1[e] * x1[e]);
                lx12[e] = p[1] * ix12[e];
            }
            double rn = 1;
            for (int n = 0; n < 3; n++) {
                rn *= invRm[e];
                int o = e * LOSS_COEFS + n;
                lossCoef[o] = -len[e] * rn * keefe.g[2 * n + 1];
                lossCoef[o + 3] = len[e] * rn * keefe.g[2 * n];
                lossCoef[o + 6] = invPiR1R2[e] * rn * keefe.z[2 * n];
                lossCoef[o + 9] = invPiR1R2[e] * rn * keefe.z[2 * n + 1];
                lossCoef[o + 12] = s1[e] * rn * keefe.zInv[2 * n];
                lossCoef[o + 15] = s1[e] * rn * keefe.zInv[2 * n + 1];
                lossCoef[o + 18] = rn * keefe.gInv[2 * n];
                lossCoef[o + 21] = rn * keefe.gInv[2 * n + 1];
            }
        }
        BoreSegment first = column.segments().get(0);
        inputArea = Math.PI * first.inputRadius() * first.inputRadius();
        outputRadius = column.segments().get(column.segments().size() - 1).outputRadius();
    }

    /**
     * Joins consecutive segments that form one straight cone or cylinder (same taper, no step):
     * the exact cone matrix of the whole run equals the product of its parts without losses, and
     * with losses the run is cut again below (radii within an element differ by at most 15 %), so
     * a bore drawn as many collinear frusta costs no more than its distinct tapers.
     */
    static List<BoreSegment> mergeCollinear(List<BoreSegment> segments) {
        List<BoreSegment> out = new ArrayList<>();
        BoreSegment run = null;
        for (BoreSegment s : segments) {
            if (run != null && collinear(run, s)) {
                run = new BoreSegment(run.length() + s.length(), run.inputRadius(), s.outputRadius());
            } else {
                if (run != null) {
                    out.add(run);
                }
                run = s;
            }
        }
        out.add(run);
        return out;
    }

    private static boolean collinear(BoreSegment a, BoreSegment b) {
        double scale = Math.max(a.outputRadius(), b.inputRadius());
        if (Math.abs(a.outputRadius() - b.inputRadius()) > 1e-9 * scale) {
            return false;
        }
        if (a.isCylinder() && b.isCylinder()) {
            return true;
        }
        double ta = (a.outputRadius() - a.inputRadius()) / a.length();
        double tb = (b.outputRadius() - b.inputRadius()) / b.length();
        return Math.abs(ta - tb) <= 1e-9 * Math.max(Math.abs(ta), Math.abs(tb)) && ta != 0 && tb != 0;
    }

    private void addPieces(List<double[]> pieces, double from, double length, double ra, double rb) {
        int n = 1;
        if (losses && ra != rb) {
            double ratio = Math.max(ra, rb) / Math.min(ra, rb);
            n = (int) Math.ceil(Math.log(ratio) / Math.log(MAX_LOSSY_CONE_RATIO) - 1e-9);
            n = Math.max(1, Math.min(n, 64));
        }
        for (int i = 0; i < n; i++) {
            double a = ra + (rb - ra) * i / n;
            double b = ra + (rb - ra) * (i + 1) / n;
            pieces.add(new double[] {from + length * i / n, length / n, a, b});
        }
    }

    public AirColumn column() {
        return column;
    }

    /** Number of elements (bore pieces and holes) in the chain. */
    public int elementCount() {
        return count;
    }

    /** Area of the input end, m^2. */
    public double inputArea() {
        return inputArea;
    }

    /**
     * Input impedance divided by rho c / S_input on the uniform grid f0 + i df, i = 0..n-1.
     *
     * @throws IllegalArgumentException for a non-positive f0, negative df or short output arrays
     */
    public void inputImpedance(double f0, double df, int n, double[] outRe, double[] outIm) {
        if (!(f0 > 0) || !(df >= 0) || n < 1 || outRe.length < n || outIm.length < n) {
            throw new IllegalArgumentException("need f0 > 0, df >= 0, n >= 1 and arrays of n: f0=" + f0 + " df=" + df
                    + " n=" + n);
        }
        int chunks = (n + CHUNK - 1) / CHUNK;
        if ((long) n * count >= PARALLEL_WORK && chunks > 1) {
            // Frequencies are independent: chunks run on the common pool (and this thread).
            java.util.stream.IntStream.range(0, chunks).parallel()
                    .forEach(ch -> sweep(f0, df, ch * CHUNK, Math.min(n, (ch + 1) * CHUNK), outRe, outIm));
        } else {
            sweep(f0, df, 0, n, outRe, outIm);
        }
    }

    private void sweep(double f0, double df, int from, int to, double[] outRe, double[] outIm) {
        double c = air.speedOfSound();
        double rhoOverMu = air.density() / air.viscosity();
        // e^{-jkL} of every duct (and e^{-2jk te} of every hole chimney), advanced by rotation.
        double[] rotRe = new double[count];
        double[] rotIm = new double[count];
        double[] stepRe = new double[count];
        double[] stepIm = new double[count];
        double[] rotLen = new double[count];
        for (int e = 0; e < count; e++) {
            rotLen[e] = isHole[e] ? 2 * holes[e].chimneyLength() : len[e];
        }
        double dk = 2 * Math.PI * df / c;
        for (int e = 0; e < count; e++) {
            stepRe[e] = Math.cos(dk * rotLen[e]);
            stepIm[e] = -Math.sin(dk * rotLen[e]);
        }
        double[] hz = new double[4];
        double[] st = new double[4];
        for (int i = from; i < to; i++) {
            double f = f0 + i * df;
            double omega = 2 * Math.PI * f;
            double k = omega / c;
            double sw = losses ? Math.sqrt(rhoOverMu * omega) : 0;
            double invSw = losses ? 1 / sw : 0;
            double invK = 1 / k;
            double kws = k * invSw;
            double kv = invK * invSw;
            boolean reseed = (i - from) % RESEED == 0;
            load(k, st);
            double pr = st[0];
            double pi = st[1];
            double ur = st[2];
            double ui = st[3];
            for (int e = count - 1; e >= 0; e--) {
                double er;
                double ei;
                if (reseed) {
                    double th = k * rotLen[e];
                    er = Math.cos(th);
                    ei = -Math.sin(th);
                } else {
                    double or = rotRe[e];
                    double oi = rotIm[e];
                    er = or * stepRe[e] - oi * stepIm[e];
                    ei = or * stepIm[e] + oi * stepRe[e];
                }
                rotRe[e] = er;
                rotIm[e] = ei;
                if (isHole[e]) {
                    holes[e].impedances(k, sw, er, ei, losses, keefe, air, hz);
                    st[0] = pr;
                    st[1] = pi;
                    st[2] = ur;
                    st[3] = ui;
                    applyHole(st, hz);
                    pr = st[0];
                    pi = st[1];
                    ur = st[2];
                    ui = st[3];
                    continue;
                }
                // The body of applyDuct, inlined by hand with the state in locals (the method is too
                // large for the JIT to inline); ResonanceTest checks both paths give the same state.
                // Loss terms with the element's factors folded in (see lossCoef): B's 1/(pi r1 r2), C's
                // S1 and the length are inside the polynomials in 1/sqrt(rho omega/mu), so each needs
                // only its Horner steps: zrS = Re(z)/(pi r1 r2), zirS = Re(1/z) S1, ik = 1/k_c.
                double zrS = invPiR1R2[e], ziS = 0, zirS = s1[e], ziiS = 0, ikr = invK, iki = 0, a = 0, b = 0;
                if (losses) {
                    double ep = invRm[e] * invSw; // 1 / rv
                    if (ep <= KeefeExpansion.MAX_INV_RV) {
                        int o = e * LOSS_COEFS;
                        double[] lc = lossCoef;
                        a = kws * (lc[o] + invSw * (lc[o + 1] + invSw * lc[o + 2]));
                        b = kws * (lc[o + 3] + invSw * (lc[o + 4] + invSw * lc[o + 5]));
                        zrS += invSw * (lc[o + 6] + invSw * (lc[o + 7] + invSw * lc[o + 8]));
                        ziS = invSw * (lc[o + 9] + invSw * (lc[o + 10] + invSw * lc[o + 11]));
                        zirS += invSw * (lc[o + 12] + invSw * (lc[o + 13] + invSw * lc[o + 14]));
                        ziiS = invSw * (lc[o + 15] + invSw * (lc[o + 16] + invSw * lc[o + 17]));
                        ikr += kv * (lc[o + 18] + invSw * (lc[o + 19] + invSw * lc[o + 20]));
                        iki = kv * (lc[o + 21] + invSw * (lc[o + 22] + invSw * lc[o + 23]));
                    } else {
                        double[] ex = exactLoss(1 / ep);
                        a = -k * ex[1] * len[e];
                        b = k * ex[0] * len[e];
                        double ipr = zrS;
                        double area = zirS;
                        zrS = ex[2] * ipr;
                        ziS = ex[3] * ipr;
                        zirS = ex[4] * area;
                        ziiS = ex[5] * area;
                        ikr = (1 + ex[6]) * invK;
                        iki = ex[7] * invK;
                    }
                }
                // cosh and sinh of Gamma L = a + j theta, theta = kL + b, from cos/sin theta (the
                // rotated e^{-jkL} times e^{-jb}) and cosh/sinh a by short series: no exp, no division
                // (the old E, 1/E form needed one complex reciprocal per element and frequency).
                double cth = er;
                double sth = -ei;
                double cha = 1;
                double sha = 0;
                if (losses) {
                    double cb;
                    double sb;
                    if (Math.abs(a) < 0.01 && Math.abs(b) < 0.01) {
                        // Short element (the usual case): Taylor series (A&S 4.3.65-66, 4.5.62-63);
                        // the first omitted terms, x^6/720 and x^5/120, are below 1.4e-15 and 8.4e-13.
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
                double chr = cha * cth;
                double chi = sha * sth;
                double shr = sha * cth;
                double shi = cha * sth;
                double br = zrS * shr - ziS * shi;
                double bi = zrS * shi + ziS * shr;
                double ar;
                double ai;
                double cr;
                double ci;
                double dr;
                double di;
                if (!cone[e]) {
                    ar = chr;
                    ai = chi;
                    dr = chr;
                    di = chi;
                    cr = zirS * shr - ziiS * shi;
                    ci = zirS * shi + ziiS * shr;
                } else {
                    double jsr = -(shr * iki + shi * ikr);
                    double jsi = shr * ikr - shi * iki;
                    double q21 = r21[e];
                    double q12 = r12[e];
                    double i1 = ix1[e];
                    double i2 = ix2[e];
                    ar = q21 * chr + jsr * i1;
                    ai = q21 * chi + jsi * i1;
                    dr = q12 * chr - jsr * i2;
                    di = q12 * chi - jsi * i2;
                    double lx = lx12[e];
                    double ix = ix12[e];
                    double t1r = (chr * ikr - chi * iki) * lx;
                    double t1i = (chr * iki + chi * ikr) * lx;
                    double fr = q21 + (ikr * ikr - iki * iki) * ix;
                    double fi = 2 * ikr * iki * ix;
                    double wr = t1i + shr * fr - shi * fi;
                    double wi = -t1r + shr * fi + shi * fr;
                    cr = zirS * wr - ziiS * wi;
                    ci = zirS * wi + ziiS * wr;
                }
                double npr = ar * pr - ai * pi + br * ur - bi * ui;
                double npi = ar * pi + ai * pr + br * ui + bi * ur;
                double nur = cr * pr - ci * pi + dr * ur - di * ui;
                double nui = cr * pi + ci * pr + dr * ui + di * ur;
                pr = npr;
                pi = npi;
                ur = nur;
                ui = nui;
            }
            double d = ur * ur + ui * ui;
            outRe[i] = (pr * ur + pi * ui) / d * inputArea;
            outIm[i] = (pi * ur - pr * ui) / d * inputArea;
        }
    }

    /** {G re, G im, z re, z im, 1/z re, 1/z im, q re, q im} from the exact Bessel form at rv. */
    private double[] exactLoss(double rv) {
        Complex[] ex = ZwikkerKosten.normalisedAt(rv, air.gamma(), nu);
        Complex zInv = ex[1].reciprocal();
        Complex q = ex[0].reciprocal();
        return new double[] {ex[0].getReal() - 1, ex[0].getImaginary(), ex[1].getReal(), ex[1].getImaginary(),
            zInv.getReal(), zInv.getImaginary(), q.getReal() - 1, q.getImaginary()};
    }

    /** Input impedance / (rho c / S_input) at one frequency, {re, im}. */
    public double[] inputImpedance(double f) {
        double[] re = new double[1];
        double[] im = new double[1];
        inputImpedance(f, 0, 1, re, im);
        return new double[] {re[0], im[0]};
    }

    /** The state {P re, P im, U re, U im} (arbitrary scale) at the output end. */
    private void load(double k, double[] st) {
        switch (column.outputEnd()) {
            case CLOSED -> {
                st[0] = 1;
                st[1] = 0;
                st[2] = 0;
                st[3] = 0;
            }
            case IDEAL_OPEN -> {
                st[0] = 0;
                st[1] = 0;
                st[2] = 1;
                st[3] = 0;
            }
            default -> {
                double[] zr = new double[2];
                Radiation.normalisedImpedance(column.outputEnd() == OutputEnd.OPEN_FLANGED, k * outputRadius, zr);
                double invS = 1 / (Math.PI * outputRadius * outputRadius);
                st[0] = zr[0] * invS;
                st[1] = zr[1] * invS;
                st[2] = 1;
                st[3] = 0;
            }
        }
    }

    /** T network: series Za/2, shunt 1/Zs, series Za/2 (Lefebvre &amp; Scavone 2012), applied upstream. */
    private static void applyHole(double[] st, double[] hz) {
        double har = hz[2] / 2;
        double hai = hz[3] / 2;
        double pr = st[0] + har * st[2] - hai * st[3];
        double pi = st[1] + har * st[3] + hai * st[2];
        double d = hz[0] * hz[0] + hz[1] * hz[1];
        double yr = hz[0] / d;
        double yi = -hz[1] / d;
        double ur = st[2] + yr * pr - yi * pi;
        double ui = st[3] + yr * pi + yi * pr;
        st[0] = pr + har * ur - hai * ui;
        st[1] = pi + har * ui + hai * ur;
        st[2] = ur;
        st[3] = ui;
    }

    /**
     * Applies one duct's matrix to the state. (er, ei) = e^{-jkL} for the lossless wavenumber.
     */
    private void applyDuct(double[] st, double er, double ei, double k, double invK, double invSw, double l,
            double ratio21, double ratio12, double invX1, double invX2, double lOverX12, double invX12, double area,
            double invPiRR, double invRmean, boolean isCone) {
        // Loss factors: Gamma/(jk) = 1 + G, z = Zc S/(rho c), zInv = 1/z, q = (1 + G)^-1 - 1.
        double gr = 0, gi = 0, zr = 1, zi = 0, zir = 1, zii = 0, qr = 0, qi = 0;
        if (losses) {
            double e = invRmean * invSw; // 1 / rv
            if (e <= KeefeExpansion.MAX_INV_RV) {
                double[] g = keefe.g;
                double[] z = keefe.z;
                double[] gv = keefe.gInv;
                double[] zv = keefe.zInv;
                gr = e * (g[0] + e * (g[2] + e * g[4]));
                gi = e * (g[1] + e * (g[3] + e * g[5]));
                zr = 1 + e * (z[0] + e * (z[2] + e * z[4]));
                zi = e * (z[1] + e * (z[3] + e * z[5]));
                zir = 1 + e * (zv[0] + e * (zv[2] + e * zv[4]));
                zii = e * (zv[1] + e * (zv[3] + e * zv[5]));
                qr = e * (gv[0] + e * (gv[2] + e * gv[4]));
                qi = e * (gv[1] + e * (gv[3] + e * gv[5]));
            } else {
                double[] ex = exactLoss(1 / e);
                gr = ex[0];
                gi = ex[1];
                zr = ex[2];
                zi = ex[3];
                zir = ex[4];
                zii = ex[5];
                qr = ex[6];
                qi = ex[7];
            }
            // Gamma L = jkL + (a + jb) with a = -k gi L, b = k gr L; multiply e^{-jkL} by e^{-a} e^{-jb}.
            double a = -k * gi * l;
            double b = k * gr * l;
            double ea;
            double cb;
            double sb;
            if (Math.abs(a) < 0.1 && Math.abs(b) < 0.1) {
                // Taylor series to 7th order: truncation below 3e-12 (reciprocal constants: no divisions).
                ea = 1 - a * (1 - a * H2 * (1 - a * H3 * (1 - a * H4 * (1 - a * H5 * (1 - a * H6 * (1 - a * H7))))));
                double b2 = b * b;
                cb = 1 - b2 * H2 * (1 - b2 * H12 * (1 - b2 * H30 * (1 - b2 * H56)));
                sb = b * (1 - b2 * H6 * (1 - b2 * H20 * (1 - b2 * H42 * (1 - b2 * H72))));
            } else {
                ea = Math.exp(-a);
                cb = Math.cos(b);
                sb = Math.sin(b);
            }
            // e^{-jb} = cb - j sb
            double nr = ea * (er * cb + ei * sb);
            double ni = ea * (ei * cb - er * sb);
            er = nr;
            ei = ni;
        }
        // E = e^{-Gamma L}, 1/E = conj(E)/|E|^2; cosh = (1/E + E)/2, sinh = (1/E - E)/2.
        double m2 = er * er + ei * ei;
        double ivr = er / m2;
        double ivi = -ei / m2;
        double chr = (ivr + er) * 0.5;
        double chi = (ivi + ei) * 0.5;
        double shr = (ivr - er) * 0.5;
        double shi = (ivi - ei) * 0.5;
        double ar;
        double ai;
        double br;
        double bi;
        double cr;
        double ci;
        double dr;
        double di;
        // B = z sinh / (pi r1 r2)
        br = (zr * shr - zi * shi) * invPiRR;
        bi = (zr * shi + zi * shr) * invPiRR;
        if (!isCone) {
            ar = chr;
            ai = chi;
            dr = chr;
            di = chi;
            cr = (zir * shr - zii * shi) * area;
            ci = (zir * shi + zii * shr) * area;
        } else {
            // 1/k_c = (1 + q)/k; sin(k_c L) = -j sinh, cos(k_c L) = cosh.
            double ikr = (1 + qr) * invK;
            double iki = qi * invK;
            // j sinh / k_c
            double jsr = -(shr * iki + shi * ikr);
            double jsi = shr * ikr - shi * iki;
            ar = ratio21 * chr + jsr * invX1;
            ai = ratio21 * chi + jsi * invX1;
            dr = ratio12 * chr - jsr * invX2;
            di = ratio12 * chi - jsi * invX2;
            // C = (S1/z) [ -j L cosh / (k_c x1^2) + sinh (x2/x1 + 1/(k_c x1)^2) ]
            double t1r = (chr * ikr - chi * iki) * lOverX12; // L cosh / k_c / x1^2
            double t1i = (chr * iki + chi * ikr) * lOverX12;
            double ik2r = (ikr * ikr - iki * iki) * invX12;
            double ik2i = 2 * ikr * iki * invX12;
            double fr = ratio21 + ik2r;
            double fi = ik2i;
            double t2r = shr * fr - shi * fi;
            double t2i = shr * fi + shi * fr;
            double wr = t1i + t2r; // -j (t1r + j t1i) = t1i - j t1r
            double wi = -t1r + t2i;
            cr = (zir * wr - zii * wi) * area;
            ci = (zir * wi + zii * wr) * area;
        }
        double pr = st[0];
        double pi = st[1];
        double ur = st[2];
        double ui = st[3];
        st[0] = ar * pr - ai * pi + br * ur - bi * ui;
        st[1] = ar * pi + ai * pr + br * ui + bi * ur;
        st[2] = cr * pr - ci * pi + dr * ur - di * ui;
        st[3] = cr * pi + ci * pr + dr * ui + di * ur;
    }

    /**
     * Pressure and volume flow along the bore at frequency f, sampled at the given positions
     * (ascending, within 0..L, metres), scaled so that the input volume flow... is arbitrary: the
     * caller normalises. Returns {pRe[], pIm[], uRe[], uIm[]}.
     */
    public double[][] standingWave(double f, double[] positions) {
        double c = air.speedOfSound();
        double omega = 2 * Math.PI * f;
        double k = omega / c;
        double sw = losses ? Math.sqrt(air.density() * omega / air.viscosity()) : 0;
        double invSw = losses ? 1 / sw : 0;
        double invK = 1 / k;
        // States at the downstream side of each element boundary, from the output end.
        double[][] downstream = new double[count][];
        double[] st = new double[4];
        double[] hz = new double[4];
        load(k, st);
        for (int e = count - 1; e >= 0; e--) {
            downstream[e] = st.clone();
            if (isHole[e]) {
                double th = 2 * k * holes[e].chimneyLength();
                holes[e].impedances(k, sw, Math.cos(th), -Math.sin(th), losses, keefe, air, hz);
                applyHole(st, hz);
            } else {
                applyDuct(st, Math.cos(k * len[e]), -Math.sin(k * len[e]), k, invK, invSw, len[e], r21[e], r12[e],
                        ix1[e], ix2[e], lx12[e], ix12[e], s1[e], invPiR1R2[e], invRm[e], cone[e]);
            }
        }
        int m = positions.length;
        double[][] out = new double[4][m];
        double total = column.length();
        for (int j = 0; j < m; j++) {
            double x = Math.min(Math.max(positions[j], 0), total);
            int e = elementAt(x);
            double[] s = downstream[e].clone();
            double rest = start[e] + len[e] - x;
            if (rest > 0) {
                double ra = r1[e] + (r2[e] - r1[e]) * (x - start[e]) / len[e];
                double rb = r2[e];
                boolean isCone = ra != rb && cone[e];
                double xa = isCone ? ra * rest / (rb - ra) : 1;
                double xb = xa + rest;
                applyDuct(s, Math.cos(k * rest), -Math.sin(k * rest), k, invK, invSw, rest, xb / xa, xa / xb, 1 / xa,
                        1 / xb, rest / (xa * xa), 1 / (xa * xa), Math.PI * ra * ra, 1 / (Math.PI * ra * rb),
                        2 / (ra + rb), isCone);
            }
            out[0][j] = s[0];
            out[1][j] = s[1];
            out[2][j] = s[2];
            out[3][j] = s[3];
        }
        return out;
    }

    /** The duct element containing x (the last one starting at or before x). */
    private int elementAt(double x) {
        int best = -1;
        for (int e = 0; e < count; e++) {
            if (!isHole[e] && start[e] <= x) {
                best = e;
            }
        }
        return Math.max(best, firstDuct());
    }

    private int firstDuct() {
        for (int e = 0; e < count; e++) {
            if (!isHole[e]) {
                return e;
            }
        }
        throw new IllegalStateException("no duct element");
    }

    /** Positions of the element boundaries along the bore, metres (for sampling profiles). */
    public double[] boundaries() {
        List<Double> xs = new ArrayList<>();
        for (int e = 0; e < count; e++) {
            if (!isHole[e]) {
                xs.add(start[e]);
            }
        }
        xs.add(column.length());
        return xs.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
