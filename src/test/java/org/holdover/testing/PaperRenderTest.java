package org.holdover.testing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import javax.imageio.ImageIO;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Printing to PDF and PNG, and the page-width check, on sheets set up at A4 and Letter.
 *
 * <p>Paper sizes: A4 210 x 297 mm (ISO 216:2007), Letter 8.5 x 11 in (ANSI/ASME Y14.1-2020).
 * Margins are the library's defaults for a new sheet, 0.7 in left and right.
 */
class PaperRenderTest {

    private static final String A4_FIT = "A4 fit";
    private static final String LETTER_FIT = "Letter fit";
    private static final String WIDE = "Wide at 100 percent";
    private static final String NARROW = "Narrow at 100 percent";
    private static final String FLAG_MISSING = "Fit width without fit flag";

    /** Columns of the fit-to-width tables and their width in characters: about 534 pt, wider than both papers. */
    private static final int FIT_COLUMNS = 8;
    private static final int COLUMN_CHARS = 12;
    private static final double SIDE_MARGINS_PT = 2 * 0.7 * 72;

    /**
     * The application zooms in whole percent and picks the largest zoom that fits, so the measured zoom
     * lies within 0.01 below printable / natural width; 0.012 adds the glyph-measurement error.
     */
    private static final double ZOOM_STEP = 0.012;

    /** The lowest zoom a page of ours may print at: 11 pt text no smaller than 6.6 pt (common practice, no source). */
    private static final double MINIMUM_ZOOM = 0.6;

    private static Path workbook;
    private static List<PaperRender.SheetFit> fits;

    @BeforeAll
    static void printAndMeasure() throws Exception {
        workbook = Artifacts.dir("paper").resolve("paper.xlsx");
        try (XSSFWorkbook book = new XSSFWorkbook()) {
            sheet(book, A4_FIT, FIT_COLUMNS, PrintSetup.A4_PAPERSIZE, true, true);
            sheet(book, LETTER_FIT, FIT_COLUMNS, PrintSetup.LETTER_PAPERSIZE, true, true);
            sheet(book, WIDE, 20, PrintSetup.A4_PAPERSIZE, false, false);
            sheet(book, NARROW, 3, PrintSetup.A4_PAPERSIZE, false, false);
            sheet(book, FLAG_MISSING, FIT_COLUMNS, PrintSetup.A4_PAPERSIZE, true, false);
            TestWorkbooks.save(book, workbook);
        }
        fits = PaperRender.measureFit(workbook, List.of(A4_FIT, LETTER_FIT, WIDE, NARROW, FLAG_MISSING));
    }

    private static void sheet(XSSFWorkbook book, String name, int columns, short paper, boolean fitWidth, boolean fitFlag) {
        Sheet sheet = book.createSheet(name);
        TestWorkbooks.table(book, sheet, columns, 40, COLUMN_CHARS);
        PrintSetup setup = sheet.getPrintSetup();
        setup.setPaperSize(paper);
        setup.setLandscape(false);
        if (fitWidth) {
            setup.setFitWidth((short) 1);
            setup.setFitHeight((short) 0);
        }
        sheet.setFitToPage(fitFlag);
    }

    private static PaperRender.SheetFit fit(String sheet) {
        return fits.stream().filter(f -> f.sheet().equals(sheet)).findFirst().orElseThrow();
    }

    @Test
    void fitToWidthOnA4PrintsOnePageAcrossAtTheZoomTheGeometryNeeds() {
        PaperRender.SheetFit a4 = fit(A4_FIT);
        assertThat(a4.paper().matches(PaperRender.PageSize.A4)).as(a4.describe()).isTrue();
        assertThat(a4.printableWidthPt()).isCloseTo(PaperRender.PageSize.A4.widthPt() - SIDE_MARGINS_PT, within(1.0));
        assertThat(a4.naturalWidthPt()).as("the table is wider than the page, so fit-to-width has to shrink it")
                .isGreaterThan(a4.printableWidthPt());
        double needed = a4.printableWidthPt() / a4.naturalWidthPt();
        assertThat(a4.printScale()).as(a4.describe()).isBetween(needed - ZOOM_STEP, needed + 0.002);
        assertThat(a4.fitsPageWidth()).as(a4.describe()).isTrue();
        assertThat(a4.pagesAcross()).isEqualTo(1);
        assertThat(a4.printedPages()).isEqualTo(1);
        a4.assertFitsPageWidth(MINIMUM_ZOOM);
    }

    @Test
    void fitToWidthOnLetterPrintsOnePageAcrossAndZoomsLessThanOnA4() {
        PaperRender.SheetFit letter = fit(LETTER_FIT);
        assertThat(letter.paper().matches(PaperRender.PageSize.LETTER)).as(letter.describe()).isTrue();
        double needed = letter.printableWidthPt() / letter.naturalWidthPt();
        assertThat(letter.printScale()).as(letter.describe()).isBetween(needed - ZOOM_STEP, needed + 0.002);
        assertThat(letter.fitsPageWidth()).isTrue();
        // Letter is 612 pt wide, A4 595.3 pt: the same table shrinks less on Letter
        assertThat(letter.printScale()).isGreaterThanOrEqualTo(fit(A4_FIT).printScale());
        letter.assertFitsPageWidth(MINIMUM_ZOOM);
    }

