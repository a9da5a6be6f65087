package org.nodewright.physics.bars;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.nodewright.physics.Require;

/** Finds the modes of a bar: bending through the thickness, and the families a maker must also hear. */
public final class BarAnalyzer {

    /** Upper bound on bending modes per call, so no request can ask for unbounded work. */
    public static final int MAX_MODES = 16;

    private BarAnalyzer() {
    }

    /**
     * @param modeCount  bending modes through the thickness wanted (1..{@link #MAX_MODES})
     * @param withOthers also compute the twisting and lateral families
     */
    public static BarAnalysis analyze(Bar bar, BeamTheory theory, int modeCount, boolean withOthers) {
        Require.between("modeCount", modeCount, 1, MAX_MODES);
        BeamFamily bending = BeamFamily.solve(bar, theory, false, modeCount);
        List<BarMode> modes = bending.modes(ModeFamily.BENDING);
        List<BarMode> others = new ArrayList<>();
        if (withOthers) {
            double top = modes.get(modes.size() - 1).frequencyHz();
            keepBelow(others, TwistingFamily.modes(bar, modeCount), top);
            if (bar.section().hasLateralFamily()) {
                keepBelow(others, BeamFamily.solve(bar, theory, true, modeCount).modes(ModeFamily.LATERAL_BENDING), top);
            }
            others.sort(Comparator.comparingDouble(BarMode::frequencyHz));
        }
        return new BarAnalysis(bending.shearCoefficient, bar.poissonForShear(), modes, others);
    }

    /** Bending modes only (the tuning solver's inner loop). */
    public static double[] bendingFrequencies(Bar bar, BeamTheory theory, int modeCount) {
        Require.between("modeCount", modeCount, 1, MAX_MODES);
        double[] ev = BeamFamily.solve(bar, theory, false, modeCount).eigenvalues;
        double[] f = new double[ev.length];
        for (int i = 0; i < ev.length; i++) {
            f[i] = Math.sqrt(ev[i]) / (2 * Math.PI);
        }
        return f;
    }

    private static void keepBelow(List<BarMode> out, List<BarMode> family, double top) {
        for (BarMode m : family) {
            if (m.n() == 1 || m.frequencyHz() <= top) {
                out.add(m);
            }
        }
    }
}
