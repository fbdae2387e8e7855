package dev.yoke.tui.edit;

import com.googlecode.lanterna.input.KeyType;
import dev.yoke.catalog.AtomicFile;
import dev.yoke.catalog.CatalogLoader;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Scenario;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The editors writing real files through the catalog package's stores, checked by loading the
 * files back with the catalog loader (the same code the ranking reads them with).
 */
class EditorFilesTest {

    @TempDir
    Path dir;

    private final AtomicInteger saves = new AtomicInteger();

    private Path bundledCatalog() throws Exception {
        Path catalog = Files.createDirectories(dir.resolve("catalog"));
        for (String name : List.of("motors.yaml", "switches.yaml")) {
            Files.copy(Path.of("catalog", name), catalog.resolve(name));
        }
        return catalog;
    }

    private static Motor motor(Catalog c, String id) {
        return c.motors().stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    private static PowerSwitch mosfet(Catalog c, String id) {
        return c.switches().stream().filter(s -> s.id().equals(id)).findFirst().orElseThrow();
    }

    @Test
    void editedMotorLoadsBackEqualAndTheBackupHoldsThePreviousFile() throws Exception {
        Path catalog = bundledCatalog();
        Path file = catalog.resolve("motors.yaml");
        byte[] before = Files.readAllBytes(file);
        Motor original = motor(CatalogLoader.load(catalog).catalog(), "dc12-03w");
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            PartsEditor.open(t.gui, CatalogPartStore.open(catalog), saves::incrementAndGet);
            t.press(KeyType.Enter).press(KeyType.ArrowDown, 3).clearField(20).type("5.6 Ohm").press(KeyType.F2);
            assertTrue(t.text().contains("Saved motor dc12-03w"), t.text());
        }
        Motor expected = new Motor(original.id(), original.label(), original.nominalVoltage(), 5.6,
                original.resistanceTemp(), original.inductance(), original.torqueConstant(), original.noLoadCurrent(),
                original.continuousCurrent(), original.peakCurrent(), original.maxSpeed(), original.rotorInertia(),
                original.rthWindingHousing(), original.rthHousingAmbient(), original.tauWinding(),
                original.tauHousing(), original.maxWindingTemp(), original.brushDrop(), original.mass(),
                original.price());
        assertEquals(expected, motor(CatalogLoader.load(catalog).catalog(), "dc12-03w"));
        assertArrayEquals(before, Files.readAllBytes(AtomicFile.backupOf(file)), "the backup is the previous file");
        assertEquals(1, saves.get());
        // only the edited line differs: comments, order and the other parts are the user's text
        List<String> old = Files.readAllLines(AtomicFile.backupOf(file));
        List<String> now = Files.readAllLines(file);
        assertEquals(old.size(), now.size());
        List<String> changed = new ArrayList<>();
        for (int i = 0; i < old.size(); i++) {
            if (!old.get(i).equals(now.get(i))) {
                changed.add(now.get(i));
            }
        }
        assertEquals(1, changed.size(), changed.toString());
        assertTrue(changed.get(0).contains("resistance:"), changed.toString());
    }

