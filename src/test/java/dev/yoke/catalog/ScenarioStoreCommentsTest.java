package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Bench;
import dev.yoke.model.Limits;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Saving a scenario over a file the user wrote keeps the user's text: each test edits the loaded
 * scenario the way the editor does, saves it, and diffs the file's lines before and after. The
 * law checked throughout: the saved file reloads to exactly the scenario that was saved, and the
 * only lines that differ are those of the values, or the segments, that changed.
 */
class ScenarioStoreCommentsTest {

    @TempDir
    Path folder;

    @Test
    void editingOneValueRewritesOnlyItsLineAndKeepsItsComment() throws Exception {
        Path file = commented();
        Scenario before = ScenarioLoader.load(file).scenario();
        Scenario edited = withBench(before, b -> bench(b, b.busVoltage(), b.busVoltageMin(), b.busVoltageMax(),
                b.deadTime(), 40, b.limits()));

        Diff diff = save(file, edited);

        assertEquals(List.of("  ambient_temp: 35 degC   # inside the cabinet"), diff.removed);
        assertEquals(List.of("  ambient_temp: 40 degC   # inside the cabinet"), diff.added);
    }

    @Test
    void editingOneSegmentValueRewritesOnlyItsLine() throws Exception {
        Path file = commented();
        Scenario before = ScenarioLoader.load(file).scenario();
        Segment lowering = before.profile().segments().get(2);
        Scenario edited = withSegments(before, list -> list.set(2, new Segment(lowering.label(), lowering.duration(),
                lowering.speedStart(), lowering.speedEnd(), 1.25)));

        Diff diff = save(file, edited);

        assertEquals(List.of("      torque: 1 N*m"), diff.removed);
        assertEquals(List.of("      torque: 1.25 N*m"), diff.added);
    }

    @Test
    void editingTheLimitsAndTheNameKeepsTheirTrailingComments() throws Exception {
        Path file = commented();
        Scenario before = ScenarioLoader.load(file).scenario();
        Limits l = before.bench().limits();
        Scenario renamed = new Scenario("lift table, heavier", before.bench(), before.profile());
        Scenario edited = withBench(renamed, b -> bench(b, b.busVoltage(), b.busVoltageMin(), b.busVoltageMax(),
                b.deadTime(), b.ambientTemp(), new Limits(0.75, l.junctionTempLimit(), l.windingTempMargin(),
                        l.rippleFraction())));

        Diff diff = save(file, edited);

        assertEquals(List.of("name: lift table   # shown in the editor's title",
                "    vds_derating: 0.8      # kept from the last build"), diff.removed);
        assertEquals(List.of("name: lift table, heavier   # shown in the editor's title",
                "    vds_derating: 0.75      # kept from the last build"), diff.added);
    }

    /** A key left to its default keeps loading as the edited value: it is written out only when needed. */
    @Test
    void valueLeftToFollowAnotherIsWrittenOutWhenTheOtherChanges() throws Exception {
        Path file = commented();
        Scenario before = ScenarioLoader.load(file).scenario();
        // bus_voltage_max is absent, so it loads as bus_voltage (24 V); the edit keeps 24 V as maximum.
        Scenario edited = withBench(before, b -> bench(b, 22, b.busVoltageMin(), b.busVoltageMax(), b.deadTime(),
                b.ambientTemp(), b.limits()));

        Diff diff = save(file, edited);

        assertEquals(List.of("  bus_voltage: 24 V        # nominal; bus_voltage_max is left to follow it"),
                diff.removed);
        assertEquals(List.of("  bus_voltage: 22 V        # nominal; bus_voltage_max is left to follow it",
                "  bus_voltage_max: 24 V"), diff.added);
        // A key the file lacked goes where the table puts it: after the key before it.
        assertTrue(Files.readString(file).contains("  bus_voltage_min: 20 V    # battery sag\n  bus_voltage_max: 24 V\n"));
    }

    @Test
    void segmentEndSpeedLeftOutIsWrittenWhenTheStartSpeedChanges() throws Exception {
        Path file = commented();
        Scenario before = ScenarioLoader.load(file).scenario();
        Segment hold = before.profile().segments().get(1);
        Scenario edited = withSegments(before, list -> list.set(1, new Segment(hold.label(), hold.duration(), 0.5,
                hold.speedEnd(), hold.torque())));

        Diff diff = save(file, edited);

        assertEquals(List.of("      speed_start: 0 rad/s"), diff.removed);
        assertEquals(List.of("      speed_start: 0.5 rad/s", "      speed_end: 0 rad/s"), diff.added);
    }

