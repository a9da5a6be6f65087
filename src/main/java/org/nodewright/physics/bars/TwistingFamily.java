package org.nodewright.physics.bars;

import java.util.ArrayList;
import java.util.List;

/**
 * Twisting modes by Saint-Venant torsion, G J(x) θ'' = ρ I_p(x) θ̈ (no warping restraint), with
 * three-node quadratic Lagrange elements (consistent mass; frequency error falling as h⁴).
 * J is the section's Saint-Venant constant, I_p its polar second moment (rotary inertia per density).
 * DOFs: θ at the element ends and mid-points.
 */
final class TwistingFamily {

    /** Quadratic elements per half-wave of the highest twisting mode wanted (error under 0.05 cent). */
    static final double ELEMENTS_PER_HALF_WAVE = 6.0;
    static final int MIN_ELEMENTS = 12;
    /** Gauss points per element: exact for a tapered rectangle's I_p (cubic) times the quadratic basis squared (degree 7). */
    private static final int RULE = 4;

    private TwistingFamily() {
    }

    static List<BarMode> modes(Bar bar, int count) {
        BarSection s = bar.section();
        int elements = Math.max(MIN_ELEMENTS, (int) Math.ceil(ELEMENTS_PER_HALF_WAVE * (count + 1)));
        double[] x = Mesh.graded(s.breakpoints(bar.length()), elements, p -> {
            // local torsional wavenumber ∝ sqrt(ρ I_p / (G J))
            return Math.sqrt(s.polarSecondMoment(p) / s.torsionConstant(p));
        });
        int ne = x.length - 1;
        int dof = 2 * ne + 1;
        double g = bar.shearModulus();
        double rho = bar.density();
        double[][] k = new double[dof][dof];
        double[][] m = new double[dof][dof];
        double[] n = new double[3];
        double[] dn = new double[3];
        double[] breaks = s.breakpoints(bar.length());
        for (int el = 0; el < ne; el++) {
            double h = x[el + 1] - x[el];
            int base = 2 * el;
            double[][] rule = Mesh.quadrature(x[el], x[el + 1], breaks, RULE);
            for (int q = 0; q < rule[0].length; q++) {
                double xi = rule[0][q];
                double wq = rule[1][q] * h;
                double pos = x[el] + xi * h;
                double gj = g * s.torsionConstant(pos);
                double rip = rho * s.polarSecondMoment(pos);
                n[0] = (1 - xi) * (1 - 2 * xi);
                n[1] = 4 * xi * (1 - xi);
                n[2] = xi * (2 * xi - 1);
                dn[0] = (4 * xi - 3) / h;
                dn[1] = (4 - 8 * xi) / h;
                dn[2] = (4 * xi - 1) / h;
                for (int i = 0; i < 3; i++) {
                    for (int j = i; j < 3; j++) {
                        double kk = wq * gj * dn[i] * dn[j];
                        double mm = wq * rip * n[i] * n[j];
                        k[base + i][base + j] += kk;
                        m[base + i][base + j] += mm;
                        if (j != i) {
                            k[base + j][base + i] += kk;
                            m[base + j][base + i] += mm;
                        }
                    }
                }
            }
        }
        boolean[] held = new boolean[dof];
        held[0] = bar.ends().start() != BarEnds.End.FREE;
        held[dof - 1] = bar.ends().finish() != BarEnds.End.FREE;
        int[] free = BeamFamily.freeIndices(held);
        int rigid = bar.ends().rigidTwistingModes();
        GeneralizedEigen eig = BandedEigen.lowest(BeamFamily.reduce(k, free), BeamFamily.reduce(m, free),
                rigid + count);
        List<BarMode> out = new ArrayList<>();
        for (int q = rigid; q < eig.values.length; q++) {
            double[] full = new double[dof];
            for (int i = 0; i < free.length; i++) {
                full[free[i]] = eig.vectors[q][i];
            }
            double[][] c = new double[ne][3];
            for (int el = 0; el < ne; el++) {
                double t0 = full[2 * el];
                double tm = full[2 * el + 1];
                double t1 = full[2 * el + 2];
                c[el][0] = t0;
                c[el][1] = -3 * t0 + 4 * tm - t1;
                c[el][2] = 2 * t0 - 4 * tm + 2 * t1;
            }
            double f = Math.sqrt(Math.max(0, eig.values[q])) / (2 * Math.PI);
            out.add(ModeLines.mode(ModeFamily.TWISTING, q - rigid + 1, f, new ModeLine(x, c), bar.ends()));
        }
        return out;
    }
}
