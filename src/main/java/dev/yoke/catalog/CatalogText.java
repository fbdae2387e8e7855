package dev.yoke.catalog;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.yaml.snakeyaml.DumperOptions.FlowStyle;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.YAMLException;
import org.yaml.snakeyaml.nodes.MappingNode;
import org.yaml.snakeyaml.nodes.Node;
import org.yaml.snakeyaml.nodes.NodeTuple;
import org.yaml.snakeyaml.nodes.ScalarNode;
import org.yaml.snakeyaml.nodes.SequenceNode;
import org.yaml.snakeyaml.nodes.Tag;

/**
 * Text-preserving edits of one catalog file: the user's comments, blank lines, key order and
 * number spelling survive every edit that does not touch them.
 *
 * <p>The text is composed into a YAML node tree whose marks give the exact position of every key
 * and value. A changed field's value is replaced where it stands (an anchor before it and a comment
 * after it stay); a field the part did not have is added as a new line at the end of the part; a
 * new part is appended after the last part of its list, indented like its neighbours; a deleted
 * part's lines are removed (comments between parts stay, as they may describe the list).
 * Lists written in flow style ({@code [ {...}, {...} ]}) are refused with a message rather than
 * rewritten, except the empty list {@code []}.
 *
 * <p>Besides parts found by id in a top-level list, the same edits reach a section by its path of
 * keys and an item of a nested list by its index (what a scenario file holds), and a nested list can
 * be rearranged, its items moving with their own lines.
 */
final class CatalogText {

    /** One field to write: the key to use, every key the loader accepts for it, and the YAML scalar. */
    record FieldValue(String key, List<String> acceptedKeys, String scalar) {
        FieldValue {
            acceptedKeys = List.copyOf(acceptedKeys);
        }

        static FieldValue of(String key, String scalar) {
            return new FieldValue(key, List.of(key), scalar);
        }
    }

    private final String text;
    private final String newline;
    private final MappingNode root;
    private final boolean surrogates;

    private CatalogText(String text, MappingNode root) {
        this.text = text;
        this.root = root;
        this.newline = text.contains("\r\n") ? "\r\n" : "\n";
        this.surrogates = text.chars().anyMatch(c -> Character.isSurrogate((char) c));
    }

    /**
     * Composes the text's node tree.
     *
     * @throws IOException when the text is not YAML or its top level is not a mapping
     */
    static CatalogText parse(String text) throws IOException {
        for (int start = 0, end; start <= text.length(); start = end + 1) {
            end = text.indexOf('\n', start);
            end = end < 0 ? text.length() : end;
            if (end - start > YamlReader.MAX_LINE_CHARS) {
                // The loader refuses such files too; the scanner is slow on very long lines.
                throw new IOException("a line is longer than " + YamlReader.MAX_LINE_CHARS + " characters");
            }
        }
        LoaderOptions options = new LoaderOptions();
        options.setMaxAliasesForCollections(50);
        options.setNestingDepthLimit(50);
        options.setCodePointLimit(64 * 1024 * 1024);
        options.setAllowDuplicateKeys(false);
        Node node;
        try {
            node = new Yaml(options).compose(new StringReader(text));
        } catch (YAMLException e) {
            throw new IOException("not a YAML document: " + e.getMessage(), e);
        }
        if (node == null) {
            return new CatalogText(text, null);
        }
        if (!(node instanceof MappingNode mapping)) {
            throw new IOException("the top level is not a mapping of lists");
        }
        return new CatalogText(text, mapping);
    }

    /** The unchanged text. */
    String text() {
        return text;
    }

    /** The keys part {@code id} of list {@code listKey} gives a value, in file order (empty when absent). */
    List<String> keysOf(String listKey, String id) {
        return item(listKey, id).map(CatalogText::keysIn).orElse(List.of());
    }

    /**
     * The keys the section at {@code path} spells out, in file order. The path names the keys from
     * the top level down ({@code ["bench", "limits"]}); an empty path is the top level itself.
     *
     * @throws IOException when a key on the path is missing or does not hold a section
     */
    List<String> keysAt(List<String> path) throws IOException {
        return keysIn(section(path));
    }

    /**
     * The keys item {@code index} (from 0) of the list at {@code listPath} spells out, in file order.
     *
     * @throws IOException when the list or the item is missing, or the item is not a section
     */
    List<String> keysOfItem(List<String> listPath, int index) throws IOException {
        return keysIn(itemAt(listPath, index));
    }

