package dev.yoke.tui.edit;

import dev.yoke.catalog.FieldResult;
import dev.yoke.catalog.FieldSpec;
import dev.yoke.catalog.PartFields;
import dev.yoke.catalog.PartKind;
import dev.yoke.model.Modulation;
import dev.yoke.units.Dimension;
import dev.yoke.units.UnitException;
import dev.yoke.units.Units;

import java.math.BigDecimal;
import java.math.MathContext;

import java.util.ArrayList;
import java.util.Arrays;
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
 * @param help         one line saying what the field means, shown while it is selected
 */
public record FormField(
        String key,
        String unit,
        Function<String, Object> reader,
        Function<Object, String> writer,
        List<String> choices,
        Object emptyValue,
        String help) {

    public FormField {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(reader, "reader");
        Objects.requireNonNull(writer, "writer");
        unit = unit == null ? "" : unit;
        help = help == null ? "" : help;
        choices = List.copyOf(choices);
    }

    /** One of fixed words; the value is {@code toValue} of the chosen word. */
    public static FormField choice(String key, List<String> words, Function<String, Object> toValue,
                                   Function<Object, String> toWord) {
        return new FormField(key, "", toValue, toWord, words, null, "");
    }

    /**
     * The form field for a key of the catalog's field table, so that a field is read exactly as the
     * loader reads the file: same units, same range, same messages. Quantities are written with
     * {@link Units#formatExact}, so a field left alone gives back the very same value.
     * A key whose default is derived from another key (e.g. {@code bus_voltage_min}) is required here.
     */
    public static FormField of(FieldSpec spec) {
        Function<String, Object> reader = text -> {
            FieldResult r = spec.validate(text);
            if (!r.ok()) {
                throw new IllegalArgumentException(r.message());
            }
            return r.value();
        };
        Object whenBlank = spec.required() ? null : spec.defaultValue();
        String help = spec.description()
                + (spec.required() || spec.defaultText().isEmpty() ? "" : "; default " + spec.defaultText());
        return switch (spec.type()) {
            case QUANTITY -> new FormField(spec.key(), spec.dimension().symbol(), reader,
                    v -> writeQuantity((Double) v, spec.dimension()), List.of(), whenBlank, help);
            case QUANTITY_LIST -> new FormField(spec.key(), spec.dimension().symbol(), reader, v -> {
                List<String> parts = new ArrayList<>();
                for (Object item : (List<?>) v) {
                    parts.add(writeQuantity((Double) item, spec.dimension()));
                }
                return String.join(", ", parts);
            }, List.of(), null, help);
            case BOOLEAN -> new FormField(spec.key(), "", reader, String::valueOf, List.of("true", "false"), null, help);
            case MODULATION -> new FormField(spec.key(), "", reader, v -> ((Modulation) v).fileName(),
                    Arrays.stream(Modulation.values()).map(Modulation::fileName).toList(), null, help);
            case IDENTIFIER, TEXT -> new FormField(spec.key(), "", reader, String::valueOf, List.of(), whenBlank, help);
            case SECTION, SECTION_LIST -> throw new IllegalArgumentException(spec.key() + " is a section");
        };
    }

    /**
     * A quantity as field text that reads back to exactly {@code si}: speeds in rpm and small
     * inertias in g·cm² when a short decimal in those units reads back exactly (the units the trade
     * quotes them in), otherwise {@link Units#formatExact}.
     */
    static String writeQuantity(double si, Dimension d) {
        String exact = Units.formatExact(si, d);
        if (d == Dimension.ANGULAR_SPEED) {
            return shortIn(si, d, "rpm", Math.PI / 30, exact);
        }
        if (d == Dimension.INERTIA && si != 0 && Math.abs(si) < 1e-3) {
            return shortIn(si, d, "g*cm^2", 1e-7, exact);
        }
        return exact;
    }

    private static String shortIn(double si, Dimension d, String symbol, double factor, String otherwise) {
        if (si == 0 || !Double.isFinite(si)) {
            return otherwise;
        }
        BigDecimal inUnit = new BigDecimal(si / factor);
        for (int digits = 1; digits <= 10; digits++) {
            String text = inUnit.round(new MathContext(digits)).stripTrailingZeros().toPlainString() + " " + symbol;
            try {
                if (Units.parse(text, d) == si) {
                    return text;
                }
            } catch (UnitException e) {
                return otherwise;
            }
        }
        return otherwise;
    }

    /** The catalog's field for {@code key} of {@code kind}, as a form field. */
    public static FormField of(PartKind kind, String key) {
        return of(PartFields.find(kind, key).orElseThrow(() -> new IllegalArgumentException(kind + " has no " + key)));
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
}
