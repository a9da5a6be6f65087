package org.nodewright.web;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import tools.jackson.databind.JacksonModule;
import tools.jackson.databind.cfg.MapperConfig;
import tools.jackson.databind.introspect.AnnotatedClass;
import tools.jackson.databind.introspect.NopAnnotationIntrospector;
import tools.jackson.databind.module.SimpleModule;

/**
 * The JSON words of the physics core's enums: each constant is written and read as its name in
 * lower case with hyphens ({@code OPEN_UNFLANGED} ↔ {@code "open-unflanged"}). The core enums carry
 * no Jackson annotations; request and response records use them directly and this module (registered
 * on the application's mapper by {@link StrictJsonConfig}) gives them their words. Only the words are
 * accepted: the constant names, other cases and numbers are refused like any unknown word, and
 * {@link ProblemAdvice} answers with the accepted words.
 */
public final class EnumWords {

    /** Enums declared under this package (and its sub-packages) get their words from here. */
    static final String CORE_PACKAGE = "org.nodewright.physics";

    private EnumWords() {
    }

    /** True for an enum of the physics core. */
    public static boolean isCoreEnum(Class<?> type) {
        return type != null && type.isEnum() && type.getName().startsWith(CORE_PACKAGE + ".");
    }

    /** The word of one constant: {@code OPEN_UNFLANGED} → {@code open-unflanged}. */
    public static String word(Enum<?> constant) {
        return constant.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** Every word of a core enum, in declaration order. */
    public static List<String> words(Class<?> enumType) {
        return Arrays.stream(enumType.getEnumConstants()).map(c -> word((Enum<?>) c)).toList();
    }

    /** The Jackson module that gives core enums their words, for reading and writing alike. */
    public static JacksonModule module() {
        return new SimpleModule("nodewright-enum-words") {
            @Override
            public void setupModule(SetupContext context) {
                super.setupModule(context);
                context.insertAnnotationIntrospector(new Words());
            }
        };
    }

    /** Supplies the words as if each core constant carried {@code @JsonProperty("word")}. */
    private static final class Words extends NopAnnotationIntrospector {

        @Override
        public String[] findEnumValues(MapperConfig<?> config, AnnotatedClass ac, Enum<?>[] enumValues,
                String[] names) {
            if (!isCoreEnum(ac.getRawType())) {
                return names;
            }
            for (int i = 0; i < enumValues.length; i++) {
                names[i] = word(enumValues[i]);
            }
            return names;
        }
    }
}
