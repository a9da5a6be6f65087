package org.nodewright.web;

import org.springframework.boot.jackson.autoconfigure.JsonMapperBuilderCustomizer;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.core.StreamWriteFeature;

/**
 * Jackson's fast floating-point writer (Schubfach, shortest text that reads back to the same
 * double) and parser. Kept because they pay on our numeric answers: see README, Speed
 * ({@code AnswerBenchmark}, {@code fastDoubles} false/true). Both are exact: every double written
 * reads back bit for bit.
 */
@Configuration(proxyBeanMethods = false)
class FastDoublesConfig {

    @Bean
    JsonMapperBuilderCustomizer fastDoubles() {
        return builder -> builder
                .enable(StreamWriteFeature.USE_FAST_DOUBLE_WRITER)
                .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER);
    }
}
