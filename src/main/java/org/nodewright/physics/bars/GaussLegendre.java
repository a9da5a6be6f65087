package org.nodewright.physics.bars;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Gauss–Legendre rules on [0, 1] (points and weights from Hipparchus); the n-point rule is exact for
 * polynomials up to degree 2n − 1.
 */
final class GaussLegendre {

    private static final int LARGEST = 6;
    private static final double[][] XI = new double[LARGEST + 1][];
    private static final double[][] WEIGHT = new double[LARGEST + 1][];

    static {
        GaussIntegratorFactory factory = new GaussIntegratorFactory();
        for (int n = 1; n <= LARGEST; n++) {
            GaussIntegrator rule = factory.legendre(n, 0.0, 1.0);
            XI[n] = new double[n];
            WEIGHT[n] = new double[n];
            for (int g = 0; g < n; g++) {
                XI[n][g] = rule.getPoint(g);
                WEIGHT[n][g] = rule.getWeight(g);
            }
        }
    }

    private GaussLegendre() {
    }

    static double[] points(int n) {
        return XI[n];
    }

    static double[] weights(int n) {
        return WEIGHT[n];
    }
}
