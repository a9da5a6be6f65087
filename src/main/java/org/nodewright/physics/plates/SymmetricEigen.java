package org.nodewright.physics.plates;

import java.util.Arrays;
import java.util.Comparator;
import java.util.stream.IntStream;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.RealMatrix;

/**
 * The lowest pairs of K c = λ M c with K symmetric and M symmetric positive (semi-)definite, by
 * Hipparchus' symmetric eigen-decomposition (Householder tridiagonalisation and implicit QL). Hipparchus
 * is already the project's numerics library (optimisers, FFT); the matrices here are at most a few
 * hundred rows, where its dense solver takes milliseconds. M is diagonalised first and directions with
 * a negligible mass (the bounding-box polynomials an outline barely sees) are dropped, which keeps the
 * reduction K̃ = Λ^-½ Vᵀ K V Λ^-½ well conditioned where a Cholesky factor of M would not be.
 */
final class SymmetricEigen {

    /** λ ascending and their vectors (vectors[i] belongs to values[i]). */
    record Pairs(double[] values, double[][] vectors) {
    }

    private SymmetricEigen() {
    }

    /** The lowest {@code count} eigenpairs of the standard problem K c = λ c. */
    static Pairs standard(double[][] k, int count) {
        EigenDecompositionSymmetric eig = new EigenDecompositionSymmetric(new Array2DRowRealMatrix(k, false));
        double[] values = eig.getEigenvalues();
        Integer[] order = ascending(values);
        int take = Math.min(count, values.length);
        double[] out = new double[take];
        double[][] vectors = new double[take][];
        for (int i = 0; i < take; i++) {
            out[i] = values[order[i]];
            vectors[i] = eig.getEigenvector(order[i]).toArray();
        }
        return new Pairs(out, vectors);
    }

    /** The lowest {@code count} eigenpairs of K c = λ M c. */
    static Pairs generalized(double[][] k, double[][] m, int count) {
        int n = k.length;
        EigenDecompositionSymmetric mass = new EigenDecompositionSymmetric(new Array2DRowRealMatrix(m, false));
        double[] lambda = mass.getEigenvalues();
        double max = Arrays.stream(lambda).max().orElse(1);
        int[] keep = IntStream.range(0, n).filter(i -> lambda[i] > 1e-12 * max).toArray();
        int r = keep.length;
        double[][] t = new double[n][r];
        for (int c = 0; c < r; c++) {
            double[] v = mass.getEigenvector(keep[c]).toArray();
            double scale = 1 / Math.sqrt(lambda[keep[c]]);
            for (int i = 0; i < n; i++) {
                t[i][c] = v[i] * scale;
            }
        }
        RealMatrix tm = new Array2DRowRealMatrix(t, false);
        RealMatrix reduced = tm.transposeMultiply(new Array2DRowRealMatrix(k, false).multiply(tm));
        double[][] a = reduced.getData();
        for (int i = 0; i < r; i++) {
            for (int j = i + 1; j < r; j++) {
                double s = (a[i][j] + a[j][i]) / 2;
                a[i][j] = s;
                a[j][i] = s;
            }
        }
        Pairs small = standard(a, count);
        double[][] vectors = new double[small.values().length][];
        for (int i = 0; i < vectors.length; i++) {
            vectors[i] = tm.operate(small.vectors()[i]);
        }
        return new Pairs(small.values(), vectors);
    }

    private static Integer[] ascending(double[] values) {
        Integer[] order = new Integer[values.length];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        Arrays.sort(order, Comparator.comparingDouble(i -> values[i]));
        return order;
    }
}
