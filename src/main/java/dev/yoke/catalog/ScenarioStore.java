package dev.yoke.catalog;

import dev.yoke.model.Bench;
import dev.yoke.model.Limits;
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

/**
 * Saves a scenario file: the whole file is written anew from the scenario (a scenario is small
 * and edited as a whole), keeping the comment block at its top. Keys follow {@link PartFields}
 * order; numbers go through {@link Units#formatExact} so that they load back as the same doubles.
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

    private ScenarioStore() {
    }

    /**
     * Writes {@code scenario} to {@code file} (created when absent) and returns it as loaded back.
     *
     * @throws InputException the written file would not load; the previous version is back
     * @throws IOException    the disk failed, or the save did not verify ({@link SaveNotVerifiedException})
     */
    public static LoadedScenario save(Scenario scenario, Path file) throws IOException, InputException {
        String header = Files.exists(file) ? headerOf(SourceFile.textOf(Files.readAllBytes(file))) : NEW_FILE_HEADER;
        return write(scenario, file, header);
    }

    /**
     * Like {@link #save(Scenario, Path)}, but first checks that the file is still the version the
     * editor loaded ({@code loadedAs}, from {@link LoadedScenario#file()}).
     *
     * @throws ChangedOnDiskException the file changed since it was loaded; nothing was written
     */
    public static LoadedScenario save(Scenario scenario, Path file, CatalogFile loadedAs)
            throws IOException, InputException, ChangedOnDiskException {
        byte[] now = loadedAs.readUnchanged(file);
        return write(scenario, file, headerOf(SourceFile.textOf(now)));
    }

    /** The text Yoke writes for {@code scenario} under {@code header} (comment lines, may be empty). */
    public static String render(Scenario scenario, String header) {
        StringBuilder out = new StringBuilder(header);
        if (!header.isEmpty() && !header.endsWith("\n")) {
            out.append('\n');
        }
        line(out, 0, "name", CatalogText.scalar(scenario.name()));
        Bench bench = scenario.bench();
        out.append("bench:\n");
        section(out, 1, PartKind.BENCH, Map.ofEntries(
                Map.entry("bus_voltage", bench.busVoltage()),
                Map.entry("bus_voltage_min", bench.busVoltageMin()),
                Map.entry("bus_voltage_max", bench.busVoltageMax()),
                Map.entry("pwm_frequencies", bench.pwmFrequencies()),
                Map.entry("modulation", bench.modulation().fileName()),
                Map.entry("dead_time", bench.deadTime()),
                Map.entry("gate_drive_voltage", bench.gateDriveVoltage()),
                Map.entry("gate_resistance", bench.gateResistance()),
                Map.entry("max_duty", bench.maxDuty()),
                Map.entry("ambient_temp", bench.ambientTemp()),
                Map.entry("switch_rth_case_ambient", bench.switchRthCaseAmbient()),
                Map.entry("gear_ratios", bench.gearRatios()),
                Map.entry("gear_efficiency", bench.gearEfficiency())));
        Limits limits = bench.limits();
        out.append("  limits:\n");
        section(out, 2, PartKind.LIMITS, Map.of(
                "vds_derating", limits.vdsDerating(),
                "junction_temp_limit", limits.junctionTempLimit(),
                "winding_temp_margin", limits.windingTempMargin(),
                "ripple_fraction", limits.rippleFraction()));
        Profile profile = scenario.profile();
        out.append("profile:\n");
        section(out, 1, PartKind.PROFILE, Map.of(
                "load_inertia", profile.loadInertia(),
                "repeat", profile.repeat()));
        out.append("  segments:\n");
        for (Segment segment : profile.segments()) {
            StringBuilder item = new StringBuilder();
            section(item, 3, PartKind.SEGMENT, segmentValues(segment));
            out.append("    - ").append(item.substring(6));
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

    private static LoadedScenario write(Scenario scenario, Path file, String header) throws IOException, InputException {
        boolean existed = Files.exists(file);
        AtomicFile.write(file, render(scenario, header).getBytes(StandardCharsets.UTF_8));
        try {
            LoadedScenario back = ScenarioLoader.load(file);
            List<String> differences = differences(scenario, back.scenario());
            if (!differences.isEmpty()) {
                throw new SaveNotVerifiedException(List.of(file), differences);
            }
            return back;
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

    private static Map<String, Object> segmentValues(Segment segment) {
        return Map.of(
                "label", segment.label(),
                "duration", segment.duration(),
                "speed_start", segment.speedStart(),
                "speed_end", segment.speedEnd(),
                "torque", segment.torque());
    }

    /** The keys of {@code kind} that have a value in {@code values}, in table order. */
    private static void section(StringBuilder out, int depth, PartKind kind, Map<String, Object> values) {
        for (FieldSpec spec : PartFields.of(kind)) {
            Object value = values.get(spec.key());
            if (value == null || value instanceof String text && text.isEmpty()) {
                continue;
            }
            line(out, depth, spec.key(), spec.scalar(value));
        }
    }

    private static void line(StringBuilder out, int depth, String key, String scalar) {
        out.append("  ".repeat(depth)).append(key).append(": ").append(scalar).append('\n');
    }
}
