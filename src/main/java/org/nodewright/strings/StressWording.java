package org.nodewright.strings;

import java.util.List;
import java.util.Locale;
import org.nodewright.physics.strings.StressCheck;
import org.nodewright.web.UserTexts;
import org.springframework.stereotype.Component;

/**
 * The words of the core's stress levels and the string cautions ({@code messages/strings.properties},
 * keys {@code strings.stress.*} and {@code strings.set.*}), for every feature that tensions a string.
 */
@Component
public class StressWording {

    private final UserTexts texts;

    StressWording(UserTexts texts) {
        this.texts = texts;
    }

    /** Eye protection and the string maker's data: shown with every tension figure. */
    public String caution() {
        return texts.get("strings.stress.caution");
    }

    /** The total-load caution of a set planner. */
    public String neckCaution() {
        return texts.get("strings.set.neck-caution");
    }

    /** Nothing below 75 % of the strength, one warning above it, one danger above 90 % (with the caution). */
    public List<String> warnings(StressCheck stress) {
        if (stress == null || stress.level() == StressCheck.Level.NONE) {
            return List.of();
        }
        String pct = String.format(Locale.ROOT, "%.0f %%", 100 * stress.fractionOfStrength());
        String key = stress.level() == StressCheck.Level.DANGER ? "strings.stress.danger" : "strings.stress.warning";
        return List.of(texts.get(key, pct, caution()));
    }

    /** A set member's warning, naming the string by its number (from 1) and label. */
    public String memberWarning(int index, String label, String warning) {
        return label == null ? texts.get("strings.set.member-warning", index + 1, warning)
                : texts.get("strings.set.labelled-member-warning", index + 1, label, warning);
    }
}
