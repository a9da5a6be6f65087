package org.nodewright.sheets;

import java.util.List;

/**
 * What a bench sheet shows of one analysed design, besides its name, revision, date and parameters
 * (which {@link SheetHeader} and {@link ParameterRows} give for every kind): the key results, the
 * charts that matter for the kind, the results tables and the cautions. Built by the feature that
 * owns the design's request ({@link DesignSheet}); drawn by {@link BenchSheetPdf}.
 *
 * @param heading  the kind of design in words ("String", "Air column")
 * @param results  the key figures, label and value with its unit
 * @param charts   drawn as vector graphics, in this order
 * @param tables   the results tables
 * @param cautions safety and model cautions, one paragraph each
 */
public record BenchSheet(String heading, List<Entry> results, List<Chart> charts, List<Table> tables,
        List<String> cautions) {

    public BenchSheet {
        results = List.copyOf(results);
        charts = List.copyOf(charts);
        tables = List.copyOf(tables);
        cautions = cautions.stream().filter(c -> c != null && !c.isBlank()).distinct().toList();
    }

    /** One labelled figure ("Tension", "70.8 N"). */
    public record Entry(String label, String value) {
    }

    /**
     * A chart: axes with their titles (units included), one or more series. {@code categories}
     * draws x as whole numbers (partial n, string 1..6) and series as side-by-side bars or points;
     * {@code equalScale} keeps one millimetre of x as long as one of y (a plate's outline).
     */
    public record Chart(String title, String xAxis, String yAxis, List<Series> series, boolean categories,
            boolean equalScale) {
        public Chart {
            series = List.copyOf(series);
        }

        public static Chart lines(String title, String xAxis, String yAxis, List<Series> series) {
            return new Chart(title, xAxis, yAxis, series, false, false);
        }

        public static Chart categories(String title, String xAxis, String yAxis, List<Series> series) {
            return new Chart(title, xAxis, yAxis, series, true, false);
        }

        public static Chart plan(String title, String xAxis, String yAxis, List<Series> series) {
            return new Chart(title, xAxis, yAxis, series, false, true);
        }
    }

    /** How a series is drawn; besides its colour each series has its own dash pattern or marker. */
    public enum Look { LINE, POINTS, BARS }

    /** Points of one series; a NaN in x or y lifts the pen (separate line pieces). */
    public record Series(String label, Look look, double[] x, double[] y) {
        public Series {
            if (x.length != y.length) {
                throw new IllegalArgumentException("series " + label + ": x has " + x.length + " values, y " + y.length);
            }
            x = x.clone();
            y = y.clone();
        }
    }

    /** A table of text cells, one list per row, as many cells as columns. */
    public record Table(String title, List<String> columns, List<List<String>> rows) {
        public Table {
            columns = List.copyOf(columns);
            rows = rows.stream().map(List::copyOf).toList();
            for (List<String> row : rows) {
                if (row.size() != columns.size()) {
                    throw new IllegalArgumentException("table " + title + ": a row of " + row.size()
                            + " cells for " + columns.size() + " columns");
                }
            }
        }
    }
}
