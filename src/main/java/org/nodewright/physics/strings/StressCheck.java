package org.nodewright.physics.strings;

import java.util.ArrayList;
import java.util.List;

/**
 * Axial stress of the load-bearing core, σ = T/(π·d²/4), against the material's tensile strength.
 *
 * @param stressPa           σ
 * @param tensileStrengthPa  the catalogue's typical strength (NaN when unknown)
 * @param warnings           nothing below 75 %, a warning above it, a strong one above 90 %
 */
public record StressCheck(double stressPa, double tensileStrengthPa, List<String> warnings) {

    public static final double WARN_FRACTION = 0.75;
    public static final double STRONG_FRACTION = 0.90;

    public static final String CAUTION = "A string near its breaking stress can snap and whip: wear eye protection "
            + "when you bring a string up to pitch, keep your face out of its plane, and trust the string maker's "
            + "published tension and breaking data over these typical catalogue values.";

    public StressCheck {
        warnings = List.copyOf(warnings);
    }

    /** σ = T/(π·d²/4) for a solid round core of diameter d. */
    public static double stressPa(double tensionN, double coreDiameterM) {
        return tensionN / (Math.PI * coreDiameterM * coreDiameterM / 4);
    }

    public static StressCheck of(double tensionN, double coreDiameterM, double tensileStrengthPa) {
        double stress = stressPa(tensionN, coreDiameterM);
        List<String> warnings = new ArrayList<>();
        if (tensileStrengthPa > 0) {
            double fraction = stress / tensileStrengthPa;
            String pct = String.format(java.util.Locale.ROOT, "%.0f %%", 100 * fraction);
            if (fraction > STRONG_FRACTION) {
                warnings.add("DANGER: stress is " + pct + " of the typical tensile strength (above 90 %): "
                        + "this string is likely to break at or before this pitch. " + CAUTION);
            } else if (fraction > WARN_FRACTION) {
                warnings.add("Warning: stress is " + pct + " of the typical tensile strength (above 75 %). " + CAUTION);
            }
        }
        return new StressCheck(stress, tensileStrengthPa, warnings);
    }

    public double fractionOfStrength() {
        return stressPa / tensileStrengthPa;
    }
}
