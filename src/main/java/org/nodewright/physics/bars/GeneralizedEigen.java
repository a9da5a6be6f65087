package org.nodewright.physics.bars;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.CholeskyDecomposition;
import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.RealMatrix;

/**
 * The symmetric-definite generalised eigenproblem K x = λ M x, reduced to standard form with the
 * Cholesky factor of the mass matrix (M = L Lᵀ, C = L⁻¹ K L⁻ᵀ, C y = λ y, x = L⁻ᵀ y; Golub and Van
 * Loan, Matrix Computations, §8.7) and solved by Hipparchus' symmetric eigen decomposition. The
 * eigenvectors come out M-orthonormal (xᵀ M x = 1).
 */
final class GeneralizedEigen {

    /** Relative symmetry tolerance for the Cholesky factorisation (matrices are assembled symmetric). */
    private static final double SYMMETRY = 1e-10;
    /** Absolute positivity threshold on the mass matrix's pivots (mass entries are far above it). */
    private static final double POSITIVITY = 1e-300;
    /** Relative accuracy of the symmetric eigen decomposition. */
    private static final double EIGEN_EPSILON = 1e-12;

    final double[] values;
    /** vectors[k] is the k-th eigenvector, ascending eigenvalue. */
    final double[][] vectors;

    private GeneralizedEigen(double[] values, double[][] vectors) {
        this.values = values;
        this.vectors = vectors;
    }

    static GeneralizedEigen of(double[] values, double[][] vectors) {
        return new GeneralizedEigen(values, vectors);
    }

    /**
     * @param k     stiffness, symmetric
     * @param m     mass, symmetric positive definite
     * @param count how many of the lowest eigenpairs to keep
     */
    static GeneralizedEigen lowest(double[][] k, double[][] m, int count) {
        int n = k.length;
        RealMatrix lower = new CholeskyDecomposition(new Array2DRowRealMatrix(m, false), SYMMETRY, POSITIVITY).getL();
        double[][] l = lower.getData();
        double[][] linv = lowerInverse(l);
        // C = L⁻¹ K L⁻ᵀ: first T = L⁻¹ K (L⁻¹ is lower triangular), then C = T L⁻ᵀ.
        double[][] t = new double[n][n];
        for (int i = 0; i < n; i++) {
            double[] ti = t[i];
            double[] li = linv[i];
            for (int p = 0; p <= i; p++) {
                double lip = li[p];
                if (lip == 0) {
                    continue;
                }
                double[] kp = k[p];
                for (int j = 0; j < n; j++) {
                    ti[j] += lip * kp[j];
                }
            }
        }
        double[][] c = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j <= i; j++) {
                double[] lj = linv[j];
                double[] ti = t[i];
                double s = 0;
                for (int p = 0; p <= j; p++) {
                    s += ti[p] * lj[p];
                }
                c[i][j] = s;
                c[j][i] = s;
            }
        }
        EigenDecompositionSymmetric eig =
                new EigenDecompositionSymmetric(new Array2DRowRealMatrix(c, false), EIGEN_EPSILON, false);
        double[] all = eig.getEigenvalues();
        int keep = Math.min(count, n);
        double[] values = new double[keep];
        double[][] vectors = new double[keep][];
        for (int q = 0; q < keep; q++) {
            values[q] = all[q];
            double[] y = eig.getEigenvector(q).toArray();
            // x = L⁻ᵀ y
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                double s = 0;
                for (int p = i; p < n; p++) {
                    s += linv[p][i] * y[p];
                }
                x[i] = s;
            }
            vectors[q] = x;
        }
        return new GeneralizedEigen(values, vectors);
    }

    /** Inverse of a lower-triangular matrix by forward substitution, column by column. */
    private static double[][] lowerInverse(double[][] l) {
        int n = l.length;
        double[][] inv = new double[n][n];
        for (int j = 0; j < n; j++) {
            inv[j][j] = 1.0 / l[j][j];
            for (int i = j + 1; i < n; i++) {
                double s = 0;
                double[] li = l[i];
                for (int p = j; p < i; p++) {
                    s += li[p] * inv[p][j];
                }
                inv[i][j] = -s / li[i];
            }
        }
        return inv;
    }
}