    @Test
    void removingASegmentTakesItsLinesAndKeepsEveryOtherComment() throws Exception {
        Path file = commented();
        Scenario before = ScenarioLoader.load(file).scenario();
        Scenario edited = withSegments(before, list -> list.remove(1));

        String original = Files.readString(file);

        save(file, edited);

        String holdLines = "\n    # hold at the top: speed_end left out, it follows speed_start\n"
                + "    - label: hold\n      duration: 2 s\n      speed_start: 0 rad/s\n      torque: 1.5 N*m\n";
        // The unlabelled segment is now second: the label the editor shows ("segment 3") is written
        // out, or it would load back as "segment 2".
        String expected = original.replace(holdLines, "")
                .replace("    - duration: 1 s", "    - label: segment 3\n      duration: 1 s");
        assertEquals(expected, Files.readString(file));
        String text = Files.readString(file);
        for (String comment : List.of("# Invented machine", "# the lift cycle", "# from the floor",
                "# load plus friction", "# unlabelled: loads as", "# lowering: the load drives back",
                "# end of the cycle", "# inside the cabinet")) {
            assertTrue(text.contains(comment), comment + " survives:\n" + text);
        }
    }

    @Test
    void addedSegmentIsWrittenLikeItsNeighboursAndNothingElseMoves() throws Exception {
        Path file = commented();
        String original = Files.readString(file);
        Scenario before = ScenarioLoader.load(file).scenario();
        Scenario edited = withSegments(before, list -> list.add(new Segment("rest", 3, 0, 0, 0.2)));

        Diff diff = save(file, edited);

        assertEquals(List.of(), diff.removed);
        // Indented like the other segments, set apart by a blank line as they are.
        assertEquals(List.of("", "    - label: rest", "      duration: 3 s", "      speed_start: 0 rad/s",
                "      speed_end: 0 rad/s", "      torque: 200 mN*m"), diff.added);
        String text = Files.readString(file);
        String lastSegmentEnd = "      torque: 1 N*m\n";
        int cut = original.indexOf(lastSegmentEnd) + lastSegmentEnd.length();
        assertTrue(text.startsWith(original.substring(0, cut)), text);
        assertTrue(text.endsWith("# end of the cycle\n"), text);
    }

    @Test
    void segmentAddedInTheMiddleLeavesTheOthersAndTheirCommentsWhereTheyWere() throws Exception {
        Path file = commented();
        Scenario before = ScenarioLoader.load(file).scenario();
        Segment raise = before.profile().segments().get(0);
        // The editor's "add" copies the current row below it; the copy is then edited.
        Scenario edited = withSegments(before, list -> list.add(1, new Segment("raise more", 0.5, 3, 3.5,
                raise.torque())));

        String original = Files.readString(file);

        save(file, edited);

        String raiseEnd = "      torque: 2 N*m     # load plus friction\n";
        String expected = original.replace(raiseEnd, raiseEnd + "\n    - label: raise more\n      duration: 500 ms\n"
                        + "      speed_start: 3 rad/s\n      speed_end: 3.5 rad/s\n      torque: 2 N*m\n")
                // the unlabelled segment moves from third to fourth: its label is written to stay "segment 3"
                .replace("    - duration: 1 s", "    - label: segment 3\n      duration: 1 s");
        assertEquals(expected, Files.readString(file));
    }

    @Test
    void movedSegmentsTakeTheirCommentsAlong() throws Exception {
        Path file = commented();
        Scenario before = ScenarioLoader.load(file).scenario();
        Scenario edited = withSegments(before, list -> list.add(0, list.remove(1)));

        save(file, edited);

        String text = Files.readString(file);
        String holdBlock = "    # hold at the top: speed_end left out, it follows speed_start\n"
                + "    - label: hold\n"
                + "      duration: 2 s\n"
                + "      speed_start: 0 rad/s\n"
                + "      torque: 1.5 N*m\n";
        String raiseBlock = "    - label: raise   # from the floor\n"
                + "      duration: 1 s\n"
                + "      speed_start: 0 rad/s\n"
                + "      speed_end: 3 rad/s\n"
                + "      torque: 2 N*m     # load plus friction\n";
        assertTrue(text.contains("  segments:\n    # the lift cycle, from the floor up and back\n" + holdBlock
                + "\n" + raiseBlock + "\n    - duration: 1 s     # unlabelled"), text);
    }

    /** A label cleared in the editor loads back as the loader's numbered name, as an unlabelled segment does. */
    @Test
    void clearedLabelLoadsBackAsTheNumberedName() throws Exception {
        Path file = commented();
        LoadedScenario before = ScenarioLoader.load(file);
        Segment hold = before.scenario().profile().segments().get(1);
        Scenario edited = withSegments(before.scenario(), list -> list.set(1, new Segment("", hold.duration(),
                hold.speedStart(), hold.speedEnd(), hold.torque())));

        SavedScenario saved = ScenarioStore.save(edited, file, before.file());

        assertEquals("segment 2", saved.scenario().profile().segments().get(1).label());
        assertTrue(Files.readString(file).contains("    - label: segment 2\n      duration: 2 s\n"));
    }

