package org.nodewright.web;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.nodewright.physics.aircolumn.OutputEnd;
import org.nodewright.physics.strings.EndCondition;
import tools.jackson.databind.exc.InvalidFormatException;
import tools.jackson.databind.exc.MismatchedInputException;
import tools.jackson.databind.json.JsonMapper;

class EnumWordsTest {

    /** A request-like record holding core enums, read with the application's strict mapper. */
    record Ends(OutputEnd outputEnd, EndCondition endCondition) {
    }

    private final JsonMapper mapper = strictMapper();

    static JsonMapper strictMapper() {
        JsonMapper.Builder builder = JsonMapper.builder();
        new StrictJsonConfig().strictCoercion().customize(builder);
        return builder.build();
    }

    // The contract's words (http-contract.md) for the output end and the bending boundary.
    @ParameterizedTest
    @CsvSource({"open-unflanged, OPEN_UNFLANGED", "open-flanged, OPEN_FLANGED", "ideal-open, IDEAL_OPEN",
        "closed, CLOSED"})
    void contractWordsReadAsCoreConstantsAndWriteBack(String word, OutputEnd constant) {
        Ends ends = mapper.readValue("{\"outputEnd\":\"" + word + "\",\"endCondition\":\"clamped\"}", Ends.class);
        assertThat(ends.outputEnd()).isEqualTo(constant);
        assertThat(ends.endCondition()).isEqualTo(EndCondition.CLAMPED);
        assertThat(mapper.writeValueAsString(ends))
                .isEqualTo("{\"outputEnd\":\"" + word + "\",\"endCondition\":\"clamped\"}");
    }

    @ParameterizedTest
    @ValueSource(strings = {"\"OPEN_UNFLANGED\"", "\"Open-Unflanged\"", "\"open_unflanged\"", "\"\"", "\"open\""})
    void otherSpellingsAreUnknownWords(String value) {
        assertThatThrownBy(() -> mapper.readValue("{\"outputEnd\":" + value + "}", Ends.class))
                .isInstanceOf(InvalidFormatException.class);
    }

    @ParameterizedTest
    @ValueSource(strings = {"0", "1", "2.0", "true"})
    void numbersAndBooleansAreNotEnumWords(String value) {
        assertThatThrownBy(() -> mapper.readValue("{\"outputEnd\":" + value + "}", Ends.class))
                .isInstanceOf(MismatchedInputException.class);
    }

    @Test
    void theAcceptedWordsAreListedInDeclarationOrder() {
        assertThat(EnumWords.words(OutputEnd.class))
                .containsExactly("open-unflanged", "open-flanged", "ideal-open", "closed");
        assertThat(ProblemAdvice.enumWords(OutputEnd.class))
                .containsExactly("open-unflanged", "open-flanged", "ideal-open", "closed");
        assertThat(EnumWords.isCoreEnum(OutputEnd.class)).isTrue();
        assertThat(EnumWords.isCoreEnum(ProblemAdviceTest.Ending.class)).isFalse();
    }
}
