package org.holdover.project;

import java.util.Objects;

/**
 * One problem with the user's input: where it is, which field, what is wrong and what was expected.
 *
 * @param where    file, line and column
 * @param field    field path such as {@code loads.appliances[3].watts}, or a column name; may be empty
 * @param message  what is wrong, with the value received ("must be >= 0, got -150")
 * @param expected what would be accepted, or a hint; may be empty
 */
public record Problem(SourceLocation where, String field, String message, String expected) {

    public Problem {
        Objects.requireNonNull(where, "where");
        field = field == null ? "" : field;
        Objects.requireNonNull(message, "message");
        expected = expected == null ? "" : expected;
    }

    /** The one-line form: {@code file:line:column: field: message; expected}. */
    public String oneLine() {
        StringBuilder b = new StringBuilder(where.toString()).append(": ");
        if (!field.isEmpty()) {
            b.append(field).append(": ");
        }
        b.append(message);
        if (!expected.isEmpty()) {
            b.append("; ").append(expected);
        }
        return b.toString().replace('\n', ' ').replace('\r', ' ');
    }

    @Override
    public String toString() {
        return oneLine();
    }
}
