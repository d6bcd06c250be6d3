package org.holdover.testing;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * Every formula cell of one workbook with its cached value and the value an application recomputed.
 *
 * @param source the workbook that was checked
 * @param recalculated the application's own saved copy, or the source itself for an in-process evaluator
 * @param evaluator which application recomputed the values, for messages
 * @param cells every formula cell, by sheet in workbook order, then row, then column
 */
public record RecalcReport(Path source, Path recalculated, String evaluator, List<FormulaCell> cells) {

    /** How many disagreeing cells a failure message lists before it stops. */
    private static final int LISTED_IN_MESSAGE = 20;

    public RecalcReport {
        if (source == null || recalculated == null || evaluator == null || cells == null) {
            throw new IllegalArgumentException("no field of a report may be null");
        }
        cells = List.copyOf(cells);
    }

    /**
     * @param tolerance how close two numbers must be
     * @return the cells whose values disagree, in sheet, row, column order
     */
    public List<FormulaCell> disagreements(Tolerance tolerance) {
        return cells.stream().filter(c -> !c.agrees(tolerance)).toList();
    }

    /**
     * The cell with the largest difference; a cell whose numbers differ by no more than the absolute
     * tolerance counts as no difference.
     *
     * @param tolerance the tolerance
     * @return the worst cell, empty when the workbook has no formula cells
     */
    public Optional<FormulaCell> worst(Tolerance tolerance) {
        return cells.stream().max(Comparator.comparingDouble(c -> c.badness(tolerance)));
    }

    /**
     * @param sheet a sheet name
     * @param address an A1 address
     * @return that formula cell
     * @throws IllegalArgumentException when it is not a formula cell of this workbook
     */
    public FormulaCell cell(String sheet, String address) {
        return cells.stream().filter(c -> c.sheet().equals(sheet) && c.address().equals(address)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no formula cell " + sheet + "!" + address + " in " + source));
    }

    /**
     * @param tolerance the tolerance
     * @return a few lines: how many cells, how many disagree, the worst and the first disagreements
     */
    public String summary(Tolerance tolerance) {
        List<FormulaCell> bad = disagreements(tolerance);
        StringBuilder text = new StringBuilder()
                .append(source.getFileName()).append(" recomputed by ").append(evaluator).append(": ")
                .append(cells.size()).append(" formula cells, ").append(bad.size()).append(" disagree (tolerance relative ")
                .append(tolerance.relative()).append(", absolute ").append(tolerance.absolute()).append(")");
        worst(tolerance).ifPresent(w -> text.append("\n  worst: ").append(w.describe()));
        if (!bad.isEmpty()) {
            text.append(bad.stream().limit(LISTED_IN_MESSAGE).map(c -> "\n  " + c.describe()).collect(Collectors.joining()));
            if (bad.size() > LISTED_IN_MESSAGE) {
                text.append("\n  ... and ").append(bad.size() - LISTED_IN_MESSAGE).append(" more");
            }
        }
        return text.toString();
    }

    /**
     * Fails unless every formula cell agrees within {@link Tolerance#DEFAULT}.
     *
     * @throws AssertionError listing the worst cell and the first disagreements
     */
    public void assertAgrees() {
        assertAgrees(Tolerance.DEFAULT);
    }

    /**
     * Fails unless the workbook has formula cells and every one agrees.
     *
     * @param tolerance the tolerance
     * @throws AssertionError listing the worst cell and the first disagreements
     */
    public void assertAgrees(Tolerance tolerance) {
        if (cells.isEmpty()) {
            throw new AssertionError(source + " has no formula cells, so nothing was checked");
        }
        if (!disagreements(tolerance).isEmpty()) {
            throw new AssertionError(summary(tolerance));
        }
    }
}
