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

    /**
     * The one-line form: {@code file:line:column: field: message; expected}. Line breaks and tabs become
     * spaces, and other control characters (which a file can smuggle into a field name or a parser's
     * message, e.g. a terminal escape, U+2028 or a bidirectional override) become {@code ?}, so the line
     * prints as one line and as written.
     */
    public String oneLine() {
        StringBuilder b = new StringBuilder(where.toString()).append(": ");
        if (!field.isEmpty()) {
            b.append(field).append(": ");
        }
        b.append(message);
        if (!expected.isEmpty()) {
            b.append("; ").append(expected);
        }
        return printable(b);
    }

    private static String printable(CharSequence s) {
        StringBuilder out = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '\n' || c == '\r' || c == '\t') {
                out.append(' ');
            } else if (Character.isISOControl(c) || c == '\u2028' || c == '\u2029' || c >= '\u202A' && c <= '\u202E'
                    || c >= '\u2066' && c <= '\u2069') {
                out.append('?');
            } else {
                out.append(c);
            }
        }
        return out.toString();
    }

    @Override
    public String toString() {
        return oneLine();
    }
}