    /** The keys that hold a value: {@code key:} with nothing after it reads as absent, as the loader reads it. */
    private static List<String> keysIn(MappingNode mapping) {
        List<String> keys = new ArrayList<>();
        for (NodeTuple tuple : mapping.getValue()) {
            boolean empty = tuple.getValueNode() instanceof ScalarNode value && Tag.NULL.equals(value.getTag());
            if (tuple.getKeyNode() instanceof ScalarNode key && !empty) {
                keys.add(key.getValue());
            }
        }
        return keys;
    }

    /** Whether list {@code listKey} holds a part with this id. */
    boolean contains(String listKey, String id) {
        return item(listKey, id).isPresent();
    }

    /**
     * The text with the given fields of part {@code id} set; untouched fields keep their spelling.
     *
     * @throws IOException when the part is missing or written in a form Yoke does not edit
     */
    String withFields(String listKey, String id, List<FieldValue> fields) throws IOException {
        return withFields(listKey, id, fields, List.of());
    }

    /**
     * Like {@link #withFields(String, String, List)}, but a key the part lacks is placed after the
     * nearest key before it in {@code keyOrder} that the part has, as {@link #withSectionFields} does.
     */
    String withFields(String listKey, String id, List<FieldValue> fields, List<String> keyOrder) throws IOException {
        MappingNode item = item(listKey, id).orElseThrow(() -> missing(listKey, id));
        return withFields(item, listKey + " '" + id + "'", fields, keyOrder);
    }

    /**
     * The text with the given fields of the section at {@code path} (see {@link #keysAt}) set,
     * like {@link #withFields(String, String, List)} does for a part; a key the section lacks is
     * placed after the nearest key before it in {@code keyOrder}.
     */
    String withSectionFields(List<String> path, List<FieldValue> fields, List<String> keyOrder) throws IOException {
        return withFields(section(path), path.isEmpty() ? "the top level" : String.join(".", path), fields, keyOrder);
    }

    /**
     * The text with the given fields of item {@code index} (from 0) of the list at
     * {@code listPath} set, like {@link #withSectionFields} does for a section.
     */
    String withItemFields(List<String> listPath, int index, List<FieldValue> fields, List<String> keyOrder)
            throws IOException {
        return withFields(itemAt(listPath, index), String.join(".", listPath) + " #" + (index + 1), fields, keyOrder);
    }

    /**
     * Sets {@code fields} in {@code item} ({@code what} names it in messages). A key the item lacks
     * goes on a new line after the nearest key before it in {@code keyOrder} that the item has (at
     * the item's start when it has none); with no order given, after the item's last line.
     */
    private String withFields(MappingNode item, String what, List<FieldValue> fields, List<String> keyOrder)
            throws IOException {
        if (item.getFlowStyle() == FlowStyle.FLOW) {
            throw new IOException(what + " is written in flow style {...};"
                    + " write it as a block (one field per line) to edit it in Yoke");
        }
        List<Replacement> replacements = new ArrayList<>();
        java.util.Map<Integer, StringBuilder> added = new java.util.TreeMap<>();
        int itemStart = charIndex(item.getStartMark());
        String keyIndent = " ".repeat(column(itemStart));
        int end = nextLineStart(contentEnd(item));
        for (FieldValue field : fields) {
            Optional<NodeTuple> present = tuple(item, field.acceptedKeys());
            if (present.isPresent()) {
                replacements.add(replacementOf(present.get(), field));
                continue;
            }
            String line = field.key() + ": " + field.scalar();
            int at = end;
            int place = keyOrder.indexOf(field.key());
            if (place >= 0) {
                at = -1;
                for (int k = place - 1; k >= 0 && at < 0; k--) {
                    Optional<NodeTuple> before = tuple(item, List.of(keyOrder.get(k)));
                    if (before.isPresent()) {
                        at = nextLineStart(valueEnd(before.get()));
                    }
                }
            }
            if (at < 0) {
                added.computeIfAbsent(itemStart, k -> new StringBuilder()).append(line).append(newline).append(keyIndent);
            } else {
                added.computeIfAbsent(at, k -> new StringBuilder(endsWithNewline(k) ? "" : newline))
                        .append(keyIndent).append(line).append(newline);
            }
        }
        added.forEach((at, text) -> replacements.add(new Replacement(at, at, text.toString())));
        return apply(replacements);
    }

