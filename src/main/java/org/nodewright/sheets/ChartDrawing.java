package org.nodewright.sheets;

import java.io.IOException;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.nodewright.physics.templates.Mark.Caption.Anchor;
import org.nodewright.templates.render.PdfMarks;

/**
 * One chart of a bench sheet as PDF vector paths: the plot frame, ticks at 1-2-5 steps with their
 * numbers, the axis titles, and each series as a polyline (own dash pattern), markers (own shape)
 * or bars (filled, hollow or light, side by side). Coordinates in page millimetres.
 */
final class ChartDrawing {

    private final PDPageContentStream cs;
    private final PdfMarks pen;
    private final BenchSheet.Chart chart;
    private double left;
    private final double top;
    private double w;
    private double h;
    private double x0;
    private double x1;
    private double y0;
    private double y1;

    ChartDrawing(PDPageContentStream cs, PdfMarks pen, BenchSheet.Chart chart, double left, double top, double w,
            double h) {
        this.cs = cs;
        this.pen = pen;
        this.chart = chart;
        this.left = left;
        this.top = top;
        this.w = w;
        this.h = h;
    }

    void draw() throws IOException {
        if (!range()) {
            pen.text(left, top + h / 2, "(nothing to draw)", 2.5, Anchor.START);
            return;
        }
        if (chart.equalScale()) {
            double scale = Math.min(w / (x1 - x0), h / (y1 - y0));
            double nw = scale * (x1 - x0);
            left += (w - nw) / 2;
            w = nw;
            h = scale * (y1 - y0);
        }
        axes();
        cs.saveGraphicsState();
        cs.addRect(pen.x(left), pen.y(top + h), PdfMarks.pt(w), PdfMarks.pt(h));
        cs.clip();
        List<BenchSheet.Series> series = chart.series();
        int bars = (int) series.stream().filter(s -> s.look() == BenchSheet.Look.BARS).count();
        int bar = 0;
        for (int i = 0; i < series.size(); i++) {
            BenchSheet.Series s = series.get(i);
            switch (s.look()) {
                case LINE -> line(s, i);
                case POINTS -> points(s, i);
                case BARS -> bars(s, i, bar++, bars);
            }
        }
        cs.restoreGraphicsState();
        cs.setLineDashPattern(new float[0], 0);
        cs.setStrokingColor(0f, 0f, 0f);
        cs.setNonStrokingColor(0f, 0f, 0f);
    }

    /** The data's extent, widened to whole 1-2-5 steps; bars and categories include y = 0. */
    private boolean range() {
        double ax = Double.POSITIVE_INFINITY;
        double bx = Double.NEGATIVE_INFINITY;
        double ay = Double.POSITIVE_INFINITY;
        double by = Double.NEGATIVE_INFINITY;
        boolean anyBars = false;
        for (BenchSheet.Series s : chart.series()) {
            anyBars |= s.look() == BenchSheet.Look.BARS;
            for (int i = 0; i < s.x().length; i++) {
                if (Double.isFinite(s.x()[i]) && Double.isFinite(s.y()[i])) {
                    ax = Math.min(ax, s.x()[i]);
                    bx = Math.max(bx, s.x()[i]);
                    ay = Math.min(ay, s.y()[i]);
                    by = Math.max(by, s.y()[i]);
                }
            }
        }
        if (!Double.isFinite(ax)) {
            return false;
        }
        if (anyBars) {
            ay = Math.min(ay, 0);
            by = Math.max(by, 0);
        }
        if (chart.categories()) {
            x0 = Math.floor(ax) - 0.5;
            x1 = Math.ceil(bx) + 0.5;
        } else if (chart.equalScale()) {
            x0 = ax;
            x1 = bx == ax ? ax + 1 : bx;
        } else {
            double step = step(ax, bx);
            x0 = Math.floor(ax / step) * step;
            x1 = Math.ceil(bx / step) * step;
            if (x1 == x0) {
                x1 = x0 + step;
            }
        }
        if (chart.equalScale()) {
            y0 = ay;
            y1 = by == ay ? ay + 1 : by;
        } else {
            double step = step(ay, by);
            y0 = Math.floor(ay / step + 1e-9) * step;
            y1 = Math.ceil(by / step - 1e-9) * step;
            if (y1 - y0 < step) {
                y1 = y0 + step;
            }
        }
        return true;
    }

