package org.nodewright.web;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.function.Function;
import java.util.regex.Pattern;
import org.springframework.http.ContentDisposition;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;

/**
 * The one CSV writer: an explicit list of columns per row type (the README lists them; they are a
 * contract), one row per record, RFC 4180 quoting and CRLF line ends. A number is written as Java
 * writes it ({@code 650.0}, {@code 1.0E-5}), a list as its items joined with {@code ;}, an absent
 * value as an empty cell.
 *
 * <p>Formula-injection guard: a cell whose text starts with {@code =}, {@code +}, {@code -},
 * {@code @}, a tab or a carriage return is written with a leading {@code '} so that a spreadsheet
 * shows it as text instead of running it, except a plain number or a {@code ;}-list of plain numbers
 * ({@code -1.5}, {@code -2.0E-4;3.0}), which stay as they are.
 *
 * @param <T> the row type
 */
public final class CsvTable<T> {

    /** {@code text/csv; charset=UTF-8}. */
    public static final MediaType CSV = new MediaType("text", "csv", StandardCharsets.UTF_8);

    private static final Pattern NUMBER = Pattern.compile("[-+]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][-+]?\\d+)?");

    /** One column: its header and how a row gives its value. */
    public record Column<T>(String name, Function<T, ?> value) {
    }

    private final List<Column<T>> columns;

    private CsvTable(List<Column<T>> columns) {
        this.columns = List.copyOf(columns);
    }

    @SafeVarargs
    public static <T> CsvTable<T> of(Column<T>... columns) {
        return new CsvTable<>(List.of(columns));
    }

    public static <T> Column<T> column(String name, Function<T, ?> value) {
        return new Column<>(name, value);
    }

    public List<String> header() {
        return columns.stream().map(Column::name).toList();
    }

    /** The header line and one line per row. */
    public String write(Collection<? extends T> rows) {
        StringBuilder out = new StringBuilder();
        line(out, header());
        for (T row : rows) {
            List<String> cells = new ArrayList<>(columns.size());
            for (Column<T> c : columns) {
                cells.add(text(c.value().apply(row)));
            }
            line(out, cells);
        }
        return out.toString();
    }

    /** The table as a download named {@code filename}. */
    public ResponseEntity<String> download(Collection<? extends T> rows, String filename) {
        return ResponseEntity.ok().contentType(CSV)
                .header(HttpHeaders.CONTENT_DISPOSITION, ContentDisposition.attachment().filename(filename).build()
                        .toString())
                .body(write(rows));
    }

    private static void line(StringBuilder out, List<String> cells) {
        for (int i = 0; i < cells.size(); i++) {
            if (i > 0) {
                out.append(',');
            }
            out.append(cell(cells.get(i)));
        }
        out.append("\r\n");
    }

    static String text(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof double[] a) {
            List<String> parts = new ArrayList<>(a.length);
            for (double x : a) {
                parts.add(String.valueOf(x));
            }
            return String.join(";", parts);
        }
        if (v instanceof Collection<?> c) {
            return String.join(";", c.stream().map(CsvTable::text).toList());
        }
        return String.valueOf(v);
    }

    /** The guard, then RFC 4180 quoting (a cell with a comma, quote, semicolon or line break is quoted). */
    static String cell(String s) {
        String v = s;
        if (!v.isEmpty() && "=+-@\t\r".indexOf(v.charAt(0)) >= 0 && !plainNumbers(v)) {
            v = "'" + v;
        }
        if (v.contains(",") || v.contains("\"") || v.contains("\n") || v.contains("\r") || v.contains(";")) {
            return "\"" + v.replace("\"", "\"\"") + "\"";
        }
        return v;
    }

    private static boolean plainNumbers(String v) {
        for (String part : v.split(";", -1)) {
            if (!NUMBER.matcher(part).matches()) {
                return false;
            }
        }
        return true;
    }
}
