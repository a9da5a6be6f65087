package org.nodewright.templates.render;

import java.util.ArrayList;
import java.util.List;

/**
 * How a sheet is cut into pages: each page shows a window of the sheet at 1:1, neighbouring
 * windows overlap by {@link #OVERLAP_MM} so that the maker can line up the alignment crosses and
 * tape the pages together. The bottom of every page carries a label and a 100 mm ruler.
 *
 * @param pageWidthMm  page width as printed (landscape when the sheet is wider than tall)
 * @param pageHeightMm page height
 * @param columns      pages across the sheet's width
 * @param rows         pages down the sheet's height
 */
public record TilePlan(double sheetWidthMm, double sheetHeightMm, double pageWidthMm, double pageHeightMm,
        int columns, int rows) {

    /** Blank page margin: most office printers cannot print closer than about 5 mm to the edge. */
    public static final double MARGIN_MM = 10.0;
    /** Width of the strip shared by two neighbouring pages. */
    public static final double OVERLAP_MM = 12.0;
    /** Band at the foot of each page for its label and calibration ruler. */
    public static final double FOOTER_MM = 24.0;
    /** At most this many pages (a 4 m long bore on A4 is still well inside). */
    public static final int MAX_PAGES = 60;

    /** Plans the pages for a sheet on the given paper, turned landscape when the sheet is wider than tall. */
    public static TilePlan of(double sheetWidthMm, double sheetHeightMm, Paper paper) {
        boolean landscape = sheetWidthMm >= sheetHeightMm;
        double pw = landscape ? paper.longMm() : paper.shortMm();
        double ph = landscape ? paper.shortMm() : paper.longMm();
        double cw = pw - 2 * MARGIN_MM;
        double ch = ph - 2 * MARGIN_MM - FOOTER_MM;
        int cols = count(sheetWidthMm, cw);
        int rows = count(sheetHeightMm, ch);
        if ((long) cols * rows > MAX_PAGES) {
            throw new IllegalArgumentException("the template needs " + (long) cols * rows + " pages, more than "
                    + MAX_PAGES);
        }
        return new TilePlan(sheetWidthMm, sheetHeightMm, pw, ph, cols, rows);
    }

    private static int count(double extent, double window) {
        if (extent <= window) {
            return 1;
        }
        return (int) Math.ceil((extent - OVERLAP_MM) / (window - OVERLAP_MM));
    }

    /** Width of the sheet window shown on each page. */
    public double windowWidthMm() {
        return pageWidthMm - 2 * MARGIN_MM;
    }

    public double windowHeightMm() {
        return pageHeightMm - 2 * MARGIN_MM - FOOTER_MM;
    }

    /** Sheet x at the left edge of column c's window. */
    public double originXMm(int column) {
        return column * (windowWidthMm() - OVERLAP_MM);
    }

    public double originYMm(int row) {
        return row * (windowHeightMm() - OVERLAP_MM);
    }

    public int pageCount() {
        return columns * rows;
    }

    /** One page of the plan, in printing order (row by row). */
    public record Tile(int index, int row, int column, double originXMm, double originYMm) {
    }

    public List<Tile> tiles() {
        List<Tile> tiles = new ArrayList<>();
        for (int r = 0; r < rows; r++) {
            for (int c = 0; c < columns; c++) {
                tiles.add(new Tile(tiles.size(), r, c, originXMm(c), originYMm(r)));
            }
        }
        return tiles;
    }
}
