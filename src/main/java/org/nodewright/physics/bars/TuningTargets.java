package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * What a bar is tuned to: the fundamental and the ratios of the next bending modes to it
 * (1:4:10 is common marimba practice, 1:3:6 common xylophone practice).
 *
 * @param fundamentalHz the first bending mode's target
 * @param ratios        targets of modes 2, 3, ... as multiples of the fundamental (may be empty)
 */
public record TuningTargets(double fundamentalHz, double[] ratios) {

    public TuningTargets {
        Require.positive("fundamentalHz", fundamentalHz);
        ratios = ratios.clone();
        double previous = 1;
        for (int i = 0; i < ratios.length; i++) {
            Require.positive("ratios[" + i + "]", ratios[i]);
            if (!(ratios[i] > previous)) {
                throw new IllegalArgumentException("ratios must ascend above 1, got " + ratios[i] + " after " + previous);
            }
            previous = ratios[i];
        }
    }

    /** The target of bending mode n (1-based). */
    public double targetHz(int n) {
        return n == 1 ? fundamentalHz : fundamentalHz * ratios[n - 2];
    }

    public int modes() {
        return ratios.length + 1;
    }
}
