package dev.yoke.tui.edit;

import dev.yoke.model.Catalog;

import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * What the parts editor needs to know about one kind of part (motor, switch): its fields, the
 * checks across them, how a record becomes field values and back, and the list's columns.
 *
 * @param <T> the part record
 */
public interface EditablePart<T> {

    /** Singular name, e.g. {@code motor}. */
    String noun();

    /** Plural name, e.g. {@code motors}. */
    String plural();

    /** Every field, in form order; the first two are {@code id} and {@code label}. */
    List<FormField> fields();

    /** Checks across fields (a peak rating not below the continuous one…). */
    List<FormRule> rules();

    /** The catalog's plausibility checks: doubts shown beside fields that never block a save. */
    List<FormRule> doubts();

    /** The record as field values, keyed like {@link #fields()}. */
    Map<String, Object> values(T part);

    /** The record from field values that passed every check. */
    T build(Map<String, Object> values);

    String id(T part);

    String label(T part);

    /** The parts of this kind in the catalog, in catalog order. */
    List<T> parts(Catalog catalog);

    /** A few key values shown in the list. */
    List<Column<T>> columns();

    /**
     * One column of the list.
     *
     * @param header shown above the column, with its unit
     * @param width  columns of text
     * @param value  the cell's text
     */
    record Column<T>(String header, int width, Function<T, String> value) {
    }
}