    /**
     * The text without part {@code id}: its lines, from the dash to its last value, are removed. A
     * list left empty becomes {@code []} so that it still reads as a list.
     *
     * @throws IOException when the part is missing or its list is in flow style
     */
    String withoutItem(String listKey, String id) throws IOException {
        NodeTuple list = listTuple(listKey).orElseThrow(() -> missing(listKey, id));
        SequenceNode sequence = blockSequence(list, listKey);
        MappingNode item = item(listKey, id).orElseThrow(() -> missing(listKey, id));
        int from = lineStart(dashBefore(charIndex(item.getStartMark())));
        int to = nextLineStart(contentEnd(item));
        List<Replacement> replacements = new ArrayList<>();
        replacements.add(new Replacement(from, to, ""));
        if (sequence.getValue().size() == 1) {
            int colon = text.indexOf(':', charIndex(list.getKeyNode().getEndMark()));
            replacements.add(new Replacement(colon + 1, colon + 1, " []"));
        }
        return apply(replacements);
    }

    /**
     * The text with a new part appended at the end of list {@code listKey} (the list is created at
     * the end of the file when absent), indented like the parts already there.
     */
    String withItemAppended(String listKey, List<FieldValue> fields) throws IOException {
        Optional<NodeTuple> list = listTuple(listKey);
        if (list.isEmpty()) {
            String block = listKey + ":" + newline + block("  - ", "    ", fields);
            String separator = text.isEmpty() || text.endsWith("\n") ? "" : newline;
            return text + separator + block;
        }
        Node value = list.get().getValueNode();
        if (value instanceof ScalarNode scalar && scalar.getValue().isEmpty()) {
            // "motors:" with nothing after it.
            int at = nextLineStart(charIndex(list.get().getKeyNode().getEndMark()));
            String indent = " ".repeat(column(charIndex(list.get().getKeyNode().getStartMark())) + 2);
            return apply(List.of(new Replacement(at, at, (endsWithNewline(at) ? "" : newline)
                    + block(indent + "- ", indent + "  ", fields))));
        }
        if (!(value instanceof SequenceNode sequence)) {
            throw new IOException(listKey + " is not a list");
        }
        if (sequence.getFlowStyle() == FlowStyle.FLOW) {
            if (!sequence.getValue().isEmpty()) {
                throw new IOException(listKey + " is written in flow style [...];"
                        + " write it as a block list (one '- ' per part) to edit it in Yoke");
            }
            // "motors: []": the brackets give way to a block list on the following lines.
            int end = charIndex(sequence.getEndMark());
            int at = nextLineStart(end);
            String indent = " ".repeat(column(charIndex(list.get().getKeyNode().getStartMark())) + 2);
            int keyEnd = text.indexOf(':', charIndex(list.get().getKeyNode().getEndMark())) + 1;
            return apply(List.of(new Replacement(keyEnd, end, ""),
                    new Replacement(at, at, (endsWithNewline(at) ? "" : newline)
                            + block(indent + "- ", indent + "  ", fields))));
        }
        Node last = sequence.getValue().get(sequence.getValue().size() - 1);
        int dash = dashBefore(charIndex(last.getStartMark()));
        String dashIndent = " ".repeat(column(dash));
        String keyIndent = " ".repeat(column(charIndex(last.getStartMark())));
        int at = nextLineStart(contentEnd(last));
        return apply(List.of(new Replacement(at, at, (endsWithNewline(at) ? "" : newline)
                + block(dashIndent + "- ", keyIndent, fields))));
    }

    /**
     * One item of a rearranged list: an item already in the file (by its index there), or a new
     * one written from its fields.
     *
     * @param index  the item's index in the file, or -1 for a new item
     * @param fields the new item's fields (empty for a kept one)
     */
    record ListEntry(int index, List<FieldValue> fields) {
        ListEntry {
            fields = List.copyOf(fields);
        }

        static ListEntry kept(int index) {
            return new ListEntry(index, List.of());
        }

        static ListEntry added(List<FieldValue> fields) {
            return new ListEntry(-1, fields);
        }
    }

