package dev.yoke.tui.edit;

import com.googlecode.lanterna.input.KeyType;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The parts editor against a store in memory; the files' contents are checked in the store's own tests. */
class PartsEditorTest {

    private static final Path MOTORS = Path.of("motors.yaml");
    private static final Path SWITCHES = Path.of("switches.yaml");

    private final AtomicInteger saves = new AtomicInteger();

    private static MemoryPartStore store() {
        return new MemoryPartStore(MOTORS, SWITCHES)
                .motor(DemoParts.motor("m24-small", "small 24 V can", 1.2), MOTORS)
                .motor(DemoParts.motor("m24-large", "large 24 V can", 0.35), MOTORS)
                .motor(DemoParts.motor("m12-flat", "flat 12 V pancake", 0.8), MOTORS)
                .mosfet(DemoParts.mosfet("q60-low", "60 V low-ohmic"), SWITCHES)
                .mosfet(DemoParts.mosfet("q40-fast", "40 V fast edge"), SWITCHES);
    }

    private PartsEditor open(TerminalDriver t, MemoryPartStore store) {
        PartsEditor editor = PartsEditor.open(t.gui, store, saves::incrementAndGet);
        t.update();
        return editor;
    }

    @Test
    void filterHidesPartsWhoseIdAndLabelDoNotMatch() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            PartsEditor editor = open(t, store());
            t.type("/24");
            assertEquals(List.of("m24-small", "m24-large"), editor.shownIds());
            assertFalse(t.text().contains("m12-flat"));
            t.press(KeyType.Backspace).press(KeyType.Backspace).type("pancake");
            assertEquals(List.of("m12-flat"), editor.shownIds(), "the label matches too");
            t.press(KeyType.Escape);
            assertEquals(3, editor.shownIds().size(), "Esc clears the filter");
        }
    }

    @Test
    void tabSwitchesBetweenMotorsAndSwitches() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            PartsEditor editor = open(t, store());
            t.press(KeyType.Tab);
            assertEquals("switches", editor.shownKind());
            assertEquals(List.of("q60-low", "q40-fast"), editor.shownIds());
            assertTrue(t.text().contains("[SWITCHES 2]"), "the shown kind is named, not only coloured");
        }
    }

    @Test
    void invalidFieldShowsItsMessageAndBlocksTheSave() throws Exception {
        MemoryPartStore store = store();
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t, store);
            t.press(KeyType.Enter).press(KeyType.ArrowDown, 3).clearField(12).type("4.7 mH");
            assertTrue(t.lineWithNext("resistance").contains("expected ohms"), t.text());
            t.press(KeyType.F2);
            assertTrue(store.applied.isEmpty(), "nothing written");
            assertEquals(0, saves.get());
            assertTrue(t.text().contains("NOT saved, 1 problem: resistance"), t.text());
        }
    }

    @Test
    void peakBelowContinuousBlocksTheSaveAndNamesTheOtherField() throws Exception {
        MemoryPartStore store = store();
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t, store);
            t.press(KeyType.Enter).press(KeyType.ArrowDown, 9).clearField(12).type("3 A");
            assertTrue(t.lineWithNext("peak_current").contains("is below continuous_current 4.00 A"), t.text());
            t.press(KeyType.F2);
            assertTrue(store.applied.isEmpty());
        }
    }

    @Test
    void validEditIsWrittenAndRanksAgain() throws Exception {
        MemoryPartStore store = store();
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t, store);
            t.press(KeyType.Enter).press(KeyType.ArrowDown, 3).clearField(12).type("4.7 mOhm").press(KeyType.F2);
            PartChange.Put put = (PartChange.Put) store.applied.get(0);
            assertEquals("m24-small", put.replacedId());
            assertEquals(MOTORS, put.file());
            assertEquals(0.0047, ((Motor) put.part()).resistance(), 0.0);
            assertEquals(DemoParts.motor("m24-small", "small 24 V can", 0.0047), put.part(),
                    "only the edited field changed");
            assertEquals(1, saves.get());
            assertTrue(t.text().contains("Saved motor m24-small"), t.text());
        }
    }

    @Test
    void copyAddsAPartWithAFreshIdToTheSameFile() throws Exception {
        MemoryPartStore store = store();
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t, store);
            t.press(KeyType.Tab).press(KeyType.ArrowDown).type("c");
            assertTrue(t.text().contains("NEW SWITCH"), t.text());
            t.press(KeyType.F2);
            PartChange.Put put = (PartChange.Put) store.applied.get(0);
            assertNull(put.replacedId(), "a copy replaces nothing");
            assertEquals(SWITCHES, put.file(), "the copy goes where its original is");
            PowerSwitch copy = (PowerSwitch) put.part();
            assertEquals("q40-fast-copy", copy.id());
            assertEquals(3, store.switches.size());
        }
    }

    @Test
    void copyCannotTakeAnIdInUse() throws Exception {
        MemoryPartStore store = store();
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t, store);
            t.type("c").clearField(30).type("m24-large").press(KeyType.F2);
            assertTrue(store.applied.isEmpty());
            assertTrue(t.lineWithNext(" id ").contains("already used"), t.text());
        }
    }

    @Test
    void addStartsBlankAndGoesToThePickedFile() throws Exception {
        MemoryPartStore store = store();
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            open(t, store);
            t.type("a").press(KeyType.F2);
            assertTrue(store.applied.isEmpty(), "a blank motor is not saved");
            assertTrue(t.text().contains("required"), t.text());
            // pick the second file: the file field is first, Space cycles it
            t.press(KeyType.ArrowUp).type(" ");
            Motor m = DemoParts.motor("m36-new", "new 36 V", 0.5);
            t.press(KeyType.ArrowDown).type(m.id());
            t.press(KeyType.ArrowDown).type(m.label());
            for (FormField f : MotorEditing.INSTANCE.fields().subList(2, MotorEditing.INSTANCE.fields().size())) {
                t.press(KeyType.ArrowDown).clearField(30).type(f.write(MotorEditing.INSTANCE.values(m).get(f.key())));
            }
            t.press(KeyType.F2);
            PartChange.Put put = (PartChange.Put) store.applied.get(0);
            assertEquals(SWITCHES, put.file());
            assertEquals(m, put.part());
        }
    }

    @Test
    void deleteAsksFirstAndKeepLeavesThePart() throws Exception {
        MemoryPartStore store = store();
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            PartsEditor editor = open(t, store);
            t.press(KeyType.ArrowDown).type("d");
            assertTrue(t.text().contains("Delete motor m24-large from motors.yaml?"), t.text());
            t.press(KeyType.Escape);
            assertTrue(store.applied.isEmpty(), "Esc keeps the part");
            t.type("d").press(KeyType.Enter);
            assertEquals(new PartChange.Remove(DemoParts.motor("m24-large", "large 24 V can", 0.35), "m24-large",
                    MOTORS), store.applied.get(0));
            assertEquals(List.of("m24-small", "m12-flat"), editor.shownIds());
            assertEquals(1, saves.get());
        }
    }

    /** Opens the editor, renames the first motor to {@code renamed} in its form and presses F2. */
    private void renameFirstMotorAndSave(TerminalDriver t, MemoryPartStore store) {
        open(t, store);
        t.press(KeyType.Enter).press(KeyType.ArrowDown).clearField(30).type("renamed").press(KeyType.F2);
    }

    @Test
    void fileChangedOnDiskOffersReloadThenWritesTheEdit() throws Exception {
        MemoryPartStore store = store();
        store.changedOnDisk = MOTORS;
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            renameFirstMotorAndSave(t, store);
            assertTrue(t.text().contains("changed by someone else"), t.text());
            assertTrue(store.applied.isEmpty());
            t.press(KeyType.Enter); // Reload, then apply mine
            assertEquals(1, store.reloads);
            assertEquals("renamed", ((Motor) ((PartChange.Put) store.applied.get(0)).part()).label());
            assertEquals(1, saves.get());
        }
    }

    @Test
    void fileChangedOnDiskCanKeepBoth() throws Exception {
        MemoryPartStore store = store();
        store.changedOnDisk = MOTORS;
        try (TerminalDriver t = new TerminalDriver(100, 30)) {
            renameFirstMotorAndSave(t, store);
            t.press(KeyType.ArrowRight).press(KeyType.Enter); // Keep both
            assertTrue(store.applied.isEmpty(), "the changed file is left alone");
            assertEquals(1, store.besides.size());
            assertTrue(t.text().contains("yours is renamed-mine in motors.mine.yaml"), t.text());
        }
    }

    @Test
    void leavingAChangedFormAsksBeforeDiscarding() throws Exception {
        MemoryPartStore store = store();
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t, store);
            t.press(KeyType.Enter).press(KeyType.ArrowDown).type("x").press(KeyType.Escape);
            assertTrue(t.text().contains("Discard the changes"), t.text());
            t.press(KeyType.Escape);
            assertTrue(t.text().contains("EDIT MOTOR m24-small"), "Esc on the question keeps editing");
        }
    }

    @Test
    void asciiTerminalGetsUnitsSpeltInAscii() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            PartsEditor.open(t.gui, store(), saves::incrementAndGet).useUnicode(false);
            t.update();
            assertOnlyAscii(t.text());
            t.press(KeyType.Enter).press(KeyType.ArrowDown, 3).clearField(12).type("4.7 mH");
            String screen = t.text();
            assertOnlyAscii(screen);
            assertTrue(screen.contains("expected ohms (Ohm, Ohm)") || screen.contains("expected ohms"), screen);
        }
    }

    private static void assertOnlyAscii(String screen) {
        for (int i = 0; i < screen.length(); i++) {
            assertTrue(screen.charAt(i) < 128, "non-ASCII '" + screen.charAt(i) + "' in\n" + screen);
        }
    }
}
