package dev.yoke.tui.edit;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Function;

/**
 * One editable field of a form: its name (the file's key), the unit shown beside it, how its
 * text is read into a value and written back, and, for a field with fixed options, those options.
 *
 * @param key          name shown in the form; the key used in the files
 * @param unit         unit shown beside the field, empty for plain text
 * @param reader       text to value; throws {@link IllegalArgumentException} whose message is shown
 * @param writer       value to text, read back exactly by {@code reader}
 * @param choices      fixed options cycled with Space or Left/Right; empty for typed fields
 * @param emptyValue   value taken when the text is blank; {@code null} makes the field required
 */
public record FieldSpec(
        String key,
        String unit,
        Function<String, Object> reader,
        Function<Object, String> writer,
        List<String> choices,
        Object emptyValue) {

    public FieldSpec {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(reader, "reader");
        Objects.requireNonNull(writer, "writer");
        unit = unit == null ? "" : unit;
        choices = List.copyOf(choices);
    }

    /** A quantity with a unit, e.g. {@code resistance [4.7 mΩ]}, that must pass {@code check}. */
    public static FieldSpec quantity(String key, QuantityText quantity, FieldCheck check) {
        return new FieldSpec(key, quantity.unit(),
                text -> checked(quantity.parse(text), check),
                value -> quantity.format((Double) value),
                List.of(), null);
    }

    /** Like {@link #quantity} but blank text means {@code whenBlank}. */
    public static FieldSpec optionalQuantity(String key, QuantityText quantity, FieldCheck check, double whenBlank) {
        return new FieldSpec(key, quantity.unit(),
                text -> checked(quantity.parse(text), check),
                value -> quantity.format((Double) value),
                List.of(), whenBlank);
    }

    /**
     * A comma-separated list of quantities, e.g. {@code 16 kHz, 20 kHz, 40 kHz}; at least one,
     * each passing {@code check}. The value is a {@code List<Double>}.
     */
    public static FieldSpec quantityList(String key, QuantityText quantity, FieldCheck check) {
        return new FieldSpec(key, quantity.unit(),
                text -> readList(text, quantity, check),
                value -> writeList(value, quantity),
                List.of(), null);
    }

    /** Free text; required unless {@code optional}. The value is the trimmed string. */
    public static FieldSpec text(String key, boolean optional) {
        return new FieldSpec(key, "", String::trim, String::valueOf, List.of(), optional ? "" : null);
    }

    /** One of fixed words; the value is {@code toValue} of the chosen word. */
    public static FieldSpec choice(String key, List<String> words, Function<String, Object> toValue,
                                   Function<Object, String> toWord) {
        return new FieldSpec(key, "", toValue, toWord, words, null);
    }

    /** Whether the field is cycled through options rather than typed. */
    public boolean isChoice() {
        return !choices.isEmpty();
    }

    /**
     * Reads the field's text.
     *
     * @throws IllegalArgumentException naming what is wrong
     */
    public Object read(String text) {
        if (text == null || text.isBlank()) {
            if (emptyValue != null) {
                return emptyValue;
            }
            throw new IllegalArgumentException("required");
        }
        return reader.apply(text);
    }

    /** Writes a value as the field's text. */
    public String write(Object value) {
        return value == null ? "" : writer.apply(value);
    }

    private static double checked(double value, FieldCheck check) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("must be a finite number");
        }
        if (!check.test().test(value)) {
            throw new IllegalArgumentException(check.message());
        }
        return value;
    }

    private static List<Double> readList(String text, QuantityText quantity, FieldCheck check) {
        List<Double> values = new ArrayList<>();
        String[] items = text.split(",");
        for (int i = 0; i < items.length; i++) {
            String item = items[i].trim();
            if (item.isEmpty()) {
                throw new IllegalArgumentException("item " + (i + 1) + " is empty");
            }
            try {
                values.add(checked(quantity.parse(item), check));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("item " + (i + 1) + ": " + e.getMessage(), e);
            }
        }
        return List.copyOf(values);
    }

    private static String writeList(Object value, QuantityText quantity) {
        List<String> parts = new ArrayList<>();
        for (Object item : (List<?>) value) {
            parts.add(quantity.format((Double) item));
        }
        return String.join(", ", parts);
    }
}
