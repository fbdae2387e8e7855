package dev.yoke.catalog;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.error.MarkedYAMLException;
import org.yaml.snakeyaml.events.AliasEvent;
import org.yaml.snakeyaml.events.Event;
import org.yaml.snakeyaml.events.ScalarEvent;
import org.yaml.snakeyaml.parser.Parser;
import org.yaml.snakeyaml.parser.ParserImpl;
import org.yaml.snakeyaml.reader.StreamReader;

/**
 * Turns the bytes of a YAML file into a {@link YamlNode} tree that keeps the line and column of
 * every key and value, refusing hostile or broken input with located problems, never an exception.
 *
 * <p>It reads SnakeYAML's event stream directly: every scalar is kept as the text written (the
 * loaders convert units themselves), so no per-scalar type guessing is done; that guessing was a
 * fifth of the time of loading a large catalog.
 *
 * <p>Defences: a size cap checked before parsing; UTF-8 only (a byte-order mark is skipped,
 * invalid bytes are located); SnakeYAML's own limits on nesting and size; a depth cap of our
 * own; aliases refused outright (no "billion laughs" expansion can happen); duplicate keys
 * reported with both lines; a single document per file.
 */
final class YamlReader {

    /** Largest file read, bytes: far above any real catalog (about 10 000 parts), far below memory trouble. */
    static final int MAX_FILE_BYTES = 8 * 1024 * 1024;

    /**
     * Longest line accepted, characters. The YAML scanner slows down more than linearly on one
     * very long line (a 2 MB line took over 10 s), so a hostile file could stall the loader;
     * no hand-written or Yoke-written line comes near this.
     */
    static final int MAX_LINE_CHARS = 10_000;

    /** Deepest nesting accepted; our formats need 4 levels. */
    static final int MAX_DEPTH = 20;

    private static final LoaderOptions OPTIONS = createOptions();

    private final Path file;
    private final List<Problem> problems;

    private YamlReader(Path file, List<Problem> problems) {
        this.file = file;
        this.problems = problems;
    }

    private static LoaderOptions createOptions() {
        LoaderOptions options = new LoaderOptions();
        options.setMaxAliasesForCollections(50);
        options.setNestingDepthLimit(MAX_DEPTH + 10);
        options.setCodePointLimit(MAX_FILE_BYTES);
        // Duplicate keys are found by readValue, which names both lines; SnakeYAML's check would not.
        options.setAllowDuplicateKeys(true);
        options.setAllowRecursiveKeys(false);
        options.setProcessComments(false);
        return options;
    }

    /**
     * The tree of {@code bytes} read from {@code file}, or null when the file cannot be read as one
     * YAML document; every problem found is added to {@code problems}.
     */
    static YamlNode read(Path file, byte[] bytes, List<Problem> problems) {
        return new YamlReader(file, problems).read(bytes);
    }

    private YamlNode read(byte[] bytes) {
        if (bytes.length > MAX_FILE_BYTES) {
            fileProblem(tooLarge(bytes.length));
            return null;
        }
        int start = 0;
        if (bytes.length >= 3 && (bytes[0] & 0xff) == 0xEF && (bytes[1] & 0xff) == 0xBB && (bytes[2] & 0xff) == 0xBF) {
            start = 3; // UTF-8 byte-order mark: harmless, skipped
        } else if (bytes.length >= 2 && ((bytes[0] & 0xff) == 0xFE && (bytes[1] & 0xff) == 0xFF
                || (bytes[0] & 0xff) == 0xFF && (bytes[1] & 0xff) == 0xFE)) {
            fileProblem("the file is UTF-16; save it as UTF-8");
            return null;
        }
        String text = decode(bytes, start);
        if (text == null) {
            return null;
        }
        if (!linesShortEnough(text)) {
            return null;
        }
        if (text.isBlank()) {
            fileProblem("the file is empty");
            return null;
        }
        try {
            Parser parser = new ParserImpl(new StreamReader(text), OPTIONS);
            expect(parser, Event.ID.StreamStart);
            if (parser.checkEvent(Event.ID.StreamEnd)) {
                fileProblem("the file holds no data (only comments or blank lines)");
                return null;
            }
            expect(parser, Event.ID.DocumentStart);
            YamlNode root = readValue(parser, parser.getEvent(), 0);
            expect(parser, Event.ID.DocumentEnd);
            if (parser.checkEvent(Event.ID.DocumentStart)) {
                parser.getEvent();
                Mark at = parser.peekEvent().getStartMark();
                problems.add(Problem.error(file, at.getLine() + 1, at.getColumn() + 1, "",
                        "a second YAML document starts here; keep one document per file"));
                return null;
            }
            return root;
        } catch (Abandon e) {
            return null; // the reason is already recorded
        } catch (RuntimeException | StackOverflowError e) {
            problems.add(fromOther(e));
        }
        return null;
    }

