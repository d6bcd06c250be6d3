package org.holdover.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Recomputes workbooks in a real spreadsheet application, LibreOffice Calc, and compares every formula
 * cell's cached value with the application's result.
 *
 * <p>How: one headless {@code soffice} run for all the workbooks given, with a fresh throw-away profile
 * in which recalculation on load is forced ("always") and the locale pinned to en-US; the run converts
 * each workbook to .xlsx in its own output folder, and the values the application wrote there are read
 * back and compared cell by cell with the values cached in the original (see {@link RecalcReport}).
 * The application writes 15 significant digits. Start-up costs about 4-6 s per call, so pass all
 * workbooks of a test class in one call. Artifacts stay under {@code target/holdover-testing/recalc-*}.
 *
 * <p>Only functions listed in {@link SafeFunctions} are known to give the same result here as in the
 * library's evaluator that the workbook writer uses to cache values.
 *
 * <p>When {@code soffice} is missing the calling test is skipped with the install command, or fails when
 * the environment variable {@code CI} is {@code true} (see {@link ExternalTools}).
 *
 * <p>Typical use:
 * <pre>{@code
 * RecalcReport report = SpreadsheetRecalc.recalculate(workbookPath);
 * report.assertAgrees();                                   // Tolerance.DEFAULT: relative 1e-9
 * }</pre>
 */
public final class SpreadsheetRecalc {

    /** The name the reports give the application. */
    public static final String EVALUATOR = "LibreOffice Calc (headless, recalculated on load)";

    private SpreadsheetRecalc() {
    }

    /**
     * Recomputes one workbook.
     *
     * @param workbook an .xlsx file
     * @return its formula cells with cached and recomputed values
     */
    public static RecalcReport recalculate(Path workbook) {
        return recalculate(List.of(workbook)).get(0);
    }

    /**
     * Recomputes several workbooks in one application run.
     *
     * @param workbooks .xlsx files; they may share file names
     * @return one report per workbook, in the same order
     */
    public static List<RecalcReport> recalculate(Path... workbooks) {
        return recalculate(Arrays.asList(workbooks));
    }

    /**
     * Recomputes several workbooks in one application run.
     *
     * @param workbooks .xlsx files; they may share file names
     * @return one report per workbook, in the same order
     */
    public static List<RecalcReport> recalculate(List<Path> workbooks) {
        OfficeConverter.Conversion run = OfficeConverter.convert(workbooks, "xlsx", "xlsx", "recalc",
                OfficeConverter.Recalc.ALWAYS);
        List<RecalcReport> reports = new ArrayList<>();
        for (int i = 0; i < workbooks.size(); i++) {
            reports.add(compare(workbooks.get(i), run.outputs().get(i)));
        }
        return List.copyOf(reports);
    }

    private static RecalcReport compare(Path source, Path recalculated) {
        try (XSSFWorkbook before = WorkbookCells.open(source); XSSFWorkbook after = WorkbookCells.open(recalculated)) {
            List<FormulaCell> cells = new ArrayList<>();
            for (Cell cell : WorkbookCells.formulaCells(before)) {
                String sheet = cell.getSheet().getSheetName();
                cells.add(new FormulaCell(sheet, cell.getAddress().formatAsString(), cell.getCellFormula(),
                        WorkbookCells.stored(cell),
                        WorkbookCells.storedAt(after, sheet, cell.getRowIndex(), cell.getColumnIndex())));
            }
            return new RecalcReport(source, recalculated, EVALUATOR, cells);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot close workbooks " + source + ", " + recalculated, e);
        }
    }
}
