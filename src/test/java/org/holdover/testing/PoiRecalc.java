package org.holdover.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Supplier;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.FormulaEvaluator;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * The library's own formula evaluator (Apache POI) as a second opinion, and the way tests fill in
 * cached values of workbooks they build.
 *
 * <p>Cells are evaluated in order (sheets in workbook order, rows top to bottom, columns left to
 * right). The evaluator keeps every computed cell, so a row that refers to the row above finds it
 * already computed and the recursion stays one level deep; evaluating a long row-to-row chain from the
 * bottom instead recurses once per row. As a second guard the evaluation runs on a thread with a
 * {@value #STACK_BYTES}-byte stack, so a chain that runs upwards or across sheets against that order
 * still evaluates.
 */
public final class PoiRecalc {

    /** The name the reports give this evaluator. */
    public static final String EVALUATOR = "Apache POI FormulaEvaluator (row order)";

    /** Stack of the evaluating thread: reserved address space, committed only as deep as it gets. */
    static final long STACK_BYTES = 1L << 30;

    private PoiRecalc() {
    }

    /**
     * Recomputes every formula cell of a workbook file with the library's evaluator, without changing
     * the file.
     *
     * @param workbook an .xlsx file
     * @return its formula cells with cached and recomputed values
     */
    public static RecalcReport recalculate(Path workbook) {
        try (XSSFWorkbook book = WorkbookCells.open(workbook)) {
            List<Cell> formulas = WorkbookCells.formulaCells(book);
            FormulaEvaluator evaluator = book.getCreationHelper().createFormulaEvaluator();
            List<FormulaCell> cells = onLargeStack(() -> {
                List<FormulaCell> out = new ArrayList<>(formulas.size());
                for (Cell cell : formulas) {
                    CellResult recomputed;
                    try {
                        recomputed = WorkbookCells.evaluated(evaluator.evaluate(cell));
                    } catch (RuntimeException e) {
                        recomputed = new CellResult.Unevaluated(String.valueOf(rootMessage(e)));
                    }
                    out.add(new FormulaCell(cell.getSheet().getSheetName(), cell.getAddress().formatAsString(),
                            cell.getCellFormula(), WorkbookCells.stored(cell), recomputed));
                }
                return out;
            });
            return new RecalcReport(workbook, workbook, EVALUATOR, cells);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot close workbook " + workbook, e);
        }
    }

    /**
     * Evaluates every formula cell of a workbook in row order and stores each result as the cell's
     * cached value, as a workbook writer does before saving.
     *
     * @param workbook a workbook being built by a test
     * @return how many formula cells were evaluated
     * @throws IllegalStateException naming the cell when the evaluator cannot compute one
     */
    public static int storeCachedValues(Workbook workbook) {
        List<Cell> formulas = WorkbookCells.formulaCells(workbook);
        FormulaEvaluator evaluator = workbook.getCreationHelper().createFormulaEvaluator();
        return onLargeStack(() -> {
            for (Cell cell : formulas) {
                try {
                    evaluator.evaluateFormulaCell(cell);
                } catch (RuntimeException e) {
                    throw new IllegalStateException("cannot evaluate " + cell.getSheet().getSheetName() + "!"
                            + cell.getAddress() + " =" + cell.getCellFormula() + ": " + rootMessage(e), e);
                }
            }
            return formulas.size();
        });
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        StringBuilder text = new StringBuilder(String.valueOf(t.getMessage()));
        while (t.getCause() != null && t.getCause() != t) {
            t = t.getCause();
            text.append(" / ").append(t.getClass().getSimpleName()).append(": ").append(t.getMessage());
        }
        return text.toString();
    }

    static <T> T onLargeStack(Supplier<T> work) {
        AtomicReference<T> result = new AtomicReference<>();
        AtomicReference<Throwable> failure = new AtomicReference<>();
        Thread thread = new Thread(null, () -> {
            try {
                result.set(work.get());
            } catch (Throwable t) {
                failure.set(t);
            }
        }, "formula-evaluator", STACK_BYTES);
        thread.start();
        try {
            thread.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while evaluating formulas", e);
        }
        Throwable t = failure.get();
        if (t instanceof RuntimeException r) {
            throw r;
        }
        if (t instanceof Error err) {
            throw err;
        }
        if (t != null) {
            throw new IllegalStateException(t);
        }
        return result.get();
    }
}
