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

    /**
     * Each warning code is rendered with its own figures (not pinned word for word: the sentences
     * belong to messages/aircolumns.properties): the cap, the fingering's name (or the word for an
     * unnamed one), the register and the searched band, the highest ka against the cross-mode
     * cut-on 1.84 (first zero of J1', the (1,1) mode of a circular duct; from memory), and the temperature outside
     * Cramer's 0..30 C fit. A key missing from the properties would show as its code, not a figure.
     */
    @Test
    void eachWarningCarriesItsFigures() {
        List<String> shown = wording.warnings(List.of(
                new AirColumnWarning.ResonanceCap(120),
                new AirColumnWarning.RegisterNotFound("D5", 2, 300.0, 3000.0),
                new AirColumnWarning.RegisterNotFound(" ", 1, 20.0, 1500.5),
                new AirColumnWarning.CrossModes(2.004),
                new AirColumnWarning.OutsideSpeedFit(-5.0)));
        assertThat(shown).hasSize(5).allSatisfy(w -> assertThat(w).doesNotContain("{", "}", "??").isNotBlank());
        assertThat(shown.get(0)).contains("120");
        assertThat(shown.get(1)).contains("D5", " 2 ", "300.0", "3000.0");
        assertThat(shown.get(2)).doesNotContain("D5").contains(" 1 ", "20.0", "1500.5");
        assertThat(shown.get(2).trim()).isNotEqualTo(shown.get(1).trim());
        assertThat(shown.get(3)).contains("2.00", "1.84");
        assertThat(shown.get(4)).contains("-5.0", "0..30");
    }
}
