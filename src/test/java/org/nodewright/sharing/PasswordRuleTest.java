package org.nodewright.sharing;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The stated password rule: NIST SP 800-63B 5.1.1.2 minimum of 8 characters, a common-password list, BCrypt's 72 bytes. */
class PasswordRuleTest {

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource(delimiter = '|', textBlock = """
            # password                          | expected problem (empty = accepted)
            spruce-and-maple                    |
            seven77                             | must be at least 8 characters
            'eight888'                          |
            # 8 code points, 16 UTF-16 units (SP 800-63B counts characters, not bytes)
            𝄞𝄞𝄞𝄞𝄞𝄞𝄞𝄞                            |
            # common practice: the most guessed passwords, compared ignoring case
            password123                         | is one of the most common passwords; choose a longer phrase of your own
            PassWord123                         | is one of the most common passwords; choose a longer phrase of your own
            qwertyuiop                          | is one of the most common passwords; choose a longer phrase of your own
            12345678                            | is one of the most common passwords; choose a longer phrase of your own
            luthier-anna                        | must not be the account's name
            '          '                        | must not be only spaces
            """)
    void theRuleNamesWhatIsWrong(String password, String expected) {
        assertThat(PasswordRule.problem(password, "luthier-anna")).isEqualTo(expected);
    }

    @ParameterizedTest(name = "{0} bytes")
    @CsvSource({
            // BCrypt (Provos & Mazieres 1999) reads at most 72 bytes of the key; more is refused, not cut.
            "72, ",
            "73, must be at most 72 bytes (UTF-8)"})
    void atMost72Bytes(int bytes, String expected) {
        assertThat(PasswordRule.problem("k".repeat(bytes - 1) + "z", null)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource({"'', is required"})
    void anEmptyPasswordIsMissing(String password, String expected) {
        assertThat(PasswordRule.problem(password, null)).isEqualTo(expected);
        assertThat(PasswordRule.problem(null, null)).isEqualTo(expected);
    }

    @org.junit.jupiter.api.Test
    void theShippedListIsShortButThere() {
        assertThat(PasswordRule.listSize()).isBetween(50, 1000);
        assertThat(PasswordRule.isCommon("iloveyou")).isTrue();
        assertThat(PasswordRule.isCommon("harrowgate-bench-1")).isFalse();
    }
}
