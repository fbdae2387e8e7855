package dev.yoke.catalog;

import java.util.List;
import java.util.stream.Collectors;

/**
 * The user's files cannot be used: carries every problem found in one run (not only the first),
 * so a user fixes them all at once. The only exception the loaders let out; commands print
 * {@link #problems()} one per line and exit with status 2.
 */
public final class InputException extends Exception {

    private final List<Problem> problems;

    /** @param problems at least one; warnings found alongside may be included */
    public InputException(List<Problem> problems) {
        super(problems.stream().map(Problem::toString).collect(Collectors.joining(System.lineSeparator())));
        if (problems.isEmpty()) {
            throw new IllegalArgumentException("an InputException needs at least one problem");
        }
        this.problems = List.copyOf(problems);
    }

    /** Every problem, errors and warnings, in file order. */
    public List<Problem> problems() {
        return problems;
    }

    /** Only the errors. */
    public List<Problem> errors() {
        return problems.stream().filter(p -> !p.warning()).toList();
    }
}
