package org.nodewright.templates.render;

import java.io.IOException;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.nodewright.physics.templates.CalibrationRuler;
import org.nodewright.physics.templates.Mark;

/**
 * Draws template {@link Mark}s onto one PDF page at exact 1:1, page coordinates in millimetres from
 * the top-left corner (flipped to PDF's bottom-left origin). The one place marks become PDF
 * strokes, circles and text: the tiled templates and the bench sheets both draw through it.
 */
public final class PdfMarks {

    /** PostScript points per millimetre: 1 pt = 1/72 in, 1 in = 25.4 mm (exact). */
    public static final double PT_PER_MM = 72.0 / 25.4;

    private final PDPageContentStream cs;
    private final PDType1Font font;
    private final double pageHeightMm;

    public PdfMarks(PDPageContentStream cs, PDType1Font font, double pageHeightMm) {
        this.cs = cs;
        this.font = font;
        this.pageHeightMm = pageHeightMm;
    }

    public static float pt(double mm) {
        return (float) (mm * PT_PER_MM);
    }

    /** The content stream, for callers that draw paths of their own in page millimetres (see {@link #x}, {@link #y}). */
    public PDPageContentStream stream() {
        return cs;
    }

    public PDType1Font font() {
        return font;
    }

    /** The 100 mm calibration ruler of {@link CalibrationRuler}, base line at (x, y) on the page. */
    public void ruler(double xMm, double yMm, String label) throws IOException {
        for (Mark m : CalibrationRuler.at(xMm, yMm, label)) {
            draw(m, 0, 0);
        }
    }

    public void draw(List<Mark> marks, double dx, double dy) throws IOException {
        for (Mark m : marks) {
            draw(m, dx, dy);
        }
    }

    /** One mark shifted by (dx, dy) mm. */
    public void draw(Mark m, double dx, double dy) throws IOException {
        if (m instanceof Mark.Stroke s) {
            cs.setLineWidth(pt(s.widthMm()));
            cs.moveTo(x(s.x1() + dx), y(s.y1() + dy));
            cs.lineTo(x(s.x2() + dx), y(s.y2() + dy));
            cs.stroke();
        } else if (m instanceof Mark.Ring r) {
            circle(r.cx() + dx, r.cy() + dy, r.radiusMm(), r.widthMm());
        } else if (m instanceof Mark.Caption c) {
            text(c.x() + dx, c.y() + dy, c.text(), c.sizeMm(), c.anchor());
        }
    }

    /** A circle as four cubic Béziers, control distance 0.5523 r (the usual quarter-arc fit). */
    public void circle(double cx, double cy, double r, double width) throws IOException {
        circlePath(cx, cy, r);
        cs.setLineWidth(pt(width));
        cs.closeAndStroke();
    }

    /** The path of a circle, neither stroked nor filled (the caller ends it). */
    public void circlePath(double cx, double cy, double r) throws IOException {
        final double k = 0.552284749831;
        cs.moveTo(x(cx + r), y(cy));
        cs.curveTo(x(cx + r), y(cy + k * r), x(cx + k * r), y(cy + r), x(cx), y(cy + r));
        cs.curveTo(x(cx - k * r), y(cy + r), x(cx - r), y(cy + k * r), x(cx - r), y(cy));
        cs.curveTo(x(cx - r), y(cy - k * r), x(cx - k * r), y(cy - r), x(cx), y(cy - r));
        cs.curveTo(x(cx + k * r), y(cy - r), x(cx + r), y(cy - k * r), x(cx + r), y(cy));
    }

    /** A line of text whose baseline starts, centres or ends at (x, y); height in mm. */
    public void text(double xMm, double yMm, String text, double sizeMm, Mark.Caption.Anchor anchor)
            throws IOException {
        String safe = encodable(text);
        float size = pt(sizeMm);
        float shift = switch (anchor) {
            case START -> 0f;
            case MIDDLE -> width(safe, sizeMm) / 2;
            case END -> width(safe, sizeMm);
        };
        cs.beginText();
        cs.setFont(font, size);
        cs.newLineAtOffset(x(xMm) - shift, y(yMm));
        cs.showText(safe);
        cs.endText();
    }

    /** Width of a text in points at a height of {@code sizeMm}. */
    public float width(String text, double sizeMm) throws IOException {
        return font.getStringWidth(encodable(text)) / 1000f * pt(sizeMm);
    }

    /** Width of a text in mm at a height of {@code sizeMm}. */
    public double widthMm(String text, double sizeMm) throws IOException {
        return width(text, sizeMm) / PT_PER_MM;
    }

    /** Characters the standard Helvetica (WinAnsi) cannot show become '?'. */
    public String encodable(String text) {
        StringBuilder sb = new StringBuilder(text.length());
        // The minus sign and the Greek mu are not in WinAnsi; the hyphen and the micro sign stand in.
        String plain = text.replace('\u2212', '-').replace('\u03bc', '\u00b5');
        for (int i = 0; i < plain.length(); i++) {
            char ch = plain.charAt(i);
            try {
                font.encode(String.valueOf(ch));
                sb.append(ch);
            } catch (IllegalArgumentException | IOException e) {
                sb.append('?');
            }
        }
        return sb.toString();
    }

    public float x(double mm) {
        return pt(mm);
    }

    public float y(double mm) {
        return pt(pageHeightMm - mm);
    }
}
