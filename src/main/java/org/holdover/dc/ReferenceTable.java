package org.holdover.dc;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A reference table exactly as bundled: where it comes from, its column names and its cells. Meant for a
 * workbook writer that embeds the same tables and looks values up with INDEX/MATCH, so the workbook and the
 * engine read the same numbers.
 *
 * @param name    the resource name without extension, e.g. {@code nec-310-16-copper-ampacity}
 * @param source  the comment lines at the top of the CSV (document, edition, table, where it was read), in order
 * @param columns column names; a name ends with its unit ({@code _A}, {@code _ohm_per_kft}, {@code _C}, …)
 * @param rows    the cells, one list per row, each as long as {@code columns}
 */
public record ReferenceTable(String name, List<String> source, List<String> columns, List<List<Cell>> rows) {

    /** One cell: a number, a text, or blank (the table prints a dash or nothing). */
    public sealed interface Cell permits Number, Text, Blank {
    }

    /** @param value the number as printed */
    public record Number(double value) implements Cell {
        public Number {
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("a table number must be finite, got " + value);
            }
        }
    }

    /** @param value the text as printed, e.g. a size label */
    public record Text(String value) implements Cell {
        public Text {
            Objects.requireNonNull(value, "value");
        }
    }

    /** No value: the table prints a dash (not permitted) or leaves the cell empty. */
    public record Blank() implements Cell {
    }

    public ReferenceTable {
        Objects.requireNonNull(name, "name");
        source = List.copyOf(source);
        columns = List.copyOf(columns);
        List<List<Cell>> copy = new ArrayList<>(rows.size());
        for (List<Cell> row : rows) {
            if (row.size() != columns.size()) {
                throw new IllegalArgumentException(name + ": a row has " + row.size() + " cells, the header "
                        + columns.size());
            }
            copy.add(List.copyOf(row));
        }
        rows = List.copyOf(copy);
    }

    /**
     * @param columnName a name from {@link #columns()}
     * @return its 0-based index; throws {@link IllegalArgumentException} if there is none
     */
    public int column(String columnName) {
        int i = columns.indexOf(columnName);
        if (i < 0) {
            throw new IllegalArgumentException(name + " has no column " + columnName + "; columns: " + columns);
        }
        return i;
    }

    /**
     * @param row        0-based row
     * @param columnName column name
     * @return the number there, or NaN when the cell is blank
     */
    public double number(int row, String columnName) {
        Cell c = rows.get(row).get(column(columnName));
        if (c instanceof Number n) {
            return n.value();
        }
        if (c instanceof Blank) {
            return Double.NaN;
        }
        throw new IllegalStateException(name + " row " + row + " column " + columnName + " is text: " + c);
    }

    /**
     * @param row        0-based row
     * @param columnName column name
     * @return the text there (a number as Java prints it, a blank as "")
     */
    public String text(int row, String columnName) {
        Cell c = rows.get(row).get(column(columnName));
        if (c instanceof Text t) {
            return t.value();
        }
        if (c instanceof Number n) {
            return Double.toString(n.value());
        }
        return "";
    }
}
