package org.nodewright.physics.bars;

import java.util.List;

/**
 * One mode of a bar.
 *
 * @param family      which family it belongs to
 * @param n           its number within the family (1 = lowest)
 * @param frequencyHz its frequency
 * @param nodes       positions where the displacement (twist, for twisting) is zero, ascending, m;
 *                    a held end is a node, a free end never is
 * @param antinodes   positions of the local maxima of |displacement|, ascending, m; a free end is one
 * @param shapeX      sample positions 0..L, m
 * @param shape       the displacement at the samples, scaled so that the largest |sample| is 1
 *                    (and that sample positive)
 * @param line        the interpolated displacement, same scaling
 */
public record BarMode(ModeFamily family, int n, double frequencyHz, List<Double> nodes, List<Double> antinodes,
        double[] shapeX, double[] shape, ModeLine line) {

    public BarMode {
        nodes = List.copyOf(nodes);
        antinodes = List.copyOf(antinodes);
        if (shapeX.length != shape.length) {
            throw new IllegalArgumentException("shape samples and positions differ in length: " + shapeX.length
                    + " and " + shape.length);
        }
    }
}
