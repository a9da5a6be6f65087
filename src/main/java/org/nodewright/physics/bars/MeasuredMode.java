package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * A bending mode heard on a tapped blank.
 *
 * @param n           its number among the bar's bending modes through the thickness (1 = lowest)
 * @param frequencyHz the measured frequency
 */
public record MeasuredMode(int n, double frequencyHz) {

    public MeasuredMode {
        Require.between("n", n, 1, BarAnalyzer.MAX_MODES);
        Require.positive("frequencyHz", frequencyHz);
    }
}
