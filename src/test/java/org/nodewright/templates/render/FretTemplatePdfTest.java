package org.nodewright.templates.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nodewright.physics.templates.CalibrationRuler;
import org.nodewright.physics.templates.FretTemplate;

/** Reads the tiled PDF back with PDFBox's content-stream engine and measures what it draws. */
class FretTemplatePdfTest {

    /** 1 pt = 1/72 in and 1 in = 25.4 mm exactly (PDF 32000-1:2008 §8.3.2.3; NIST SP 811). */
    private static final double MM = 72.0 / 25.4;

    // Page sizes: ISO 216 A4 = 210 x 297 mm; ANSI Letter = 8.5 x 11 in (215.9 x 279.4 mm).
    @ParameterizedTest
    @CsvSource({
        "650, 22, a4, 297.0, 210.0",
        "650, 22, letter, 279.4, 215.9",
        "864, 24, a4, 297.0, 210.0",   // a long bass scale, 34 in: four pages or more
        "330, 17, a4, 297.0, 210.0"    // a short mandolin-like scale: two pages
    })
    void everyFretLineIsWhereEqualTemperamentPutsItOnSomePageAndEveryPageHasA100MmRuler(double scale, int count,
            String paperWord, double pageW, double pageH) throws Exception {
        Paper paper = Paper.fromWord(paperWord).orElseThrow();
        FretTemplate template = new FretTemplate(scale, count, 12, 50.0, List.of());
        var sheet = template.draw();
        byte[] pdf = PdfRenderer.render(sheet, paper);
        TilePlan plan = TilePlan.of(sheet.widthMm(), sheet.heightMm(), paper);
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            assertThat(doc.getNumberOfPages()).isEqualTo(plan.pageCount());
            List<Double> fretSheetX = new ArrayList<>();
            double coveredTo = 0;
            for (int i = 0; i < doc.getNumberOfPages(); i++) {
                PDPage page = doc.getPage(i);
                assertThat(page.getMediaBox().getWidth() / MM).isCloseTo(pageW, within(1e-3));
                assertThat(page.getMediaBox().getHeight() / MM).isCloseTo(pageH, within(1e-3));
                List<PdfPaths.Segment> segments = PdfPaths.of(page);
                // The ruler: vertical ticks of the 10 mm length in the footer; first to last = 100 mm.
                List<Double> major = segments.stream().filter(PdfPaths.Segment::vertical)
                        .filter(s -> Math.abs(s.length() / MM - CalibrationRuler.MAJOR_TICK_MM) < 1e-3)
                        .filter(s -> Math.min(s.y1(), s.y2()) / MM < TilePlan.MARGIN_MM + TilePlan.FOOTER_MM)
                        .map(PdfPaths.Segment::x1).sorted().toList();
                assertThat(major).hasSize(11);
                assertThat((major.get(10) - major.get(0)) / MM).isCloseTo(100.0, within(1e-3));
                // Fret lines (50 mm long) mapped back to the sheet through the page's window origin.
                double origin = plan.tiles().get(i).originXMm();
                segments.stream().filter(PdfPaths.Segment::vertical)
                        .filter(s -> Math.abs(s.length() / MM - 50.0) < 1e-3)
                        .forEach(s -> fretSheetX.add(s.x1() / MM - TilePlan.MARGIN_MM + origin));
                assertThat(origin).as("no gap between pages").isLessThanOrEqualTo(coveredTo + 1e-9);
                coveredTo = Math.max(coveredTo, origin + plan.windowWidthMm());
                PDFTextStripper stripper = new PDFTextStripper();
                stripper.setStartPage(i + 1);
                stripper.setEndPage(i + 1);
                String text = stripper.getText(doc);
                assertThat(text).contains("Page " + (i + 1) + " of " + plan.pageCount());
            }
            assertThat(coveredTo).as("pages cover the whole sheet").isGreaterThanOrEqualTo(sheet.widthMm());
            // x_n = L (1 - 2^(-n/12)): equal temperament (common practice); nut line is n = 0
            double nut = FretTemplate.MARGIN_MM;
            for (int n = 0; n <= count; n++) {
                double expected = nut + scale * (1 - Math.pow(2, -n / 12.0));
                assertThat(fretSheetX).as("fret %d", n).anySatisfy(x -> assertThat(x).isCloseTo(expected, within(0.01)));
            }
            assertThat(fretSheetX).as("saddle line").anySatisfy(x -> assertThat(x).isCloseTo(nut + scale, within(0.01)));
        }
    }

    @ParameterizedTest
    @CsvSource({"650", "1000"})
    void alignmentCrossesInAnOverlapSitAtTheSameSheetPositionOnBothPages(double scale) throws Exception {
        var sheet = new FretTemplate(scale, 20, 12, 50.0, List.of()).draw();
        TilePlan plan = TilePlan.of(sheet.widthMm(), sheet.heightMm(), Paper.A4);
        assertThat(plan.columns()).isGreaterThan(1);
        try (PDDocument doc = Loader.loadPDF(PdfRenderer.render(sheet, Paper.A4))) {
            for (int c = 1; c < plan.columns(); c++) {
                double left = crossSheetX(doc.getPage(c - 1), plan.originXMm(c - 1), true);
                double right = crossSheetX(doc.getPage(c), plan.originXMm(c), false);
                assertThat(left).isCloseTo(right, within(1e-3));
            }
        }
    }

    /** The sheet x of the right-most (or left-most) alignment cross's vertical arm on a page. */
    private static double crossSheetX(PDPage page, double origin, boolean rightMost) throws Exception {
        var xs = PdfPaths.of(page).stream().filter(PdfPaths.Segment::vertical)
                .filter(s -> Math.abs(s.length() / MM - 2 * PdfRenderer.CROSS_MM) < 1e-3)
                .mapToDouble(s -> s.x1() / MM - TilePlan.MARGIN_MM + origin)
                .filter(x -> x >= origin && x <= origin + 277.0); // inside the clipped window of A4 landscape
        return (rightMost ? xs.max() : xs.min()).orElseThrow();
    }
}
