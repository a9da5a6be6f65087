package org.nodewright.strings;

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

/** The bench sheets of string and string-set designs, from the same analyses as the benches. */
@Configuration(proxyBeanMethods = false)
class StringSheets {

    /** Mode shapes drawn on the sheet: the first four (more lines stop being readable on paper). */
    static final int SHAPES_DRAWN = 4;
    /** Standard acceleration of gravity, 9.80665 m/s² (3rd CGPM, 1901): newtons to kilograms-force. */
    static final double STANDARD_GRAVITY = 9.80665;

    @Bean
    DesignSheet stringSheet(StringAnalysisService analysis, UserTexts texts) {
        return DesignSheet.of(StringAnalysisRequest.class, r -> string(r, analysis.analyze(r, true), texts));
    }

    @Bean
    DesignSheet stringSetSheet(StringSetService sets, UserTexts texts) {
        return DesignSheet.of(StringSetRequest.class, r -> set(sets.analyze(r), texts));
    }

    static BenchSheet string(StringAnalysisRequest r, StringAnalysisResponse a, UserTexts t) {
        List<Entry> results = new ArrayList<>();
        results.add(new Entry(t.get("sheet.string.tension"), Figures.sig(a.tensionN(), 5) + " N ("
                + Figures.sig(a.tensionN() / STANDARD_GRAVITY, 4) + " kgf)"));
        results.add(new Entry(t.get("sheet.string.density"), Figures.sig(a.linearDensityKgPerM() * 1000, 5) + " g/m"));
        results.add(new Entry(t.get("sheet.string.speed"), Figures.sig(a.waveSpeedMps(), 5) + " m/s"));
        results.add(new Entry(t.get("sheet.string.f1"), Figures.sig(a.fundamentalHz(), 7) + " Hz"));
        results.add(new Entry(t.get("sheet.string.idealF1"), Figures.sig(a.idealFundamentalHz(), 7) + " Hz"));
        results.add(new Entry(t.get("sheet.string.b"), Figures.sig(a.inharmonicityB(), 4)));
        if (a.note() != null) {
            results.add(new Entry(t.get("sheet.string.note"), a.note().name() + " " + Figures.signed(a.note().centsOff(), 1)
                    + " cents (A4 = " + Figures.sig(a.referenceA4Hz(), 6) + " Hz)"));
        }
        if (a.stressPa() != null) {
            results.add(new Entry(t.get("sheet.string.stress"), Figures.sig(a.stressPa() / 1e6, 4) + " MPa"));
        }
        if (a.stressFraction() != null) {
            results.add(new Entry(t.get("sheet.string.stressShare"), Figures.sig(a.stressFraction() * 100, 3) + " %"
                    + (a.stressLevel() == null ? "" : " (" + a.stressLevel() + ")")));
        }
        results.add(new Entry(t.get("sheet.string.end"), a.endCondition()));

        List<StringAnalysisResponse.ModeJson> modes = a.modes();
        int n = modes.size();
        double[] ns = Figures.counting(n);
        double[] cents = modes.stream().mapToDouble(StringAnalysisResponse.ModeJson::centsFromHarmonic).toArray();
        List<Chart> charts = new ArrayList<>();
        charts.add(Chart.categories(t.get("sheet.string.partials.title"), t.get("sheet.string.partials.x"),
                t.get("sheet.string.partials.y"), List.of(new Series(t.get("sheet.string.partials.series"), Look.POINTS,
                        ns, cents))));
        int pickups = modes.isEmpty() || modes.get(0).pickupOutput() == null ? 0 : modes.get(0).pickupOutput().size();
        boolean plucked = !modes.isEmpty() && modes.get(0).excitation() != null;
        List<Series> levels = new ArrayList<>();
        if (plucked) {
            levels.add(new Series(t.get("sheet.string.levels.pluck"), Look.BARS, ns,
                    decibels(modes.stream().mapToDouble(m -> m.excitation() == null ? Double.NaN : m.excitation()).toArray())));
        }
        for (int p = 0; p < pickups; p++) {
            int k = p;
            levels.add(new Series(t.get("sheet.string.levels.pickup", p + 1), Look.BARS, ns, decibels(modes.stream()
                    .mapToDouble(m -> m.pickupOutput() == null ? Double.NaN : m.pickupOutput().get(k)).toArray())));
        }
        if (!levels.isEmpty()) {
            charts.add(Chart.categories(t.get("sheet.string.levels.title"), t.get("sheet.string.partials.x"),
                    t.get("sheet.string.levels.y"), levels));
        }
        List<Series> shapes = new ArrayList<>();
        for (StringAnalysisResponse.ModeJson m : modes.subList(0, Math.min(SHAPES_DRAWN, n))) {
            if (m.shapeX() != null) {
                shapes.add(new Series(t.get("sheet.string.shapes.series", m.n()), Look.LINE, m.shapeX(), m.shape()));
            }
        }
        if (!shapes.isEmpty()) {
            charts.add(Chart.lines(t.get("sheet.string.shapes.title"), t.get("sheet.string.shapes.x"),
                    t.get("sheet.string.shapes.y"), shapes));
        }

        List<String> columns = new ArrayList<>(List.of(t.get("sheet.string.col.n"), t.get("sheet.string.col.f"),
                t.get("sheet.string.col.harmonic"), t.get("sheet.string.col.cents"), t.get("sheet.string.col.nodes")));
        if (plucked) {
            columns.add(t.get("sheet.string.col.pluck"));
        }
        for (int p = 0; p < pickups; p++) {
            columns.add(t.get("sheet.string.col.pickup", p + 1));
        }
        double[] pluckDb = plucked ? levels.get(0).y() : null;
        List<List<String>> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            StringAnalysisResponse.ModeJson m = modes.get(i);
            List<String> row = new ArrayList<>(List.of(Integer.toString(m.n()), Figures.sig(m.frequencyHz(), 7),
                    Figures.sig(m.harmonicHz(), 7), Figures.signed(m.centsFromHarmonic(), 2),
                    Figures.list(m.nodesMm(), 5, 6)));
            if (plucked) {
                row.add(Figures.sig(pluckDb[i], 3));
            }
            for (int p = 0; p < pickups; p++) {
                row.add(Figures.sig(levels.get(p + (plucked ? 1 : 0)).y()[i], 3));
            }
            rows.add(row);
        }
        List<String> cautions = new ArrayList<>(a.warnings() == null ? List.of() : a.warnings());
        cautions.add(a.caution());
        cautions.add(t.get("strings.caution"));
        return new BenchSheet(t.get("sheet.string.heading"), results, charts,
                List.of(new Table(t.get("sheet.string.table.title"), columns, rows)), cautions);
    }

    /** 20·log10(|v| / max |v|): levels relative to the strongest (the usual decibel of an amplitude). */
    static double[] decibels(double[] amplitudes) {
        double max = 0;
        for (double v : amplitudes) {
            if (Double.isFinite(v)) {
                max = Math.max(max, Math.abs(v));
            }
        }
        double[] out = new double[amplitudes.length];
        for (int i = 0; i < out.length; i++) {
            double v = Math.abs(amplitudes[i]);
            // a node exactly under the pluck or pickup: floored at -80 dB so that the bar stays on the chart
            out[i] = !Double.isFinite(v) || max == 0 ? Double.NaN : Math.max(-80, 20 * Math.log10(v / max));
        }
        return out;
    }

    static BenchSheet set(StringSetResponse s, UserTexts t) {
        List<Entry> results = List.of(new Entry(t.get("sheet.set.total"), Figures.sig(s.totalTensionN(), 5) + " N ("
                + Figures.sig(s.totalTensionKgf(), 4) + " kgf)"));
        List<StringSetResponse.StringJson> strings = s.strings();
        double[] xs = Figures.counting(strings.size());
        List<Chart> charts = List.of(
                Chart.categories(t.get("sheet.set.tension.title"), t.get("sheet.set.tension.x"), t.get("sheet.set.tension.y"),
                        List.of(new Series(t.get("sheet.set.tension.series"), Look.BARS, xs,
                                strings.stream().mapToDouble(StringSetResponse.StringJson::tensionN).toArray()))),
                Chart.categories(t.get("sheet.set.stress.title"), t.get("sheet.set.tension.x"), t.get("sheet.set.stress.y"),
                        List.of(new Series(t.get("sheet.set.stress.series"), Look.BARS, xs,
                                strings.stream().mapToDouble(x -> x.stressFraction() * 100).toArray()))));
        List<String> columns = List.of(t.get("sheet.set.col.string"), t.get("sheet.set.col.label"),
                t.get("sheet.set.col.length"), t.get("sheet.set.col.target"), t.get("sheet.set.col.note"),
                t.get("sheet.set.col.tension"), t.get("sheet.set.col.kgf"), t.get("sheet.set.col.density"),
                t.get("sheet.set.col.stress"), t.get("sheet.set.col.level"));
        List<List<String>> rows = new ArrayList<>();
        for (StringSetResponse.StringJson x : strings) {
            rows.add(List.of(Integer.toString(x.index() + 1), x.label() == null ? "" : x.label(),
                    Figures.sig(x.lengthMm(), 6), Figures.sig(x.targetHz(), 6),
                    x.note() == null ? "" : x.note().name() + " " + Figures.signed(x.note().centsOff(), 1),
                    Figures.sig(x.tensionN(), 4), Figures.sig(x.tensionKgf(), 4),
                    Figures.sig(x.linearDensityKgPerM() * 1000, 4), Figures.sig(x.stressFraction() * 100, 3),
                    x.stressLevel() == null ? "" : x.stressLevel()));
        }
        List<String> cautions = new ArrayList<>(s.warnings() == null ? List.of() : s.warnings());
        cautions.add(s.caution());
        cautions.add(s.neckCaution());
        cautions.add(t.get("sets.caution"));
        return new BenchSheet(t.get("sheet.set.heading"), results, charts,
                List.of(new Table(t.get("sheet.set.table.title"), columns, rows)), cautions);
    }
}