    @Test
    void savingAnUnchangedScenarioLeavesTheTextAsItWas() throws Exception {
        Path file = commented();
        String original = Files.readString(file);
        save(file, ScenarioLoader.load(file).scenario());
        assertEquals(original, Files.readString(file));
    }

    @Test
    void savingOverAnotherWritersVersionEditsTheirText() throws Exception {
        Path file = commented();
        Scenario mine = withBench(ScenarioLoader.load(file).scenario(), b -> bench(b, b.busVoltage(),
                b.busVoltageMin(), b.busVoltageMax(), 500e-9, b.ambientTemp(), b.limits()));
        Files.writeString(file, Files.readString(file).replace("# the supply", "# the supply, checked by a colleague"));

        // The "overwrite" answer: the values become the editor's, the other writer's comment stays.
        assertEquals(mine, ScenarioStore.save(mine, file).scenario());
        String text = Files.readString(file);
        assertTrue(text.contains("# the supply, checked by a colleague") && text.contains("dead_time: 500 ns"), text);
    }

    @Test
    void crlfFileKeepsItsLineEndingsWhenASegmentIsAdded() throws Exception {
        Path file = commented();
        Files.writeString(file, Files.readString(file).replace("\n", "\r\n"));
        Scenario edited = withSegments(ScenarioLoader.load(file).scenario(),
                list -> list.add(new Segment("rest", 3, 0, 0, 0.2)));
        assertEquals(edited, ScenarioStore.save(edited, file).scenario());
        String text = Files.readString(file);
        assertEquals(text.split("\n", -1).length - 1, text.split("\r\n", -1).length - 1, "every line ends in CRLF");
    }

    /** Files Yoke does not edit in place (a profile in flow style) are still saved, written anew. */
    @Test
    void flowStyleSegmentsAreWrittenAnewUnderTheHeader() throws Exception {
        Path file = commented();
        String text = Files.readString(file);
        int at = text.indexOf("  segments:");
        Files.writeString(file, text.substring(0, at) + "  segments: [{duration: 1 s, speed_start: 0 rad/s,"
                + " torque: 1 N*m}]\n");
        Scenario edited = withSegments(ScenarioLoader.load(file).scenario(),
                list -> list.add(new Segment("rest", 3, 0, 0, 0.2)));
        SavedScenario saved = ScenarioStore.save(edited, file);
        assertEquals(edited, saved.scenario());
        assertTrue(Files.readString(file).startsWith("# Invented machine for the scenario-save tests"));
        // the save says that it wrote the body anew, and names the part it could not edit in place
        assertEquals(Optional.of("profile.segments is written in flow style [...]"), saved.bodyRewritten());
    }

    @Test
    void saveEditedInPlaceSaysNothingWasWrittenAnew() throws Exception {
        Path file = commented();
        Scenario edited = withSegments(ScenarioLoader.load(file).scenario(),
                list -> list.add(new Segment("rest", 3, 0, 0, 0.2)));
        assertEquals(Optional.empty(), ScenarioStore.save(edited, file).bodyRewritten());
    }

    // ---- the demo scenarios as fixtures (copied; demo-data is never written) ----

    @ParameterizedTest
    @MethodSource("demoScenarios")
    void demoScenarioEditOfOneSegmentValueChangesOneLine(Path demo) throws Exception {
        Path file = Files.copy(demo, folder.resolve(demo.getFileName()));
        Scenario before = ScenarioLoader.load(file).scenario();
        int last = before.profile().segments().size() - 1;
        Segment s = before.profile().segments().get(last);
        Scenario edited = withSegments(before, list -> list.set(last, new Segment(s.label(), s.duration() * 2,
                s.speedStart(), s.speedEnd(), s.torque())));

        Diff diff = save(file, edited);

        assertEquals(1, diff.removed.size(), diff.toString());
        assertEquals(1, diff.added.size(), diff.toString());
        assertTrue(diff.removed.get(0).startsWith("      duration: ") && diff.added.get(0).startsWith("      duration: "),
                diff.toString());
    }

    @ParameterizedTest
    @MethodSource("demoScenarios")
    void demoScenarioLosesOnlyTheRemovedSegmentsLines(Path demo) throws Exception {
        Path file = Files.copy(demo, folder.resolve(demo.getFileName()));
        List<String> original = Files.readAllLines(file);
        Scenario before = ScenarioLoader.load(file).scenario();
        Segment gone = before.profile().segments().get(1);
        Scenario edited = withSegments(before, list -> list.remove(1));

        Diff diff = save(file, edited);

        assertEquals(List.of(), diff.added);
        assertEquals("    - label: " + gone.label(), diff.removed.get(0));
        assertTrue(diff.removed.stream().skip(1).allMatch(line -> line.startsWith("      ")), diff.toString());
        assertEquals(original.size() - diff.removed.size(), Files.readAllLines(file).size());
        // Every comment line of the file that was not inside the removed segment is still there.
        for (String line : original) {
            if (line.strip().startsWith("#") && !diff.removed.contains(line)) {
                assertTrue(Files.readAllLines(file).contains(line), line);
            }
        }
    }