    /**
     * The text with the block list at {@code listPath} holding {@code entries}, in that order: kept
     * items move with their own lines, comments inside them included; an item of the file not named
     * goes, with its lines; a new item is written in the style of the list (the indentation of its
     * items, a blank line between items when every item is set apart by one). The lines between two
     * items (comments, blank lines) belong to the item below them and move or go with it; comments
     * above the first item and after the last stay where they are, as they describe the list.
     *
     * @throws IOException when the list is missing, empty or in flow style, or an index is out of range
     */
    String withItemsArranged(List<String> listPath, List<ListEntry> entries) throws IOException {
        SequenceNode sequence = blockSequenceAt(listPath);
        List<Node> items = sequence.getValue();
        int count = items.size();
        if (count == 0) {
            throw new IOException(String.join(".", listPath) + " is an empty list");
        }
        int[] unitStart = new int[count];
        int[] bodyStart = new int[count];
        int[] unitEnd = new int[count];
        boolean spaced = count > 1;
        for (int i = 0; i < count; i++) {
            bodyStart[i] = lineStart(dashBefore(charIndex(items.get(i).getStartMark())));
            unitEnd[i] = nextLineStart(contentEnd(items.get(i)));
            unitStart[i] = i == 0 ? bodyStart[0] : unitEnd[i - 1];
            if (i > 0) {
                spaced &= leadingBlankLines(text.substring(unitStart[i], bodyStart[i])) > 0;
            }
        }
        Node last = items.get(count - 1);
        String dashIndent = " ".repeat(column(dashBefore(charIndex(last.getStartMark()))));
        String keyIndent = " ".repeat(column(charIndex(last.getStartMark())));
        StringBuilder out = new StringBuilder();
        for (ListEntry entry : entries) {
            String lead;
            String body;
            if (entry.index() < 0) {
                lead = "";
                body = block(dashIndent + "- ", keyIndent, entry.fields());
            } else if (entry.index() < count) {
                lead = text.substring(unitStart[entry.index()], bodyStart[entry.index()]);
                body = text.substring(bodyStart[entry.index()], unitEnd[entry.index()]);
                body = body.endsWith("\n") ? body : body + newline;
            } else {
                throw new IOException(String.join(".", listPath) + " has no item #" + (entry.index() + 1));
            }
            if (out.length() == 0) {
                lead = lead.substring(leadingBlankLines(lead)); // nothing to set the first item apart from
            } else if (spaced && leadingBlankLines(lead) == 0) {
                lead = newline + lead;
            }
            out.append(lead).append(body);
        }
        return apply(List.of(new Replacement(unitStart[0], unitEnd[count - 1], out.toString())));
    }

    /** Length of the blank lines at the start of {@code lines}. */
    private static int leadingBlankLines(String lines) {
        int at = 0;
        while (at < lines.length()) {
            int end = lines.indexOf('\n', at);
            end = end < 0 ? lines.length() : end + 1;
            if (!lines.substring(at, end).isBlank()) {
                break;
            }
            at = end;
        }
        return at;
    }