    @Test
    void aWideSheetAtFullSizeDoesNotFitAndTheCheckSaysSo() {
        PaperRender.SheetFit wide = fit(WIDE);
        assertThat(wide.printScale()).isCloseTo(1.0, within(0.005));
        assertThat(wide.fitsPageWidth()).as(wide.describe()).isFalse();
        assertThat(wide.pagesAcross()).isGreaterThanOrEqualTo(2);
        assertThat(wide.printedPages()).isGreaterThanOrEqualTo(2);
        assertThatThrownBy(() -> wide.assertFitsPageWidth(MINIMUM_ZOOM)).isInstanceOf(AssertionError.class)
                .hasMessageContaining(WIDE);
    }

    @Test
    void aNarrowSheetFitsAtFullSize() {
        PaperRender.SheetFit narrow = fit(NARROW);
        assertThat(narrow.printScale()).isCloseTo(1.0, within(0.005));
        assertThat(narrow.fitsPageWidth()).as(narrow.describe()).isTrue();
        narrow.assertFitsPageWidth(1.0);
    }

    @Test
    void fitWidthWithoutTheSheetsFitToPageFlagIsIgnoredByTheApplication() {
        PaperRender.SheetFit missing = fit(FLAG_MISSING);
        assertThat(missing.printScale()).isCloseTo(1.0, within(0.005));
        assertThat(missing.fitsPageWidth()).as(missing.describe()).isFalse();
    }

    @Test
    void aTooLowZoomFailsTheCheckEvenWhenTheSheetFits() {
        PaperRender.SheetFit a4 = fit(A4_FIT);
        assertThatThrownBy(() -> a4.assertFitsPageWidth(a4.printScale() + 0.05)).isInstanceOf(AssertionError.class)
                .hasMessageContaining("at least");
    }

    @Test
    void firstPageOfTheWholeWorkbookIsTheA4SheetAndRendersToAPng() throws Exception {
        Path pdf = PaperRender.toPdf(workbook);
        List<PaperRender.PageSize> pages = PaperRender.pageSizes(pdf);
        assertThat(pages.get(0).matches(PaperRender.PageSize.A4)).as(pages.get(0).toString()).isTrue();
        assertThat(pages.get(1).matches(PaperRender.PageSize.LETTER)).as(pages.get(1).toString()).isTrue();
        assertThat(PaperRender.pageText(pdf, 1)).contains("Sheet A4 fit (demo data)").contains("vH41");
        int dpi = 72;
        Path png = PaperRender.pageToPng(pdf, 1, dpi);
        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isCloseTo((int) Math.round(PaperRender.PageSize.A4.widthPt()), within(1));
        assertThat(image.getHeight()).isCloseTo((int) Math.round(PaperRender.PageSize.A4.heightPt()), within(1));
        assertThat(darkPixelFraction(image)).as("text on the page").isGreaterThan(0.005).isLessThan(0.5);
    }

    @Test
    void naturalWidthFollowsTheFileFormatsColumnWidthRuleWhenAMetricCompatibleFontIsInstalled() {
        boolean carlito;
        try {
            carlito = ExternalTools.output(List.of("fc-match", "Calibri"),
                    Artifacts.dir("paper").resolve("fc-match.log"), Duration.ofSeconds(30)).contains("Carlito");
        } catch (RuntimeException noFontconfig) {
            carlito = false;
        }
        ExternalTools.require(carlito, "a font metric-compatible with Calibri",
                "apt-get install -y --no-install-recommends fonts-crosextra-carlito", System.getenv());
        // ECMA-376-1:2016 §18.3.1.13 (col, width), from memory: a width of w characters of a font whose
        // widest digit is 7 px (Calibri 11 pt at 96 dpi) is 7w + 5 px, and 1 px = 0.75 pt.
        double columnPt = (7.0 * COLUMN_CHARS + 5) * 0.75;
        assertThat(fit(A4_FIT).naturalWidthPt()).isCloseTo(FIT_COLUMNS * columnPt, within(0.02 * FIT_COLUMNS * columnPt));
    }

    @Test
    void zoomIsTheSlopeOfPrintedAgainstNaturalPositions() {
        // printed x = 50 + 0.5 * natural x; "page" is only on the print, "c" only in the natural export
        double across = PaperRender.measuredScale(
                PaperRender.wordsOf("Title", 51, 55, 7.0, "a", 51, 62, 5.0, "b", 101, 62, 5.0, "page", 300, 700, 9.0),
                PaperRender.wordsOf("Title", 2, 1, 12.0, "a", 2, 15, 10.0, "b", 102, 15, 10.0, "c", 202, 15, 10.0));
        assertThat(across).isCloseTo(0.5, within(1e-12));
        // one column: the slope of the top edges
        double down = PaperRender.measuredScale(
                PaperRender.wordsOf("a", 51, 60, 5.0, "b", 51, 90, 5.0),
                PaperRender.wordsOf("a", 2, 0, 10.0, "b", 2, 40, 10.0));
        assertThat(down).isCloseTo(0.75, within(1e-12));
        // a single word: the height ratio
        assertThat(PaperRender.measuredScale(PaperRender.wordsOf("a", 51, 60, 5.0), PaperRender.wordsOf("a", 2, 0, 10.0)))
                .isEqualTo(0.5);
        assertThat(PaperRender.measuredScale(PaperRender.wordsOf("x", 0, 0, 1.0), PaperRender.wordsOf("y", 0, 0, 1.0)))
                .isNaN();
    }

    private static double darkPixelFraction(BufferedImage image) {
        long dark = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                int rgb = image.getRGB(x, y);
                int luminance = ((rgb >> 16 & 0xff) + (rgb >> 8 & 0xff) + (rgb & 0xff)) / 3;
                if (luminance < 128) {
                    dark++;
                }
            }
        }
        return (double) dark / ((long) image.getWidth() * image.getHeight());
    }
}