    @ParameterizedTest
    @MethodSource("demoScenarios")
    void demoScenarioKeepsItsTextWhenSegmentsAreAddedAndReordered(Path demo) throws Exception {
        Path file = Files.copy(demo, folder.resolve(demo.getFileName()));
        Scenario before = ScenarioLoader.load(file).scenario();
        Scenario edited = withSegments(before, list -> {
            list.add(list.remove(0));
            list.add(new Segment("extra pause", 0.75, 0, 0, 0));
        });

        save(file, edited);

        // The first segment's lines (the demo files have no comments between segments) move to the
        // end as they were; the new segment follows them, indented like the others.
        List<String> lines = Files.readAllLines(demo);
        int first = lines.indexOf(lines.stream().filter(line -> line.startsWith("    - ")).findFirst().orElseThrow());
        int second = first + 1;
        while (!lines.get(second).startsWith("    - ")) {
            second++;
        }
        List<String> expected = new ArrayList<>(lines.subList(0, first));
        expected.addAll(lines.subList(second, lines.size()));
        expected.addAll(lines.subList(first, second));
        expected.addAll(List.of("    - label: extra pause", "      duration: 750 ms", "      speed_start: 0 rad/s",
                "      speed_end: 0 rad/s", "      torque: 0 N*m"));
        assertEquals(expected, Files.readAllLines(file));
    }

    static Stream<Path> demoScenarios() throws IOException {
        return ScenarioStoreTest.demoScenarios();
    }

    // ---- helpers ----

    /** Saves {@code edited} over {@code file}, checks it reloads equal, and returns the line diff. */
    private static Diff save(Path file, Scenario edited) throws Exception {
        List<String> before = Files.readAllLines(file);
        LoadedScenario stamp = ScenarioLoader.load(file);
        SavedScenario saved = ScenarioStore.save(edited, file, stamp.file());
        assertEquals(edited, saved.scenario(), "what the save reports");
        assertEquals(edited, ScenarioLoader.load(file).scenario(), "what the file loads as");
        return Diff.of(before, Files.readAllLines(file));
    }

    private Path commented() throws IOException {
        try (InputStream in = getClass().getResourceAsStream("/store/commented-scenario.yaml")) {
            Path file = folder.resolve("lift.yaml");
            Files.copy(in, file);
            return file;
        }
    }

    private static Scenario withBench(Scenario s, UnaryOperator<Bench> change) {
        return new Scenario(s.name(), change.apply(s.bench()), s.profile());
    }

    private static Bench bench(Bench b, double bus, double busMin, double busMax, double deadTime, double ambient,
            Limits limits) {
        return new Bench(bus, busMin, busMax, b.pwmFrequencies(), b.modulation(), deadTime, b.gateDriveVoltage(),
                b.gateResistance(), b.maxDuty(), ambient, b.switchRthCaseAmbient(), b.gearRatios(),
                b.gearEfficiency(), limits);
    }

    private static Scenario withSegments(Scenario s, java.util.function.Consumer<List<Segment>> change) {
        List<Segment> segments = new ArrayList<>(s.profile().segments());
        change.accept(segments);
        Profile p = s.profile();
        return new Scenario(s.name(), s.bench(), new Profile(p.loadInertia(), p.repeat(), segments));
    }

    /** Lines removed and added between two versions: the complement of their longest common subsequence. */
    private record Diff(List<String> removed, List<String> added) {
        static Diff of(List<String> a, List<String> b) {
            int[][] common = new int[a.size() + 1][b.size() + 1];
            for (int i = a.size() - 1; i >= 0; i--) {
                for (int j = b.size() - 1; j >= 0; j--) {
                    common[i][j] = a.get(i).equals(b.get(j)) ? common[i + 1][j + 1] + 1
                            : Math.max(common[i + 1][j], common[i][j + 1]);
                }
            }
            List<String> removed = new ArrayList<>();
            List<String> added = new ArrayList<>();
            int i = 0;
            int j = 0;
            while (i < a.size() || j < b.size()) {
                if (i < a.size() && j < b.size() && a.get(i).equals(b.get(j))) {
                    i++;
                    j++;
                } else if (j < b.size() && (i == a.size() || common[i][j + 1] >= common[i + 1][j])) {
                    added.add(b.get(j++));
                } else {
                    removed.add(a.get(i++));
                }
            }
            return new Diff(removed, added);
        }
    }
}