    /** Takes the next event, which the YAML grammar guarantees is of kind {@code id}. */
    private static void expect(Parser parser, Event.ID id) {
        Event event = parser.getEvent();
        if (!event.is(id)) {
            throw new IllegalStateException("expected " + id + ", found " + event.getEventId());
        }
    }

    /** Refuses the file when a line is longer than {@link #MAX_LINE_CHARS}, naming the first such line. */
    private boolean linesShortEnough(String text) {
        int line = 1;
        int lineStart = 0;
        for (int i = 0; i <= text.length(); i++) {
            if (i == text.length() || text.charAt(i) == '\n' || text.charAt(i) == '\r') {
                if (i - lineStart > MAX_LINE_CHARS) {
                    problems.add(Problem.error(file, line, MAX_LINE_CHARS + 1, "", "the line is " + (i - lineStart)
                            + " characters long; lines longer than " + MAX_LINE_CHARS + " are refused"));
                    return false;
                }
                if (i < text.length() && text.charAt(i) == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                    i++;
                }
                line++;
                lineStart = i + 1;
            }
        }
        return true;
    }

    static String tooLarge(long size) {
        return String.format(java.util.Locale.ROOT,
                "the file is %.1f MB; files larger than %d MB are refused (is it really a Yoke file?)",
                size / 1048576.0, MAX_FILE_BYTES / 1048576);
    }

