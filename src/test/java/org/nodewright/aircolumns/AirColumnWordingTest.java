package org.nodewright.aircolumns;

import static org.assertj.core.api.Assertions.assertThat;

import java.lang.reflect.Constructor;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.nodewright.physics.aircolumn.AirColumnWarning;
import org.nodewright.web.UserTexts;
import org.springframework.context.support.ResourceBundleMessageSource;

public class AirColumnWordingTest {

    /** The application's texts without a Spring context (same basenames as application.properties). */
    public static UserTexts texts() {
        ResourceBundleMessageSource source = new ResourceBundleMessageSource();
        source.setBasenames("messages/common", "messages/strings", "messages/aircolumns");
        source.setDefaultEncoding("UTF-8");
        source.setFallbackToSystemLocale(false);
        try {
            Constructor<UserTexts> c = UserTexts.class.getDeclaredConstructor(
                    org.springframework.context.MessageSource.class);
            c.setAccessible(true);
            return c.newInstance(source);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException(e);
        }
    }

    private final AirColumnWording wording = new AirColumnWording(texts());

    @Test
    void eachWarningReadsAsBefore() {
        assertThat(wording.warnings(List.of(
                new AirColumnWarning.ResonanceCap(120),
                new AirColumnWarning.RegisterNotFound("D5", 2, 300.0, 3000.0),
                new AirColumnWarning.RegisterNotFound(" ", 1, 20.0, 1500.5),
                new AirColumnWarning.CrossModes(2.004),
                new AirColumnWarning.OutsideSpeedFit(-5.0)))).containsExactly(
                "only the lowest 120 resonances are listed",
                "fingering D5: register 2 not found between 300.0 and 3000.0 Hz",
                "fingering (unnamed): register 1 not found between 20.0 and 1500.5 Hz",
                "ka reaches 2.00: above 1.84 the first cross-mode can propagate and the plane-wave model is no "
                        + "longer exact",
                "Cramer's 1993 speed-of-sound fit is stated for 0..30 C; -5.0 C is outside it");
    }
}
