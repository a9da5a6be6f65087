package org.nodewright.physics.strings;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.Require;

/** The first N transverse modes of a {@link StringModel}. */
public final class ModeSolver {

    /** Upper bound on modes per call, so no request can ask for unbounded work. */
    public static final int MAX_MODES = 128;

    public List<Mode> modes(StringModel s, int count) {
        Require.between("mode count", count, 1, MAX_MODES);
        double f1 = s.idealFundamentalHz();
        List<Mode> modes = new ArrayList<>(count);
        for (int n = 1; n <= count; n++) {
            modes.add(mode(s, n, f1));
        }
        return List.copyOf(modes);
    }

    /** The sounding fundamental, stiffness and end condition included. */
    public double fundamentalHz(StringModel s) {
        return frequencyOnly(s, 1);
    }

    private Mode mode(StringModel s, int n, double f1) {
        double harmonic = n * f1;
        if (!s.isStiff()) {
            return new Mode(n, harmonic, harmonic, new SineShape(n));
        }
        if (s.endCondition() == EndCondition.PINNED) {
            return new Mode(n, pinnedStiffHz(n, f1, s.inharmonicityB()), harmonic, new SineShape(n));
        }
        double tau = s.tensionParameter();
        double b = ClampedCharacteristic.root(n, tau);
        double a = Math.sqrt(b * b + tau);
        return new Mode(n, ClampedCharacteristic.frequencyHz(b, s), harmonic, ClampedShape.of(n, a, b));
    }

    private double frequencyOnly(StringModel s, int n) {
        double f1 = s.idealFundamentalHz();
        if (!s.isStiff()) {
            return n * f1;
        }
        if (s.endCondition() == EndCondition.PINNED) {
            return pinnedStiffHz(n, f1, s.inharmonicityB());
        }
        return ClampedCharacteristic.frequencyHz(ClampedCharacteristic.root(n, s.tensionParameter()), s);
    }

    /** Pinned stiff string, exact: f_n = n·f1·√(1 + B·n²) (Fletcher 1964, eq. 9). */
    public static double pinnedStiffHz(int n, double idealF1, double b) {
        return n * idealF1 * Math.sqrt(1 + b * n * n);
    }
}
