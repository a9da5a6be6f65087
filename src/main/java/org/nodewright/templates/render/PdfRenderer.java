package org.nodewright.templates.render;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.nodewright.physics.templates.CalibrationRuler;
import org.nodewright.physics.templates.Mark;
import org.nodewright.physics.templates.Sheet;

/**
 * Prints a sheet at exact 1:1 (1 mm = 72/25.4 pt) over as many pages as its {@link TilePlan}
 * needs. Every page carries alignment crosses in the strips it shares with its neighbours, a label
 * ("page 2 of 3, row 1 column 2") and its own 100 mm calibration ruler in the footer.
 */
public final class PdfRenderer {

    /** PostScript points per millimetre: 1 pt = 1/72 in, 1 in = 25.4 mm (exact). */
    public static final double PT_PER_MM = PdfMarks.PT_PER_MM;
    /** Half the length of an alignment cross's arms. */
    public static final double CROSS_MM = 4.0;

    private PdfRenderer() {
    }

    public static byte[] render(Sheet sheet, Paper paper) {
        TilePlan plan = TilePlan.of(sheet.widthMm(), sheet.heightMm(), paper);
        List<Mark> alignment = alignmentMarks(plan);
        try (PDDocument doc = new PDDocument(); ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            PDType1Font font = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
            PDDocumentInformation info = doc.getDocumentInformation();
            info.setTitle(sheet.title());
            info.setCreator("Nodewright");
            info.setSubject("Print at 100 % (actual size); check the 100 mm ruler on every page.");
            for (TilePlan.Tile tile : plan.tiles()) {
                PDPage page = new PDPage(new PDRectangle(pt(plan.pageWidthMm()), pt(plan.pageHeightMm())));
                doc.addPage(page);
                try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                    Page p = new Page(cs, font, plan, tile);
                    p.window(sheet.marks());
                    p.window(alignment);
                    p.footer(sheet.title());
                }
            }
            doc.save(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException("could not write the template PDF", e);
        }
    }

    /**
     * Crosses in the middle of every strip two pages share, at three heights (or widths): they
     * print on both pages at the same sheet position, so laying one over the other aligns them.
     */
    static List<Mark> alignmentMarks(TilePlan plan) {
        List<Mark> marks = new ArrayList<>();
        double w = plan.sheetWidthMm();
        double h = plan.sheetHeightMm();
        for (int c = 1; c < plan.columns(); c++) {
            double x = plan.originXMm(c) + TilePlan.OVERLAP_MM / 2;
            for (double y : new double[] {CROSS_MM + 1, h / 2, h - CROSS_MM - 1}) {
                cross(marks, x, y, "column-" + c);
            }
        }
        for (int r = 1; r < plan.rows(); r++) {
            double y = plan.originYMm(r) + TilePlan.OVERLAP_MM / 2;
            for (double x : new double[] {CROSS_MM + 1, w / 2, w - CROSS_MM - 1}) {
                cross(marks, x, y, "row-" + r);
            }
        }
        return marks;
    }

    private static void cross(List<Mark> marks, double x, double y, String join) {
        java.util.Map<String, String> data = java.util.Map.of("align", join);
        marks.add(new Mark.Stroke(x - CROSS_MM, y, x + CROSS_MM, y, 0.15, Mark.Role.ALIGNMENT, data));
        marks.add(new Mark.Stroke(x, y - CROSS_MM, x, y + CROSS_MM, 0.15, Mark.Role.ALIGNMENT, data));
        marks.add(new Mark.Ring(x, y, CROSS_MM / 2, 0.15, Mark.Role.ALIGNMENT, data));
    }

    static float pt(double mm) {
        return PdfMarks.pt(mm);
    }

    /** Draws onto one page; page coordinates in mm from the top-left corner, flipped to PDF's bottom-left. */
    private static final class Page {
        private final PDPageContentStream cs;
        private final PdfMarks pen;
        private final TilePlan plan;
        private final TilePlan.Tile tile;

