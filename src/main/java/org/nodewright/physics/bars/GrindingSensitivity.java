package org.nodewright.physics.bars;

import org.nodewright.physics.Require;

/**
 * Where grinding moves each mode: the change in cents of bending modes 1..m when 1 mm² of side-view
 * area (1 mm deeper over 1 mm of length) is removed at x, from the eigenvalue sensitivity of the
 * finite-element model (first order: Δf/f = ½ Δλ/λ). Negative where removing wood lowers the
 * mode (mostly where the mode bends), positive where it mainly removes mass (near the free ends).
 *
 * @param positions     sample positions, m
 * @param centsPerMm2   [mode][sample]
 */
public record GrindingSensitivity(double[] positions, double[][] centsPerMm2) {

    /** Samples along the bar. */
    public static final int SAMPLES = 121;

    /** cents = 1200 log2(1 + ε) ≈ (1200 / ln 2) ε for small ε. */
    private static final double CENTS_PER_UNIT = 1200 / Math.log(2);
    private static final double MM2 = 1e-6;

    /**
     * @throws IllegalArgumentException unless the bar is a rectangle
     */
    public static GrindingSensitivity of(Bar bar, BeamTheory theory, int modes) {
        Require.between("modes", modes, 1, BarAnalyzer.MAX_MODES);
        if (!(bar.section() instanceof RectangleSection)) {
            throw new IllegalArgumentException("grinding sensitivity needs a rectangular bar");
        }
        BeamFamily f = BeamFamily.solve(bar, theory, false, modes);
        double[] xs = new double[SAMPLES];
        for (int i = 0; i < SAMPLES; i++) {
            xs[i] = bar.length() * i / (SAMPLES - 1);
        }
        double[][] c = new double[modes][];
        for (int q = 0; q < modes; q++) {
            double[] s = f.thicknessSensitivity(q, xs);
            double lambda = f.eigenvalues[q];
            for (int i = 0; i < s.length; i++) {
                s[i] = -CENTS_PER_UNIT * 0.5 * s[i] / lambda * MM2;
            }
            c[q] = s;
        }
        return new GrindingSensitivity(xs, c);
    }
}
