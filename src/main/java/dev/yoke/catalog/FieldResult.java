package dev.yoke.catalog;

import java.util.List;

/**
 * The outcome of reading one field's text: a value (Double, List of Double, String, Boolean or
 * Modulation, by the field's {@link FieldType}) or a message saying why it was refused.
 *
 * @param value   the value read, null when refused
 * @param message why it was refused, null when accepted
 */
public record FieldResult(Object value, String message) {

    static FieldResult ok(Object value) {
        return new FieldResult(value, null);
    }

    static FieldResult refused(String message) {
        return new FieldResult(null, message);
    }

    /** Whether the text was accepted. */
    public boolean ok() {
        return message == null;
    }

    /** The value as a number (QUANTITY fields). */
    public double number() {
        return (Double) value;
    }

    /** The value as a list of numbers (QUANTITY_LIST fields). */
    @SuppressWarnings("unchecked")
    public List<Double> numbers() {
        return (List<Double>) value;
    }
}
