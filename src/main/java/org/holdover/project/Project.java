package org.holdover.project;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.function.Function;

/**
 * A project file read and validated.
 *
 * @param input    the input as written (validated; optional fields may still be null)
 * @param file     the project file
 * @param display  the file as the user named it, for messages
 * @param locator  maps a field path such as {@code loads.appliances[2].watts} to where it is written
 * @param warnings problems that do not stop the run (each is shown to the user)
 */
public record Project(ProjectInput input, Path file, String display, Function<String, SourceLocation> locator,
                      List<Problem> warnings) {

    public Project {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(display, "display");
        Objects.requireNonNull(locator, "locator");
        warnings = List.copyOf(warnings);
    }

    /** Resolves a path written in the project file against the project file's folder. */
    public Path resolve(String written) {
        Path dir = file.toAbsolutePath().getParent();
        return dir == null ? Path.of(written) : dir.resolve(written).normalize();
    }

    /** How to show a path written in the project file (relative to where the user ran the tool). */
    public String displayOf(String written) {
        Path dir = Path.of(display).getParent();
        return dir == null ? written : dir.resolve(written).normalize().toString();
    }

    /** A problem at a field of this project file. */
    public Problem problemAt(String field, String message, String expected) {
        return new Problem(locator.apply(field), field, message, expected);
    }
}
