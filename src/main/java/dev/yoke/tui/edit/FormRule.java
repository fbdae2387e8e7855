package dev.yoke.tui.edit;

import java.util.Map;
import java.util.Optional;

/**
 * A check across fields of one form (e.g. a peak current not below the continuous one).
 * It sees only the fields that are valid on their own, and stays silent when one it needs is missing.
 */
@FunctionalInterface
public interface FormRule {

    /** @return the field to mark and the message, or empty when the rule holds */
    Optional<Map.Entry<String, String>> check(Map<String, Object> validValues);

    /** {@code key} must be ≥ {@code otherKey}; the message names the other field. */
    static FormRule notBelow(String key, String otherKey) {
        return values -> {
            Object value = values.get(key);
            Object other = values.get(otherKey);
            if (value instanceof Double v && other instanceof Double o && v < o) {
                return Optional.of(Map.entry(key, "must be ≥ " + otherKey));
            }
            return Optional.empty();
        };
    }

    /** {@code key} must be ≤ {@code otherKey}; the message names the other field. */
    static FormRule notAbove(String key, String otherKey) {
        return values -> {
            Object value = values.get(key);
            Object other = values.get(otherKey);
            if (value instanceof Double v && other instanceof Double o && v > o) {
                return Optional.of(Map.entry(key, "must be ≤ " + otherKey));
            }
            return Optional.empty();
        };
    }
}
