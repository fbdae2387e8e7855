package dev.yoke.tui.edit;

import java.util.function.DoublePredicate;

/**
 * A range a single numeric field must lie in, with the words shown when it does not.
 *
 * @param test    true when the value is acceptable
 * @param message what is wrong, e.g. {@code must be > 0}
 */
public record FieldCheck(DoublePredicate test, String message) {

    /** Any finite value. */
    public static final FieldCheck ANY = new FieldCheck(v -> true, "");
    /** Strictly positive (resistances, inductances, durations…). */
    public static final FieldCheck POSITIVE = new FieldCheck(v -> v > 0, "must be > 0");
    /** Zero or more (drops, prices, optional losses…). */
    public static final FieldCheck NOT_NEGATIVE = new FieldCheck(v -> v >= 0, "must be ≥ 0");
    /** A fraction in (0, 1] (efficiencies, duty limits, derating). */
    public static final FieldCheck FRACTION = new FieldCheck(v -> v > 0 && v <= 1, "must be > 0 and ≤ 1");

    /** Values in [low, high], both in the field's SI unit; {@code shown} is the text of the bounds. */
    public static FieldCheck between(double low, double high, String shown) {
        return new FieldCheck(v -> v >= low && v <= high, "must be within " + shown);
    }
}
