package org.nodewright.physics.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;

/**
 * The small CSV dialect shared by the measurement tables: cells split on a comma, semicolon or
 * tab; blank lines and {@code #} comments skipped; a first line without any digit is a header.
 */
final class CsvTable {

    private static final Pattern SPLIT = Pattern.compile("\\s*[,;\\t]\\s*");
    private static final Pattern HAS_DIGIT = Pattern.compile(".*\\d.*");

    private CsvTable() {
    }

    /** One row of cells and its 1-based line number in the file. */
    record Row(int line, String[] cells) {
    }

    /** The header's cells (lower case), or an empty array when the table has none. */
    static String[] header(String text) {
        for (String raw : text.split("\\r?\\n|\\r", -1)) {
            String line = raw.strip().replace("\uFEFF", "");
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            return HAS_DIGIT.matcher(line).matches() ? new String[0] : SPLIT.split(line.toLowerCase(java.util.Locale.ROOT));
        }
        return new String[0];
    }

    /**
     * @param width   cells each row must have
     * @param maxRows rows allowed at most
     */
    static List<Row> rows(String text, int width, int maxRows) {
        if (text == null || text.isBlank()) {
            throw new UnreadableInputException("the table is empty");
        }
        if (text.indexOf('\0') >= 0) {
            throw new UnreadableInputException("not a text table (the file holds binary data)");
        }
        String[] lines = text.split("\\r?\\n|\\r", -1);
        List<Row> out = new ArrayList<>();
        boolean first = true;
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i].strip().replace("\uFEFF", "");
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            boolean header = first && !HAS_DIGIT.matcher(line).matches();
            first = false;
            if (header) {
                continue;
            }
            String[] cells = SPLIT.split(line, -1);
            if (cells.length != width) {
                throw new UnreadableInputException("line " + (i + 1) + ": expected " + width + " cell(s), found " + cells.length);
            }
            if (out.size() == maxRows) {
                throw new UnreadableInputException("the table has more than " + maxRows + " rows");
            }
            out.add(new Row(i + 1, cells));
        }
        if (out.isEmpty()) {
            throw new UnreadableInputException("the table has no rows of numbers");
        }
        return out;
    }

    /** Number of cells in the first non-header row (the table's width). */
    static int width(String text) {
        if (text == null || text.isBlank()) {
            throw new UnreadableInputException("the table is empty");
        }
        boolean first = true;
        for (String raw : text.split("\\r?\\n|\\r", -1)) {
            String line = raw.strip().replace("\uFEFF", "");
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            boolean header = first && !HAS_DIGIT.matcher(line).matches();
            first = false;
            if (!header) {
                return SPLIT.split(line, -1).length;
            }
        }
        throw new UnreadableInputException("the table has no rows of numbers");
    }

    /** A finite decimal number, or a message naming the line, column and cell. */
    static double number(String cell, int line, String column) {
        String c = cell.trim();
        try {
            if (c.matches("(?i).*(nan|inf).*")) {
                throw new NumberFormatException();
            }
            return Double.parseDouble(c);
        } catch (NumberFormatException e) {
            String shown = c.length() > 30 ? c.substring(0, 30) + "…" : c;
            throw new UnreadableInputException("line " + line + ", column " + column + ": \"" + shown + "\" is not a number");
        }
    }
}
