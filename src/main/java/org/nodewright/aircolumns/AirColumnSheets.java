package org.nodewright.aircolumns;

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

/** The bench sheet of an air-column design, from the same analysis as the bore bench. */
@Configuration(proxyBeanMethods = false)
class AirColumnSheets {

    /** Standing waves drawn on the sheet: the first three resonances. */
    static final int PROFILES_DRAWN = 3;

    @Bean
    DesignSheet airColumnSheet(AirColumnController api, UserTexts texts) {
        return DesignSheet.of(AirColumnRequest.class, r -> sheet(api.analyze(r), texts));
    }

    static BenchSheet sheet(AirColumnResponse a, UserTexts t) {
        List<Entry> results = new ArrayList<>();
        results.add(new Entry(t.get("sheet.air.speed"), Figures.sig(a.speedOfSoundMps(), 6) + " m/s"));
        if (a.air() != null) {
            results.add(new Entry(t.get("sheet.air.temperature"), Figures.sig(a.air().temperatureC(), 4) + " °C"));
            results.add(new Entry(t.get("sheet.air.humidity"), Figures.sig(a.air().relativeHumidityPct(), 3) + " %"));
        }
        if (a.series() != null) {
            results.add(new Entry(t.get("sheet.air.series"), a.series()));
        }
        if (a.mouth() != null && a.mouth().endCorrectionMm() != null) {
            results.add(new Entry(t.get("sheet.air.endCorrection"), Figures.sig(a.mouth().endCorrectionMm(), 4) + " mm"));
        }
        List<Chart> charts = new ArrayList<>();
        if (a.impedance() != null && a.impedance().frequencyHz() != null) {
            double[] db = Figures.map(a.impedance().magnitude(), m -> m > 0 ? 20 * Math.log10(m) : Double.NaN);
            charts.add(Chart.lines(t.get("sheet.air.impedance.title"), t.get("sheet.air.impedance.x"),
                    t.get("sheet.air.impedance.y"), List.of(new Series(t.get("sheet.air.impedance.series"), Look.LINE,
                            a.impedance().frequencyHz(), db))));
        }
        if (a.profiles() != null && !a.profiles().isEmpty()) {
            List<Series> profiles = new ArrayList<>();
            for (AirColumnResponse.Profile p : a.profiles().subList(0, Math.min(PROFILES_DRAWN, a.profiles().size()))) {
                profiles.add(new Series(t.get("sheet.air.profiles.series", p.n()), Look.LINE, p.xMm(), p.pressure()));
            }
            charts.add(Chart.lines(t.get("sheet.air.profiles.title"), t.get("sheet.air.profiles.x"),
                    t.get("sheet.air.profiles.y"), profiles));
        }
        List<AirColumnResponse.FingeringItem> fingerings = a.fingerings() == null ? List.of() : a.fingerings();
        if (!fingerings.isEmpty()) {
            charts.add(Chart.categories(t.get("sheet.air.fingerings.title"), t.get("sheet.air.fingerings.x"),
                    t.get("sheet.air.fingerings.y"), List.of(new Series(t.get("sheet.air.fingerings.series"), Look.BARS,
                            Figures.counting(fingerings.size()), fingerings.stream()
                                    .mapToDouble(f -> f.centsFromTarget() == null ? Double.NaN : f.centsFromTarget())
                                    .toArray()))));
        }
        List<Table> tables = new ArrayList<>();
        List<List<String>> rows = new ArrayList<>();
        for (AirColumnResponse.ResonanceItem r : a.resonances()) {
            rows.add(List.of(Integer.toString(r.n()), Figures.sig(r.frequencyHz(), 7),
                    r.note() == null ? "" : r.note().name() + " " + Figures.signed(r.note().centsOff(), 1),
                    Figures.sig(r.q(), 4), Figures.signed(r.centsFromSeries(), 1), Figures.list(r.pressureNodesMm(), 5, 5)));
        }
        tables.add(new Table(t.get("sheet.air.table.title"), List.of(t.get("sheet.air.col.n"), t.get("sheet.air.col.f"),
                t.get("sheet.air.col.note"), t.get("sheet.air.col.q"), t.get("sheet.air.col.series"),
                t.get("sheet.air.col.nodes")), rows));
        if (!fingerings.isEmpty()) {
            List<List<String>> f = new ArrayList<>();
            for (AirColumnResponse.FingeringItem x : fingerings) {
                // holes are numbered from 1 on the page and the sheet (0-based in the request)
                String closed = x.closedHoles() == null || x.closedHoles().isEmpty() ? "none"
                        : String.join(", ", x.closedHoles().stream().map(h -> Integer.toString(h + 1)).toList());
                f.add(List.of((x.index() + 1) + " " + (x.name() == null ? "" : x.name()), closed,
                        Figures.sig(x.targetHz(), 6), Integer.toString(x.register()), Figures.sig(x.predictedHz(), 6),
                        Figures.signed(x.centsFromTarget(), 1)));
            }
            tables.add(new Table(t.get("sheet.air.fingeringTable.title"), List.of(t.get("sheet.air.col.fingering"),
                    t.get("sheet.air.col.closed"), t.get("sheet.air.col.target"), t.get("sheet.air.col.register"),
                    t.get("sheet.air.col.predicted"), t.get("sheet.air.col.cents")), f));
        }
        List<String> cautions = new ArrayList<>(a.warnings() == null ? List.of() : a.warnings());
        cautions.add(t.get("air.caution"));
        return new BenchSheet(t.get("sheet.air.heading"), results, charts, tables, cautions);
    }
}
