package org.nodewright.physics.inverse;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.physics.strings.IdealString;
import org.nodewright.physics.strings.Material;
import org.nodewright.physics.strings.StressCheck;
import org.nodewright.physics.strings.StringConstruction;

/**
 * Picks, for a string tuned to a pitch, the available gauge whose tension at that pitch comes
 * closest to a target (closest in ratio, |ln(T/T_target)|), by Mersenne's law T = μ(2Lf)²
 * (ideal flexible string: bending stiffness raises the pitch of a steel string by well under a
 * cent at these gauges and is left out). Wound strings are built as the string core builds them
 * (one round wrap of touching turns) with the core a fixed fraction of the outer diameter.
 */
public final class GaugePicker {

    /** Core diameter as a fraction of the outer diameter of a wound string: 0.40 (common practice, from memory). */
    public static final double DEFAULT_CORE_RATIO = 0.40;

    private GaugePicker() {
    }

    /**
     * One string to choose a gauge for.
     *
     * @param wrap      wrap material, or null for a plain string
     * @param coreRatio core diameter / outer diameter for a wound string (0.2 to 0.8)
     */
    public record Target(double lengthM, double frequencyHz, double tensionN, Material core, Material wrap,
            double coreRatio) {
        public Target {
            if (!(lengthM > 0) || !(frequencyHz > 0) || !(tensionN > 0) || !Double.isFinite(lengthM)
                    || !Double.isFinite(frequencyHz) || !Double.isFinite(tensionN)) {
                throw new IllegalArgumentException("length, frequency and tension must be positive: " + lengthM + ", "
                        + frequencyHz + ", " + tensionN);
            }
            if (core == null) {
                throw new IllegalArgumentException("a core material is required");
            }
            if (!(coreRatio >= 0.2 && coreRatio <= 0.8)) {
                throw new IllegalArgumentException("coreRatio must be 0.2 to 0.8, was " + coreRatio);
            }
        }

        public boolean wound() {
            return wrap != null;
        }

        /** The string built at outer diameter d (m). */
        public StringConstruction build(double d) {
            if (wrap == null) {
                return StringConstruction.plain(core, d);
            }
            double c = coreRatio * d;
            return StringConstruction.wound(core, c, wrap, (d - c) / 2);
        }

        public double tensionAt(double d) {
            return IdealString.tensionN(lengthM, build(d).linearDensityKgPerM(), frequencyHz);
        }
    }

    /** A gauge and the tension it needs at the target pitch. */
    public record Option(double outerDiameterM, double tensionN, StringConstruction construction) {
    }

    /**
     * @param choice      the closest available gauge
     * @param thinner     the next thinner available gauge, or null
     * @param thicker     the next thicker available gauge, or null
     * @param exactDiameterM the outer diameter that gives exactly the target tension
     * @param stress      stress of the chosen gauge's core against its material's strength
     */
    public record Pick(Target target, Option choice, Option thinner, Option thicker, double exactDiameterM,
            StressCheck stress) {
        public double offFraction() {
            return choice.tensionN() / target.tensionN() - 1;
        }
    }

    /**
     * @param gaugesM available outer diameters, m (any order, at least one)
     * @throws IllegalArgumentException for an empty or non-positive gauge list
     */
    public static Pick pick(Target target, List<Double> gaugesM) {
        if (gaugesM == null || gaugesM.isEmpty()) {
            throw new IllegalArgumentException("at least one available gauge is needed");
        }
        List<Double> sorted = new ArrayList<>(gaugesM);
        sorted.sort(Double::compare);
        if (!(sorted.get(0) > 0)) {
            throw new IllegalArgumentException("gauges must be positive, smallest was " + sorted.get(0));
        }
        int best = 0;
        double bestScore = Double.POSITIVE_INFINITY;
        for (int i = 0; i < sorted.size(); i++) {
            double score = Math.abs(Math.log(target.tensionAt(sorted.get(i)) / target.tensionN()));
            if (score < bestScore) {
                bestScore = score;
                best = i;
            }
        }
        Option choice = option(target, sorted.get(best));
        Option thinner = best > 0 ? option(target, sorted.get(best - 1)) : null;
        Option thicker = best + 1 < sorted.size() ? option(target, sorted.get(best + 1)) : null;
        StressCheck stress = StressCheck.of(choice.tensionN(), choice.construction().coreDiameterM(),
                target.core().tensileStrengthPa());
        return new Pick(target, choice, thinner, thicker, exactDiameter(target), stress);
    }

    private static Option option(Target target, double d) {
        return new Option(d, target.tensionAt(d), target.build(d));
    }

    /**
     * The diameter giving the target tension exactly. Tension grows as d² for a plain string and
     * monotonically for a wound one of fixed core ratio, so bisection on ln d (to 1e-12) finds it.
     */
    static double exactDiameter(Target target) {
        double lo = 1e-6;
        double hi = 0.05;
        for (int i = 0; i < 200 && hi / lo > 1 + 1e-12; i++) {
            double mid = Math.sqrt(lo * hi);
            if (target.tensionAt(mid) < target.tensionN()) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return Math.sqrt(lo * hi);
    }
}
