package org.nodewright.physics.bars;

import java.util.List;

/**
 * The modes of a bar.
 *
 * @param shearCoefficient the Timoshenko shear coefficient of the section (reported for Euler–Bernoulli too)
 * @param poissonRatio     the Poisson's ratio it was taken at
 * @param bending          the lowest bending modes through the thickness, ascending
 * @param others           twisting and lateral modes up to the highest bending mode (at least the
 *                         first of each family), ascending in frequency
 */
public record BarAnalysis(double shearCoefficient, double poissonRatio, List<BarMode> bending, List<BarMode> others) {

    public BarAnalysis {
        bending = List.copyOf(bending);
        others = List.copyOf(others);
    }

    /** The lowest bending mode's frequency. */
    public double fundamentalHz() {
        return bending.get(0).frequencyHz();
    }
}
