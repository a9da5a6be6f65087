package org.nodewright.web;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.annotation.JsonProperty;
import org.junit.jupiter.api.Test;

class ProblemAdviceTest {

    enum Ending {
        @JsonProperty("open-unflanged") OPEN_UNFLANGED,
        @JsonProperty("closed") CLOSED,
        PLAIN
    }

    @Test
    void anUnknownEnumWordIsAnsweredWithTheWordsTheFieldAccepts() {
        assertThat(ProblemAdvice.enumWords(Ending.class)).containsExactly("open-unflanged", "closed", "PLAIN");
    }
}