    /** A tick step of 1, 2 or 5 times a power of ten giving about five intervals. */
    static double step(double a, double b) {
        double span = Math.abs(b - a);
        if (span == 0 || !Double.isFinite(span)) {
            span = Math.max(Math.abs(a), 1.0);
        }
        double raw = span / 5;
        double p = Math.pow(10, Math.floor(Math.log10(raw)));
        double m = raw / p;
        return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * p;
    }

    private double px(double x) {
        return left + (x - x0) / (x1 - x0) * w;
    }

    private double py(double y) {
        return top + h - (y - y0) / (y1 - y0) * h;
    }

    private void axes() throws IOException {
        cs.setStrokingColor(0f, 0f, 0f);
        cs.setNonStrokingColor(0f, 0f, 0f);
        cs.setLineWidth(PdfMarks.pt(0.2));
        cs.addRect(pen.x(left), pen.y(top + h), PdfMarks.pt(w), PdfMarks.pt(h));
        cs.stroke();
        double size = 2.1;
        if (chart.categories()) {
            int first = (int) Math.ceil(x0);
            int count = (int) Math.floor(x1) - first + 1;
            int every = Math.max(1, (int) Math.ceil(count / 24.0));
            for (int n = first; n <= x1; n += every) {
                tickX(n, Integer.toString(n), size);
            }
        } else {
            double sx = step(x0, x1);
            for (double v = Math.ceil(x0 / sx) * sx; v <= x1 + sx * 1e-9; v += sx) {
                tickX(v, Figures.sig(Math.abs(v) < sx * 1e-9 ? 0 : v, 6), size);
            }
        }
        double sy = step(y0, y1);
        for (double v = Math.ceil(y0 / sy - 1e-9) * sy; v <= y1 + sy * 1e-9; v += sy) {
            double yy = py(v);
            cs.moveTo(pen.x(left), pen.y(yy));
            cs.lineTo(pen.x(left - 1.2), pen.y(yy));
            cs.stroke();
            pen.text(left - 1.8, yy + size * 0.35, Figures.sig(Math.abs(v) < sy * 1e-9 ? 0 : v, 6), size, Anchor.END);
        }
        if (y0 < 0 && y1 > 0) {
            cs.setLineWidth(PdfMarks.pt(0.12));
            cs.moveTo(pen.x(left), pen.y(py(0)));
            cs.lineTo(pen.x(left + w), pen.y(py(0)));
            cs.stroke();
        }
        pen.text(left + w / 2, top + h + 7.5, chart.xAxis(), 2.4, Anchor.MIDDLE);
        pen.text(left - 15, top - 1.5, chart.yAxis(), 2.2, Anchor.START);
    }

    private void tickX(double v, String label, double size) throws IOException {
        double xx = px(v);
        cs.moveTo(pen.x(xx), pen.y(top + h));
        cs.lineTo(pen.x(xx), pen.y(top + h + 1.2));
        cs.stroke();
        pen.text(xx, top + h + 1.6 + size, label, size, Anchor.MIDDLE);
    }

    private void colour(int i) throws IOException {
        float[] c = BenchSheetPdf.PALETTE[i % BenchSheetPdf.PALETTE.length];
        cs.setStrokingColor(c[0], c[1], c[2]);
        cs.setNonStrokingColor(c[0], c[1], c[2]);
    }

    private void line(BenchSheet.Series s, int i) throws IOException {
        colour(i);
        cs.setLineWidth(PdfMarks.pt(0.35));
        float[] dash = BenchSheetPdf.DASHES[i % BenchSheetPdf.DASHES.length];
        cs.setLineDashPattern(scaled(dash), 0);
        boolean down = false;
        for (int k = 0; k < s.x().length; k++) {
            double x = s.x()[k];
            double y = s.y()[k];
            if (!Double.isFinite(x) || !Double.isFinite(y)) {
                if (down) {
                    cs.stroke();
                }
                down = false;
                continue;
            }
            if (!down) {
                cs.moveTo(pen.x(px(x)), pen.y(py(y)));
                down = true;
            } else {
                cs.lineTo(pen.x(px(x)), pen.y(py(y)));
            }
        }
        if (down) {
            cs.stroke();
        }
        cs.setLineDashPattern(new float[0], 0);
    }

    private static float[] scaled(float[] dashMm) {
        float[] out = new float[dashMm.length];
        for (int i = 0; i < out.length; i++) {
            out[i] = PdfMarks.pt(dashMm[i]);
        }
        return out;
    }

