package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Bench;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

class ScenarioStoreTest {

    @TempDir
    Path folder;

    @Test
    void savedScenarioLoadsBackEqualAndKeepsItsHeader() throws Exception {
        Path file = copy("scenario.yaml");
        String before = Files.readString(file);
        Scenario loaded = ScenarioLoader.load(file).scenario();
        Profile profile = loaded.profile();
        List<Segment> segments = new ArrayList<>(profile.segments());
        segments.add(new Segment("dwell", 1.25, 0, 0, 0.1));
        Bench b = loaded.bench();
        Bench bench = new Bench(b.busVoltage(), b.busVoltageMin(), b.busVoltageMax(), List.of(16000.0, 25000.0),
                b.modulation(), 750e-9, b.gateDriveVoltage(), b.gateResistance(), b.maxDuty(), b.ambientTemp(),
                b.switchRthCaseAmbient(), b.gearRatios(), b.gearEfficiency(), b.limits());
        Scenario edited = new Scenario("test conveyor, longer", bench,
                new Profile(profile.loadInertia(), profile.repeat(), segments));

        SavedScenario saved = ScenarioStore.save(edited, file);

        assertEquals(edited, saved.scenario());
        assertEquals(edited, ScenarioLoader.load(file).scenario());
        String after = Files.readString(file);
        assertTrue(after.startsWith("# Invented machine for the store and fuzz tests: a small conveyor.\n"
                + "# Nothing here describes a real product.\n\nname: "), after);
        assertEquals(before, Files.readString(AtomicFile.backupOf(file)));
    }

    /** Every demo scenario survives a save unchanged (the renderer covers every key they use). */
    @ParameterizedTest
    @MethodSource("demoScenarios")
    void demoScenarioRoundTripsExactly(Path demo) throws Exception {
        Path file = Files.copy(demo, folder.resolve(demo.getFileName()));
        Scenario scenario = ScenarioLoader.load(file).scenario();
        assertEquals(scenario, ScenarioStore.save(scenario, file).scenario());
    }

    @Test
    void newFileGetsAHeader() throws Exception {
        Scenario scenario = ScenarioLoader.load(copy("scenario.yaml")).scenario();
        Path file = folder.resolve("new.yaml");
        ScenarioStore.save(scenario, file);
        assertTrue(Files.readString(file).startsWith("# Yoke scenario"));
        assertEquals(scenario, ScenarioLoader.load(file).scenario());
    }

    @Test
    void changedOnDiskIsNotOverwritten() throws Exception {
        Path file = copy("scenario.yaml");
        LoadedScenario loaded = ScenarioLoader.load(file);
        String theirs = Files.readString(file).replace("name: test conveyor", "name: their conveyor");
        Files.writeString(file, theirs);
        assertThrows(ChangedOnDiskException.class, () -> ScenarioStore.save(loaded.scenario(), file, loaded.file()));
        assertEquals(theirs, Files.readString(file));
    }

    @Test
    void scenarioTheLoaderRefusesIsNotSaved() throws Exception {
        Path file = copy("scenario.yaml");
        String before = Files.readString(file);
        Scenario s = ScenarioLoader.load(file).scenario();
        Bench b = s.bench();
        // A minimum bus voltage above the nominal one is refused by the loader's rules.
        Bench broken = new Bench(b.busVoltage(), b.busVoltage() + 5, b.busVoltageMax() + 10, b.pwmFrequencies(),
                b.modulation(), b.deadTime(), b.gateDriveVoltage(), b.gateResistance(), b.maxDuty(), b.ambientTemp(),
                b.switchRthCaseAmbient(), b.gearRatios(), b.gearEfficiency(), b.limits());
        assertThrows(InputException.class, () -> ScenarioStore.save(new Scenario(s.name(), broken, s.profile()), file));
        assertEquals(before, Files.readString(file));
    }

    @Test
    void headerIsTheLeadingCommentBlock() {
        assertEquals("# a\n#b\n\n", ScenarioStore.headerOf("# a\n#b\n\n\n\nname: x\n# not header\n"));
        assertEquals("", ScenarioStore.headerOf("name: x\n"));
    }

    /** A byte-order mark before the header (some editors write one) is dropped, the comments are kept. */
    @Test
    void byteOrderMarkIsDroppedAndTheHeaderKept() throws Exception {
        Path file = copy("scenario.yaml");
        String before = Files.readString(file);
        Files.writeString(file, "\uFEFF" + before);
        LoadedScenario loaded = ScenarioLoader.load(file);
        ScenarioStore.save(loaded.scenario(), file, loaded.file());
        String after = Files.readString(file);
        assertTrue(after.startsWith("# Invented machine for the store and fuzz tests"), after);
        assertEquals(loaded.scenario(), ScenarioLoader.load(file).scenario());
    }

    static Stream<Path> demoScenarios() throws IOException {
        try (Stream<Path> files = Files.list(Path.of("demo-data"))) {
            return files.filter(p -> p.toString().endsWith(".yaml")).sorted().toList().stream();
        }
    }

    private Path copy(String name) throws IOException {
        try (InputStream in = getClass().getResourceAsStream("/store/" + name)) {
            Path file = folder.resolve(name);
            Files.copy(in, file);
            return file;
        }
    }
}
