package dev.yoke.tui.edit;

/**
 * How one kind of quantity is read from and written to a field: the editors' bridge to the
 * units package, so the form never parses numbers itself.
 */
public interface QuantityText {

    /**
     * Reads what the user typed into an SI value.
     *
     * @throws IllegalArgumentException with a message naming the expected unit and what was typed
     */
    double parse(String text);

    /** Writes an SI value so that {@link #parse} reads it back exactly. */
    String format(double value);

    /** The unit shown beside the field, e.g. {@code Ω}. */
    String unit();
}