    private void points(BenchSheet.Series s, int i) throws IOException {
        colour(i);
        cs.setLineWidth(PdfMarks.pt(0.3));
        for (int k = 0; k < s.x().length; k++) {
            if (Double.isFinite(s.x()[k]) && Double.isFinite(s.y()[k])) {
                marker(cs, pen, i, px(s.x()[k]), py(s.y()[k]), 0.9);
            }
        }
    }

    /** Marker i: circle, square, triangle, diamond, cross; filled for even i, hollow for odd. */
    static void marker(PDPageContentStream cs, PdfMarks pen, int i, double x, double y, double r) throws IOException {
        switch (i % 5) {
            case 0 -> pen.circlePath(x, y, r);
            case 1 -> cs.addRect(pen.x(x - r), pen.y(y + r), PdfMarks.pt(2 * r), PdfMarks.pt(2 * r));
            case 2 -> {
                cs.moveTo(pen.x(x), pen.y(y - r * 1.2));
                cs.lineTo(pen.x(x + r * 1.1), pen.y(y + r * 0.8));
                cs.lineTo(pen.x(x - r * 1.1), pen.y(y + r * 0.8));
                cs.closePath();
            }
            case 3 -> {
                cs.moveTo(pen.x(x), pen.y(y - r * 1.3));
                cs.lineTo(pen.x(x + r * 1.1), pen.y(y));
                cs.lineTo(pen.x(x), pen.y(y + r * 1.3));
                cs.lineTo(pen.x(x - r * 1.1), pen.y(y));
                cs.closePath();
            }
            default -> {
                cs.moveTo(pen.x(x - r), pen.y(y - r));
                cs.lineTo(pen.x(x + r), pen.y(y + r));
                cs.moveTo(pen.x(x - r), pen.y(y + r));
                cs.lineTo(pen.x(x + r), pen.y(y - r));
                cs.stroke();
                return;
            }
        }
        if (i % 2 == 0) {
            cs.fillAndStroke();
        } else {
            cs.stroke();
        }
    }

    private void bars(BenchSheet.Series s, int i, int slot, int slots) throws IOException {
        double band = 0.8 / slots;
        double base = py(Math.max(y0, Math.min(y1, 0)));
        cs.setLineWidth(PdfMarks.pt(0.25));
        for (int k = 0; k < s.x().length; k++) {
            double x = s.x()[k];
            double y = s.y()[k];
            if (!Double.isFinite(x) || !Double.isFinite(y)) {
                continue;
            }
            double a = px(x - 0.4 + slot * band);
            double b = px(x - 0.4 + (slot + 1) * band);
            double top = py(y);
            bar(i, a, Math.min(top, base), b - a, Math.abs(base - top));
        }
    }

    /** A bar: series 0 filled, 1 hollow, 2 filled light, ...; each outlined in its colour. */
    private void bar(int i, double x, double yTop, double bw, double bh) throws IOException {
        colour(i);
        cs.addRect(pen.x(x), pen.y(yTop + bh), PdfMarks.pt(bw), PdfMarks.pt(bh));
        if (i % 2 == 0) {
            cs.fillAndStroke();
        } else {
            cs.stroke();
        }
    }

    /** The legend's sample of series i at (x, y): 6 mm of its line, one marker, or a small bar. */
    static void swatch(PDPageContentStream cs, PdfMarks pen, BenchSheet.Series s, int i, double x, double y)
            throws IOException {
        float[] c = BenchSheetPdf.PALETTE[i % BenchSheetPdf.PALETTE.length];
        cs.setStrokingColor(c[0], c[1], c[2]);
        cs.setNonStrokingColor(c[0], c[1], c[2]);
        cs.setLineWidth(PdfMarks.pt(0.35));
        switch (s.look()) {
            case LINE -> {
                cs.setLineDashPattern(scaled(BenchSheetPdf.DASHES[i % BenchSheetPdf.DASHES.length]), 0);
                cs.moveTo(pen.x(x), pen.y(y));
                cs.lineTo(pen.x(x + 6), pen.y(y));
                cs.stroke();
                cs.setLineDashPattern(new float[0], 0);
            }
            case POINTS -> marker(cs, pen, i, x + 3, y, 0.9);
            case BARS -> {
                cs.addRect(pen.x(x + 1.5), pen.y(y + 1.2), PdfMarks.pt(3), PdfMarks.pt(2.4));
                if (i % 2 == 0) {
                    cs.fillAndStroke();
                } else {
                    cs.stroke();
                }
            }
        }
        cs.setStrokingColor(0f, 0f, 0f);
        cs.setNonStrokingColor(0f, 0f, 0f);
    }
}
