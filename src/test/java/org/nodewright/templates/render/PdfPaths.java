package org.nodewright.templates.render;

import java.awt.geom.Point2D;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.contentstream.PDFGraphicsStreamEngine;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.graphics.image.PDImage;

/**
 * Reads back the straight segments a PDF page strokes, in PDF user space (points, origin
 * bottom-left), through PDFBox's own content-stream interpreter. Curves are recorded as
 * their end points only, marked as curves.
 */
public final class PdfPaths extends PDFGraphicsStreamEngine {

    public record Segment(double x1, double y1, double x2, double y2, boolean curve) {
        public double length() {
            return Math.hypot(x2 - x1, y2 - y1);
        }

        public boolean vertical() {
            return !curve && Math.abs(x2 - x1) < 1e-6 && Math.abs(y2 - y1) > 1e-6;
        }
    }

    private final List<Segment> pending = new ArrayList<>();
    final List<Segment> stroked = new ArrayList<>();
    private Point2D current;

    PdfPaths(PDPage page) {
        super(page);
    }

    public static List<Segment> of(PDPage page) throws IOException {
        PdfPaths engine = new PdfPaths(page);
        engine.processPage(page);
        return engine.stroked;
    }

    @Override
    public void moveTo(float x, float y) {
        current = new Point2D.Float(x, y);
    }

    @Override
    public void lineTo(float x, float y) {
        pending.add(new Segment(current.getX(), current.getY(), x, y, false));
        current = new Point2D.Float(x, y);
    }

    @Override
    public void curveTo(float x1, float y1, float x2, float y2, float x3, float y3) {
        pending.add(new Segment(current.getX(), current.getY(), x3, y3, true));
        current = new Point2D.Float(x3, y3);
    }

    @Override
    public void strokePath() {
        stroked.addAll(pending);
        pending.clear();
    }

    @Override
    public void closePath() {
    }

    @Override
    public void endPath() {
        pending.clear();
    }

    @Override
    public void appendRectangle(Point2D p0, Point2D p1, Point2D p2, Point2D p3) {
    }

    @Override
    public void drawImage(PDImage pdImage) {
    }

    @Override
    public void clip(int windingRule) {
    }

    @Override
    public Point2D getCurrentPoint() {
        return current;
    }

    @Override
    public void fillPath(int windingRule) {
        pending.clear();
    }

    @Override
    public void fillAndStrokePath(int windingRule) {
        strokePath();
    }

    @Override
    public void shadingFill(COSName shadingName) {
    }
}
