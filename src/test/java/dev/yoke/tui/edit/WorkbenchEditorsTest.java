package dev.yoke.tui.edit;

import com.googlecode.lanterna.input.KeyType;
import dev.yoke.catalog.CatalogLoader;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.engine.Shortlist;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import dev.yoke.tui.RankProgress;
import dev.yoke.tui.TerminalTraits;
import dev.yoke.tui.ViewSettings;
import dev.yoke.tui.Workbench;
import dev.yoke.tui.WorkbenchBackend;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArrayList;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The editors opened from the workbench's keys, and their changes reaching the ranking. */
class WorkbenchEditorsTest {

    @TempDir
    Path dir;

    /** Records what it is asked to rank; the ranking itself is not under test here. */
    private static final class RecordingBackend implements WorkbenchBackend {
        final List<Scenario> scenarios = new CopyOnWriteArrayList<>();
        final List<Catalog> catalogs = new CopyOnWriteArrayList<>();

        @Override
        public Shortlist rank(Scenario scenario, Catalog catalog, RankProgress progress) throws Exception {
            scenarios.add(scenario);
            catalogs.add(catalog);
            throw new IOException("not ranked in this test");
        }

        @Override
        public void writeCsv(Path file, Shortlist shortlist, int[] order, ViewSettings view) {
        }
    }

    private static void waitFor(java.util.function.BooleanSupplier condition) throws InterruptedException {
        for (int i = 0; i < 500 && !condition.getAsBoolean(); i++) {
            Thread.sleep(10);
        }
    }

    @Test
    void benchAndPartsKeysOpenTheEditorsAndTheirChangesRankAgain() throws Exception {
        Path catalog = Files.createDirectories(dir.resolve("catalog"));
        for (String name : List.of("motors.yaml", "switches.yaml")) {
            Files.copy(Path.of("catalog", name), catalog.resolve(name));
        }
        Path scenarioFile = dir.resolve("conveyor.yaml");
        Files.copy(Path.of("demo-data", "conveyor.yaml"), scenarioFile);
        Scenario scenario = ScenarioLoader.load(scenarioFile).scenario();
        RecordingBackend backend = new RecordingBackend();
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            Workbench workbench = new Workbench(t.gui, TerminalTraits.PLAIN, backend, scenario,
                    CatalogLoader.load(catalog).catalog(), Set.of(), dir);
            workbench.setEditors(WorkbenchEditors.forFiles(catalog, scenarioFile));
            workbench.open();
            t.update();
            waitFor(() -> backend.scenarios.size() == 1);

            t.type("b");
            assertTrue(t.text().contains("SCENARIO Belt conveyor (demo)"), t.text());
            t.press(KeyType.ArrowDown).clearField(20).type("12.5 V").press(KeyType.ArrowDown);
            waitFor(() -> backend.scenarios.size() == 2);
            assertEquals(12.5, backend.scenarios.get(1).bench().busVoltage(), 0.0);
            assertEquals(12.5, workbench.scenario().bench().busVoltage(), 0.0);
            t.press(KeyType.Escape).press(KeyType.ArrowRight).press(KeyType.Enter); // close without saving
            t.type("b");
            assertTrue(t.text().contains("unsaved (F2 saves)"), "reopened: the screen is ahead of the file");
            t.press(KeyType.Escape).press(KeyType.ArrowRight).press(KeyType.Enter);

            t.type("e");
            assertTrue(t.text().contains("[MOTORS 14]"), t.text());
            t.press(KeyType.Enter).press(KeyType.ArrowDown, 3).clearField(20).type("5.6 Ohm").press(KeyType.F2);
            waitFor(() -> backend.scenarios.size() == 3);
            assertEquals(5.6, backend.catalogs.get(2).motors().get(0).resistance(), 0.0);
        }
    }
}
