package org.holdover.testing;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.CellValue;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.usermodel.XSSFCell;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/** Reading formula cells and their values with the library; nothing here leaves the package. */
final class WorkbookCells {

    private WorkbookCells() {
    }

    static XSSFWorkbook open(Path file) {
        try (InputStream in = Files.newInputStream(file)) {
            return new XSSFWorkbook(in);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read workbook " + file, e);
        }
    }

    /** Every formula cell, by sheet in workbook order, then row, then column. */
    static List<Cell> formulaCells(Workbook workbook) {
        List<Cell> cells = new ArrayList<>();
        for (Sheet sheet : workbook) {
            for (Row row : sheet) {
                for (Cell cell : row) {
                    if (cell.getCellType() == CellType.FORMULA) {
                        cells.add(cell);
                    }
                }
            }
        }
        return cells;
    }

    /** The value a cell holds: for a formula cell its cached result. */
    static CellResult stored(Cell cell) {
        if (cell == null) {
            return new CellResult.Blank();
        }
        CellType type = cell.getCellType();
        if (type == CellType.FORMULA) {
            if (cell instanceof XSSFCell x && !x.getCTCell().isSetV()) {
                return new CellResult.Blank();
            }
            type = cell.getCachedFormulaResultType();
        }
        return switch (type) {
            case NUMERIC -> new CellResult.Numeric(cell.getNumericCellValue());
            case STRING -> new CellResult.Text(cell.getStringCellValue());
            case BOOLEAN -> new CellResult.Logical(cell.getBooleanCellValue());
            case ERROR -> errorCode(cell.getErrorCellValue());
            default -> new CellResult.Blank();
        };
    }

    /** The result of the library's evaluator. */
    static CellResult evaluated(CellValue value) {
        if (value == null) {
            return new CellResult.Blank();
        }
        return switch (value.getCellType()) {
            case NUMERIC -> new CellResult.Numeric(value.getNumberValue());
            case STRING -> new CellResult.Text(value.getStringValue());
            case BOOLEAN -> new CellResult.Logical(value.getBooleanValue());
            case ERROR -> errorCode(value.getErrorValue());
            default -> new CellResult.Blank();
        };
    }

    private static CellResult errorCode(byte code) {
        try {
            return new CellResult.ErrorCode(FormulaError.forInt(code).getString());
        } catch (IllegalArgumentException e) {
            return new CellResult.ErrorCode("#UNKNOWN(" + code + ")");
        }
    }

    /** The formula cell at the same sheet and address in another workbook, as its stored value. */
    static CellResult storedAt(Workbook workbook, String sheetName, int rowIndex, int columnIndex) {
        Sheet sheet = workbook.getSheet(sheetName);
        if (sheet == null) {
            return new CellResult.Blank();
        }
        Row row = sheet.getRow(rowIndex);
        return row == null ? new CellResult.Blank() : stored(row.getCell(columnIndex));
    }
}
