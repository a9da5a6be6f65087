package org.nodewright.sheets;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.nodewright.physics.templates.Mark.Caption.Anchor;
import org.nodewright.templates.render.Paper;
import org.nodewright.templates.render.PdfMarks;

/**
 * A bench sheet as a PDF on A4 or Letter, portrait: name, revision and date, the parameters, the
 * key results, the charts drawn as vector paths (no pictures), the results tables and the cautions,
 * flowing over as many pages as they need. Every page carries the 100 mm calibration ruler of the
 * printed templates (drawn by the same {@link PdfMarks}) and its page number.
 */
public final class BenchSheetPdf {

    public static final double MARGIN_MM = 15.0;
    /** Space kept at the foot of every page for the ruler and the page line. */
    public static final double FOOTER_MM = 24.0;
    public static final double CHART_HEIGHT_MM = 58.0;
    /** Left of the ruler's zero from the page's left edge; its base line sits this far above the bottom margin. */
    public static final double RULER_BASE_ABOVE_MARGIN_MM = 12.0;

    /**
     * The sheet's own colours, chosen apart in lightness as well as hue (dark blue, orange, light
     * blue, dark purple, grey) so that a series stays distinct in grey print and for the common forms
     * of colour-vision deficiency; each series also has its own dash pattern, marker or fill.
     */
    static final float[][] PALETTE = {
        {0.11f, 0.31f, 0.54f}, {0.88f, 0.54f, 0.12f}, {0.34f, 0.65f, 0.85f}, {0.45f, 0.16f, 0.40f}, {0.33f, 0.33f, 0.33f},
    };
    static final float[][] DASHES = {{}, {3.2f, 1.6f}, {0.9f, 1.1f}, {4.0f, 1.2f, 0.9f, 1.2f}, {2.0f, 2.0f}};

    private static final double BODY_MM = 2.8;
    private static final double SMALL_MM = 2.3;

    private BenchSheetPdf() {
    }

