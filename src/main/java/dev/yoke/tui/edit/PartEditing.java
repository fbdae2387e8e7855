package dev.yoke.tui.edit;

import dev.yoke.catalog.PartFields;
import dev.yoke.catalog.PartKind;
import dev.yoke.catalog.PartRules;
import dev.yoke.model.Catalog;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;

/**
 * What every catalog part kind shares in the parts editor: its fields come from the catalog's
 * field table ({@link PartFields}) and its checks from the catalog's rules and plausibility
 * checks, so the editor and the loader accept exactly the same values. A kind only states its
 * names, which checks apply, and how its record maps to field values.
 *
 * @param <T> the part record
 */
abstract class PartEditing<T> implements EditablePart<T> {

    private final String noun;
    private final String plural;
    private final List<FormField> fields;
    private final List<FormRule> rules;
    private final List<FormRule> doubts;
    private final Function<T, String> id;
    private final Function<T, String> label;
    private final Function<Catalog, List<T>> parts;

    /**
     * @param notEdited field-table keys the form leaves out
     * @param errors    the catalog's blocking checks of a whole record
     * @param warnings  the catalog's plausibility checks, shown but never blocking
     * @param parts     the parts of this kind in a catalog
     */
    PartEditing(String noun, String plural, PartKind kind, Set<String> notEdited,
                Function<T, List<PartRules.FieldIssue>> errors, Function<T, List<PartRules.FieldIssue>> warnings,
                Function<T, String> id, Function<T, String> label, Function<Catalog, List<T>> parts) {
        this.noun = noun;
        this.id = id;
        this.label = label;
        this.parts = parts;
        this.plural = plural;
        this.fields = PartFields.of(kind).stream()
                .filter(f -> !notEdited.contains(f.key()))
                .map(FormField::of)
                .toList();
        List<String> keys = fields.stream().map(FormField::key).toList();
        this.rules = List.of(FormRule.onRecord(keys, this::build, part -> issues(errors.apply(part))));
        this.doubts = List.of(FormRule.onRecord(keys, this::build, part -> issues(warnings.apply(part))));
    }

    @Override
    public final String noun() {
        return noun;
    }

    @Override
    public final String plural() {
        return plural;
    }

    @Override
    public final List<FormField> fields() {
        return fields;
    }

    @Override
    public final List<FormRule> rules() {
        return rules;
    }

    @Override
    public final List<FormRule> doubts() {
        return doubts;
    }

    @Override
    public final String id(T part) {
        return id.apply(part);
    }

    @Override
    public final String label(T part) {
        return label.apply(part);
    }

    @Override
    public final List<T> parts(Catalog catalog) {
        return parts.apply(catalog);
    }

    /** The catalog's issues by field, first message per field. */
    static Map<String, String> issues(List<PartRules.FieldIssue> issues) {
        Map<String, String> out = new LinkedHashMap<>();
        for (PartRules.FieldIssue i : issues) {
            out.putIfAbsent(i.field(), i.message());
        }
        return out;
    }

    /** A number field's value from values that passed every check. */
    static double number(Map<String, Object> values, String key) {
        return (Double) values.get(key);
    }
}
