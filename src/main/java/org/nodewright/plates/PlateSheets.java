package org.nodewright.plates;

import java.util.ArrayList;
import java.util.List;
import org.nodewright.sheets.BenchSheet;
import org.nodewright.sheets.BenchSheet.Chart;
import org.nodewright.sheets.BenchSheet.Entry;
import org.nodewright.sheets.BenchSheet.Look;
import org.nodewright.sheets.BenchSheet.Series;
import org.nodewright.sheets.BenchSheet.Table;
import org.nodewright.sheets.DesignSheet;
import org.nodewright.sheets.Figures;
import org.nodewright.web.UserTexts;
import org.springframework.context.annotation.Bean;
import org.springframework.context.annotation.Configuration;

/** The bench sheet of a plate design, from the same analysis as the plate bench. */
@Configuration(proxyBeanMethods = false)
class PlateSheets {

    /** Node-line drawings on the sheet: the first three modes, one drawing each, x and y to one scale. */
    static final int DRAWINGS = 3;

    @Bean
    DesignSheet plateSheet(PlateAnalysisService analysis, UserTexts texts) {
        return DesignSheet.of(PlateAnalysisRequest.class, r -> sheet(analysis.analyze(r), texts));
    }

    static BenchSheet sheet(PlateAnalysisResponse a, UserTexts t) {
        List<Entry> results = List.of(new Entry(t.get("sheet.plate.method"), a.method()),
                new Entry(t.get("sheet.plate.basis"), Integer.toString(a.basisSize())));
        List<PlateAnalysisResponse.Mode> modes = a.modes();
        List<Chart> charts = new ArrayList<>();
        charts.add(Chart.categories(t.get("sheet.plate.frequencies.title"), t.get("sheet.plate.frequencies.x"),
                t.get("sheet.plate.frequencies.y"), List.of(new Series(t.get("sheet.plate.frequencies.series"), Look.BARS,
                        Figures.counting(modes.size()),
                        modes.stream().mapToDouble(PlateAnalysisResponse.Mode::frequencyHz).toArray()))));
        for (PlateAnalysisResponse.Mode m : modes.subList(0, Math.min(DRAWINGS, modes.size()))) {
            charts.add(Chart.plan(t.get("sheet.plate.lines.title", m.n()) + ", " + Figures.sig(m.frequencyHz(), 5) + " Hz",
                    t.get("sheet.plate.lines.x"), t.get("sheet.plate.lines.y"),
                    List.of(outline(m.grid(), t), nodeLines(m, t))));
        }
        List<List<String>> rows = new ArrayList<>();
        for (PlateAnalysisResponse.Mode m : modes) {
            rows.add(List.of(Integer.toString(m.n()), Figures.sig(m.frequencyHz(), 6),
                    m.note() == null ? "" : m.note().name() + " " + Figures.signed(m.note().centsOff(), 1),
                    m.name() == null ? "" : m.name(), m.nodalLinesX() + ", " + m.nodalLinesY()));
        }
        List<String> cautions = new ArrayList<>(a.cautions());
        cautions.add(t.get("plates.caution"));
        return new BenchSheet(t.get("sheet.plate.heading"), results, charts,
                List.of(new Table(t.get("sheet.plate.table.title"), List.of(t.get("sheet.plate.col.n"),
                        t.get("sheet.plate.col.f"), t.get("sheet.plate.col.note"), t.get("sheet.plate.col.name"),
                        t.get("sheet.plate.col.lines")), rows)), cautions);
    }

    /** The edge of the plate as the solver's grid shows it: the boundary of the cells inside the outline. */
    static Series outline(PlateAnalysisResponse.Grid g, UserTexts t) {
        List<double[]> pts = new ArrayList<>();
        if (g != null && g.xMm().length > 0 && g.yMm().length > 0) {
            // each grid row's first and last point inside the outline, walked down one side and up the other
            List<double[]> left = new ArrayList<>();
            List<double[]> right = new ArrayList<>();
            for (int j = 0; j < g.yMm().length; j++) {
                int first = -1;
                int last = -1;
                for (int i = 0; i < g.xMm().length; i++) {
                    if (g.w().get(i).get(j) != null) {
                        if (first < 0) {
                            first = i;
                        }
                        last = i;
                    }
                }
                if (first >= 0) {
                    left.add(new double[] {g.xMm()[first], g.yMm()[j]});
                    right.add(new double[] {g.xMm()[last], g.yMm()[j]});
                }
            }
            pts.addAll(left);
            for (int k = right.size() - 1; k >= 0; k--) {
                pts.add(right.get(k));
            }
            if (!left.isEmpty()) {
                pts.add(left.get(0));
            }
        }
        return new Series(t.get("sheet.plate.outline"), Look.LINE, pts.stream().mapToDouble(p -> p[0]).toArray(),
                pts.stream().mapToDouble(p -> p[1]).toArray());
    }

    /** Every node line of a mode as one series, the lines apart (NaN between them). */
    static Series nodeLines(PlateAnalysisResponse.Mode m, UserTexts t) {
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        for (List<double[]> line : m.nodalLines() == null ? List.<List<double[]>>of() : m.nodalLines()) {
            for (double[] p : line) {
                xs.add(p[0]);
                ys.add(p[1]);
            }
            xs.add(Double.NaN);
            ys.add(Double.NaN);
        }
        return new Series(t.get("sheet.plate.lines.label"), Look.LINE, xs.stream().mapToDouble(Double::doubleValue).toArray(),
                ys.stream().mapToDouble(Double::doubleValue).toArray());
    }
}
