package org.nodewright.designs;

import java.awt.geom.Point2D;
import java.io.IOException;
import org.apache.pdfbox.contentstream.PDFGraphicsStreamEngine;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.graphics.image.PDImage;

/**
 * Counts what a PDF page paints through PDFBox's own content-stream interpreter: path pieces
 * (lines, curves, rectangles) that are stroked or filled, and images.
 */
final class SheetPaths extends PDFGraphicsStreamEngine {

    private int pending;
    int painted;
    int rectangles;
    int images;

    private SheetPaths(PDPage page) {
        super(page);
    }

    static SheetPaths of(PDPage page) throws IOException {
        SheetPaths s = new SheetPaths(page);
        s.processPage(page);
        return s;
    }

    @Override
    public void appendRectangle(Point2D p0, Point2D p1, Point2D p2, Point2D p3) {
        pending++;
        rectangles++;
    }

    @Override
    public void drawImage(PDImage pdImage) {
        images++;
    }

    @Override
    public void clip(int windingRule) {
    }

    @Override
    public void moveTo(float x, float y) {
    }

    @Override
    public void lineTo(float x, float y) {
        pending++;
    }

    @Override
    public void curveTo(float x1, float y1, float x2, float y2, float x3, float y3) {
        pending++;
    }

    @Override
    public Point2D getCurrentPoint() {
        return new Point2D.Float();
    }

    @Override
    public void closePath() {
    }

    @Override
    public void endPath() {
        pending = 0;
    }

    @Override
    public void strokePath() {
        painted += pending;
        pending = 0;
    }

    @Override
    public void fillPath(int windingRule) {
        painted += pending;
        pending = 0;
    }

    @Override
    public void fillAndStrokePath(int windingRule) {
        painted += pending;
        pending = 0;
    }

    @Override
    public void shadingFill(COSName shadingName) {
    }
}
