package org.holdover.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.poi.ss.usermodel.PageMargin;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Puts workbooks on paper the way a reader's spreadsheet application prints them: LibreOffice Calc
 * exports PDF (headless, fresh profile, each sheet's own print set-up, cached values as stored), and
 * poppler's {@code pdftoppm} turns a page into a PNG that a person can look at. Files go under
 * {@code target/holdover-testing/pdf-*}.
 *
 * <h2>Does a sheet fit its page width? ({@link #measureFit})</h2>
 * Counting PDF pages alone cannot tell: a fit-to-width sheet always prints one page across, however
 * small the text gets, and pages down and pages across multiply. So two measurements are made, both by
 * the spreadsheet application itself:
 * <ol>
 *   <li><b>Natural size.</b> The workbook is exported once more with the PDF option
 *       {@code SinglePageSheets}: each sheet becomes one PDF page exactly as large as its used area at
 *       100 % (no margins, no paper), so the page width is the sheet's printed width at full size in
 *       points, laid out with the application's own column widths and fonts.</li>
 *   <li><b>Real print.</b> A copy of the workbook in which every other sheet is hidden (formulas stay
 *       intact) is exported with the sheet's own print set-up (paper, orientation, margins,
 *       fit-to-width). The zoom the application applied is measured from the text: the words of page 1
 *       are paired by text with the same words of the natural-size export, and the zoom is the slope of
 *       their printed against their natural positions (cell positions scale exactly with the zoom; see
 *       {@code measuredScale}).</li>
 * </ol>
 * The sheet fits when natural width &times; scale &le; paper width &minus; left and right margins
 * (from the sheet's page set-up) + {@value #FIT_SLACK_PT} pt. A test should also bound the scale from
 * below (fit-to-width can shrink a wide sheet until it is unreadable): see
 * {@link SheetFit#assertFitsPageWidth(double)}. The sheet needs some text on its first printed page
 * (a title in A1 is enough); a print area or print titles are not taken into account.
 *
 * <h2>For the workbook writer (each shown by {@code PaperRenderTest} or seen while writing it)</h2>
 * <ul>
 *   <li>Fit to width needs three calls: {@code setFitWidth((short) 1)}, {@code setFitHeight((short) 0)}
 *       on the print set-up <em>and</em> {@code sheet.setFitToPage(true)}; without the last one the
 *       application ignores the fit and prints at 100 %.</li>
 *   <li>The application zooms to a whole percent, rounding down (about 1 % below the exact ratio).</li>
 *   <li>Give every cell a style with an explicitly named font. Cells left in the library's default style
 *       (Calibri marked as the theme's minor font, with no theme part in the file) print in the
 *       application's fallback font (DejaVu Sans, about 25 % wider), while explicitly named Calibri
 *       prints in the metric-compatible Carlito, laid out as in the file format's column-width rule.</li>
 * </ul>
 */
public final class PaperRender {

    /**
     * Slack when comparing printed width with printable width, in points: column widths are laid out
     * in whole device units and the glyph-height ratio is exact to about 1e-5, so 1 pt (0.35 mm, a
     * third of a character) separates "fits" from "does not fit" without flicker.
     */
    public static final double FIT_SLACK_PT = 1.0;

    /** Points per inch. */
    private static final double PT_PER_INCH = 72.0;
    private static final Duration PDF_TOOL_TIMEOUT = Duration.ofSeconds(120);
    private static final String SINGLE_PAGE_SHEETS =
            "pdf:calc_pdf_Export:{\"SinglePageSheets\":{\"type\":\"boolean\",\"value\":\"true\"}}";
    private static final Pattern PAGE_SIZE = Pattern.compile("(?m)^Page\\s+(\\d+) size:\\s+([0-9.]+) x ([0-9.]+) pts");
    private static final Pattern WORD = Pattern.compile(
            "<word xMin=\"([-0-9.]+)\" yMin=\"([-0-9.]+)\" xMax=\"([-0-9.]+)\" yMax=\"([-0-9.]+)\">(.*?)</word>");

    private PaperRender() {
    }

    /**
     * A PDF page's size.
     *
     * @param widthPt width in points (1/72 inch), &gt; 0
     * @param heightPt height in points, &gt; 0
     */
    public record PageSize(double widthPt, double heightPt) {
        /** A4 portrait, 210 mm x 297 mm (ISO 216). */
        public static final PageSize A4 = new PageSize(210 / 25.4 * 72, 297 / 25.4 * 72);
        /** US Letter portrait, 8.5 in x 11 in (ANSI/ASME Y14.1). */
        public static final PageSize LETTER = new PageSize(8.5 * 72, 11 * 72);

        public PageSize {
            if (!(widthPt > 0 && heightPt > 0)) {
                throw new IllegalArgumentException("page size must be positive, got " + widthPt + " x " + heightPt);
            }
        }

        /**
         * @param other another size
         * @return whether both sides agree within 1 pt (PDF writers round the media box)
         */
        public boolean matches(PageSize other) {
            return Math.abs(widthPt - other.widthPt) <= 1 && Math.abs(heightPt - other.heightPt) <= 1;
        }
    }

    /**
     * How one sheet goes onto paper.
     *
     * @param sheet the sheet's name
     * @param printPdf the PDF of the sheet alone, printed with its own page set-up
     * @param paper page 1's size in that PDF
     * @param printedPages how many pages the sheet prints on
     * @param printableWidthPt paper width less the left and right margins of the sheet's page set-up, pt
     * @param naturalWidthPt the sheet's used area at 100 %, width in pt, as laid out by the application
     * @param naturalHeightPt the same, height in pt
     * @param printScale the zoom the application applied in the real print (1 = 100 %), measured from
     *     glyph heights; NaN when page 1 has no text to measure
     */
    public record SheetFit(String sheet, Path printPdf, PageSize paper, int printedPages, double printableWidthPt,
            double naturalWidthPt, double naturalHeightPt, double printScale) {

        /** @return the printed width of the used area, pt */
        public double printedWidthPt() {
            return naturalWidthPt * printScale;
        }

        /**
         * @return whether the sheet prints one page across
         * @throws IllegalStateException when the scale could not be measured
         */
        public boolean fitsPageWidth() {
            if (Double.isNaN(printScale)) {
                throw new IllegalStateException("no text on page 1 of " + printPdf + " to measure the print scale");
            }
            return printedWidthPt() <= printableWidthPt + FIT_SLACK_PT;
        }

        /**
         * @return pages across; exact when 1, an estimate above that (pages break at column edges)
         */
        public int pagesAcross() {
            return fitsPageWidth() ? 1 : (int) Math.ceil((printedWidthPt() - FIT_SLACK_PT) / printableWidthPt);
        }

        /**
         * Fails unless the sheet prints one page across at a zoom of at least {@code minimumScale}.
         *
         * @param minimumScale the smallest acceptable zoom, for example 0.6 for 11 pt text printing at
         *     no less than 6.6 pt
         */
        public void assertFitsPageWidth(double minimumScale) {
            if (!fitsPageWidth() || !(printScale >= minimumScale - 0.005)) {
                throw new AssertionError(describe() + "; required: one page across at a zoom of at least "
                        + Math.round(minimumScale * 100) + " %");
            }
        }

        /** @return one line with every measurement */
        public String describe() {
            return String.format(java.util.Locale.ROOT,
                    "sheet '%s': printed %.1f pt wide (natural %.1f pt x zoom %.3f) on a printable width of "
                            + "%.1f pt, paper %.1f x %.1f pt, %d page(s); %s",
                    sheet, printedWidthPt(), naturalWidthPt, printScale, printableWidthPt, paper.widthPt(),
                    paper.heightPt(), printedPages, printPdf);
        }
    }

    /**
     * Prints one workbook to PDF.
     *
     * @param workbook an .xlsx file
     * @return the PDF
     */
    public static Path toPdf(Path workbook) {
        return toPdf(List.of(workbook)).get(0);
    }

    /**
     * Prints workbooks to PDF in one application run, each sheet with its own page set-up; hidden
     * sheets are not printed.
     *
     * @param workbooks .xlsx files
     * @return one PDF per workbook, same order
     */
    public static List<Path> toPdf(List<Path> workbooks) {
        ExternalTools.requirePdfTools();
        return OfficeConverter.convert(workbooks, "pdf", "pdf", "pdf", OfficeConverter.Recalc.NEVER).outputs();
    }

    /**
     * The size of every page of a PDF (poppler's {@code pdfinfo}).
     *
     * @param pdf a PDF file
     * @return page sizes, page 1 first
     */
    public static List<PageSize> pageSizes(Path pdf) {
        ExternalTools.requirePdfTools();
        String info = ExternalTools.output(List.of("pdfinfo", "-f", "1", "-l", "100000", pdf.toString()),
                toolLog(pdf, "pdfinfo"), PDF_TOOL_TIMEOUT);
        List<PageSize> sizes = new ArrayList<>();
        Matcher m = PAGE_SIZE.matcher(info);
        while (m.find()) {
            sizes.add(new PageSize(Double.parseDouble(m.group(2)), Double.parseDouble(m.group(3))));
        }
        if (sizes.isEmpty()) {
            throw new IllegalStateException("pdfinfo reported no pages for " + pdf + ":\n" + info);
        }
        return List.copyOf(sizes);
    }

    /**
     * The text of one page, laid out roughly as printed (poppler's {@code pdftotext -layout}).
     *
     * @param pdf a PDF file
     * @param page page number, 1 for the first
     * @return the page's text
     */
    public static String pageText(Path pdf, int page) {
        ExternalTools.requirePdfTools();
        return ExternalTools.output(List.of("pdftotext", "-layout", "-f", Integer.toString(page), "-l",
                Integer.toString(page), pdf.toString(), "-"), toolLog(pdf, "pdftotext"), PDF_TOOL_TIMEOUT);
    }

    /**
     * Renders one page to a PNG beside the PDF (poppler's {@code pdftoppm}).
     *
     * @param pdf a PDF file
     * @param page page number, 1 for the first
     * @param dotsPerInch resolution, 30 to 600
     * @return the PNG, named {@code <pdf name>-p<page>.png}
     */
    public static Path pageToPng(Path pdf, int page, int dotsPerInch) {
        if (page < 1 || dotsPerInch < 30 || dotsPerInch > 600) {
            throw new IllegalArgumentException("page must be >= 1 and resolution 30..600 dpi, got page " + page
                    + " at " + dotsPerInch + " dpi");
        }
        ExternalTools.requirePdfTools();
        String stem = pdf.getFileName().toString().replaceFirst("\\.pdf$", "") + "-p" + page;
        Path prefix = pdf.resolveSibling(stem);
        ExternalTools.output(List.of("pdftoppm", "-f", Integer.toString(page), "-l", Integer.toString(page),
                "-r", Integer.toString(dotsPerInch), "-png", "-singlefile", pdf.toString(), prefix.toString()),
                toolLog(pdf, "pdftoppm"), PDF_TOOL_TIMEOUT);
        Path png = pdf.resolveSibling(stem + ".png");
        if (!Files.isRegularFile(png)) {
            throw new IllegalStateException("pdftoppm wrote no " + png);
        }
        return png;
    }

    /**
     * Measures how a sheet goes onto paper; see the class comment for the method.
     *
     * @param workbook an .xlsx file
     * @param sheet the sheet's name
     * @return the measurements
     */
    public static SheetFit measureFit(Path workbook, String sheet) {
        return measureFit(workbook, List.of(sheet)).get(0);
    }

    /**
     * Measures how several sheets of one workbook go onto paper, in two application runs in all.
     *
     * @param workbook an .xlsx file
     * @param sheets the sheets' names
     * @return one measurement per sheet, same order
     */
    public static List<SheetFit> measureFit(Path workbook, List<String> sheets) {
        ExternalTools.requirePdfTools();
        Path staging = Artifacts.createDirectories(Artifacts.newRunDir("fit-copies"));
        List<Path> copies = new ArrayList<>();
        List<Integer> indexes = new ArrayList<>();
        List<Double> printableWidths = new ArrayList<>();
        int sheetCount;
        try (XSSFWorkbook book = WorkbookCells.open(workbook)) {
            sheetCount = book.getNumberOfSheets();
            for (String name : sheets) {
                int index = book.getSheetIndex(name);
                if (index < 0) {
                    throw new IllegalArgumentException("no sheet '" + name + "' in " + workbook);
                }
                indexes.add(index);
                Sheet sheet = book.getSheetAt(index);
                printableWidths.add(-PT_PER_INCH * (sheet.getMargin(PageMargin.LEFT) + sheet.getMargin(PageMargin.RIGHT)));
                copies.add(onlySheetVisible(workbook, index, staging.resolve(String.format("sheet-%02d.xlsx", index))));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + workbook, e);
        }
        List<Path> prints = OfficeConverter.convert(copies, "pdf", "pdf", "pdf-print", OfficeConverter.Recalc.NEVER).outputs();
        Path natural = OfficeConverter.convert(List.of(workbook), SINGLE_PAGE_SHEETS, "pdf", "pdf-natural",
                OfficeConverter.Recalc.NEVER).outputs().get(0);
        List<PageSize> naturalPages = pageSizes(natural);
        if (naturalPages.size() != sheetCount) {
            throw new IllegalStateException("the single-page-per-sheet export of " + workbook + " has "
                    + naturalPages.size() + " pages for " + sheetCount + " sheets (an empty sheet?): " + natural);
        }
        List<SheetFit> fits = new ArrayList<>();
        for (int i = 0; i < sheets.size(); i++) {
            Path print = prints.get(i);
            List<PageSize> printPages = pageSizes(print);
            PageSize paper = printPages.get(0);
            PageSize naturalPage = naturalPages.get(indexes.get(i));
            double scale = measuredScale(words(print, 1), words(natural, indexes.get(i) + 1));
            fits.add(new SheetFit(sheets.get(i), print, paper, printPages.size(),
                    paper.widthPt() + printableWidths.get(i), naturalPage.widthPt(), naturalPage.heightPt(), scale));
        }
        return List.copyOf(fits);
    }

    private static Path onlySheetVisible(Path workbook, int keep, Path copy) throws IOException {
        try (XSSFWorkbook book = WorkbookCells.open(workbook)) {
            book.setSheetHidden(keep, false);
            book.setActiveSheet(keep);
            book.setFirstVisibleTab(keep);
            for (int i = 0; i < book.getNumberOfSheets(); i++) {
                book.getSheetAt(i).setSelected(i == keep);
                if (i != keep) {
                    book.setSheetHidden(i, true);
                }
            }
            Files.createDirectories(copy.getParent());
            try (var out = Files.newOutputStream(copy)) {
                book.write(out);
            }
        }
        return copy;
    }

    /** A word on a PDF page: its text, left edge, top edge and height, in points. */
    private record Word(String text, double xPt, double yPt, double heightPt) {
    }

    private static List<Word> words(Path pdf, int page) {
        String xml = ExternalTools.output(List.of("pdftotext", "-bbox", "-f", Integer.toString(page), "-l",
                Integer.toString(page), pdf.toString(), "-"), toolLog(pdf, "pdftotext-bbox"), PDF_TOOL_TIMEOUT);
        List<Word> words = new ArrayList<>();
        Matcher m = WORD.matcher(xml);
        while (m.find()) {
            double top = Double.parseDouble(m.group(2));
            double height = Double.parseDouble(m.group(4)) - top;
            if (height > 0) {
                words.add(new Word(m.group(5), Double.parseDouble(m.group(1)), top, height));
            }
        }
        return words;
    }

    /** Smallest spread of natural positions, pt, over which a slope is taken as the zoom. */
    private static final double MINIMUM_SPREAD_PT = 20;

    /**
     * The zoom of the print relative to the natural-size export. Words are paired by text, in order of
     * appearance. Cell positions scale exactly with the zoom (printed x = margin + zoom * natural x), so
     * the zoom is the least-squares slope of printed against natural left edges; when the matched words
     * all sit in one column, the slope of their top edges; with a single row and column, the median
     * ratio of word heights (glyph heights follow the zoom to about 1 %, as font sizes are rounded).
     */
    static double measuredScale(List<Word> printed, List<Word> natural) {
        Map<String, Deque<Word>> byText = new HashMap<>();
        for (Word w : natural) {
            byText.computeIfAbsent(w.text(), k -> new ArrayDeque<>()).add(w);
        }
        List<Word[]> pairs = new ArrayList<>();
        for (Word w : printed) {
            Deque<Word> same = byText.get(w.text());
            if (same != null && !same.isEmpty()) {
                pairs.add(new Word[] {w, same.poll()});
            }
        }
        if (pairs.isEmpty()) {
            return Double.NaN;
        }
        double xSlope = slope(pairs, Word::xPt);
        if (!Double.isNaN(xSlope)) {
            return xSlope;
        }
        double ySlope = slope(pairs, Word::yPt);
        if (!Double.isNaN(ySlope)) {
            return ySlope;
        }
        double[] ratios = pairs.stream().mapToDouble(p -> p[0].heightPt() / p[1].heightPt()).sorted().toArray();
        int n = ratios.length;
        return n % 2 == 1 ? ratios[n / 2] : (ratios[n / 2 - 1] + ratios[n / 2]) / 2;
    }

    private static double slope(List<Word[]> pairs, java.util.function.ToDoubleFunction<Word> position) {
        double meanNatural = pairs.stream().mapToDouble(p -> position.applyAsDouble(p[1])).average().orElseThrow();
        double meanPrinted = pairs.stream().mapToDouble(p -> position.applyAsDouble(p[0])).average().orElseThrow();
        double sxx = 0;
        double sxy = 0;
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (Word[] p : pairs) {
            double dx = position.applyAsDouble(p[1]) - meanNatural;
            sxx += dx * dx;
            sxy += dx * (position.applyAsDouble(p[0]) - meanPrinted);
            min = Math.min(min, position.applyAsDouble(p[1]));
            max = Math.max(max, position.applyAsDouble(p[1]));
        }
        return max - min < MINIMUM_SPREAD_PT ? Double.NaN : sxy / sxx;
    }

    private static Path toolLog(Path pdf, String tool) {
        return pdf.resolveSibling(pdf.getFileName() + "." + tool + ".log");
    }

    /** For tests of the scale estimator: words given as text, left edge, top edge and height (pt). */
    static List<Word> wordsOf(Object... fields) {
        if (fields.length % 4 != 0) {
            throw new IllegalArgumentException("text, x, y, height expected, got " + Arrays.toString(fields));
        }
        List<Word> words = new ArrayList<>();
        for (int i = 0; i < fields.length; i += 4) {
            words.add(new Word((String) fields[i], ((Number) fields[i + 1]).doubleValue(),
                    ((Number) fields[i + 2]).doubleValue(), ((Number) fields[i + 3]).doubleValue()));
        }
        return words;
    }
}