    @Test
    void copiedSwitchIsAddedAndDeletedThroughTheFiles() throws Exception {
        Path catalog = bundledCatalog();
        Catalog start = CatalogLoader.load(catalog).catalog();
        PowerSwitch first = start.switches().get(0);
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            PartsEditor editor = PartsEditor.open(t.gui, CatalogPartStore.open(catalog), saves::incrementAndGet);
            t.press(KeyType.Tab).type("c").press(KeyType.F2);
            assertTrue(t.text().contains("Saved switch " + first.id() + "-copy"), t.text());
            Catalog withCopy = CatalogLoader.load(catalog).catalog();
            assertEquals(start.switches().size() + 1, withCopy.switches().size());
            PowerSwitch copy = mosfet(withCopy, first.id() + "-copy");
            assertEquals(first, new PowerSwitch(first.id(), copy.label(), copy.packageName(), copy.vdsMax(),
                    copy.idContinuous(), copy.idPulsed(), copy.rdsOn(), copy.rdsOnHot(), copy.rdsOnHotTemp(),
                    copy.gateCharge(), copy.gateSourceCharge(), copy.gateDrainCharge(), copy.plateauVoltage(),
                    copy.gateResistanceInternal(), copy.outputCapacitance(), copy.diodeForwardVoltage(),
                    copy.reverseRecoveryCharge(), copy.rthJunctionCase(), copy.maxJunctionTemp(), copy.price()),
                    "the copy differs only in its id");
            // the copy is selected after saving: delete it again
            assertEquals(first.id() + "-copy", editor.shownIds().get(editor.shownIds().size() - 1));
            t.press(KeyType.End).type("d").press(KeyType.Enter);
            assertEquals(start, CatalogLoader.load(catalog).catalog(), "back to the start");
            assertEquals(2, saves.get());
        }
    }

    @Test
    void newMotorGoesToThePickedFile() throws Exception {
        Path catalog = bundledCatalog();
        Motor template = motor(CatalogLoader.load(catalog).catalog(), "dc24-40w");
        try (TerminalDriver t = new TerminalDriver(100, 40)) {
            PartsEditor.open(t.gui, CatalogPartStore.open(catalog), saves::incrementAndGet);
            t.type("a").press(KeyType.ArrowUp).type(" "); // second file: switches.yaml
            t.press(KeyType.ArrowDown).type("dc24-new");
            t.press(KeyType.ArrowDown).type("new 24 V");
            for (FormField f : MotorEditing.INSTANCE.fields().subList(2, MotorEditing.INSTANCE.fields().size())) {
                t.press(KeyType.ArrowDown).clearField(40)
                        .type(f.write(MotorEditing.INSTANCE.values(template).get(f.key())));
            }
            t.press(KeyType.F2);
            assertTrue(t.text().contains("Saved motor dc24-new"), t.text());
        }
        var loaded = CatalogLoader.load(catalog);
        Motor added = motor(loaded.catalog(), "dc24-new");
        assertEquals(template.resistance(), added.resistance(), 0.0);
        assertEquals(template.maxSpeed(), added.maxSpeed(), 0.0);
        assertEquals(catalog.resolve("switches.yaml"), loaded.motorOrigins().get("dc24-new").file());
    }

    @Test
    void savedScenarioLoadsBackEqualAndTheBackupHoldsThePreviousFile() throws Exception {
        Path file = dir.resolve("conveyor.yaml");
        Files.copy(Path.of("demo-data", "conveyor.yaml"), file);
        byte[] before = Files.readAllBytes(file);
        Scenario start = ScenarioLoader.load(file).scenario();
        List<Scenario> passed = new ArrayList<>();
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            ScenarioEditor editor = ScenarioEditor.open(t.gui, start, file, passed::add);
            t.press(KeyType.ArrowDown).clearField(20).type("12.5 V");
            t.press(KeyType.Tab).press(KeyType.ArrowDown).type("]").press(KeyType.F2);
            assertTrue(t.text().contains("Saved conveyor.yaml"), t.text());
            Scenario onScreen = editor.current().orElseThrow();
            assertEquals(onScreen, ScenarioLoader.load(file).scenario());
            assertEquals(12.5, onScreen.bench().busVoltage(), 0.0);
            assertEquals("run loaded", onScreen.profile().segments().get(2).label());
            assertEquals(onScreen, passed.get(passed.size() - 1));
        }
        assertArrayEquals(before, Files.readAllBytes(AtomicFile.backupOf(file)));
        assertTrue(Files.readString(file).startsWith("# Bench-top belt conveyor"), "the header comment is kept");
    }

    /**
     * The user's comments survive a save from the editor: a changed value's line keeps its trailing
     * comment, a removed segment's lines go, every other line (comments between and inside the
     * segments included) is the user's text unchanged.
     */
    @Test
    void scenarioSavedFromTheEditorKeepsTheUsersComments() throws Exception {
        Path file = dir.resolve("rover-wheel.yaml");
        String original = Files.readString(Path.of("demo-data", "rover-wheel.yaml"))
                .replace("  bus_voltage: 25.2 V\n", "  bus_voltage: 25.2 V   # 7 cells, nominal\n")
                .replace("    - label: cruise\n", "    # the patrol loop proper\n    - label: cruise\n")
                .replace("      torque: -0.48 N*m\n", "      torque: -0.48 N*m   # regenerating\n");
        Files.writeString(file, original);
        Scenario start = ScenarioLoader.load(file).scenario();
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            ScenarioEditor editor = ScenarioEditor.open(t.gui, start, file, s -> { });
            t.press(KeyType.ArrowDown).clearField(20).type("24 V");
            t.press(KeyType.Tab).press(KeyType.ArrowDown, 4).type("x").press(KeyType.F2); // removes "brake"
            assertTrue(t.text().contains("Saved rover-wheel.yaml"), t.text());
            assertEquals(editor.current().orElseThrow(), ScenarioLoader.load(file).scenario());
        }
        String expected = original
                .replace("  bus_voltage: 25.2 V   # 7 cells, nominal\n", "  bus_voltage: 24 V   # 7 cells, nominal\n")
                .replace("    - label: brake\n      duration: 1.5 s\n      speed_start: 10 rad/s\n"
                        + "      speed_end: 0 rad/s\n      torque: 0.25 N*m\n", "");
        assertEquals(expected, Files.readString(file));
        assertEquals(original, Files.readString(AtomicFile.backupOf(file)), "the backup is the previous file");
    }

    /**
     * A scenario whose segments are written on one line (YAML flow style) cannot be edited in place:
     * a save writes the body anew and its comments survive only in the backup. The editor asks
     * before such a save and says afterwards where the comments are; a file laid out one value per
     * line is saved without a question or a notice.
     */
    @Test
    void savingAFlowStyleScenarioAsksFirstAndSaysItsCommentsAreOnlyInTheBackup() throws Exception {
        String block = Files.readString(Path.of("demo-data", "conveyor.yaml"))
                .replace("  bus_voltage: 12 V\n", "  bus_voltage: 12 V   # the supply\n");
        int at = block.indexOf("  segments:");
        String flow = block.substring(0, at) + "  segments: [{label: start, duration: 1 s, speed_start: 0 rad/s,"
                + " speed_end: 6 rad/s, torque: 1.2 N*m}, {label: run loaded, duration: 10 min,"
                + " speed_start: 6 rad/s, torque: 1.2 N*m}]\n";

        Path flowFile = Files.writeString(dir.resolve("flow.yaml"), flow);
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            ScenarioEditor editor = ScenarioEditor.open(t.gui, ScenarioLoader.load(flowFile).scenario(), flowFile, s -> { });
            t.press(KeyType.ArrowDown).clearField(20).type("12.5 V").press(KeyType.F2);
            String question = t.text();
            assertTrue(question.contains("Save writes the file anew"), question);
            assertTrue(question.contains("(profile.segments is") && question.contains("written in flow style [...]"),
                    question);
            assertTrue(question.contains("flow.yaml.bak"), question);
            assertEquals(flow, Files.readString(flowFile), "nothing written before the answer");

            t.press(KeyType.Escape); // Back
            assertTrue(t.text().contains("Not saved: flow.yaml is as it was"), t.text());
            assertEquals(flow, Files.readString(flowFile), "going back writes nothing");

            t.press(KeyType.F2).press(KeyType.Enter); // Save anyway
            assertTrue(t.text().contains("Saved flow.yaml; body written anew, its comments are only in flow.yaml.bak"),
                    t.text());
            assertFalse(t.text().contains("Save writes the file anew"), "no second question");
            assertEquals(editor.current().orElseThrow(), ScenarioLoader.load(flowFile).scenario());
        }
        assertFalse(Files.readString(flowFile).contains("# the supply"), "the body was written anew");
        assertEquals(flow, Files.readString(AtomicFile.backupOf(flowFile)), "the backup keeps the comments");

        Path blockFile = Files.writeString(dir.resolve("block.yaml"), block);
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            ScenarioEditor.open(t.gui, ScenarioLoader.load(blockFile).scenario(), blockFile, s -> { });
            t.press(KeyType.ArrowDown).clearField(20).type("12.5 V").press(KeyType.F2);
            assertTrue(t.text().contains("Saved block.yaml (previous version kept as block.yaml.bak)"), t.text());
            assertFalse(t.text().contains("written anew"), t.text());
        }
        assertTrue(Files.readString(blockFile).contains("  bus_voltage: 12.5 V   # the supply\n"), "edited in place");
    }

    @Test
    void scenarioChangedOnDiskIsNotOverwrittenWithoutAsking() throws Exception {
        Path file = dir.resolve("conveyor.yaml");
        Files.copy(Path.of("demo-data", "conveyor.yaml"), file);
        Scenario start = ScenarioLoader.load(file).scenario();
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            ScenarioEditor.open(t.gui, start, file, s -> { });
            String theirs = Files.readString(file).replace("gear_efficiency: 0.75", "gear_efficiency: 0.7");
            Files.writeString(file, theirs);
            t.press(KeyType.ArrowDown).clearField(20).type("12.5 V").press(KeyType.F2);
            assertTrue(t.text().contains("Overwrite it?"), t.text());
            assertEquals(theirs, Files.readString(file), "nothing written before the answer");
            t.press(KeyType.Enter); // Overwrite
            assertEquals(12.5, ScenarioLoader.load(file).scenario().bench().busVoltage(), 0.0);
            assertEquals(theirs, Files.readString(AtomicFile.backupOf(file)), "their version is the backup");
        }
    }

    @Test
    void motorChangedOnDiskCanBeReloadedThenSaved() throws Exception {
        Path catalog = bundledCatalog();
        Path file = catalog.resolve("motors.yaml");
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            PartsEditor.open(t.gui, CatalogPartStore.open(catalog), saves::incrementAndGet);
            Files.writeString(file, Files.readString(file).replace("price: 7.05", "price: 7.5"));
            t.press(KeyType.Enter).press(KeyType.ArrowDown, 3).clearField(20).type("5.6 Ohm").press(KeyType.F2);
            assertTrue(t.text().contains("File changed on disk"), t.text()); // the title: the message wraps with the temp path
            t.press(KeyType.Enter); // Reload, then apply mine
            assertTrue(t.text().contains("Saved motor dc12-03w"), t.text());
        }
        Motor saved = motor(CatalogLoader.load(catalog).catalog(), "dc12-03w");
        assertEquals(5.6, saved.resistance(), 0.0);
        // the editor still held the old price: "reload, then apply mine" writes the whole edited part
        assertFalse(saved.price() == 7.5 && saved.resistance() != 5.6);
    }

    @Test
    void motorGivenBySpeedConstantKeepsOneMotorConstantWhenItsTorqueConstantIsEdited() throws Exception {
        Path catalog = bundledCatalog();
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            PartsEditor.open(t.gui, CatalogPartStore.open(catalog), saves::incrementAndGet);
            // dc12-08w is written with speed_constant; the form shows it as torque_constant
            t.press(KeyType.ArrowDown).press(KeyType.Enter).press(KeyType.ArrowDown, 6)
                    .clearField(30).type("20 mN*m/A").press(KeyType.F2);
            assertTrue(t.text().contains("Saved motor dc12-08w"), t.text());
        }
        Motor saved = motor(CatalogLoader.load(catalog).catalog(), "dc12-08w");
        assertEquals(0.020, saved.torqueConstant(), 0.0);
    }

    @Test
    void doubtfulValueIsMarkedButDoesNotBlockTheSave() throws Exception {
        Path catalog = bundledCatalog();
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            PartsEditor.open(t.gui, CatalogPartStore.open(catalog), saves::incrementAndGet);
            // 10 H over 5.47 Ω is an electrical time constant of 1.8 s: possible, but almost surely a unit slip
            t.press(KeyType.Enter).press(KeyType.ArrowDown, 5).clearField(20).type("10 H");
            String field = t.lineWithNext("inductance");
            assertTrue(field.contains("? electrical time constant"), field);
            assertFalse(field.contains("!"), "a doubt is not an error");
            t.press(KeyType.F2);
            assertTrue(t.text().contains("Saved motor dc12-03w"), t.text());
        }
        assertEquals(10.0, motor(CatalogLoader.load(catalog).catalog(), "dc12-03w").inductance(), 0.0);
    }
}
