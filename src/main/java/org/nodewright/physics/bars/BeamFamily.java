package org.nodewright.physics.bars;

import java.util.ArrayList;
import java.util.List;

/**
 * Bending modes of a bar by the finite-element method (Rayleigh–Ritz on the beam's strain and
 * kinetic energies, consistent mass): Euler–Bernoulli with cubic Hermite elements, Timoshenko with
 * four-node cubic Lagrange elements for displacement and rotation (see {@link BeamElement}).
 * Energies, with ψ the section rotation and γ = w' − ψ the shear strain:
 * U = ½∫ EI ψ'² + κGA γ² dx, T = ½∫ ρA ẇ² + ρI ψ̇² dx (Timoshenko 1921); Euler–Bernoulli drops
 * the shear and rotary-inertia terms and ties ψ = w'. Element integrals use the section's own
 * A(x), I(x) at the Gauss points, so an undercut's taper is integrated, not averaged.
 */
final class BeamFamily {

    /**
     * Hermite elements per half-wave (βL/π) of the highest elastic mode wanted: the frequency error
     * falls as (βh)⁴ and stays under 0.05 cent at this density (BarConvergenceTest).
     */
    static final double HERMITE_PER_HALF_WAVE = 7.0;
    /** Cubic Lagrange elements per half-wave for Timoshenko (three nodes inside each, error as h⁶). */
    static final double LAGRANGE_PER_HALF_WAVE = 2.5;
    /** Fewest elements of either kind. */
    static final int MIN_ELEMENTS = 12;
    /** Gauss points for the Timoshenko element's reduced shear integration. */
    static final int SHEAR_POINTS = 3;

    final Bar bar;
    final BeamTheory theory;
    final BeamElement element;
    final boolean lateral;
    final double[] x;
    final double shearCoefficient;
    final double[] eigenvalues;
    /** Full DOF vectors (held DOFs as zeros), M-orthonormal, elastic modes only, ascending. */
    final double[][] vectors;

    private BeamFamily(Bar bar, BeamTheory theory, boolean lateral, double[] x, double kappa,
            double[] eigenvalues, double[][] vectors) {
        this.bar = bar;
        this.theory = theory;
        this.element = elementOf(theory);
        this.lateral = lateral;
        this.x = x;
        this.shearCoefficient = kappa;
        this.eigenvalues = eigenvalues;
        this.vectors = vectors;
    }

    static BeamElement elementOf(BeamTheory theory) {
        return theory == BeamTheory.TIMOSHENKO ? BeamElement.LAGRANGE_CUBIC : BeamElement.HERMITE;
    }

    static int elementsFor(BeamTheory theory, int elasticModes) {
        double per = theory == BeamTheory.TIMOSHENKO ? LAGRANGE_PER_HALF_WAVE : HERMITE_PER_HALF_WAVE;
        return Math.max(MIN_ELEMENTS, (int) Math.ceil(per * (elasticModes + 1)));
    }

    static BeamFamily solve(Bar bar, BeamTheory theory, boolean lateral, int modes) {
        return solve(bar, theory, lateral, modes, elementsFor(theory, modes));
    }

