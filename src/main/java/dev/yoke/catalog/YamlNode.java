package dev.yoke.catalog;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** A YAML value with the line and column where it starts: the tree the loaders validate. */
sealed interface YamlNode {

    int line();

    int column();

    /** What the node is, for messages: "a list", "a section", "a value". */
    String kind();

    /** A scalar; {@code nul} when YAML null ({@code ~}, {@code null} or nothing). */
    record Scalar(String text, boolean nul, int line, int column) implements YamlNode {
        @Override
        public String kind() {
            return nul ? "nothing" : "'" + text + "'";
        }
    }

    /** A sequence. */
    record Sequence(List<YamlNode> items, int line, int column) implements YamlNode {
        @Override
        public String kind() {
            return "a list";
        }
    }

    /** A mapping, keys in file order. */
    record Mapping(Map<String, Entry> entries, int line, int column) implements YamlNode {
        public Mapping {
            entries = new LinkedHashMap<>(entries);
        }

        @Override
        public String kind() {
            return "a section of keys";
        }
    }

    /** One key of a mapping with its position and value. */
    record Entry(String key, int line, int column, YamlNode value) {
    }
}
