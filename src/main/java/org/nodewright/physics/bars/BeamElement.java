package org.nodewright.physics.bars;

/**
 * The two beam elements of the bending families, each as polynomial shape functions in the local
 * coordinate ξ = (x − x_e)/h ∈ [0, 1] (power-basis coefficients), for the displacement w and the
 * section rotation ψ of every local DOF.
 */
enum BeamElement {

    /**
     * Euler–Bernoulli: the two-node cubic Hermite element (DOFs w1, ψ1, w2, ψ2 with ψ = dw/dx), whose
     * frequency error falls as h⁴ (Strang and Fix, An Analysis of the Finite Element Method, 1973, §6.3).
     */
    HERMITE(4, 2, 4),

    /**
     * Timoshenko: the four-node C⁰ element with cubic Lagrange interpolation of w and ψ
     * independently (DOFs w, ψ at ξ = 0, 1/3, 2/3, 1), the shear energy integrated by the 3-point
     * reduced Gauss rule (Zienkiewicz, Taylor and Too, "Reduced integration technique in general
     * analysis of plates and shells", Int. J. Numer. Meth. Eng. 3, 1971) so that it does not lock
     * for slender elements; bending and inertia by the 5-point rule. Frequency error falls as h⁶.
     */
    LAGRANGE_CUBIC(8, 6, 5);

    /** DOFs in one element. */
    final int localDofs;
    /** Global DOF offset from one element to the next (the DOFs not shared with the next element). */
    final int stride;
    /** Gauss points for bending and inertia. */
    final int fullPoints;

    BeamElement(int localDofs, int stride, int fullPoints) {
        this.localDofs = localDofs;
        this.stride = stride;
        this.fullPoints = fullPoints;
    }

    /** Lagrange cubic basis on ξ = 0, 1/3, 2/3, 1, power-basis coefficients. */
    private static final double[][] LAGRANGE = lagrangeCubic();

    /** Global DOF count for {@code elements} elements. */
    int dofs(int elements) {
        return stride * elements + (localDofs - stride);
    }

    /** Global index of the end displacement (x = 0 when {@code atEnd} is false, else x = L). */
    int endDisplacement(int elements, boolean atEnd) {
        return atEnd ? stride * elements : 0;
    }

    /**
     * Shape functions of element length h: nw[i] (displacement) and npsi[i] (rotation), power
     * coefficients in ξ, for local DOF i.
     */
    void shapes(double h, double[][] nw, double[][] npsi) {
        for (int i = 0; i < localDofs; i++) {
            java.util.Arrays.fill(nw[i], 0.0);
            java.util.Arrays.fill(npsi[i], 0.0);
        }
        if (this == HERMITE) {
            set(nw[0], 1, 0, -3, 2);
            set(nw[1], 0, h, -2 * h, h);
            set(nw[2], 0, 0, 3, -2);
            set(nw[3], 0, 0, -h, h);
            for (int i = 0; i < 4; i++) {
                // ψ = dw/dx = (dw/dξ)/h
                for (int j = 1; j < 4; j++) {
                    npsi[i][j - 1] = j * nw[i][j] / h;
                }
            }
        } else {
            for (int node = 0; node < 4; node++) {
                System.arraycopy(LAGRANGE[node], 0, nw[2 * node], 0, 4);
                System.arraycopy(LAGRANGE[node], 0, npsi[2 * node + 1], 0, 4);
            }
        }
    }

    private static void set(double[] a, double... v) {
        System.arraycopy(v, 0, a, 0, v.length);
    }

    private static double[][] lagrangeCubic() {
        double[] nodes = {0, 1.0 / 3, 2.0 / 3, 1};
        double[][] out = new double[4][];
        for (int i = 0; i < 4; i++) {
            double[] p = {1};
            double denom = 1;
            for (int j = 0; j < 4; j++) {
                if (j == i) {
                    continue;
                }
                double[] q = new double[p.length + 1];
                for (int k = 0; k < p.length; k++) {
                    q[k + 1] += p[k];
                    q[k] -= nodes[j] * p[k];
                }
                p = q;
                denom *= nodes[i] - nodes[j];
            }
            for (int k = 0; k < p.length; k++) {
                p[k] /= denom;
            }
            out[i] = p;
        }
        return out;
    }
}
