package org.holdover.testing;

/**
 * The value of a formula cell: what a workbook holds as the cached result, or what an application
 * computed.
 */
public sealed interface CellResult {

    /** @return the value as a spreadsheet shows it in a message, strings in quotes */
    String display();

    /**
     * A number.
     *
     * @param value the number, unit as in the cell
     */
    record Numeric(double value) implements CellResult {
        @Override
        public String display() {
            return Double.toString(value);
        }
    }

    /**
     * A string.
     *
     * @param value the text, not null
     */
    record Text(String value) implements CellResult {
        public Text {
            if (value == null) {
                throw new IllegalArgumentException("text must not be null");
            }
        }

        @Override
        public String display() {
            return '"' + value + '"';
        }
    }

    /**
     * TRUE or FALSE.
     *
     * @param value the logical value
     */
    record Logical(boolean value) implements CellResult {
        @Override
        public String display() {
            return value ? "TRUE" : "FALSE";
        }
    }

    /**
     * An error value.
     *
     * @param code the error as a spreadsheet writes it, for example {@code #DIV/0!} or {@code #N/A}
     */
    record ErrorCode(String code) implements CellResult {
        public ErrorCode {
            if (code == null || !code.startsWith("#")) {
                throw new IllegalArgumentException("error code must start with #, got " + code);
            }
        }

        @Override
        public String display() {
            return code;
        }
    }

    /** No value: the cell has no cached result, or the cell is missing. */
    record Blank() implements CellResult {
        @Override
        public String display() {
            return "(blank)";
        }
    }

    /**
     * The evaluator could not compute the formula at all (for example an unsupported function).
     *
     * @param reason the evaluator's message
     */
    record Unevaluated(String reason) implements CellResult {
        @Override
        public String display() {
            return "(not evaluated: " + reason + ")";
        }
    }
}
