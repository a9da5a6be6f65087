package org.nodewright.physics.bars;

import java.util.Arrays;
import java.util.function.DoubleUnaryOperator;

/**
 * Element boundaries along a bar: every breakpoint of the section is a boundary, and the elements
 * are graded so that each spans about the same share of a "local wavenumber" density g(x) (for
 * bending through a thickness t, g ∝ t^(−1/2): a thin undercut carries shorter waves).
 */
final class Mesh {

    /** Samples per breakpoint interval used to integrate the density. */
    private static final int DENSITY_SAMPLES = 64;

    private Mesh() {
    }

    /**
     * @param breakpoints ascending, from 0 to the length
     * @param elements    the number of elements wanted (at least one per breakpoint interval)
     * @param density     g(x) > 0
     */
    static double[] graded(double[] breakpoints, int elements, DoubleUnaryOperator density) {
        int segs = breakpoints.length - 1;
        double[][] cum = new double[segs][DENSITY_SAMPLES + 1];
        double[] weight = new double[segs];
        double total = 0;
        for (int s = 0; s < segs; s++) {
            double a = breakpoints[s];
            double h = (breakpoints[s + 1] - a) / DENSITY_SAMPLES;
            double prev = density.applyAsDouble(a);
            for (int j = 1; j <= DENSITY_SAMPLES; j++) {
                double g = density.applyAsDouble(a + j * h);
                cum[s][j] = cum[s][j - 1] + 0.5 * (prev + g) * h;
                prev = g;
            }
            weight[s] = cum[s][DENSITY_SAMPLES];
            total += weight[s];
        }
        int[] count = new int[segs];
        int assigned = 0;
        for (int s = 0; s < segs; s++) {
            count[s] = Math.max(1, (int) Math.round(elements * weight[s] / total));
            assigned += count[s];
        }
        double[] x = new double[assigned + 1];
        int k = 0;
        for (int s = 0; s < segs; s++) {
            double a = breakpoints[s];
            double h = (breakpoints[s + 1] - a) / DENSITY_SAMPLES;
            x[k++] = a;
            for (int e = 1; e < count[s]; e++) {
                double target = weight[s] * e / count[s];
                int j = Arrays.binarySearch(cum[s], target);
                if (j < 0) {
                    j = -j - 2;
                }
                j = Math.min(j, DENSITY_SAMPLES - 1);
                double frac = (target - cum[s][j]) / (cum[s][j + 1] - cum[s][j]);
                x[k++] = a + (j + frac) * h;
            }
        }
        x[k] = breakpoints[segs];
        return x;
    }
}
