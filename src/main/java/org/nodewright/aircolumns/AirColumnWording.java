package org.nodewright.aircolumns;

import java.util.List;
import java.util.Locale;
import org.nodewright.physics.aircolumn.AirColumnWarning;
import org.nodewright.web.UserTexts;
import org.springframework.stereotype.Component;

/** Words the air-column core's warnings ({@code messages/aircolumns.properties}, keys {@code air.warning.*}). */
@Component
public class AirColumnWording {

    private final UserTexts texts;

    AirColumnWording(UserTexts texts) {
        this.texts = texts;
    }

    public List<String> warnings(List<AirColumnWarning> warnings) {
        return warnings.stream().map(this::warning).toList();
    }

    String warning(AirColumnWarning w) {
        if (w instanceof AirColumnWarning.ResonanceCap cap) {
            return texts.get("air.warning.resonance-cap", cap.listed());
        }
        if (w instanceof AirColumnWarning.RegisterNotFound r) {
            String name = r.fingering() == null || r.fingering().isBlank()
                    ? texts.get("air.warning.unnamed-fingering") : r.fingering();
            return texts.get("air.warning.register-not-found", name, r.register(), r.fMinHz(), r.fMaxHz());
        }
        if (w instanceof AirColumnWarning.CrossModes c) {
            return texts.get("air.warning.cross-modes", String.format(Locale.ROOT, "%.2f", c.ka()));
        }
        if (w instanceof AirColumnWarning.OutsideSpeedFit t) {
            return texts.get("air.warning.outside-speed-fit", t.temperatureC());
        }
        throw new IllegalStateException("no words for " + w);
    }
}
