package org.nodewright.physics.plates;

import java.util.List;

/**
 * A mode's transverse displacement on a grid and its node lines, metres.
 *
 * @param xs         grid x positions (along the grain)
 * @param ys         grid y positions
 * @param w          w[i][j] at (xs[i], ys[j]), max |w| = 1; NaN outside the outline
 * @param nodalLines polylines where w = 0, each a list of {x, y}
 */
public record ModeShape(double[] xs, double[] ys, double[][] w, List<double[][]> nodalLines) {
}
