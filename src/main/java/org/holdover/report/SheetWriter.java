package org.holdover.report;

import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Name;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.util.CellReference;

/**
 * Writes cells of one sheet: inputs (values), results (a formula with the engine's value cached, so
 * viewers that do not recalculate still show it) and text. User text always goes in as a text value,
 * never as a formula. Rows and columns are 0-based.
 */
final class SheetWriter {

    final Sheet sheet;
    final Styles styles;
    private final Workbook wb;

    SheetWriter(Workbook wb, Sheet sheet, Styles styles) {
        this.wb = wb;
        this.sheet = sheet;
        this.styles = styles;
    }

    String name() {
        return sheet.getSheetName();
    }

    Cell cell(int r, int c) {
        Row row = sheet.getRow(r);
        if (row == null) {
            row = sheet.createRow(r);
        }
        Cell cell = row.getCell(c);
        return cell != null ? cell : row.createCell(c);
    }

    Cell text(int r, int c, String value) {
        Cell cell = cell(r, c);
        cell.setCellValue(value == null ? "" : value);
        cell.setCellStyle(styles.text);
        return cell;
    }

    Cell text(int r, int c, String value, CellStyle style) {
        Cell cell = text(r, c, value);
        cell.setCellStyle(style);
        return cell;
    }

    Cell inputText(int r, int c, String value) {
        Cell cell = cell(r, c);
        cell.setCellValue(value == null ? "" : value);
        cell.setCellStyle(styles.inputText);
        return cell;
    }

    Cell input(int r, int c, double value, String format) {
        Cell cell = cell(r, c);
        cell.setCellValue(value);
        cell.setCellStyle(styles.input(format));
        return cell;
    }

    /** A result: a formula whose cached value is the engine's. */
    Cell formula(int r, int c, String formula, double engineValue, String format) {
        if (!Double.isFinite(engineValue)) {
            throw new IllegalArgumentException("non-finite engine value for " + name() + "!" + addr(r, c) + ": " + formula);
        }
        Cell cell = cell(r, c);
        cell.setCellFormula(formula);
        cell.setCellValue(engineValue);
        cell.setCellStyle(styles.result(format));
        return cell;
    }

    /** A result whose value is text (pass/FAIL, a chosen id). */
    Cell formulaText(int r, int c, String formula, String engineValue) {
        Cell cell = cell(r, c);
        cell.setCellFormula(formula);
        cell.setCellValue(engineValue);
        cell.setCellStyle(styles.verdict());
        return cell;
    }

    /** A result whose value is text that is not a verdict (an identifier taken from another cell). */
    Cell formulaName(int r, int c, String formula, String engineValue) {
        Cell cell = formulaText(r, c, formula, engineValue);
        cell.setCellStyle(styles.text);
        return cell;
    }

    /**
     * Long text across columns {@code c1}–{@code c2}, wrapped, with a row tall enough for about
     * {@code charsPerLine} characters a line.
     */
    int paragraph(int r, int c1, int c2, String value, org.apache.poi.ss.usermodel.CellStyle style, int charsPerLine) {
        text(r, c1, value, style);
        sheet.addMergedRegion(new org.apache.poi.ss.util.CellRangeAddress(r, r, c1, c2));
        sheet.getRow(r).setHeightInPoints(15f * Math.max(1, (int) Math.ceil(value.length() / (double) charsPerLine)) + 2);
        return r + 1;
    }

    void header(int r, int c, String... labels) {
        for (int i = 0; i < labels.length; i++) {
            text(r, c + i, labels[i], styles.header);
        }
    }

    /** Defines a workbook name for one cell of this sheet. */
    void name(String name, int r, int c) {
        Name n = wb.createName();
        n.setNameName(name);
        n.setRefersToFormula(quoted() + "!" + addr(r, c));
    }

    /** Defines a workbook name for a block of this sheet. */
    void name(String name, int r1, int c1, int r2, int c2) {
        Name n = wb.createName();
        n.setNameName(name);
        n.setRefersToFormula(quoted() + "!" + addr(r1, c1) + ":" + addr(r2, c2));
    }

    String quoted() {
        return "'" + name().replace("'", "''") + "'";
    }

    /** Absolute address such as $B$7. */
    static String addr(int r, int c) {
        return "$" + CellReference.convertNumToColString(c) + "$" + (r + 1);
    }

    /** Relative address such as B7. */
    static String rel(int r, int c) {
        return CellReference.convertNumToColString(c) + (r + 1);
    }

    /** Column letters. */
    static String col(int c) {
        return CellReference.convertNumToColString(c);
    }

    /** Address on this sheet qualified with the sheet name. */
    String ref(int r, int c) {
        return quoted() + "!" + addr(r, c);
    }

    /** A range on this sheet qualified with the sheet name. */
    String ref(int r1, int c1, int r2, int c2) {
        return quoted() + "!" + addr(r1, c1) + ":" + addr(r2, c2);
    }

    void widths(int... chars) {
        for (int i = 0; i < chars.length; i++) {
            sheet.setColumnWidth(i, Math.min(255, chars[i]) * 256);
        }
    }
}