    public static byte[] render(SheetHeader header, List<BenchSheet.Entry> parameters, BenchSheet sheet, Paper paper) {
        try (PDDocument doc = new PDDocument(); ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            var info = doc.getDocumentInformation();
            info.setTitle("Bench sheet: " + header.name());
            info.setSubject(sheet.heading() + ", revision " + header.revision());
            info.setCreator("Nodewright");
            Flow flow = new Flow(doc, paper);
            flow.title(sheet.heading(), header);
            flow.section("Parameters");
            flow.entries(parameters);
            if (!sheet.results().isEmpty()) {
                flow.section("Results");
                flow.entries(sheet.results());
            }
            for (BenchSheet.Chart chart : sheet.charts()) {
                flow.chart(chart);
            }
            for (BenchSheet.Table table : sheet.tables()) {
                flow.table(table);
            }
            if (!sheet.cautions().isEmpty()) {
                flow.section("Cautions");
                for (String c : sheet.cautions()) {
                    flow.paragraph(c);
                }
            }
            flow.finish(header);
            doc.save(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("could not write the bench sheet PDF", e);
        }
    }

    /** Top-to-bottom layout over pages; y in mm from the page's top edge. */
    private static final class Flow {
        private final PDDocument doc;
        private final double width;
        private final double height;
        private final PDType1Font font = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
        private final PDType1Font bold = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
        private PDPageContentStream cs;
        private PdfMarks pen;
        private PdfMarks boldPen;
        private double y;

        Flow(PDDocument doc, Paper paper) throws IOException {
            this.doc = doc;
            this.width = paper.shortMm();
            this.height = paper.longMm();
            newPage();
        }

        private double contentWidth() {
            return width - 2 * MARGIN_MM;
        }

        private double bottom() {
            return height - MARGIN_MM - FOOTER_MM;
        }

        private void newPage() throws IOException {
            if (cs != null) {
                cs.close();
            }
            PDPage page = new PDPage(new PDRectangle(PdfMarks.pt(width), PdfMarks.pt(height)));
            doc.addPage(page);
            cs = new PDPageContentStream(doc, page);
            pen = new PdfMarks(cs, font, height);
            boldPen = new PdfMarks(cs, bold, height);
            y = MARGIN_MM;
        }

        /** Starts a new page unless {@code mm} still fit above the footer. */
        private void room(double mm) throws IOException {
            if (y + mm > bottom()) {
                newPage();
            }
        }

        void title(String heading, SheetHeader h) throws IOException {
            y += 6;
            boldPen.text(MARGIN_MM, y, "Bench sheet: " + heading, 5.0, Anchor.START);
            y += 7;
            boldPen.text(MARGIN_MM, y, fit(boldPen, h.name(), 4.2, contentWidth()), 4.2, Anchor.START);
            y += 5.5;
            String line = "Revision " + h.revision() + "   " + h.date()
                    + (h.savedBy() == null || h.savedBy().isBlank() ? "" : "   saved by " + h.savedBy())
                    + (h.tags().isEmpty() ? "" : "   tags: " + String.join(", ", h.tags()));
            pen.text(MARGIN_MM, y, fit(pen, line, BODY_MM, contentWidth()), BODY_MM, Anchor.START);
            y += 3;
        }

        void section(String name) throws IOException {
            room(12);
            y += 6;
            boldPen.text(MARGIN_MM, y, name, 3.6, Anchor.START);
            y += 1.5;
            cs.setLineWidth(PdfMarks.pt(0.25));
            cs.setStrokingColor(0f, 0f, 0f);
            cs.moveTo(pen.x(MARGIN_MM), pen.y(y));
            cs.lineTo(pen.x(MARGIN_MM + contentWidth()), pen.y(y));
            cs.stroke();
            y += 1.5;
        }

        /** Label and value pairs in two columns, filled down the first then the second. */
        void entries(List<BenchSheet.Entry> entries) throws IOException {
            double line = BODY_MM * 1.5;
            double columnWidth = contentWidth() / 2 - 3;
            int i = 0;
            while (i < entries.size()) {
                room(line * 2);
                int rowsHere = (int) Math.floor((bottom() - y) / line);
                int perColumn = Math.min(rowsHere, (entries.size() - i + 1) / 2);
                if (perColumn == 0) {
                    perColumn = 1;
                }
                for (int c = 0; c < 2 && i < entries.size(); c++) {
                    double x = MARGIN_MM + c * (contentWidth() / 2);
                    for (int r = 0; r < perColumn && i < entries.size(); r++, i++) {
                        BenchSheet.Entry e = entries.get(i);
                        double baseline = y + (r + 1) * line;
                        String label = fit(pen, e.label(), BODY_MM, columnWidth * 0.55);
                        pen.text(x, baseline, label, BODY_MM, Anchor.START);
                        double labelWidth = Math.max(pen.widthMm(label, BODY_MM) + 2, columnWidth * 0.55);
                        boldPen.text(x + labelWidth, baseline,
                                fit(boldPen, e.value(), BODY_MM, columnWidth - labelWidth), BODY_MM, Anchor.START);
                    }
                }
                y += perColumn * line + 1;
            }
        }

        void paragraph(String text) throws IOException {
            double line = BODY_MM * 1.45;
            List<String> lines = wrap(pen, text, BODY_MM, contentWidth());
            for (String l : lines) {
                room(line);
                y += line;
                pen.text(MARGIN_MM, y, l, BODY_MM, Anchor.START);
            }
            y += 1.5;
        }

        void table(BenchSheet.Table t) throws IOException {
            double size = SMALL_MM;
            double[] widths = columnWidths(t, size);
            double total = sum(widths);
            while (total > contentWidth() && size > 1.7) {
                size -= 0.1;
                widths = columnWidths(t, size);
                total = sum(widths);
            }
            if (total > contentWidth()) {
                for (int i = 0; i < widths.length; i++) {
                    widths[i] *= contentWidth() / total;
                }
            }
            double row = size * 1.6;
            section(t.title());
            header(t, widths, size, row);
            for (int r = 0; r < t.rows().size(); r++) {
                if (y + row > bottom()) {
                    newPage();
                    header(t, widths, size, row);
                }
                y += row;
                if (r % 2 == 1) {
                    shade(y - row + 0.5 * size * 0.45, row);
                }
                double x = MARGIN_MM;
                List<String> cells = t.rows().get(r);
                for (int c = 0; c < cells.size(); c++) {
                    pen.text(x + 1, y - 0.45 * size, fit(pen, cells.get(c), size, widths[c] - 1.5), size, Anchor.START);
                    x += widths[c];
                }
            }
            y += 2;
        }

        private void shade(double top, double h) throws IOException {
            cs.setNonStrokingColor(0.93f, 0.93f, 0.93f);
            cs.addRect(pen.x(MARGIN_MM), pen.y(top + h), PdfMarks.pt(contentWidth()), PdfMarks.pt(h));
            cs.fill();
            cs.setNonStrokingColor(0f, 0f, 0f);
        }

        private void header(BenchSheet.Table t, double[] widths, double size, double row) throws IOException {
            room(row * 2);
            y += row;
            double x = MARGIN_MM;
            for (int c = 0; c < widths.length; c++) {
                boldPen.text(x + 1, y - 0.45 * size, fit(boldPen, t.columns().get(c), size, widths[c] - 1.5), size,
                        Anchor.START);
                x += widths[c];
            }
            cs.setLineWidth(PdfMarks.pt(0.2));
            cs.moveTo(pen.x(MARGIN_MM), pen.y(y));
            cs.lineTo(pen.x(MARGIN_MM + sum(widths)), pen.y(y));
            cs.stroke();
        }

        private double[] columnWidths(BenchSheet.Table t, double size) throws IOException {
            double[] w = new double[t.columns().size()];
            for (int c = 0; c < w.length; c++) {
                w[c] = boldPen.widthMm(t.columns().get(c), size) + 2.5;
                for (List<String> r : t.rows()) {
                    w[c] = Math.max(w[c], Math.min(60, pen.widthMm(r.get(c), size) + 2.5));
                }
            }
            return w;
        }

        void chart(BenchSheet.Chart chart) throws IOException {
            room(CHART_HEIGHT_MM + 16);
            y += 6;
            boldPen.text(MARGIN_MM, y, fit(boldPen, chart.title(), 3.2, contentWidth() * 0.5), 3.2, Anchor.START);
            legend(chart);
            y += 6.5;
            new ChartDrawing(cs, pen, chart, MARGIN_MM + 16, y, contentWidth() - 18, CHART_HEIGHT_MM - 12).draw();
            y += CHART_HEIGHT_MM;
        }

        /** Legend to the right of the title: a swatch of each series' line, marker or bar, then its label. */
        private void legend(BenchSheet.Chart chart) throws IOException {
            double right = MARGIN_MM + contentWidth();
            double x = right;
            List<BenchSheet.Series> series = chart.series();
            List<double[]> spots = new ArrayList<>();
            for (int i = series.size() - 1; i >= 0; i--) {
                String label = fit(pen, series.get(i).label(), SMALL_MM, 45);
                double w = pen.widthMm(label, SMALL_MM);
                x -= w;
                pen.text(x, y, label, SMALL_MM, Anchor.START);
                x -= 8;
                spots.add(new double[] {x, i});
                x -= 3;
                if (x < MARGIN_MM + contentWidth() * 0.5) {
                    break;
                }
            }
            for (double[] s : spots) {
                ChartDrawing.swatch(cs, pen, series.get((int) s[1]), (int) s[1], s[0], y - 0.8);
            }
        }

        void finish(SheetHeader h) throws IOException {
            cs.close();
            int pages = doc.getNumberOfPages();
            for (int i = 0; i < pages; i++) {
                PDPage page = doc.getPage(i);
                try (PDPageContentStream foot = new PDPageContentStream(doc, page,
                        PDPageContentStream.AppendMode.APPEND, true, true)) {
                    PdfMarks p = new PdfMarks(foot, font, height);
                    double base = height - MARGIN_MM - FOOTER_MM + RULER_BASE_ABOVE_MARGIN_MM;
                    foot.setStrokingColor(0f, 0f, 0f);
                    foot.setNonStrokingColor(0f, 0f, 0f);
                    p.ruler(MARGIN_MM, base, "100 mm: check the print scale");
                    double tx = MARGIN_MM + 108;
                    double tw = contentWidth() - 108;
                    p.text(tx, base - 6, fit(p, h.name(), SMALL_MM, tw), SMALL_MM, Anchor.START);
                    p.text(tx, base - 2, "Revision " + h.revision() + ", page " + (i + 1) + " of " + pages, SMALL_MM,
                            Anchor.START);
                    p.text(tx, base + 2, "Print at 100 % (actual size).", SMALL_MM, Anchor.START);
                }
            }
        }
    }

    static double sum(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s;
    }

    /** The text cut with "..." to fit {@code maxMm}. */
    static String fit(PdfMarks pen, String text, double sizeMm, double maxMm) throws IOException {
        String s = pen.encodable(text == null ? "" : text);
        if (pen.widthMm(s, sizeMm) <= maxMm) {
            return s;
        }
        int n = s.length();
        while (n > 1 && pen.widthMm(s.substring(0, n) + "...", sizeMm) > maxMm) {
            n--;
        }
        return s.substring(0, n) + "...";
    }

    /** Greedy word wrap to {@code maxMm}. */
    static List<String> wrap(PdfMarks pen, String text, double sizeMm, double maxMm) throws IOException {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : pen.encodable(text).split("\\s+")) {
            String tryLine = line.length() == 0 ? word : line + " " + word;
            if (pen.widthMm(tryLine, sizeMm) > maxMm && line.length() > 0) {
                lines.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(tryLine);
            }
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }
}
