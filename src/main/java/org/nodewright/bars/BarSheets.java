package org.nodewright.bars;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.nodewright.physics.bars.ModeFamily;
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

/** The bench sheet of a bar design, from the same analysis as the bar bench. */
@Configuration(proxyBeanMethods = false)
class BarSheets {

    /** Bending shapes drawn on the sheet: the first three. */
    static final int SHAPES_DRAWN = 3;

    @Bean
    DesignSheet barSheet(BarAnalysisService analysis, UserTexts texts) {
        return DesignSheet.of(BarAnalysisRequest.class, r -> sheet(analysis.analyze(r), texts));
    }

    /** An enum constant as its JSON word ({@code FREE_FREE} → "free-free"), as the API writes it. */
    private static String word(Enum<?> e) {
        return e == null ? "-" : e.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    static BenchSheet sheet(BarAnalysisResponse a, UserTexts t) {
        List<Entry> results = new ArrayList<>();
        BarAnalysisResponse.MaterialUsed m = a.material();
        results.add(new Entry(t.get("sheet.bar.material"), (m.id() == null ? "" : m.id() + ": ")
                + Figures.sig(m.densityKgPerM3(), 4) + " kg/m³, E " + Figures.sig(m.youngsModulusPa() / 1e9, 4)
                + " GPa, G " + Figures.sig(m.shearModulusPa() / 1e9, 4) + " GPa"));
        results.add(new Entry(t.get("sheet.bar.theory"), word(a.theory())));
        results.add(new Entry(t.get("sheet.bar.ends"), word(a.ends())));
        results.add(new Entry(t.get("sheet.bar.shear"), Figures.sig(a.shearCoefficient(), 4)));
        if (a.cordHolesMm() != null && !a.cordHolesMm().isEmpty()) {
            results.add(new Entry(t.get("sheet.bar.cordHoles"), Figures.list(a.cordHolesMm(), 5, 4)));
        }
        List<BarAnalysisResponse.ModeJson> modes = a.modes();
        List<Chart> charts = new ArrayList<>();
        List<BarAnalysisResponse.ModeJson> bending = modes.stream().filter(x -> x.kind() == ModeFamily.BENDING).toList();
        charts.add(Chart.categories(t.get("sheet.bar.ratios.title"), t.get("sheet.bar.ratios.x"), t.get("sheet.bar.ratios.y"),
                List.of(new Series(t.get("sheet.bar.ratios.series"), Look.BARS, Figures.counting(modes.size()),
                        modes.stream().mapToDouble(BarAnalysisResponse.ModeJson::ratioToFirst).toArray()))));
        List<Series> shapes = new ArrayList<>();
        for (BarAnalysisResponse.ModeJson x : bending.subList(0, Math.min(SHAPES_DRAWN, bending.size()))) {
            if (x.shapeX() != null) {
                shapes.add(new Series(t.get("sheet.bar.shapes.series", x.n(), word(x.kind())), Look.LINE, x.shapeX(),
                        x.shape()));
            }
        }
        if (!shapes.isEmpty()) {
            charts.add(Chart.lines(t.get("sheet.bar.shapes.title"), t.get("sheet.bar.shapes.x"), t.get("sheet.bar.shapes.y"),
                    shapes));
        }
        List<List<String>> rows = new ArrayList<>();
        for (BarAnalysisResponse.ModeJson x : modes) {
            rows.add(List.of(Integer.toString(x.n()), word(x.kind()), Figures.sig(x.frequencyHz(), 7),
                    Figures.sig(x.ratioToFirst(), 5),
                    x.note() == null ? "" : x.note().name() + " " + Figures.signed(x.note().centsOff(), 1),
                    Figures.list(x.nodesMm(), 5, 6)));
        }
        List<String> cautions = new ArrayList<>();
        for (String code : a.cautions()) {
            cautions.add(t.get("bars.caution." + code));
        }
        return new BenchSheet(t.get("sheet.bar.heading"), results, charts,
                List.of(new Table(t.get("sheet.bar.table.title"), List.of(t.get("sheet.bar.col.n"), t.get("sheet.bar.col.kind"),
                        t.get("sheet.bar.col.f"), t.get("sheet.bar.col.ratio"), t.get("sheet.bar.col.note"),
                        t.get("sheet.bar.col.nodes")), rows)), cautions);
    }
}
