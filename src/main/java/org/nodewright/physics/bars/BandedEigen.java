package org.nodewright.physics.bars;

import java.util.SplittableRandom;

/**
 * The lowest eigenpairs of K x = λ M x for banded symmetric K (positive semi-definite) and M
 * (positive definite), as a finite-element beam gives them: shift-invert subspace iteration
 * (Bathe and Wilson, "Large eigenvalue problems in dynamic analysis", J. Eng. Mech. Div. ASCE 98,
 * 1972; Bathe, Finite Element Procedures, 1996, §11.6) with ONE banded LDLᵀ factorisation of
 * K − σM (σ slightly below zero, so the matrix is positive definite even with rigid-body modes) and
 * a Rayleigh–Ritz step on the small projected problem (solved densely by {@link GeneralizedEigen}).
 *
 * <p>Hand-written because this is the bar bench's hot loop (the tuning solver calls it hundreds of
 * times): the libraries at hand (Hipparchus) only offer dense decompositions, whose O(n³) cost for
 * every family was 80–105 ms per 6-mode analysis; here the work is O(n b²) for the factorisation
 * and O(n b p) per iteration (b the half-bandwidth, p the subspace size). When the iteration does
 * not settle within {@link #MAX_ITERATIONS}, the dense solver answers instead.
 */
final class BandedEigen {

    /**
     * Relative change of every wanted elastic eigenvalue between iterations that counts as converged
     * (5e-11 in frequency, 1e-7 cent). Rounding alone moves the Ritz values of a bar by 1e-12 relative
     * per iteration (ε‖K‖/λ₁ with the stiffest element's ‖K‖), so a tighter test would never pass.
     */
    static final double TOLERANCE = 1e-10;
    /** Iterations after the eigenvalues settle, so that the vectors (which converge as the square root) follow. */
    static final int EXTRA_ITERATIONS = 3;
    /** Iteration cap before falling back to the dense solver. */
    static final int MAX_ITERATIONS = 80;
    /** Shift as a fraction of the smallest diagonal ratio K_ii / M_ii (a lower bound on nothing: only a small negative σ). */
    private static final double SHIFT_FRACTION = 1e-6;
    /** Eigenvalues below this fraction of the largest wanted one are rigid-body modes (no convergence test). */
    private static final double RIGID_FRACTION = 1e-9;
    /** Fixed seed: the start vectors, and so the answer, are the same on every run. */
    private static final long SEED = 0x6e6f6465L;

    private BandedEigen() {
    }

