package org.nodewright.web;

import java.util.function.Consumer;
import org.springframework.boot.jackson.autoconfigure.JsonMapperBuilderCustomizer;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.cfg.CoercionAction;
import tools.jackson.databind.cfg.CoercionInputShape;
import tools.jackson.databind.cfg.EnumFeature;
import tools.jackson.databind.cfg.MutableCoercionConfig;
import tools.jackson.databind.type.LogicalType;

/**
 * JSON input is taken as typed, never coerced: {@code "650"} is not a number, {@code 12.5} is not a
 * mode count, {@code 1} is not an enum word. A coerced value would be a silently changed value.
 * Core enums are read and written as their lower-case hyphenated words ({@link EnumWords}).
 */
@Configuration(proxyBeanMethods = false)
class StrictJsonConfig {

    private static final CoercionInputShape STRING = CoercionInputShape.String;
    private static final CoercionInputShape EMPTY = CoercionInputShape.EmptyString;
    private static final CoercionInputShape INTEGER = CoercionInputShape.Integer;
    private static final CoercionInputShape FLOAT = CoercionInputShape.Float;
    private static final CoercionInputShape BOOLEAN = CoercionInputShape.Boolean;

    @Bean
    JsonMapperBuilderCustomizer strictCoercion() {
        return builder -> builder
                .addModule(EnumWords.module())
                .enable(EnumFeature.FAIL_ON_NUMBERS_FOR_ENUMS)
                .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
                .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .withCoercionConfig(LogicalType.Float, refuse(STRING, EMPTY, BOOLEAN))
                .withCoercionConfig(LogicalType.Integer, refuse(STRING, EMPTY, FLOAT, BOOLEAN))
                .withCoercionConfig(LogicalType.Boolean, refuse(STRING, EMPTY, INTEGER, FLOAT))
                .withCoercionConfig(LogicalType.Textual, refuse(INTEGER, FLOAT, BOOLEAN))
                .withCoercionConfig(LogicalType.Enum, refuse(INTEGER, EMPTY));
    }

    /** A coercion rule that fails on each of the given input shapes. */
    private static Consumer<MutableCoercionConfig> refuse(CoercionInputShape... shapes) {
        return c -> {
            for (CoercionInputShape shape : shapes) {
                c.setCoercion(shape, CoercionAction.Fail);
            }
        };
    }
}
