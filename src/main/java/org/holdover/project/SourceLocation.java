package org.holdover.project;

import java.util.Objects;

/**
 * Where something was read from: a file and, when known, a line and column.
 *
 * @param file   the file as the user named it (or a label such as {@code <builtin catalog>})
 * @param line   1-based line, or 0 when unknown
 * @param column 1-based column, or 0 when unknown
 */
public record SourceLocation(String file, int line, int column) {

    public SourceLocation {
        Objects.requireNonNull(file, "file");
        if (line < 0 || column < 0) {
            throw new IllegalArgumentException("line and column must be >= 0");
        }
    }

    public static SourceLocation of(String file) {
        return new SourceLocation(file, 0, 0);
    }

    public static SourceLocation of(String file, int line) {
        return new SourceLocation(file, line, 0);
    }

    /** {@code file:line:column}, leaving out what is unknown. */
    @Override
    public String toString() {
        StringBuilder b = new StringBuilder(file);
        if (line > 0) {
            b.append(':').append(line);
            if (column > 0) {
                b.append(':').append(column);
            }
        }
        return b.toString();
    }
}
