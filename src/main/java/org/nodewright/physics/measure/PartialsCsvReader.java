package org.nodewright.physics.measure;

import java.util.ArrayList;
import java.util.List;

/**
 * Reads a table of measured partial frequencies: one partial a line, either {@code frequencyHz}
 * or {@code n,frequencyHz} (comma, semicolon or tab between cells), an optional header line of
 * words, blank lines and lines starting with {@code #} ignored.
 */
public final class PartialsCsvReader {

    /** At most this many rows: a partial series, not a spectrum. */
    public static final int MAX_ROWS = 1000;

    private PartialsCsvReader() {
    }

    /** One row; {@code n} is 0 where the table has no mode-number column. */
    public record Row(int n, double frequencyHz) {
    }

    /** @throws UnreadableInputException naming the line and cell when the table cannot be read */
    public static List<Row> read(String text) {
        int width = CsvTable.width(text);
        if (width < 1 || width > 2) {
            throw new UnreadableInputException("a partials table has one column (frequencyHz) or two (n, frequencyHz), found "
                    + width);
        }
        List<Row> out = new ArrayList<>();
        for (CsvTable.Row r : CsvTable.rows(text, width, MAX_ROWS)) {
            int n = 0;
            if (width == 2) {
                double v = CsvTable.number(r.cells()[0], r.line(), "n");
                if (v != Math.rint(v) || v < 1 || v > 10_000) {
                    throw new UnreadableInputException("line " + r.line() + ", column n: must be a whole number from 1 to 10000, got "
                            + r.cells()[0].trim());
                }
                n = (int) v;
            }
            double f = CsvTable.number(r.cells()[width - 1], r.line(), "frequencyHz");
            if (!(f > 0)) {
                throw new UnreadableInputException("line " + r.line() + ", column frequencyHz: must be positive, got "
                        + r.cells()[width - 1].trim());
            }
            out.add(new Row(n, f));
        }
        return List.copyOf(out);
    }
}
