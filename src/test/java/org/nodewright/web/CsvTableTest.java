package org.nodewright.web;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CsvTableTest {

    // The formula-injection guard (common practice for CSV meant for spreadsheets): a leading =, +, -,
    // @, tab or CR makes a cell text with a leading apostrophe, unless the cell is a plain number or a
    // ;-list of plain numbers. RFC 4180 quoting follows (commas, quotes, semicolons, line breaks).
    @ParameterizedTest
    @CsvSource(delimiter = '|', quoteCharacter = '`', textBlock = """
            =SUM(A1:A2)      | '=SUM(A1:A2)
            +cmd             | '+cmd
            -cmd             | '-cmd
            @SUM(1)          | '@SUM(1)
            -1.5             | -1.5
            +2               | +2
            -2.0E-4          | -2.0E-4
            -0.5;0.25        | "-0.5;0.25"
            -0.5;=1+1        | "'-0.5;=1+1"
            650.0            | 650.0
            D5               | D5
            a,b              | "a,b"
            say "hi"         | "say ""hi""\"
            it's             | it's
            """)
    void cellsAreGuardedThenQuoted(String text, String cell) {
        assertThat(CsvTable.cell(text)).isEqualTo(cell);
    }

    @Test
    void tabAndCarriageReturnAreGuardedToo() {
        assertThat(CsvTable.cell("\tcmd")).isEqualTo("'\tcmd");
        assertThat(CsvTable.cell("\rcmd")).isEqualTo("\"'\rcmd\"");
        assertThat(CsvTable.cell("")).isEmpty();
    }

    record Row(int n, Double q, List<Double> nodes, String label) {
    }

    @Test
    void columnsComeInTheirListedOrderWithCrlfLines() {
        CsvTable<Row> table = CsvTable.of(CsvTable.column("n", Row::n), CsvTable.column("q", Row::q),
                CsvTable.column("nodesMm", Row::nodes), CsvTable.column("label", Row::label));
        assertThat(table.header()).containsExactly("n", "q", "nodesMm", "label");
        assertThat(table.write(List.of(new Row(1, 12.5, List.of(0.0, 650.0), "=open"),
                new Row(2, null, List.of(), null))))
                .isEqualTo("n,q,nodesMm,label\r\n1,12.5,\"0.0;650.0\",'=open\r\n2,,,\r\n");
        assertThat(CsvTable.text(new double[] {1.0, -2.5})).isEqualTo("1.0;-2.5");
        assertThat(CsvTable.text(Arrays.asList(1, null))).isEqualTo("1;");
    }
}