        Page(PDPageContentStream cs, PDType1Font font, TilePlan plan, TilePlan.Tile tile) {
            this.cs = cs;
            this.pen = new PdfMarks(cs, font, plan.pageHeightMm());
            this.plan = plan;
            this.tile = tile;
        }

        /** The tile's window of the sheet, clipped to the window. */
        void window(List<Mark> marks) throws IOException {
            double dx = TilePlan.MARGIN_MM - tile.originXMm();
            double dy = TilePlan.MARGIN_MM - tile.originYMm();
            cs.saveGraphicsState();
            cs.addRect(x(TilePlan.MARGIN_MM), y(TilePlan.MARGIN_MM + plan.windowHeightMm()),
                    pt(plan.windowWidthMm()), pt(plan.windowHeightMm()));
            cs.clip();
            for (Mark m : marks) {
                if (touchesWindow(m)) {
                    draw(m, dx, dy);
                }
            }
            cs.restoreGraphicsState();
        }

        /** Whether a mark's extent (text roughly: its height above, its length either side) meets the window. */
        private boolean touchesWindow(Mark m) {
            double x0 = tile.originXMm();
            double y0 = tile.originYMm();
            double x1 = x0 + plan.windowWidthMm();
            double y1 = y0 + plan.windowHeightMm();
            if (m instanceof Mark.Stroke s) {
                return Math.max(s.x1(), s.x2()) >= x0 && Math.min(s.x1(), s.x2()) <= x1
                        && Math.max(s.y1(), s.y2()) >= y0 && Math.min(s.y1(), s.y2()) <= y1;
            }
            if (m instanceof Mark.Ring r) {
                return r.cx() + r.radiusMm() >= x0 && r.cx() - r.radiusMm() <= x1
                        && r.cy() + r.radiusMm() >= y0 && r.cy() - r.radiusMm() <= y1;
            }
            Mark.Caption c = (Mark.Caption) m;
            double reach = c.text().length() * c.sizeMm();
            return c.x() + reach >= x0 && c.x() - reach <= x1 && c.y() >= y0 && c.y() - c.sizeMm() <= y1;
        }

        void footer(String title) throws IOException {
            double top = plan.pageHeightMm() - TilePlan.MARGIN_MM - TilePlan.FOOTER_MM;
            double rulerBase = top + 12;
            pen.ruler(TilePlan.MARGIN_MM, rulerBase, "100 mm: measure before cutting");
            String label = String.format(Locale.ROOT, "Page %d of %d (row %d, column %d; sheet x %.1f-%.1f mm)",
                    tile.index() + 1, plan.pageCount(), tile.row() + 1, tile.column() + 1, tile.originXMm(),
                    Math.min(tile.originXMm() + plan.windowWidthMm(), plan.sheetWidthMm()));
            double textX = TilePlan.MARGIN_MM + CalibrationRuler.LENGTH_MM + 8;
            text(textX, top + 6, label, 3.0, Mark.Caption.Anchor.START);
            text(textX, top + 11, title, 2.5, Mark.Caption.Anchor.START);
            text(textX, top + 16, "Print at 100 % / actual size, no fit-to-page. Overlap "
                    + (int) TilePlan.OVERLAP_MM + " mm: lay the crosses over each other.", 2.2, Mark.Caption.Anchor.START);
        }

        private void draw(Mark m, double dx, double dy) throws IOException {
            pen.draw(m, dx, dy);
        }

        private void text(double xMm, double yMm, String text, double sizeMm, Mark.Caption.Anchor anchor)
                throws IOException {
            pen.text(xMm, yMm, text, sizeMm, anchor);
        }

        private float x(double mm) {
            return pt(mm);
        }

        private float y(double mm) {
            return pt(plan.pageHeightMm() - mm);
        }
    }
}
