package dev.yoke.catalog;

import dev.yoke.model.Modulation;
import dev.yoke.units.Dimension;
import dev.yoke.units.UnitException;
import dev.yoke.units.Units;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * One key of a Yoke file: its type, unit, whether it is required, its default and the physically
 * possible range. The tables in {@link PartFields} are the single source of truth for the loaders,
 * the editors (field-by-field validation as the user types) and the format documentation.
 *
 * @param part         the section the key belongs to
 * @param key          the YAML key, snake_case
 * @param type         what the key holds
 * @param dimension    unit kind for QUANTITY and QUANTITY_LIST, else null
 * @param required     whether the key must be present
 * @param defaultValue value used when absent (Double, Boolean or String), or null when there is none
 *                     or when it is derived from another key (see {@code defaultText})
 * @param defaultText  the default as documented, e.g. "20 degC" or "bus_voltage"; empty when required
 * @param range        possible values for numbers
 * @param description  one line for documentation and editor help
 */
public record FieldSpec(PartKind part, String key, FieldType type, Dimension dimension, boolean required,
        Object defaultValue, String defaultText, Range range, String description) {

    private static final Pattern IDENTIFIER = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._+-]*");

    /**
     * Reads {@code text} as a value of this field: the unit converted to SI, the range checked.
     * QUANTITY_LIST text is comma-separated. Sections cannot be read from one line of text.
     */
    public FieldResult validate(String text) {
        if (text == null || text.isBlank()) {
            return FieldResult.refused("has no value");
        }
        String t = text.strip();
        return switch (type) {
            case QUANTITY -> quantity(t);
            case QUANTITY_LIST -> {
                List<Double> values = new ArrayList<>();
                for (String piece : t.split(",")) {
                    FieldResult one = quantity(piece.strip());
                    if (!one.ok()) {
                        yield one;
                    }
                    values.add(one.number());
                }
                yield FieldResult.ok(List.copyOf(values));
            }
            case IDENTIFIER -> IDENTIFIER.matcher(t).matches() ? FieldResult.ok(t)
                    : FieldResult.refused("'" + t + "' is not a usable id; use letters, digits and . _ - +"
                            + " (starting with a letter or digit)");
            case TEXT -> FieldResult.ok(t);
            case BOOLEAN -> switch (t.toLowerCase(Locale.ROOT)) {
                case "true" -> FieldResult.ok(Boolean.TRUE);
                case "false" -> FieldResult.ok(Boolean.FALSE);
                default -> FieldResult.refused("expected true or false, got '" + t + "'");
            };
            case MODULATION -> {
                try {
                    yield FieldResult.ok(Modulation.fromFileName(t));
                } catch (IllegalArgumentException e) {
                    yield FieldResult.refused(e.getMessage());
                }
            }
            case SECTION, SECTION_LIST -> FieldResult.refused("'" + key + "' holds a section, not a value");
        };
    }

    /** Reads one element of a QUANTITY_LIST field (or a QUANTITY field's value). */
    public FieldResult validateItem(String text) {
        if (text == null || text.isBlank()) {
            return FieldResult.refused("no value given");
        }
        return quantity(text.strip());
    }

    private FieldResult quantity(String text) {
        double value;
        try {
            value = Units.parse(text, dimension);
        } catch (UnitException e) {
            return FieldResult.refused(e.getMessage());
        }
        if (!range.contains(value)) {
            return FieldResult.refused("must be " + range.describe(dimension) + ", got '" + text + "'");
        }
        return FieldResult.ok(value);
    }

    /** Whether the key holds a number or list of numbers. */
    public boolean isQuantity() {
        return type == FieldType.QUANTITY || type == FieldType.QUANTITY_LIST;
    }

    /**
     * {@code value} as the YAML scalar a save writes for this key: numbers through
     * {@link Units#formatExact} (they load back as the very same double) with the key's unit, lists
     * of numbers in brackets, booleans bare, anything else as text quoted only where YAML needs it.
     */
    String scalar(Object value) {
        if (value instanceof Double number) {
            return Units.formatExact(number, dimension);
        }
        if (value instanceof List<?> list) {
            StringBuilder out = new StringBuilder("[");
            for (Object item : list) {
                out.append(out.length() > 1 ? ", " : "").append(Units.formatExact((Double) item, dimension));
            }
            return out.append(']').toString();
        }
        if (value instanceof Boolean bool) {
            return bool.toString();
        }
        return CatalogText.scalar(String.valueOf(value));
    }

    /** The unit in words for documentation: "ohms (Ω, Ohm)", or the type for non-quantities. */
    public String unitText() {
        return switch (type) {
            case QUANTITY, QUANTITY_LIST -> dimension.expectation();
            case IDENTIFIER -> "id";
            case TEXT -> "text";
            case BOOLEAN -> "true or false";
            case MODULATION -> "bipolar, unipolar or sign-magnitude";
            case SECTION -> "section";
            case SECTION_LIST -> "list of sections";
        };
    }
}
