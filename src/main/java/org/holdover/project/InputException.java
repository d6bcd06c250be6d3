package org.holdover.project;

import java.util.List;

/**
 * The user's input cannot be used. Carries every problem found, each with its location; the command
 * line prints one line per problem and exits with code 2. Never used for the tool's own bugs.
 */
public final class InputException extends Exception {

    private final transient List<Problem> problems;

    public InputException(List<Problem> problems) {
        super(problems.isEmpty() ? "invalid input" : problems.get(0).oneLine());
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("an InputException needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    public InputException(Problem problem) {
        this(List.of(problem));
    }

    /** Shorthand for a single problem. */
    public static InputException at(SourceLocation where, String field, String message, String expected) {
        return new InputException(new Problem(where, field, message, expected));
    }

    public List<Problem> problems() {
        return problems;
    }
}
