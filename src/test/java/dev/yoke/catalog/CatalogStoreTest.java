package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CatalogStoreTest {

    @TempDir
    Path folder;

    Path motorsFile;
    Path switchesFile;
    String motorsText;

    @BeforeEach
    void copyCatalog() throws IOException {
        for (String name : List.of("motors.yaml", "switches.yaml")) {
            try (InputStream in = getClass().getResourceAsStream("/store/" + name)) {
                Files.copy(in, folder.resolve(name));
            }
        }
        motorsFile = folder.resolve("motors.yaml");
        switchesFile = folder.resolve("switches.yaml");
        motorsText = Files.readString(motorsFile);
    }

    @Test
    void editedFieldChangesOnlyItsOwnLine() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor small = motor(store, "test-m-small");
        Motor edited = withResistance(small, 1.35);
        store.saveMotor(edited, "test-m-small", null);

        List<String> changed = changedLines(motorsText, Files.readString(motorsFile));
        assertEquals(List.of("    resistance: 1.35 Ohm"), changed, "comments, blank lines and key order are kept");
        assertEquals(edited, motor(CatalogStore.open(folder), "test-m-small"));
        assertEquals(motorsText, Files.readString(AtomicFile.backupOf(motorsFile)), "the previous file is the backup");
    }

    @Test
    void unchangedPartWritesNothing() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        store.saveMotor(motor(store, "test-m-fast"), "test-m-fast", null);
        assertEquals(motorsText, Files.readString(motorsFile));
        assertFalse(Files.exists(AtomicFile.backupOf(motorsFile)));
    }

    @Test
    void speedConstantGivesWayToTorqueConstantWhenEdited() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor fast = motor(store, "test-m-fast");
        Motor edited = new Motor(fast.id(), fast.label(), fast.nominalVoltage(), fast.resistance(),
                fast.resistanceTemp(), fast.inductance(), 0.025, fast.noLoadCurrent(), fast.continuousCurrent(),
                fast.peakCurrent(), fast.maxSpeed(), fast.rotorInertia(), fast.rthWindingHousing(),
                fast.rthHousingAmbient(), fast.tauWinding(), fast.tauHousing(), fast.maxWindingTemp(),
                fast.brushDrop(), fast.mass(), fast.price());
        store.saveMotor(edited, "test-m-fast", null);
        assertEquals(List.of("    torque_constant: 25 mN*m/A   # given as a speed constant"),
                changedLines(motorsText, Files.readString(motorsFile)));
        assertEquals(edited, motor(CatalogStore.open(folder), "test-m-fast"));
    }

    @Test
    void renamedPartKeepsItsPlace() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor renamed = PartText.MOTOR.withIdAndLabel(motor(store, "test-m-small"), "test-m-tiny", null);
        store.saveMotor(renamed, "test-m-small", null);
        assertEquals(List.of("  - id: test-m-tiny"), changedLines(motorsText, Files.readString(motorsFile)));
        assertEquals(List.of("test-m-tiny", "test-m-fast"), ids(store));
    }

    @Test
    void newPartIsAppendedAtTheEndOfItsList() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor copy = store.copyOfMotor("test-m-small");
        assertEquals("test-m-small-copy", copy.id());
        store.saveMotor(copy, null, motorsFile);
        String text = Files.readString(motorsFile);
        assertTrue(text.startsWith(motorsText), "the old text stays as it was, the new part follows it");
        assertTrue(text.substring(motorsText.length()).startsWith("  - id: test-m-small-copy\n    label: "), text);
        assertEquals(copy, motor(CatalogStore.open(folder), "test-m-small-copy"));
        assertEquals("test-m-small-copy-2", store.copyOfMotor("test-m-small").id());
    }

    @Test
    void newFileIsCreatedForANewPart() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        PowerSwitch copy = store.copyOfSwitch("test-s-40v");
        store.saveSwitch(copy, null, Path.of("more-switches.yaml"));
        assertEquals(copy, CatalogStore.open(folder).catalog().switches().stream()
                .filter(s -> s.id().equals(copy.id())).findFirst().orElseThrow());
        assertEquals(folder.resolve("more-switches.yaml"), store.fileOfSwitch(copy.id()).orElseThrow());
    }

    @Test
    void partMovesToAnotherFile() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor fast = motor(store, "test-m-fast");
        store.saveMotor(fast, "test-m-fast", folder.resolve("fast.yaml"));
        CatalogStore again = CatalogStore.open(folder);
        assertEquals(fast, motor(again, "test-m-fast"));
        assertEquals(folder.resolve("fast.yaml"), again.fileOfMotor("test-m-fast").orElseThrow());
        assertFalse(Files.readString(motorsFile).contains("test-m-fast"));
    }

    @Test
    void deletedPartLosesItsLinesAndNothingElse() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor small = motor(store, "test-m-small");
        store.deleteMotor("test-m-fast");
        assertEquals(List.of("test-m-small"), ids(store));
        assertEquals(small, motor(CatalogStore.open(folder), "test-m-small"));
        assertTrue(Files.readString(motorsFile).startsWith(motorsText.substring(0, motorsText.indexOf("  - id: test-m-fast"))));
    }

    @Test
    void switchEditWritesTheDerivedHotResistance() throws Exception {
        // The file gives no rds_on_hot, so the loader derives it from rds_on; an edit of rds_on
        // that keeps the hot value must write it out, or the part would load back different.
        CatalogStore store = CatalogStore.open(folder);
        PowerSwitch s = store.catalog().switches().get(0);
        PowerSwitch edited = new PowerSwitch(s.id(), s.label(), s.packageName(), s.vdsMax(), s.idContinuous(),
                s.idPulsed(), 0.0035, s.rdsOnHot(), s.rdsOnHotTemp(), s.gateCharge(), s.gateSourceCharge(),
                s.gateDrainCharge(), s.plateauVoltage(), s.gateResistanceInternal(), s.outputCapacitance(),
                s.diodeForwardVoltage(), s.reverseRecoveryCharge(), s.rthJunctionCase(), s.maxJunctionTemp(),
                s.price());
        store.saveSwitch(edited, s.id(), null);
        assertEquals(edited, CatalogStore.open(folder).catalog().switches().get(0));
    }

    @Test
    void fileChangedOnDiskIsNeverOverwritten() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        String theirs = motorsText.replace("price: 42", "price: 44");
        Files.writeString(motorsFile, theirs);
        Motor edited = withResistance(motor(store, "test-m-small"), 1.35);
        ChangedOnDiskException e = assertThrows(ChangedOnDiskException.class,
                () -> store.saveMotor(edited, "test-m-small", null));
        assertEquals(motorsFile, e.file());
        assertEquals(theirs, Files.readString(motorsFile), "the other writer's version stays");
    }

    @Test
    void reloadThenSaveKeepsBothChanges() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor edited = withResistance(motor(store, "test-m-small"), 1.35);
        Files.writeString(motorsFile, motorsText.replace("price: 65", "price: 70"));
        assertThrows(ChangedOnDiskException.class, () -> store.saveMotor(edited, "test-m-small", null));
        store.reload();
        store.saveMotor(edited, "test-m-small", null);
        CatalogStore again = CatalogStore.open(folder);
        assertEquals(edited, motor(again, "test-m-small"));
        assertEquals(70.0, motor(again, "test-m-fast").price(), "the other writer's change is kept");
    }

    @Test
    void keepBothWritesTheEditBesideUnderAFreshId() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor edited = withResistance(motor(store, "test-m-small"), 1.35);
        String theirs = motorsText.replace("price: 42", "price: 44");
        Files.writeString(motorsFile, theirs);
        CatalogStore.Saved saved = store.saveMotorBeside(edited, motorsFile);
        assertEquals(folder.resolve("motors.mine.yaml"), saved.file());
        assertEquals("test-m-small-mine", saved.id());
        assertEquals(theirs, Files.readString(motorsFile));
        CatalogStore again = CatalogStore.open(folder);
        assertEquals(44.0, motor(again, "test-m-small").price());
        assertEquals(PartText.MOTOR.withIdAndLabel(edited, "test-m-small-mine", null), motor(again, "test-m-small-mine"));
        assertTrue(Files.readString(saved.file()).contains("changed on disk"));
    }

    @Test
    void secondStoreOnTheSameFolderCannotOverwriteTheFirstOnesSave() throws Exception {
        CatalogStore first = CatalogStore.open(folder);
        CatalogStore second = CatalogStore.open(folder);
        first.saveMotor(withResistance(motor(first, "test-m-small"), 1.35), "test-m-small", null);
        assertThrows(ChangedOnDiskException.class,
                () -> second.saveMotor(withResistance(motor(second, "test-m-small"), 1.5), "test-m-small", null));
        assertEquals(1.35, motor(CatalogStore.open(folder), "test-m-small").resistance());
    }

    @Test
    void refusedValuePutsThePreviousFileBack() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor small = motor(store, "test-m-small");
        // A peak current below the continuous one is refused by the loader's rules.
        Motor broken = new Motor(small.id(), small.label(), small.nominalVoltage(), small.resistance(),
                small.resistanceTemp(), small.inductance(), small.torqueConstant(), small.noLoadCurrent(),
                small.continuousCurrent(), 1.0, small.maxSpeed(), small.rotorInertia(), small.rthWindingHousing(),
                small.rthHousingAmbient(), small.tauWinding(), small.tauHousing(), small.maxWindingTemp(),
                small.brushDrop(), small.mass(), small.price());
        InputException e = assertThrows(InputException.class, () -> store.saveMotor(broken, small.id(), null));
        assertTrue(e.getMessage().contains("peak_current"), e.getMessage());
        assertEquals(motorsText, Files.readString(motorsFile));
        assertEquals(small, motor(store, "test-m-small"), "the store still holds the loaded part");
        store.saveMotor(withResistance(small, 1.4), small.id(), null);
        assertEquals(1.4, motor(CatalogStore.open(folder), "test-m-small").resistance(), "the store stays usable");
    }

    @Test
    void idTakenByAnotherPartIsRefused() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor clash = PartText.MOTOR.withIdAndLabel(motor(store, "test-m-small"), "test-m-fast", null);
        IOException e = assertThrows(IOException.class, () -> store.saveMotor(clash, "test-m-small", null));
        assertTrue(e.getMessage().contains("already used"), e.getMessage());
        assertEquals(motorsText, Files.readString(motorsFile));
    }

    @Test
    void targetOutsideTheFolderIsRefused() throws Exception {
        CatalogStore store = CatalogStore.open(folder);
        Motor copy = store.copyOfMotor("test-m-small");
        assertThrows(UnsafePathException.class, () -> store.saveMotor(copy, null, Path.of("../escape.yaml")));
        assertThrows(UnsafePathException.class, () -> store.saveMotor(copy, null, Path.of("notes.txt")));
        assertFalse(Files.exists(folder.getParent().resolve("escape.yaml")));
    }

    @Test
    void saveWaitsForTheLockAndGivesUpWhenAnotherProcessHoldsIt() throws Exception {
        Process holder = LockHolder.start(folder);
        try {
            assertThrows(CatalogBusyException.class,
                    () -> CatalogLock.acquire(folder, java.time.Duration.ofMillis(200)).close());
        } finally {
            holder.destroyForcibly().waitFor();
        }
        // The kernel drops the lock of a killed process: the catalog is never left locked.
        CatalogLock.acquire(folder, java.time.Duration.ofSeconds(5)).close();
    }

    /** Every bundled part, written anew as a copy, loads back as the very same doubles (exact number format). */
    @Test
    void everyBundledPartCopiesExactly() throws Exception {
        Path bundled = Files.createDirectories(folder.resolve("bundled"));
        try (var files = Files.list(Path.of("catalog"))) {
            for (Path file : files.filter(p -> p.toString().endsWith(".yaml")).toList()) {
                Files.copy(file, bundled.resolve(file.getFileName()));
            }
        }
        CatalogStore store = CatalogStore.open(bundled);
        for (Motor m : store.catalog().motors()) {
            store.saveMotor(store.copyOfMotor(m.id()), null, Path.of("copies.yaml"));
        }
        for (PowerSwitch s : store.catalog().switches()) {
            store.saveSwitch(store.copyOfSwitch(s.id()), null, Path.of("copies.yaml"));
        }
        CatalogStore again = CatalogStore.open(bundled);
        for (Motor m : again.catalog().motors()) {
            if (!m.id().endsWith("-copy")) {
                Motor copy = motor(again, m.id() + "-copy");
                assertEquals(PartText.MOTOR.withIdAndLabel(m, copy.id(), copy.label()), copy);
            }
        }
        List<PowerSwitch> switches = again.catalog().switches();
        for (PowerSwitch s : switches) {
            if (!s.id().endsWith("-copy")) {
                PowerSwitch copy = switches.stream().filter(c -> c.id().equals(s.id() + "-copy")).findFirst().orElseThrow();
                assertEquals(PartText.SWITCH.withIdAndLabel(s, copy.id(), copy.label()), copy);
            }
        }
        assertEquals(2 * again.catalog().motors().stream().filter(m -> !m.id().endsWith("-copy")).count(),
                again.catalog().motors().size(), "every motor has its copy");
    }

    private static Motor motor(CatalogStore store, String id) {
        return store.catalog().motors().stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    private static List<String> ids(CatalogStore store) {
        return store.catalog().motors().stream().map(Motor::id).toList();
    }

    private static Motor withResistance(Motor m, double resistance) {
        return new Motor(m.id(), m.label(), m.nominalVoltage(), resistance, m.resistanceTemp(), m.inductance(),
                m.torqueConstant(), m.noLoadCurrent(), m.continuousCurrent(), m.peakCurrent(), m.maxSpeed(),
                m.rotorInertia(), m.rthWindingHousing(), m.rthHousingAmbient(), m.tauWinding(), m.tauHousing(),
                m.maxWindingTemp(), m.brushDrop(), m.mass(), m.price());
    }

    /** Lines of {@code after} that differ from the line at the same place in {@code before}. */
    private static List<String> changedLines(String before, String after) {
        String[] a = before.split("\n", -1);
        String[] b = after.split("\n", -1);
        assertEquals(a.length, b.length, "same number of lines");
        List<String> changed = new ArrayList<>();
        for (int i = 0; i < a.length; i++) {
            if (!a[i].equals(b[i])) {
                changed.add(b[i]);
            }
        }
        return changed;
    }
}
