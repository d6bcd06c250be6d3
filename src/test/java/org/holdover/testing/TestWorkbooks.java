package org.holdover.testing;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/** Small workbooks for the harness's own tests, built with the library (demo data). */
final class TestWorkbooks {

    static final String INPUTS = "Inputs";
    static final String BANK = "Battery bank";

    /** Rows of the chain sheets. */
    static final int CHAIN_ROWS = 9_000;
    /** Growth per row of the chain, a pure number. */
    static final double CHAIN_RATIO = 1.0001;
    /** Added per row of the chain. */
    static final double CHAIN_STEP = 0.5;

    private TestWorkbooks() {
    }

    /**
     * A two-sheet sizing sketch whose numbers, strings, logicals and errors are all formulas, with
     * cached values filled by the library's evaluator (demo data).
     *
     * <pre>
     * Inputs:        A: label, B: value
     *   1 Daily energy per appliance (Wh)  B1:B3 = 1200, 850, 2400
     *   4 Days of autonomy                  B4 = 2
     *   5 Depth of discharge                B5 = 0.8
     *   6 Bus voltage (V)                   B6 = 48
     * Battery bank:  B1 = SUM(Inputs!B1:B3)                       daily energy, Wh   (4450)
     *                B2 = B1*Inputs!B4/Inputs!B5                  stored energy, Wh  (11125)
     *                B3 = ROUNDUP(ROUND(B2/Inputs!B6,6),0)        capacity, Ah       (232)
     *                B4 = IF(B3>200,"large bank","small bank")    text
     *                B5 = B3>=232                                 logical
     *                B6 = NA()                                    error #N/A
     *                B7 = IFERROR(1/0,"no data")                  text
     *                B8 = 1/(Inputs!B4-2)                         error #DIV/0!
     *                B9 = SQRT(B2)*PI()                           irrational number
     * </pre>
     */
    static Path sizingSketch(Path file) {
        try (XSSFWorkbook workbook = new XSSFWorkbook()) {
            Sheet inputs = workbook.createSheet(INPUTS);
            String[] labels = {"Daily energy, lights (Wh)", "Daily energy, pump (Wh)", "Daily energy, freezer (Wh)",
                "Days of autonomy", "Depth of discharge", "Bus voltage (V)"};
            double[] values = {1200, 850, 2400, 2, 0.8, 48};
            for (int i = 0; i < labels.length; i++) {
                Row row = inputs.createRow(i);
                row.createCell(0).setCellValue(labels[i]);
                row.createCell(1).setCellValue(values[i]);
            }
            Sheet bank = workbook.createSheet(BANK);
            String[] formulas = {"SUM(Inputs!B1:B3)", "B1*Inputs!B4/Inputs!B5", "ROUNDUP(ROUND(B2/Inputs!B6,6),0)",
                "IF(B3>200,\"large bank\",\"small bank\")", "B3>=232", "NA()", "IFERROR(1/0,\"no data\")",
                "1/(Inputs!B4-2)", "SQRT(B2)*PI()"};
            for (int i = 0; i < formulas.length; i++) {
                Row row = bank.createRow(i);
                row.createCell(0).setCellValue("Result " + (i + 1));
                row.createCell(1).setCellFormula(formulas[i]);
            }
            PoiRecalc.storeCachedValues(workbook);
            return save(workbook, file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The sizing sketch with three cached values made wrong: B2 by one part in a million, B4's text and
     * B5's logical flipped; and B9 off by one part in 1e12, which is within the tolerance.
     */
    static Path sizingSketchWithWrongCache(Path file) {
        Path right = sizingSketch(file);
        try (XSSFWorkbook workbook = WorkbookCells.open(right)) {
            Sheet bank = workbook.getSheet(BANK);
            Cell stored = bank.getRow(1).getCell(1);
            stored.setCellValue(stored.getNumericCellValue() * (1 + 1e-6));
            bank.getRow(3).getCell(1).setCellValue("small bank");
            bank.getRow(4).getCell(1).setCellValue(false);
            Cell irrational = bank.getRow(8).getCell(1);
            irrational.setCellValue(irrational.getNumericCellValue() * (1 + 1e-12));
            return save(workbook, file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Two chains of {@value #CHAIN_ROWS} rows: sheet "Down" where A(k) = A(k-1)*r + s and B(k) = B(k-1)
     * + A(k), each row referring to the one above; sheet "Up" where A(k) = A(k+1)*r + s, each row
     * referring to the one below (evaluating it in row order recurses the whole chain).
     */
    static Path chains(Path file, boolean includeUpwardChain) {
        try (XSSFWorkbook workbook = new XSSFWorkbook()) {
            Sheet down = workbook.createSheet("Down");
            Row first = down.createRow(0);
            first.createCell(0).setCellValue(1.0);
            first.createCell(1).setCellFormula("A1");
            for (int k = 1; k < CHAIN_ROWS; k++) {
                Row row = down.createRow(k);
                row.createCell(0).setCellFormula("A" + k + "*" + CHAIN_RATIO + "+" + CHAIN_STEP);
                row.createCell(1).setCellFormula("B" + k + "+A" + (k + 1));
            }
            if (includeUpwardChain) {
                Sheet up = workbook.createSheet("Up");
                for (int k = 0; k < CHAIN_ROWS - 1; k++) {
                    up.createRow(k).createCell(0).setCellFormula("A" + (k + 2) + "*" + CHAIN_RATIO + "+" + CHAIN_STEP);
                }
                up.createRow(CHAIN_ROWS - 1).createCell(0).setCellValue(1.0);
            }
            PoiRecalc.storeCachedValues(workbook);
            return save(workbook, file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The closed form of the chain after n steps from 1: r^n + s (r^n - 1) / (r - 1). */
    static double chainValue(int steps) {
        double growth = Math.pow(CHAIN_RATIO, steps);
        return growth + CHAIN_STEP * (growth - 1) / (CHAIN_RATIO - 1);
    }

    /** The sum of the chain's first n values (steps 0 .. n-1), in closed form. */
    static double chainSum(int count) {
        double r = CHAIN_RATIO;
        double geometric = (Math.pow(r, count) - 1) / (r - 1);
        double c = CHAIN_STEP / (r - 1);
        return (1 + c) * geometric - c * count;
    }

    /**
     * A sheet of a table with explicit fonts (so that the application uses a metric-compatible font),
     * a title in A1 and the given number of columns of width {@code columnChars}.
     */
    static void table(Workbook workbook, Sheet sheet, int columns, int rows, int columnChars) {
        Font font = workbook.createFont();
        font.setFontName("Calibri");
        font.setFontHeightInPoints((short) 11);
        CellStyle style = workbook.createCellStyle();
        style.setFont(font);
        Row title = sheet.createRow(0);
        Cell titleCell = title.createCell(0);
        titleCell.setCellValue("Sheet " + sheet.getSheetName() + " (demo data)");
        titleCell.setCellStyle(style);
        for (int r = 1; r <= rows; r++) {
            Row row = sheet.createRow(r);
            for (int c = 0; c < columns; c++) {
                Cell cell = row.createCell(c);
                cell.setCellValue("v" + new CellReference(r, c).formatAsString());
                cell.setCellStyle(style);
            }
        }
        for (int c = 0; c < columns; c++) {
            sheet.setColumnWidth(c, columnChars * 256);
        }
    }

    static Path save(Workbook workbook, Path file) throws IOException {
        Files.createDirectories(file.getParent());
        try (OutputStream out = Files.newOutputStream(file)) {
            workbook.write(out);
        }
        return file;
    }
}
