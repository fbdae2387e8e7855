package dev.yoke.catalog;

import java.nio.file.Path;

/**
 * One thing wrong (or doubtful, when {@code warning}) in a user's file, located precisely enough
 * to jump to: {@code file:line:column: field: message}, the form compilers use so that editors and
 * terminals can follow it.
 *
 * @param file    the file, as the user named it
 * @param line    1-based; 0 when the problem concerns the whole file or folder
 * @param column  1-based; 0 when unknown
 * @param field   the YAML key concerned, or empty
 * @param message what is wrong and, where possible, what to write instead
 * @param warning true for plausibility doubts that do not stop loading
 */
public record Problem(Path file, int line, int column, String field, String message, boolean warning) {

    public Problem {
        field = field == null ? "" : field;
    }

    /** An error at a place in a file. */
    public static Problem error(Path file, int line, int column, String field, String message) {
        return new Problem(file, line, column, field, message, false);
    }

    /** A warning at a place in a file. */
    public static Problem warning(Path file, int line, int column, String field, String message) {
        return new Problem(file, line, column, field, message, true);
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder().append(file);
        if (line > 0) {
            b.append(':').append(line);
            if (column > 0) {
                b.append(':').append(column);
            }
        }
        b.append(": ");
        if (warning) {
            b.append("warning: ");
        }
        if (!field.isEmpty()) {
            b.append(field).append(": ");
        }
        return b.append(message).toString();
    }
}