    /**
     * @param k     stiffness, symmetric, banded (held DOFs already removed)
     * @param m     mass, symmetric positive definite, same band
     * @param count how many of the lowest eigenpairs to return (ascending, M-orthonormal vectors)
     */
    static GeneralizedEigen lowest(double[][] k, double[][] m, int count) {
        int n = k.length;
        int p = Math.min(n, Math.max(2 * count, count + 8));
        if (p >= n || 3 * p > n) {
            return GeneralizedEigen.lowest(k, m, count);
        }
        int b = halfBandwidth(k, m);
        double[][] kb = band(k, b);
        double[][] mb = band(m, b);
        double shift = -SHIFT_FRACTION * smallestDiagonalRatio(kb, mb);
        double[][] a = new double[n][b + 1];
        for (int i = 0; i < n; i++) {
            for (int d = 0; d <= b; d++) {
                a[i][d] = kb[i][d] - shift * mb[i][d];
            }
        }
        Ldl ldl = Ldl.factor(a, b);
        if (ldl == null) {
            return GeneralizedEigen.lowest(k, m, count);
        }
        double[][] x = startVectors(n, p);
        double[] previous = null;
        int settled = -1;
        GeneralizedEigen ritz = null;
        double[][] xbar = new double[p][n];
        double[][] kx = new double[p][n];
        double[][] mx = new double[p][n];
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            for (int j = 0; j < p; j++) {
                multiply(mb, b, x[j], mx[j]);
                ldl.solve(mx[j], xbar[j]);
            }
            for (int j = 0; j < p; j++) {
                multiply(mb, b, xbar[j], mx[j]);
                double norm = Math.sqrt(dot(xbar[j], mx[j]));
                scale(xbar[j], 1 / norm);
                scale(mx[j], 1 / norm);
                multiply(kb, b, xbar[j], kx[j]);
            }
            double[][] kr = new double[p][p];
            double[][] mr = new double[p][p];
            for (int i = 0; i < p; i++) {
                for (int j = i; j < p; j++) {
                    // K and M are symmetric: x̄ᵢᵀ K x̄ⱼ = x̄ⱼᵀ K x̄ᵢ, one product per pair
                    kr[i][j] = kr[j][i] = dot(xbar[i], kx[j]);
                    mr[i][j] = mr[j][i] = dot(xbar[i], mx[j]);
                }
            }
            ritz = GeneralizedEigen.lowest(kr, mr, p);
            double[][] next = new double[p][n];
            for (int j = 0; j < p; j++) {
                double[] q = ritz.vectors[j];
                double[] out = next[j];
                for (int i = 0; i < p; i++) {
                    double c = q[i];
                    double[] col = xbar[i];
                    for (int r = 0; r < n; r++) {
                        out[r] += c * col[r];
                    }
                }
            }
            x = next;
            if (previous != null && converged(previous, ritz.values, count)) {
                if (settled < 0) {
                    settled = it;
                }
                if (it - settled >= EXTRA_ITERATIONS) {
                    double[] values = java.util.Arrays.copyOf(ritz.values, count);
                    double[][] vectors = new double[count][];
                    System.arraycopy(x, 0, vectors, 0, count);
                    return GeneralizedEigen.of(values, vectors);
                }
            }
            previous = ritz.values.clone();
        }
        return GeneralizedEigen.lowest(k, m, count);
    }

    private static boolean converged(double[] before, double[] now, int count) {
        double top = Math.abs(now[count - 1]);
        for (int q = 0; q < count; q++) {
            if (Math.abs(now[q]) <= RIGID_FRACTION * top) {
                continue;
            }
            if (Math.abs(now[q] - before[q]) > TOLERANCE * Math.abs(now[q])) {
                return false;
            }
        }
        return true;
    }

    /** Deterministic start vectors: uniform pseudo-random numbers from a fixed seed (they span the lowest modes with certainty 1). */
    private static double[][] startVectors(int n, int p) {
        SplittableRandom random = new SplittableRandom(SEED);
        double[][] x = new double[p][n];
        for (int j = 0; j < p; j++) {
            for (int i = 0; i < n; i++) {
                x[j][i] = random.nextDouble(-1, 1);
            }
        }
        return x;
    }

    static int halfBandwidth(double[][] k, double[][] m) {
        int n = k.length;
        int b = 0;
        for (int i = 0; i < n; i++) {
            for (int j = n - 1; j > i + b; j--) {
                if (k[i][j] != 0 || m[i][j] != 0) {
                    b = j - i;
                    break;
                }
            }
        }
        return b;
    }

    /** Upper band storage: out[i][d] = a[i][i + d]. */
    private static double[][] band(double[][] a, int b) {
        int n = a.length;
        double[][] out = new double[n][b + 1];
        for (int i = 0; i < n; i++) {
            for (int d = 0; d <= b && i + d < n; d++) {
                out[i][d] = a[i][i + d];
            }
        }
        return out;
    }

    private static double smallestDiagonalRatio(double[][] kb, double[][] mb) {
        double min = Double.POSITIVE_INFINITY;
        for (int i = 0; i < kb.length; i++) {
            if (kb[i][0] > 0) {
                min = Math.min(min, kb[i][0] / mb[i][0]);
            }
        }
        return Double.isFinite(min) ? min : 1.0;
    }

    /** y = A x for a symmetric matrix in upper band storage. */
    static void multiply(double[][] ab, int b, double[] x, double[] y) {
        int n = x.length;
        java.util.Arrays.fill(y, 0.0);
        for (int i = 0; i < n; i++) {
            double[] row = ab[i];
            double s = row[0] * x[i];
            double xi = x[i];
            int top = Math.min(b, n - 1 - i);
            for (int d = 1; d <= top; d++) {
                s += row[d] * x[i + d];
                y[i + d] += row[d] * xi;
            }
            y[i] += s;
        }
    }

    private static double dot(double[] u, double[] v) {
        double s = 0;
        for (int i = 0; i < u.length; i++) {
            s += u[i] * v[i];
        }
        return s;
    }

    private static void scale(double[] u, double c) {
        for (int i = 0; i < u.length; i++) {
            u[i] *= c;
        }
    }

    /**
     * Banded LDLᵀ of a symmetric positive definite matrix without pivoting (Golub and Van Loan,
     * Matrix Computations, §4.1 and §4.3): l[j][d] = L(j + d, j), the unit diagonal implied.
     */
    static final class Ldl {
        final int n;
        final int b;
        final double[][] l;
        final double[] diag;

        private Ldl(int n, int b, double[][] l, double[] diag) {
            this.n = n;
            this.b = b;
            this.l = l;
            this.diag = diag;
        }

        /** @return the factor, or null when a pivot is not positive (the matrix is not positive definite) */
        static Ldl factor(double[][] ab, int b) {
            int n = ab.length;
            double[][] l = new double[n][b + 1];
            double[] diag = new double[n];
            for (int j = 0; j < n; j++) {
                double dj = ab[j][0];
                for (int k = Math.max(0, j - b); k < j; k++) {
                    double ljk = l[k][j - k];
                    dj -= ljk * ljk * diag[k];
                }
                if (!(dj > 0)) {
                    return null;
                }
                diag[j] = dj;
                int top = Math.min(b, n - 1 - j);
                for (int d = 1; d <= top; d++) {
                    int i = j + d;
                    double s = ab[j][d];
                    for (int k = Math.max(0, i - b); k < j; k++) {
                        s -= l[k][i - k] * l[k][j - k] * diag[k];
                    }
                    l[j][d] = s / dj;
                }
            }
            return new Ldl(n, b, l, diag);
        }

        /** Solves (L D Lᵀ) x = rhs. */
        void solve(double[] rhs, double[] x) {
            System.arraycopy(rhs, 0, x, 0, n);
            for (int j = 0; j < n; j++) {
                double xj = x[j];
                int top = Math.min(b, n - 1 - j);
                for (int d = 1; d <= top; d++) {
                    x[j + d] -= l[j][d] * xj;
                }
            }
            for (int j = 0; j < n; j++) {
                x[j] /= diag[j];
            }
            for (int j = n - 1; j >= 0; j--) {
                double s = x[j];
                int top = Math.min(b, n - 1 - j);
                for (int d = 1; d <= top; d++) {
                    s -= l[j][d] * x[j + d];
                }
                x[j] = s;
            }
        }
    }
}
