package dev.yoke.catalog;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Reads one YAML section against its table in {@link PartFields}: every key checked, every
 * problem recorded with its line and column, defaults filled in.
 */
final class SectionReader {

    private final Path file;
    private final List<Problem> problems;

    SectionReader(Path file, List<Problem> problems) {
        this.file = file;
        this.problems = problems;
    }

    void error(int line, int column, String field, String message) {
        problems.add(Problem.error(file, line, column, field, message));
    }

    void warning(int line, int column, String field, String message) {
        problems.add(Problem.warning(file, line, column, field, message));
    }

    /**
     * The values of {@code node}, a section of kind {@code kind}, or null when it is not a section
     * at all. {@code where} names it in messages, e.g. "motor 'm1'".
     */
    SectionValues read(YamlNode node, PartKind kind, String field, String where) {
        if (!(node instanceof YamlNode.Mapping map)) {
            error(node.line(), node.column(), field, "expected a section of 'key: value' lines for " + where
                    + ", got " + node.kind());
            return null;
        }
        SectionValues values = new SectionValues(map);
        java.util.Set<String> suggested = new java.util.HashSet<>();
        for (YamlNode.Entry entry : map.entries().values()) {
            Optional<FieldSpec> spec = PartFields.find(kind, entry.key());
            if (spec.isEmpty()) {
                Optional<String> suggestion = PartFields.suggest(kind, entry.key());
                suggestion.ifPresent(suggested::add);
                String hint = suggestion.map(s -> "; did you mean '" + s + "'?")
                        .orElse("; see docs/file-formats.md for the keys of a " + kind.noun());
                error(entry.line(), entry.column(), entry.key(), "unknown key in " + where + hint);
                values.fail();
                continue;
            }
            readEntry(spec.get(), entry, values, where);
        }
        for (FieldSpec spec : PartFields.of(kind)) {
            if (values.has(spec.key()) || values.given(spec.key())) {
                continue;
            }
            if (spec.required() && suggested.contains(spec.key())) {
                values.fail(); // already reported as a misspelling
            } else if (spec.required()) {
                error(map.line(), map.column(), spec.key(), "missing; every " + kind.noun() + " needs it ("
                        + where + ")");
                values.fail();
            } else if (spec.defaultValue() != null) {
                values.put(spec.key(), spec.defaultValue());
            }
        }
        return values;
    }

    private void readEntry(FieldSpec spec, YamlNode.Entry entry, SectionValues values, String where) {
        YamlNode node = entry.value();
        String key = spec.key();
        if (node instanceof YamlNode.Scalar s && s.nul()) {
            if (spec.required()) {
                error(entry.line(), entry.column(), key, "has no value");
                values.fail();
            } else if (spec.defaultValue() != null) {
                values.put(key, spec.defaultValue());
            }
            return;
        }
        switch (spec.type()) {
            case SECTION -> {
                if (node instanceof YamlNode.Mapping) {
                    values.put(key, node);
                } else {
                    error(node.line(), node.column(), key, "expected a section of 'key: value' lines, got "
                            + node.kind());
                    values.fail();
                }
            }
            case SECTION_LIST -> {
                if (node instanceof YamlNode.Sequence seq && (!seq.items().isEmpty() || !spec.required())) {
                    values.put(key, node);
                } else if (node instanceof YamlNode.Sequence) {
                    error(node.line(), node.column(), key, "the list is empty; give at least one entry");
                    values.fail();
                } else {
                    error(node.line(), node.column(), key, "expected a list ('- ' entries), got " + node.kind());
                    values.fail();
                }
            }
            case QUANTITY_LIST -> {
                List<YamlNode> items = node instanceof YamlNode.Sequence seq ? seq.items() : List.of(node);
                if (items.isEmpty()) {
                    error(node.line(), node.column(), key, "the list is empty; give at least one value");
                    values.fail();
                    return;
                }
                List<Double> numbers = new ArrayList<>();
                for (YamlNode item : items) {
                    FieldResult r = scalar(spec, item, true);
                    if (r.ok()) {
                        numbers.add(r.number());
                    } else {
                        error(item.line(), item.column(), key, r.message());
                        values.fail();
                    }
                }
                values.put(key, List.copyOf(numbers));
            }
            default -> {
                FieldResult r = scalar(spec, node, false);
                if (r.ok()) {
                    values.put(key, r.value());
                } else {
                    error(node.line(), node.column(), key, r.message());
                    values.fail();
                }
            }
        }
    }

    private static FieldResult scalar(FieldSpec spec, YamlNode node, boolean item) {
        if (node instanceof YamlNode.Scalar s) {
            if (s.nul()) {
                return FieldResult.refused("has no value");
            }
            return item ? spec.validateItem(s.text()) : spec.validate(s.text());
        }
        String wanted = spec.isQuantity() ? "a number in " + spec.dimension().expectation() : spec.unitText();
        return FieldResult.refused("expected " + wanted + ", got " + node.kind());
    }
}