    /** @param elements the element count asked for (breakpoints may add a few) */
    static BeamFamily solve(Bar bar, BeamTheory theory, boolean lateral, int modes, int elements) {
        BarSection s = bar.section();
        double[] x = Mesh.graded(s.breakpoints(bar.length()), elements,
                lateral ? p -> 1.0 : p -> 1.0 / Math.sqrt(s.depth(p)));
        int ne = x.length - 1;
        BeamElement kind = elementOf(theory);
        int nl = kind.localDofs;
        int dof = kind.dofs(ne);
        double kappa = bar.shearCoefficient();
        boolean timo = theory == BeamTheory.TIMOSHENKO;
        double e = bar.youngsModulus();
        double g = bar.shearModulus();
        double rho = bar.density();
        double[][] k = new double[dof][dof];
        double[][] m = new double[dof][dof];
        double[][] nw = new double[nl][4];
        double[][] npsi = new double[nl][4];
        double[] w = new double[nl];
        double[] psi = new double[nl];
        double[] dpsi = new double[nl];
        double[] gamma = new double[nl];
        double[][] ke = new double[nl][nl];
        double[][] me = new double[nl][nl];
        double[] breaks = s.breakpoints(bar.length());
        for (int el = 0; el < ne; el++) {
            double h = x[el + 1] - x[el];
            double[][] full = Mesh.quadrature(x[el], x[el + 1], breaks, kind.fullPoints);
            double[] fxi = full[0];
            double[] fwt = full[1];
            double[][] reduced = Mesh.quadrature(x[el], x[el + 1], breaks, SHEAR_POINTS);
            double[] sxi = reduced[0];
            double[] swt = reduced[1];
            kind.shapes(h, nw, npsi);
            for (int i = 0; i < nl; i++) {
                java.util.Arrays.fill(ke[i], 0.0);
                java.util.Arrays.fill(me[i], 0.0);
            }
            for (int q = 0; q < fxi.length; q++) {
                double xi = fxi[q];
                double wq = fwt[q] * h;
                double pos = x[el] + xi * h;
                double ei = e * inertia(s, lateral, pos);
                double ra = rho * s.area(pos);
                double ri = timo ? rho * inertia(s, lateral, pos) : 0.0;
                for (int i = 0; i < nl; i++) {
                    w[i] = ModeLine.horner(nw[i], xi);
                    psi[i] = ModeLine.horner(npsi[i], xi);
                    dpsi[i] = ModeLine.derivative(npsi[i], xi) / h;
                }
                for (int i = 0; i < nl; i++) {
                    for (int j = i; j < nl; j++) {
                        ke[i][j] += wq * ei * dpsi[i] * dpsi[j];
                        me[i][j] += wq * (ra * w[i] * w[j] + ri * psi[i] * psi[j]);
                    }
                }
            }
            if (timo) {
                for (int q = 0; q < sxi.length; q++) {
                    double xi = sxi[q];
                    double wq = swt[q] * h;
                    double kga = kappa * g * s.area(x[el] + xi * h);
                    for (int i = 0; i < nl; i++) {
                        gamma[i] = ModeLine.derivative(nw[i], xi) / h - ModeLine.horner(npsi[i], xi);
                    }
                    for (int i = 0; i < nl; i++) {
                        for (int j = i; j < nl; j++) {
                            ke[i][j] += wq * kga * gamma[i] * gamma[j];
                        }
                    }
                }
            }
            int base = kind.stride * el;
            for (int i = 0; i < nl; i++) {
                for (int j = i; j < nl; j++) {
                    k[base + i][base + j] += ke[i][j];
                    m[base + i][base + j] += me[i][j];
                    if (j != i) {
                        k[base + j][base + i] += ke[i][j];
                        m[base + j][base + i] += me[i][j];
                    }
                }
            }
        }
        boolean[] held = new boolean[dof];
        hold(held, kind.endDisplacement(ne, false), bar.ends().start());
        hold(held, kind.endDisplacement(ne, true), bar.ends().finish());
        int[] free = freeIndices(held);
        int rigid = bar.ends().rigidBendingModes();
        GeneralizedEigen eig = BandedEigen.lowest(reduce(k, free), reduce(m, free), rigid + modes);
        int got = Math.max(0, eig.values.length - rigid);
        double[] values = new double[got];
        double[][] vectors = new double[got][];
        for (int q = 0; q < got; q++) {
            values[q] = Math.max(0, eig.values[rigid + q]);
            double[] full = new double[dof];
            double[] v = eig.vectors[rigid + q];
            for (int i = 0; i < free.length; i++) {
                full[free[i]] = v[i];
            }
            vectors[q] = full;
        }
        return new BeamFamily(bar, theory, lateral, x, kappa, values, vectors);
    }

    /** The bar's modes of this family, numbered from 1. */
    List<BarMode> modes(ModeFamily family) {
        List<BarMode> out = new ArrayList<>(eigenvalues.length);
        for (int q = 0; q < eigenvalues.length; q++) {
            out.add(ModeLines.mode(family, q + 1, frequencyHz(q), line(q), bar.ends()));
        }
        return out;
    }

    double frequencyHz(int q) {
        return Math.sqrt(eigenvalues[q]) / (2 * Math.PI);
    }

