package dev.yoke.catalog;

import dev.yoke.catalog.CatalogText.FieldValue;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import dev.yoke.units.Units;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Saves a scenario file. An existing file is edited in place ({@link ScenarioText}, through the same
 * text edits as a catalog part): only the lines of changed values are rewritten, so the user's
 * comments, blank lines, key order and spelling of untouched values survive, and profile segments
 * that were kept, edited or moved keep their own lines and comments. A new file, one that does not
 * load, or one laid out in a way Yoke does not edit in place (flow style {@code {...}}) is written
 * anew from the scenario, keeping the comment block at its top: keys in {@link PartFields} order,
 * numbers through {@link Units#formatExact} so that they load back as the same doubles. Comments
 * below that block are then dropped (the backup keeps them): the result says so and why
 * ({@link SavedScenario#bodyRewritten}), so that the editor can tell the user.
 *
 * <p>The save is atomic with a backup ({@link AtomicFile}); afterwards the file is loaded again and
 * must give back an equal scenario, otherwise the previous version is put back and
 * {@link SaveNotVerifiedException} says what differed. With the stamp of the version the editor
 * loaded, a file changed on disk meanwhile is never overwritten ({@link ChangedOnDiskException}).
 */
public final class ScenarioStore {

    private static final String NEW_FILE_HEADER =
            "# Yoke scenario: the drive bench and the duty profile of one machine.\n"
                    + "# Speeds and torques are load-side; numbers carry their units.\n";

    /** Reads of a file that keeps changing under an unchecked save before giving up. */
    private static final int ATTEMPTS = 3;

    private ScenarioStore() {
    }

    /** The text to write, and why the body was written anew ("" when edited in place or created). */
    private record Plan(String text, String rewrittenBecause) {
    }

    /**
     * Writes {@code scenario} to {@code file} (created when absent) and returns it as loaded back.
     * Whatever the file holds now is what is edited, even if it changed since the editor read it.
     *
     * @throws InputException the written file would not load; the previous version is back
     * @throws IOException    the disk failed, or the save did not verify ({@link SaveNotVerifiedException})
     */
    public static SavedScenario save(Scenario scenario, Path file) throws IOException, InputException {
        for (int attempt = 1; ; attempt++) {
            try {
                return write(scenario, file, textFor(scenario, file, null));
            } catch (ChangedOnDiskException e) {
                if (attempt == ATTEMPTS) {
                    throw new IOException(file + " kept changing while it was being saved", e);
                }
            }
        }
    }

    /**
     * Like {@link #save(Scenario, Path)}, but first checks that the file is still the version the
     * editor loaded ({@code loadedAs}, from {@link LoadedScenario#file()}).
     *
     * @throws ChangedOnDiskException the file changed since it was loaded; nothing was written
     */
    public static SavedScenario save(Scenario scenario, Path file, CatalogFile loadedAs)
            throws IOException, InputException, ChangedOnDiskException {
        return write(scenario, file, textFor(scenario, file, loadedAs));
    }

    /**
     * The text to write: the file's text edited in place when it holds a scenario Yoke can edit,
     * otherwise the scenario rendered under the file's header.
     *
     * @param loadedAs the version the file must still be, or null to take it as it is now
     */
    private static Plan textFor(Scenario scenario, Path file, CatalogFile loadedAs)
            throws IOException, ChangedOnDiskException {
        if (loadedAs == null && !Files.exists(file)) {
            return new Plan(render(scenario, NEW_FILE_HEADER), "");
        }
        byte[] bytes = loadedAs != null ? loadedAs.readUnchanged(file) : Files.readAllBytes(file);
        String text = SourceFile.textOf(bytes);
        LoadedScenario before;
        try {
            before = ScenarioLoader.load(file);
        } catch (InputException e) {
            // a file that does not load is replaced (kept as .bak)
            return new Plan(render(scenario, headerOf(text)), "the file did not load as a scenario");
        }
        if (!before.file().sha256().equalsIgnoreCase(CatalogFile.sha256(bytes))) {
            throw new ChangedOnDiskException(file); // changed between the two reads
        }
        try {
            return new Plan(ScenarioText.edited(text, before.scenario(), scenario), "");
        } catch (IOException notEditable) {
            // "profile.segments is written in flow style [...]; write it as a block …": the first clause says where
            String where = Objects.requireNonNullElse(notEditable.getMessage(), "its layout").split(";", 2)[0].strip();
            return new Plan(render(scenario, headerOf(text)), where);
        }
    }

    /** The text Yoke writes for {@code scenario} under {@code header} (comment lines, may be empty). */
    public static String render(Scenario scenario, String header) {
        StringBuilder out = new StringBuilder(header);
        if (!header.isEmpty() && !header.endsWith("\n")) {
            out.append('\n');
        }
        section(out, 0, PartKind.SCENARIO, ScenarioText.topValues(scenario));
        out.append("bench:\n");
        section(out, 1, PartKind.BENCH, ScenarioText.benchValues(scenario.bench()));
        out.append("  limits:\n");
        section(out, 2, PartKind.LIMITS, ScenarioText.limitsValues(scenario.bench().limits()));
        out.append("profile:\n");
        section(out, 1, PartKind.PROFILE, ScenarioText.profileValues(scenario.profile()));
        out.append("  segments:\n");
        for (Segment segment : scenario.profile().segments()) {
            String prefix = "    - ";
            for (FieldValue field : ScenarioText.allFields(PartKind.SEGMENT, ScenarioText.segmentValues(segment))) {
                out.append(prefix).append(field.key()).append(": ").append(field.scalar()).append('\n');
                prefix = "      ";
            }
        }
        return out.toString();
    }

    /** The comment block at the top of a scenario file's text: leading comment and blank lines. */
    static String headerOf(String text) {
        StringBuilder header = new StringBuilder();
        for (String line : text.split("\n", -1)) {
            String stripped = line.strip();
            if (!stripped.isEmpty() && !stripped.startsWith("#")) {
                break;
            }
            header.append(line.replace("\r", "")).append('\n');
        }
        // Blank lines at the end of the block are layout, not content: keep one at most.
        String kept = header.toString().replaceAll("\n{2,}$", "\n\n");
        return kept.isBlank() ? "" : kept;
    }

    private static SavedScenario write(Scenario scenario, Path file, Plan plan) throws IOException, InputException {
        boolean existed = Files.exists(file);
        AtomicFile.write(file, plan.text().getBytes(StandardCharsets.UTF_8));
        try {
            LoadedScenario back = ScenarioLoader.load(file);
            List<String> differences = differences(scenario, back.scenario());
            if (!differences.isEmpty()) {
                throw new SaveNotVerifiedException(List.of(file), differences);
            }
            return new SavedScenario(back, plan.rewrittenBecause());
        } catch (IOException | InputException | RuntimeException e) {
            try {
                if (existed) {
                    AtomicFile.restoreBackup(file);
                } else {
                    Files.deleteIfExists(file);
                }
            } catch (IOException restoreFailure) {
                e.addSuppressed(restoreFailure);
            }
            throw e;
        }
    }

    /** What differs between the scenario saved and the one loaded back; a segment left unlabelled gets the loader's label. */
    private static List<String> differences(Scenario wanted, Scenario loaded) {
        List<String> differences = new ArrayList<>();
        if (!wanted.name().equals(loaded.name())) {
            differences.add("name '" + loaded.name() + "' instead of '" + wanted.name() + "'");
        }
        if (!wanted.bench().equals(loaded.bench())) {
            differences.add("bench " + loaded.bench() + " instead of " + wanted.bench());
        }
        Profile a = wanted.profile();
        Profile b = loaded.profile();
        if (a.loadInertia() != b.loadInertia() || a.repeat() != b.repeat() || a.segments().size() != b.segments().size()) {
            differences.add("profile " + b + " instead of " + a);
        } else {
            for (int i = 0; i < a.segments().size(); i++) {
                Segment s = a.segments().get(i);
                Segment t = b.segments().get(i);
                Segment expected = s.label().isEmpty() ? new Segment(t.label(), s.duration(), s.speedStart(),
                        s.speedEnd(), s.torque()) : s;
                if (!expected.equals(t)) {
                    differences.add("segment " + (i + 1) + " " + t + " instead of " + s);
                }
            }
        }
        return differences;
    }

    /** The keys of {@code kind} that have a value in {@code values}, in table order, at {@code depth}. */
    private static void section(StringBuilder out, int depth, PartKind kind, Map<String, Object> values) {
        for (FieldValue field : ScenarioText.allFields(kind, values)) {
            out.append("  ".repeat(depth)).append(field.key()).append(": ").append(field.scalar()).append('\n');
        }
    }
}
