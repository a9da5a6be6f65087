package org.nodewright.physics.strings;

/**
 * Axial stress of the load-bearing core, σ = T/(π·d²/4), against the material's tensile strength.
 * The core gives the figures and a level; the web layer words the warning and the caution.
 *
 * @param stressPa           σ
 * @param tensileStrengthPa  the catalogue's typical strength (NaN when unknown)
 * @param level              nothing below 75 % of the strength, a warning above it, danger above 90 %
 */
public record StressCheck(double stressPa, double tensileStrengthPa, Level level) {

    public static final double WARN_FRACTION = 0.75;
    public static final double STRONG_FRACTION = 0.90;

    /** How close the string is to breaking (common practice: warn above 75 %, danger above 90 %). */
    public enum Level {
        /** Below 75 % of the typical strength, or the strength is unknown. */
        NONE,
        /** Above 75 %. */
        WARNING,
        /** Above 90 %: likely to break at or before this pitch. */
        DANGER
    }

    public StressCheck {
        if (level == null) {
            throw new IllegalArgumentException("level is required");
        }
    }

    /** σ = T/(π·d²/4) for a solid round core of diameter d. */
    public static double stressPa(double tensionN, double coreDiameterM) {
        return tensionN / (Math.PI * coreDiameterM * coreDiameterM / 4);
    }

    public static StressCheck of(double tensionN, double coreDiameterM, double tensileStrengthPa) {
        double stress = stressPa(tensionN, coreDiameterM);
        Level level = Level.NONE;
        if (tensileStrengthPa > 0) {
            double fraction = stress / tensileStrengthPa;
            if (fraction > STRONG_FRACTION) {
                level = Level.DANGER;
            } else if (fraction > WARN_FRACTION) {
                level = Level.WARNING;
            }
        }
        return new StressCheck(stress, tensileStrengthPa, level);
    }

    public double fractionOfStrength() {
        return stressPa / tensileStrengthPa;
    }
}
