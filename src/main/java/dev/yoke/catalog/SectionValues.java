package dev.yoke.catalog;

import dev.yoke.model.Modulation;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** The values read from one YAML section, with where each came from; defaults filled in. */
final class SectionValues {

    private final YamlNode.Mapping map;
    private final Map<String, Object> values = new HashMap<>();
    private boolean failed;

    SectionValues(YamlNode.Mapping map) {
        this.map = map;
    }

    void put(String key, Object value) {
        values.put(key, value);
    }

    void fail() {
        failed = true;
    }

    /** Whether any problem was found in this section (the record cannot be built). */
    boolean failed() {
        return failed;
    }

    /** Whether a value (given or default) is known for {@code key}. */
    boolean has(String key) {
        return values.containsKey(key);
    }

    /** Whether the file itself gives {@code key}. */
    boolean given(String key) {
        return map.entries().containsKey(key);
    }

    double number(String key) {
        return (Double) values.get(key);
    }

    @SuppressWarnings("unchecked")
    List<Double> numbers(String key) {
        return (List<Double>) values.get(key);
    }

    String text(String key) {
        return (String) values.get(key);
    }

    boolean flag(String key) {
        return (Boolean) values.get(key);
    }

    Modulation modulation(String key) {
        return (Modulation) values.get(key);
    }

    YamlNode node(String key) {
        return (YamlNode) values.get(key);
    }

    /** Line of the value of {@code key}, or of the section when the key is absent. */
    int line(String key) {
        YamlNode.Entry e = map.entries().get(key);
        return e == null ? map.line() : e.value().line();
    }

    /** Column of the value of {@code key}, or of the section when the key is absent. */
    int column(String key) {
        YamlNode.Entry e = map.entries().get(key);
        return e == null ? map.column() : e.value().column();
    }

    YamlNode.Mapping map() {
        return map;
    }
}