    private String decode(byte[] bytes, int start) {
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes, start, bytes.length - start);
        CharBuffer out = CharBuffer.allocate(bytes.length);
        CoderResult result = decoder.decode(in, out, true);
        if (result.isError()) {
            int bad = in.position();
            int line = 1;
            int lineStart = start;
            for (int i = start; i < bad; i++) {
                if (bytes[i] == '\n') {
                    line++;
                    lineStart = i + 1;
                }
            }
            problems.add(Problem.error(file, line, bad - lineStart + 1, "",
                    String.format("invalid UTF-8 (byte 0x%02X at offset %d); save the file as UTF-8 text",
                            bytes[bad] & 0xff, bad)));
            return null;
        }
        decoder.flush(out);
        out.flip();
        String text = out.toString();
        return printable(text) ? text : null;
    }

    /**
     * Whether {@code text} holds only characters YAML 1.2 allows (section 5.1: tab, line breaks,
     * printable Unicode); locates the first offender otherwise.
     */
    private boolean printable(String text) {
        int line = 1;
        int column = 1;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean allowed = c == '\t' || c == '\n' || c == '\r' || (c >= 0x20 && c <= 0x7E) || c == 0x85
                    || (c >= 0xA0 && c <= 0xD7FF) || (c >= 0xE000 && c <= 0xFFFD) || Character.isSurrogate(c);
            if (!allowed) {
                problems.add(Problem.error(file, line, column, "", String.format(
                        "control character U+%04X is not allowed in YAML; remove it", (int) c)));
                return false;
            }
            if (c == '\n') {
                line++;
                column = 1;
            } else {
                column++;
            }
        }
        return true;
    }

    private YamlNode readValue(Parser parser, Event event, int depth) {
        Mark at = event.getStartMark();
        int line = at.getLine() + 1;
        int column = at.getColumn() + 1;
        if (event instanceof AliasEvent alias) {
            problems.add(Problem.error(file, line, column, "",
                    "aliases ('*" + alias.getAnchor() + "') are not supported; write the value out"));
            throw new Abandon(); // one report is enough; an alias bomb has thousands
        }
        if (depth > MAX_DEPTH) {
            problems.add(Problem.error(file, line, column, "", "nested more than " + MAX_DEPTH + " levels deep"));
            throw new Abandon();
        }
        switch (event.getEventId()) {
            case MappingStart -> {
                Map<String, YamlNode.Entry> entries = new LinkedHashMap<>();
                for (Event keyEvent = parser.getEvent(); !keyEvent.is(Event.ID.MappingEnd); keyEvent = parser.getEvent()) {
                    Mark keyAt = keyEvent.getStartMark();
                    int keyLine = keyAt.getLine() + 1;
                    int keyColumn = keyAt.getColumn() + 1;
                    if (!(keyEvent instanceof ScalarEvent keyScalar)) {
                        YamlNode complex = readValue(parser, keyEvent, depth + 1); // reports aliases and depth
                        problems.add(Problem.error(file, keyLine, keyColumn, "",
                                "a key must be a plain word, not " + complex.kind()));
                        throw new Abandon();
                    }
                    String key = keyScalar.getValue();
                    YamlNode value = readValue(parser, parser.getEvent(), depth + 1);
                    YamlNode.Entry previous = entries.get(key);
                    if (previous != null) {
                        problems.add(Problem.error(file, keyLine, keyColumn, key,
                                "duplicate key (first given at line " + previous.line() + ")"));
                    } else {
                        entries.put(key, new YamlNode.Entry(key, keyLine, keyColumn, value));
                    }
                }
                return new YamlNode.Mapping(entries, line, column);
            }
            case SequenceStart -> {
                List<YamlNode> items = new ArrayList<>();
                for (Event item = parser.getEvent(); !item.is(Event.ID.SequenceEnd); item = parser.getEvent()) {
                    items.add(readValue(parser, item, depth + 1));
                }
                return new YamlNode.Sequence(items, line, column);
            }
            case Scalar -> {
                ScalarEvent scalar = (ScalarEvent) event;
                String text = scalar.getValue();
                // YAML's null: an empty or ~/null plain scalar (YAML 1.1 null type), or the !!null tag.
                boolean nul = scalar.isPlain() && (text.isEmpty() || NULLS.contains(text))
                        || "tag:yaml.org,2002:null".equals(scalar.getTag());
                return new YamlNode.Scalar(nul ? "" : text, nul, line, column);
            }
            default -> throw new IllegalStateException("unexpected " + event.getEventId() + " in a document");
        }
    }

    private static final java.util.Set<String> NULLS = java.util.Set.of("~", "null", "Null", "NULL");

    /** Unwinds the parse after a fatal structural problem that is already recorded. */
    private static final class Abandon extends RuntimeException {
        Abandon() {
            super(null, null, false, false);
        }
    }

    private Problem fromMarked(MarkedYAMLException marked) {
        var mark = marked.getProblemMark() != null ? marked.getProblemMark() : marked.getContextMark();
        String problem = marked.getProblem() == null ? "" : marked.getProblem();
        String context = marked.getContext() == null ? "" : " (" + marked.getContext() + ")";
        String message = "not readable as YAML: " + firstLine(problem + context);
        if (context.contains("block")) {
            message += "; check the indentation and the ': ' after each key";
        }
        if (mark == null) {
            return Problem.error(file, 0, 0, "", message);
        }
        return Problem.error(file, mark.getLine() + 1, mark.getColumn() + 1, "", message);
    }

    private Problem fromOther(Throwable e) {
        if (e instanceof MarkedYAMLException marked) {
            return fromMarked(marked);
        }
        if (e instanceof StackOverflowError) {
            return Problem.error(file, 0, 0, "", "nested too deeply to read");
        }
        String message = e.getMessage() == null ? e.getClass().getSimpleName() : firstLine(e.getMessage());
        return Problem.error(file, 0, 0, "", "not readable as YAML: " + message);
    }

    private static String firstLine(String text) {
        if (text == null) {
            return "unknown error";
        }
        String s = text.strip();
        int nl = s.indexOf('\n');
        return nl < 0 ? s : s.substring(0, nl).strip();
    }

    private void fileProblem(String message) {
        problems.add(Problem.error(file, 0, 0, "", message));
    }
}
