package org.nodewright.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

class ChartPrecisionTest {

    // Expected text from Python 3's '%.*f' % (decimals, x) (the same value as a number; Python keeps
    // trailing zeros, we drop them down to one decimal). No row is an exact tie.
    @ParameterizedTest
    @CsvSource(textBlock = """
            0.8414709848078965,     5, 0.84147
            -0.3826834323650898,    5, -0.38268
            27.083333333333332,     3, 27.083
            1.2246467991473532e-16, 5, 0.0
            650.0,                  3, 650.0
            -0.999999999,           5, -1.0
            0.000123456789,         5, 0.00012
            123456.789,             0, 123457.0
            3.25,                   3, 3.25
            1e-7,                   5, 0.0
            """)
    void roundsToTheGivenDecimals(double x, int decimals, String expected) {
        assertThat(ChartPrecision.format(x, decimals, new StringBuilder())).isEqualTo(expected);
    }

    // The text of the char-buffer writer against java.math.BigDecimal's plain string of the same
    // scaled integer (an independent formatter): 200 000 values over every decimals count used.
    @Test
    void charBufferTextEqualsBigDecimalPlainString() {
        java.util.Random random = new java.util.Random(20261204L);
        char[] buf = new char[ChartPrecision.BUFFER];
        for (int i = 0; i < 200_000; i++) {
            int decimals = random.nextInt(16);
            double scale = Math.pow(10, decimals);
            double x = (random.nextDouble() * 2 - 1) * Math.pow(10, random.nextInt(8) - 4);
            if (i % 7 == 0) {
                x = Math.round(x * scale / 1000) * 1000 / scale; // trailing zeros in the fraction
            }
            if (Math.abs(x) * scale >= 9e15) {
                continue;
            }
            long scaled = Math.round(Math.abs(x) * scale);
            String expected = scaled == 0 ? "0.0"
                    : (x < 0 ? "-" : "") + java.math.BigDecimal.valueOf(scaled, decimals).stripTrailingZeros().toPlainString();
            if (!expected.contains(".")) {
                expected += ".0";
            }
            int len = ChartPrecision.format(x, decimals, scale, buf);
            assertThat(new String(buf, 0, len)).as("x=%s decimals=%d", x, decimals).isEqualTo(expected);
        }
    }

    // Six significant digits of the largest magnitude (common practice for chart data).
    @ParameterizedTest
    @CsvSource(textBlock = """
            1.0,      5
            0.5,      6
            650.0,    3
            99999.0,  1
            2.0e6,    0
            0.0,      1
            """)
    void decimalsFollowTheLargestMagnitude(double max, int decimals) {
        assertThat(ChartPrecision.decimalsFor(new double[] {0.0, -max / 3, max})).isEqualTo(decimals);
    }

    record Curve(@tools.jackson.databind.annotation.JsonSerialize(using = ChartPrecision.class) double[] y,
            @tools.jackson.databind.annotation.JsonSerialize(using = ChartPrecision.class) List<Double> x) {
    }

    @Test
    void writesArraysAndListsAsJsonNumbers() {
        JsonMapper mapper = JsonMapper.builder().build();
        String text = mapper.writeValueAsString(new Curve(new double[] {0, Math.sin(1), -1},
                List.of(0.0, 650.0 / 24, 650.0)));
        assertThat(text).isEqualTo("{\"y\":[0.0,0.84147,-1.0],\"x\":[0.0,27.083,650.0]}");
        JsonNode back = mapper.readTree(text);
        assertThat(back.path("y").get(1).isNumber()).isTrue();
    }
}
