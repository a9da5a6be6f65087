package org.nodewright.physics.aircolumn;

/**
 * A cylinder or conical frustum in the element chain, with the constants its matrix needs at
 * every frequency worked out once: the signed apex distances of a cone (x1 = r1 L / (r2 - r1),
 * x2 = x1 + L) and their ratios, 1/(pi r1 r2), S1, and Keefe's loss polynomials with the
 * element's radius powers, length, 1/(pi r1 r2), S1 and local air folded in ({@link #lossCoef}). The matrix
 * itself is {@link DuctKernel}.
 */
final class Duct implements ChainElement {

    /** Loss coefficients per duct, see {@link #lossCoef}. */
    static final int LOSS_COEFS = 24;

    final double start;
    final double length;
    final double r1;
    final double r2;
    final boolean cone;
    /** Input area pi r1^2, m^2. */
    final double s1;
    final double invPiR1R2;
    /** 1 / mean radius, the radius the loss terms are taken at. */
    final double invRm;
    /** x2 / x1, x1 / x2, 1 / x1, 1 / x2, 1 / x1^2 and L / x1^2 (cones only, else 0). */
    final double r21;
    final double r12;
    final double ix1;
    final double ix2;
    final double ix12;
    final double lx12;
    /**
     * Keefe's coefficients (order 1..3 in 1/rv) pre-multiplied by invRm^n and the factor each is
     * used with, as polynomials in 1/sqrt(rho omega/mu): [0..2] -L Im G, [3..5] L Re G,
     * [6..11] z/(pi r1 r2) re, im, [12..17] S1/z re, im, [18..23] q = 1/(1 + G) - 1 re, im.
     */
    final double[] lossCoef = new double[LOSS_COEFS];
    /** The duct's air relative to the reference air. */
    final LocalAir localAir;
    /** c_ref / c, its inverse, sigma and 1 / (mean radius sigma): see {@link LocalAir}. */
    final double kappa;
    final double invKappa;
    final double invRmSigma;
    /** B's and C's lossless factors in reference units: zeta / (pi r1 r2) and S1 / zeta. */
    final double zBase;
    final double yBase;

    /**
     * @param start  position of the upstream end, m
     * @param length axial length, m (&gt; 0)
     * @param r1     upstream radius, m (&gt; 0)
     * @param r2     downstream radius, m (&gt; 0)
     */
    Duct(double start, double length, double r1, double r2, LocalAir localAir) {
        if (!(length > 0) || !(r1 > 0) || !(r2 > 0)) {
            throw new IllegalArgumentException("duct needs positive length and radii: L=" + length + " r1=" + r1
                    + " r2=" + r2);
        }
        this.start = start;
        this.length = length;
        this.r1 = r1;
        this.r2 = r2;
        this.s1 = Math.PI * r1 * r1;
        this.invPiR1R2 = 1 / (Math.PI * r1 * r2);
        this.invRm = 2 / (r1 + r2);
        this.cone = r1 != r2;
        this.localAir = localAir;
        this.kappa = localAir.kappa();
        this.invKappa = 1 / kappa;
        this.invRmSigma = invRm / localAir.sigma();
        this.zBase = localAir.zeta() * invPiR1R2;
        this.yBase = s1 / localAir.zeta();
        KeefeExpansion keefe = localAir.keefe();
        if (cone) {
            double x1 = r1 * length / (r2 - r1);
            double x2 = x1 + length;
            r21 = x2 / x1;
            r12 = x1 / x2;
            ix1 = 1 / x1;
            ix2 = 1 / x2;
            ix12 = 1 / (x1 * x1);
            lx12 = length * ix12;
        } else {
            r21 = 0;
            r12 = 0;
            ix1 = 0;
            ix2 = 0;
            ix12 = 0;
            lx12 = 0;
        }
        // Loss terms with the local air (see LocalAir): 1/rv = invRm invSw / sigma, k = kappa k_ref.
        double rn = 1;
        for (int n = 0; n < 3; n++) {
            rn *= invRmSigma;
            lossCoef[n] = -length * kappa * rn * keefe.g[2 * n + 1];
            lossCoef[n + 3] = length * kappa * rn * keefe.g[2 * n];
            lossCoef[n + 6] = zBase * rn * keefe.z[2 * n];
            lossCoef[n + 9] = zBase * rn * keefe.z[2 * n + 1];
            lossCoef[n + 12] = yBase * rn * keefe.zInv[2 * n];
            lossCoef[n + 15] = yBase * rn * keefe.zInv[2 * n + 1];
            lossCoef[n + 18] = invKappa * rn * keefe.gInv[2 * n];
            lossCoef[n + 21] = invKappa * rn * keefe.gInv[2 * n + 1];
        }
    }

    @Override
    public double start() {
        return start;
    }

    /** Position of the downstream end, m. */
    double end() {
        return start + length;
    }

    @Override
    public double rotationLength() {
        return length * kappa;
    }

    /** Radius at x (m from the input end of the bore), linear taper. */
    double radiusAt(double x) {
        return r1 + (r2 - r1) * (x - start) / length;
    }

    /** The part of this duct from x (start &lt; x &lt; end) to its downstream end. */
    Duct tail(double x) {
        return new Duct(x, end() - x, radiusAt(x), r2, localAir);
    }

    @Override
    public void propagate(DuctKernel.Frequency w, double er, double ei, DuctKernel.State s) {
        DuctKernel.propagate(this, w, er, ei, s);
    }
}
