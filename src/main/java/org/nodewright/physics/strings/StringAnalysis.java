package org.nodewright.physics.strings;

import java.util.List;
import org.nodewright.physics.tuning.Note;

/**
 * The result of analysing one string.
 *
 * @param model            the string as analysed (tension solved if a target was given)
 * @param fundamentalHz    the sounding f1 (stiffness included)
 * @param stress           the stress check, or null when no core diameter is known
 * @param note             nearest equal-tempered note to the sounding f1
 * @param modes            the modes with their excitation and pickup gains
 */
public record StringAnalysis(StringModel model, double fundamentalHz, StressCheck stress, Note note,
        List<ModeResponse> modes) {

    public StringAnalysis {
        modes = List.copyOf(modes);
    }

    /**
     * @param mode          the mode
     * @param excitation    modal amplitude from the pluck or strike, or null without one
     * @param pickupGains   one signed gain per pickup, in request order
     * @param combined      g1 + g2 or g1 − g2 for a two-pickup combination, or null
     */
    public record ModeResponse(Mode mode, Double excitation, List<Double> pickupGains, Double combined) {

        public ModeResponse {
            pickupGains = List.copyOf(pickupGains);
        }
    }
}