    /** The displacement of mode q as element polynomials. */
    ModeLine line(int q) {
        int ne = x.length - 1;
        int nl = element.localDofs;
        double[][] c = new double[ne][4];
        double[][] nw = new double[nl][4];
        double[][] npsi = new double[nl][4];
        double[] v = vectors[q];
        for (int el = 0; el < ne; el++) {
            element.shapes(x[el + 1] - x[el], nw, npsi);
            int base = element.stride * el;
            for (int i = 0; i < nl; i++) {
                double d = v[base + i];
                for (int j = 0; j < 4; j++) {
                    c[el][j] += d * nw[i][j];
                }
            }
        }
        return new ModeLine(x, c);
    }

    /**
     * dλ/dt per unit length at each position: the first-order change of mode q's eigenvalue λ = ω²
     * when the thickness of a rectangle grows by dt over a short length dx is (this) · dt · dx
     * (the eigenvalue derivative φᵀ(dK − λ dM)φ of an M-normalised mode, Fox and Kapoor, AIAA J. 6,
     * 1968), with ∂A/∂t = b, ∂I/∂t = b t²/4 at the actual thickness.
     */
    double[] thicknessSensitivity(int q, double[] positions) {
        RectangleSection r = (RectangleSection) bar.section();
        boolean timo = theory == BeamTheory.TIMOSHENKO;
        int nl = element.localDofs;
        double[][] nw = new double[nl][4];
        double[][] npsi = new double[nl][4];
        double[] v = vectors[q];
        double lambda = eigenvalues[q];
        double e = bar.youngsModulus();
        double kg = shearCoefficient * bar.shearModulus();
        double rho = bar.density();
        double[] out = new double[positions.length];
        for (int k = 0; k < positions.length; k++) {
            double pos = positions[k];
            int el = java.util.Arrays.binarySearch(x, pos);
            el = el >= 0 ? Math.min(el, x.length - 2) : -el - 2;
            el = Math.max(0, Math.min(el, x.length - 2));
            double h = x[el + 1] - x[el];
            double xi = (pos - x[el]) / h;
            element.shapes(h, nw, npsi);
            int base = element.stride * el;
            double w = 0;
            double psi = 0;
            double dpsi = 0;
            double dw = 0;
            for (int i = 0; i < nl; i++) {
                double d = v[base + i];
                w += d * ModeLine.horner(nw[i], xi);
                dw += d * ModeLine.derivative(nw[i], xi) / h;
                psi += d * ModeLine.horner(npsi[i], xi);
                dpsi += d * ModeLine.derivative(npsi[i], xi) / h;
            }
            double t = r.profile().thicknessAt(pos);
            double dA = r.width();
            double dI = r.width() * t * t / 4;
            double ds = e * dI * dpsi * dpsi - lambda * rho * dA * w * w;
            if (timo) {
                double gamma = dw - psi;
                ds += kg * dA * gamma * gamma - lambda * rho * dI * psi * psi;
            }
            out[k] = ds;
        }
        return out;
    }

    static double inertia(BarSection s, boolean lateral, double pos) {
        return lateral ? s.lateralSecondMoment(pos) : s.secondMoment(pos);
    }

    /** Holds an end: the displacement DOF for a pinned or clamped end, the rotation (next DOF) for a clamped one. */
    private static void hold(boolean[] held, int wIndex, BarEnds.End end) {
        if (end != BarEnds.End.FREE) {
            held[wIndex] = true;
        }
        if (end == BarEnds.End.CLAMPED) {
            held[wIndex + 1] = true;
        }
    }

    static int[] freeIndices(boolean[] held) {
        int n = 0;
        for (boolean b : held) {
            if (!b) {
                n++;
            }
        }
        int[] free = new int[n];
        int k = 0;
        for (int i = 0; i < held.length; i++) {
            if (!held[i]) {
                free[k++] = i;
            }
        }
        return free;
    }

    static double[][] reduce(double[][] a, int[] free) {
        double[][] r = new double[free.length][free.length];
        for (int i = 0; i < free.length; i++) {
            for (int j = 0; j < free.length; j++) {
                r[i][j] = a[free[i]][free[j]];
            }
        }
        return r;
    }
}
