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

    /**
     * Breakpoints closer than this share of an average element to the last kept one are not made
     * element boundaries (a step in a profile typed as two points 1 µm apart would otherwise make a
     * sliver element whose tiny mass ruins the eigenproblem's conditioning); the elements holding
     * them integrate across them piecewise ({@link #quadrature}).
     */
    static final double SHORTEST_SHARE = 0.25;

    private Mesh() {
    }

    /** The breakpoints with those closer than {@code gap} to the previous kept one dropped; ends kept. */
    static double[] spaced(double[] b, double gap) {
        double[] out = new double[b.length];
        int n = 0;
        out[n++] = b[0];
        for (int i = 1; i < b.length - 1; i++) {
            if (b[i] - out[n - 1] >= gap && b[b.length - 1] - b[i] >= gap) {
                out[n++] = b[i];
            }
        }
        out[n++] = b[b.length - 1];
        return java.util.Arrays.copyOf(out, n);
    }

    /**
     * Gauss points and weights (in the element's ξ ∈ [0, 1], weights summing to 1) of an element
     * [xa, xb]: the {@code points}-point rule on each piece between the breakpoints inside it, so
     * that a kink of the profile inside an element is still integrated exactly.
     *
     * @return {xi[], weight[]}
     */
    static double[][] quadrature(double xa, double xb, double[] breakpoints, int points) {
        double[] gx = GaussLegendre.points(points);
        double[] gw = GaussLegendre.weights(points);
        java.util.List<Double> cuts = new java.util.ArrayList<>();
        cuts.add(0.0);
        double h = xb - xa;
        for (double b : breakpoints) {
            if (b > xa + 1e-12 * h && b < xb - 1e-12 * h) {
                cuts.add((b - xa) / h);
            }
        }
        cuts.add(1.0);
        int pieces = cuts.size() - 1;
        double[] xi = new double[pieces * points];
        double[] w = new double[pieces * points];
        for (int p = 0; p < pieces; p++) {
            double a = cuts.get(p);
            double len = cuts.get(p + 1) - a;
            for (int g = 0; g < points; g++) {
                xi[p * points + g] = a + len * gx[g];
                w[p * points + g] = len * gw[g];
            }
        }
        return new double[][] {xi, w};
    }

    /**
     * @param breakpoints ascending, from 0 to the length
     * @param elements    the number of elements wanted (at least one per breakpoint interval)
     * @param density     g(x) > 0
     */
    static double[] graded(double[] allBreakpoints, int elements, DoubleUnaryOperator density) {
        double[] breakpoints = spaced(allBreakpoints, SHORTEST_SHARE * (allBreakpoints[allBreakpoints.length - 1]
                - allBreakpoints[0]) / elements);
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