    /** Renders a part as block lines: the first field after the dash, the others below it. */
    private String block(String dashPrefix, String keyIndent, List<FieldValue> fields) {
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < fields.size(); i++) {
            out.append(i == 0 ? dashPrefix : keyIndent)
                    .append(fields.get(i).key()).append(": ").append(fields.get(i).scalar()).append(newline);
        }
        return out.toString();
    }

    /**
     * A YAML scalar for {@code raw}: plain when it reads back as the same string, double-quoted
     * with escapes otherwise (YAML 1.1 plain-scalar rules, which the loader's parser follows).
     */
    static String scalar(String raw) {
        if (isPlainSafe(raw)) {
            return raw;
        }
        StringBuilder out = new StringBuilder("\"");
        raw.codePoints().forEach(c -> {
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\n' -> out.append("\\n");
                case '\t' -> out.append("\\t");
                case '\r' -> out.append("\\r");
                default -> {
                    if (c < 0x20 || c == 0x7f || c == 0x85 || c == 0x2028 || c == 0x2029 || c == 0xfeff
                            || (c >= 0xd800 && c <= 0xdfff)) {
                        out.append(String.format("\\u%04x", c));
                    } else {
                        out.appendCodePoint(c);
                    }
                }
            }
        });
        return out.append('"').toString();
    }

    private static boolean isPlainSafe(String raw) {
        if (raw.isEmpty() || !raw.strip().equals(raw)) {
            return false;
        }
        if ("-?:,[]{}#&*!|>'\"%@`".indexOf(raw.charAt(0)) >= 0) {
            return false;
        }
        if (raw.contains(": ") || raw.contains(" #") || raw.endsWith(":")) {
            return false;
        }
        String lower = raw.toLowerCase(java.util.Locale.ROOT);
        if (List.of("true", "false", "yes", "no", "on", "off", "y", "n", "null", "~").contains(lower)) {
            return false;
        }
        if (lower.matches("[-+.]?[0-9][0-9_.,:e+-]*|[-+]?\\.(inf|nan)|0[xbo].*")) {
            return false; // would read back as a number, not as this text
        }
        return raw.codePoints().allMatch(CatalogText::isPrintable);
    }

    /** Characters a plain scalar may hold unescaped (no controls, line breaks or byte-order marks). */
    private static boolean isPrintable(int c) {
        return c >= 0x20 && c != 0x7f && c != 0x85 && c != 0x2028 && c != 0x2029 && c != 0xfeff
                && !(c >= 0xd800 && c <= 0xdfff) && c != 0xfffe && c != 0xffff;
    }

    private Replacement replacementOf(NodeTuple tuple, FieldValue field) {
        int keyStart = charIndex(tuple.getKeyNode().getStartMark());
        int keyEnd = charIndex(tuple.getKeyNode().getEndMark());
        Node value = tuple.getValueNode();
        int start = charIndex(value.getStartMark());
        int end;
        if (start < keyEnd) {
            // An alias (*name): the node's marks are those of its anchor, elsewhere in the file.
            start = skipSpaces(text.indexOf(':', keyEnd) + 1);
            end = start;
            while (end < text.length() && " \t\r\n,}#".indexOf(text.charAt(end)) < 0) {
                end++;
            }
        } else {
            end = contentEnd(value);
            start = skipPropertyTokens(start, end);
        }
        boolean renameKey = !((ScalarNode) tuple.getKeyNode()).getValue().equals(field.key());
        if (renameKey) {
            return new Replacement(keyStart, end, field.key() + ": " + field.scalar());
        }
        String prefix = start == end && start > 0 && text.charAt(start - 1) == ':' ? " " : "";
        return new Replacement(start, end, prefix + field.scalar());
    }

    /** Skips a leading anchor ({@code &name}) or tag ({@code !tag}) so it stays in place. */
    private int skipPropertyTokens(int start, int end) {
        int at = start;
        while (at < end && (text.charAt(at) == '&' || text.charAt(at) == '!')) {
            while (at < end && !Character.isWhitespace(text.charAt(at))) {
                at++;
            }
            at = skipSpaces(at);
        }
        return Math.min(at, end);
    }

    private int skipSpaces(int at) {
        while (at < text.length() && (text.charAt(at) == ' ' || text.charAt(at) == '\t')) {
            at++;
        }
        return at;
    }

    private Optional<NodeTuple> listTuple(String listKey) {
        if (root == null) {
            return Optional.empty();
        }
        return tuple(root, List.of(listKey));
    }

    private SequenceNode blockSequence(NodeTuple list, String listKey) throws IOException {
        if (!(list.getValueNode() instanceof SequenceNode sequence)) {
            throw new IOException(listKey + " is not a list");
        }
        if (sequence.getFlowStyle() == FlowStyle.FLOW) {
            throw new IOException(listKey + " is written in flow style [...];"
                    + " write it as a block list (one '- ' per part) to edit it in Yoke");
        }
        return sequence;
    }

    /** The block section at {@code path} (keys from the top level down; empty: the top level). */
    private MappingNode section(List<String> path) throws IOException {
        if (root == null) {
            throw new IOException("the file is empty");
        }
        MappingNode node = root;
        for (int i = 0; i < path.size(); i++) {
            Optional<NodeTuple> tuple = tuple(node, List.of(path.get(i)));
            if (tuple.isEmpty() || !(tuple.get().getValueNode() instanceof MappingNode mapping)) {
                throw new IOException(String.join(".", path.subList(0, i + 1)) + " is not a section");
            }
            node = mapping;
        }
        return node;
    }

    /** The block list at {@code listPath}: the last key names the list, the others its sections. */
    private SequenceNode blockSequenceAt(List<String> listPath) throws IOException {
        MappingNode parent = section(listPath.subList(0, listPath.size() - 1));
        String key = listPath.get(listPath.size() - 1);
        NodeTuple list = tuple(parent, List.of(key))
                .orElseThrow(() -> new IOException(String.join(".", listPath) + " is missing"));
        return blockSequence(list, String.join(".", listPath));
    }

    private MappingNode itemAt(List<String> listPath, int index) throws IOException {
        List<Node> items = blockSequenceAt(listPath).getValue();
        if (index < 0 || index >= items.size() || !(items.get(index) instanceof MappingNode item)) {
            throw new IOException(String.join(".", listPath) + " has no section #" + (index + 1));
        }
        return item;
    }

    private Optional<MappingNode> item(String listKey, String id) {
        Optional<NodeTuple> list = listTuple(listKey);
        if (list.isEmpty() || !(list.get().getValueNode() instanceof SequenceNode sequence)) {
            return Optional.empty();
        }
        for (Node node : sequence.getValue()) {
            if (node instanceof MappingNode mapping) {
                Optional<NodeTuple> idTuple = tuple(mapping, List.of("id"));
                if (idTuple.isPresent() && idTuple.get().getValueNode() instanceof ScalarNode scalar
                        && scalar.getValue().equals(id)) {
                    return Optional.of(mapping);
                }
            }
        }
        return Optional.empty();
    }

    private static Optional<NodeTuple> tuple(MappingNode mapping, List<String> keys) {
        for (NodeTuple tuple : mapping.getValue()) {
            if (tuple.getKeyNode() instanceof ScalarNode key && keys.contains(key.getValue())) {
                return Optional.of(tuple);
            }
        }
        return Optional.empty();
    }

    /** Offset just after the last character that belongs to {@code node} (comments after it excluded). */
    private int contentEnd(Node node) {
        if (node instanceof MappingNode mapping && mapping.getFlowStyle() != FlowStyle.FLOW
                && !mapping.getValue().isEmpty()) {
            int end = 0;
            for (NodeTuple tuple : mapping.getValue()) {
                end = Math.max(end, Math.max(contentEnd(tuple.getKeyNode()), valueEnd(tuple)));
            }
            return end;
        }
        if (node instanceof SequenceNode sequence && sequence.getFlowStyle() != FlowStyle.FLOW
                && !sequence.getValue().isEmpty()) {
            int end = 0;
            for (Node child : sequence.getValue()) {
                end = Math.max(end, contentEnd(child));
            }
            return end;
        }
        return charIndex(node.getEndMark());
    }

    private int valueEnd(NodeTuple tuple) {
        int keyEnd = charIndex(tuple.getKeyNode().getEndMark());
        if (charIndex(tuple.getValueNode().getStartMark()) < keyEnd) {
            int at = skipSpaces(text.indexOf(':', keyEnd) + 1);
            while (at < text.length() && " \t\r\n,}#".indexOf(text.charAt(at)) < 0) {
                at++;
            }
            return at;
        }
        return contentEnd(tuple.getValueNode());
    }

    /** The dash that opens the list item starting at {@code itemStart}. */
    private int dashBefore(int itemStart) {
        int at = itemStart - 1;
        while (at >= 0 && Character.isWhitespace(text.charAt(at))) {
            at--;
        }
        return at >= 0 && text.charAt(at) == '-' ? at : itemStart;
    }

    private int lineStart(int offset) {
        return text.lastIndexOf('\n', offset - 1) + 1;
    }

    private int column(int offset) {
        return offset - lineStart(offset);
    }

    /** Start of the line after the one holding the character before {@code offset}. */
    private int nextLineStart(int offset) {
        if (offset > 0 && text.charAt(offset - 1) == '\n') {
            return offset;
        }
        int newlineAt = text.indexOf('\n', offset);
        return newlineAt < 0 ? text.length() : newlineAt + 1;
    }

    private boolean endsWithNewline(int offset) {
        return offset == 0 || text.charAt(offset - 1) == '\n';
    }

    /** A mark's index counts code points; Java strings count UTF-16 units. */
    private int charIndex(Mark mark) {
        int index = mark.getIndex();
        return surrogates ? text.offsetByCodePoints(0, Math.min(index, text.codePointCount(0, text.length()))) : index;
    }

    private static IOException missing(String listKey, String id) {
        return new IOException(listKey + " has no part with id '" + id + "'");
    }

    private String apply(List<Replacement> replacements) {
        List<Replacement> ordered = new ArrayList<>(replacements);
        ordered.sort(Comparator.comparingInt(Replacement::start).reversed());
        StringBuilder out = new StringBuilder(text);
        for (Replacement r : ordered) {
            out.replace(r.start(), r.end(), r.text());
        }
        return out.toString();
    }

    private record Replacement(int start, int end, String text) {
    }
}
