package dev.yoke.tui.edit;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Function;

/**
 * A check across fields of one form (e.g. a peak current not below the continuous one).
 * It sees only the fields that are valid on their own, and stays silent when one it needs is missing.
 */
@FunctionalInterface
public interface FormRule {

    /** @return field key to message for each field the rule finds wrong; empty when it holds */
    Map<String, String> check(Map<String, Object> validValues);

    /** {@code key} must be ≥ {@code otherKey}; the message names the other field. */
    static FormRule notBelow(String key, String otherKey) {
        return values -> values.get(key) instanceof Double v && values.get(otherKey) instanceof Double o && v < o
                ? Map.of(key, "must be ≥ " + otherKey) : Map.of();
    }

    /** {@code key} must be ≤ {@code otherKey}; the message names the other field. */
    static FormRule notAbove(String key, String otherKey) {
        return values -> values.get(key) instanceof Double v && values.get(otherKey) instanceof Double o && v > o
                ? Map.of(key, "must be ≤ " + otherKey) : Map.of();
    }

    /**
     * A rule on the whole record: once every field is valid, the record is built and {@code issues}
     * lists its problems (as the loader would report them) by field.
     *
     * @param keys   the fields the record needs
     * @param build  field values to record
     * @param issues record to field key and message
     */
    static <T> FormRule onRecord(java.util.Collection<String> keys, Function<Map<String, Object>, T> build,
                                 Function<T, Map<String, String>> issues) {
        return values -> {
            if (!values.keySet().containsAll(keys)) {
                return Map.of();
            }
            try {
                return new LinkedHashMap<>(issues.apply(build.apply(values)));
            } catch (RuntimeException e) {
                return Map.of();
            }
        };
    }
}
