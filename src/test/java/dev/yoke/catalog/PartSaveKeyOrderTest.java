package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A part save that sets a key the part's block lacks puts it where the file format's key order
 * ({@link PartFields}, as in docs/file-formats.md) has it: on a new line after the key that precedes
 * it, not at the end of the block. Each check compares the whole text with the file as it was plus
 * the expected line(s), so that comments, blank lines and the other parts are seen to be untouched,
 * and then loads the folder again to see the part come back equal.
 */
class PartSaveKeyOrderTest {

    /** Invented switches, block style, with comments inside and between the parts. */
    private static final String SWITCHES = """
            # Invented switches for the key-order tests; no real products.
            switches:
              # first switch: values read off the bench
              - id: kt-a
                vds_max: 40 V
                id_continuous: 60 A   # case at 25 degC
                id_pulsed: 240 A
                rds_on: 4 mOhm        # at 25 degC
                # gate charges from the curve
                qg: 30 nC
                qgs: 8 nC
                qgd: 7 nC
                plateau_voltage: 4.5 V
                gate_resistance_internal: 1.2 ohm
                coss: 600 pF
                diode_vf: 0.85 V
                qrr: 40 nC
                rth_jc: 1.1 K/W
                tj_max: 175 degC
                price: 0.9

              # second switch, untouched by every test
              - id: kt-b
                vds_max: 60 V
                id_continuous: 40 A
                id_pulsed: 160 A
                rds_on: 9 mOhm
                qg: 20 nC
                qgs: 5 nC
                qgd: 6 nC
                plateau_voltage: 4.8 V
                gate_resistance_internal: 1.5 ohm
                coss: 400 pF
                diode_vf: 0.9 V
                qrr: 30 nC
                rth_jc: 1.5 K/W
                tj_max: 175 degC
                price: 0.7
            """;

    @TempDir
    Path folder;

    private Path write(String name, String text) throws IOException {
        return Files.writeString(folder.resolve(name), text);
    }

    private Path copyStoreMotors() throws IOException {
        try (InputStream in = getClass().getResourceAsStream("/store/motors.yaml")) {
            Path file = folder.resolve("motors.yaml");
            Files.copy(in, file);
            return file;
        }
    }

    private static PowerSwitch sw(CatalogStore store, String id) {
        return store.catalog().switches().stream().filter(s -> s.id().equals(id)).findFirst().orElseThrow();
    }

    private static Motor motor(CatalogStore store, String id) {
        return store.catalog().motors().stream().filter(m -> m.id().equals(id)).findFirst().orElseThrow();
    }

    private static PowerSwitch withOnResistance(PowerSwitch s, double rdsOn, double rdsOnHot, double hotTemp) {
        return new PowerSwitch(s.id(), s.label(), s.packageName(), s.vdsMax(), s.idContinuous(), s.idPulsed(),
                rdsOn, rdsOnHot, hotTemp, s.gateCharge(), s.gateSourceCharge(), s.gateDrainCharge(),
                s.plateauVoltage(), s.gateResistanceInternal(), s.outputCapacitance(), s.diodeForwardVoltage(),
                s.reverseRecoveryCharge(), s.rthJunctionCase(), s.maxJunctionTemp(), s.price());
    }

    private static Motor withBrushDrop(Motor m, double brushDrop) {
        return new Motor(m.id(), m.label(), m.nominalVoltage(), m.resistance(), m.resistanceTemp(), m.inductance(),
                m.torqueConstant(), m.noLoadCurrent(), m.continuousCurrent(), m.peakCurrent(), m.maxSpeed(),
                m.rotorInertia(), m.rthWindingHousing(), m.rthHousingAmbient(), m.tauWinding(), m.tauHousing(),
                m.maxWindingTemp(), brushDrop, m.mass(), m.price());
    }

    /**
     * Saves switch kt-a of {@link #SWITCHES} as {@code edit} makes it, checks that the folder loads it
     * back equal, and returns the saved file's text.
     */
    private String saveSwitchA(UnaryOperator<PowerSwitch> edit) throws Exception {
        Path file = write("switches.yaml", SWITCHES);
        CatalogStore store = CatalogStore.open(folder);
        PowerSwitch edited = edit.apply(sw(store, "kt-a"));
        store.saveSwitch(edited, "kt-a", null);
        assertEquals(edited, sw(CatalogStore.open(folder), "kt-a"), "the file loads back as saved");
        return Files.readString(file);
    }

    @Test
    void hotOnResistanceSetForTheFirstTimeGoesRightAfterTheColdOne() throws Exception {
        String saved = saveSwitchA(a -> withOnResistance(a, a.rdsOn(), 0.0072, 125));
        // two added lines in table order, after rds_on (and its comment), before the comment that
        // opens the gate charges; every other line as it was
        String expected = SWITCHES.replace("    rds_on: 4 mOhm        # at 25 degC\n",
                "    rds_on: 4 mOhm        # at 25 degC\n    rds_on_hot: 7.2 mOhm\n    rds_on_hot_temp: 125 degC\n");
        assertEquals(expected, saved);
    }

    @Test
    void derivedHotValuesWrittenOutByAColdEditFollowTableOrder() throws Exception {
        // The file gives neither rds_on_hot nor rds_on_hot_temp; the loader derives both from rds_on,
        // so an edit of rds_on writes them out. They go after rds_on, in table order.
        String saved = saveSwitchA(a -> withOnResistance(a, 0.0035, a.rdsOnHot(), a.rdsOnHotTemp()));
        List<String> lines = List.of(saved.split("\n", -1));
        int cold = lines.indexOf("    rds_on: 3.5 mOhm        # at 25 degC");
        assertTrue(lines.get(cold + 1).startsWith("    rds_on_hot: "), saved);
        assertTrue(lines.get(cold + 2).startsWith("    rds_on_hot_temp: "), saved);
        assertEquals("    # gate charges from the curve", lines.get(cold + 3), saved);
        assertEquals(SWITCHES.split("\n", -1).length + 2, lines.size(), "two lines added, none lost");
    }

    @Test
    void hotOnResistanceAloneAlsoWritesTheTemperatureItNeeds() throws Exception {
        // The loader refuses rds_on_hot without rds_on_hot_temp. A file that gives neither gets the
        // derived temperature; setting only the hot resistance must write that temperature out too.
        String saved = saveSwitchA(a -> withOnResistance(a, a.rdsOn(), 0.0072, a.rdsOnHotTemp()));
        List<String> lines = List.of(saved.split("\n", -1));
        int cold = lines.indexOf("    rds_on: 4 mOhm        # at 25 degC");
        assertEquals("    rds_on_hot: 7.2 mOhm", lines.get(cold + 1), saved);
        assertTrue(lines.get(cold + 2).startsWith("    rds_on_hot_temp: "), saved);
    }

    @Test
    void motorFieldSetForTheFirstTimeGoesBeforeTheKeysThatFollowItInTableOrder() throws Exception {
        // test-m-small has no brush_drop: the table puts it after max_winding_temp, before mass.
        Path file = copyStoreMotors();
        String before = Files.readString(file);
        CatalogStore store = CatalogStore.open(folder);
        Motor edited = withBrushDrop(motor(store, "test-m-small"), 0.8);
        store.saveMotor(edited, "test-m-small", null);

        String expected = before.replace("    max_winding_temp: 155 degC\n    mass: 350 g\n",
                "    max_winding_temp: 155 degC\n    brush_drop: 800 mV\n    mass: 350 g\n");
        assertEquals(expected, Files.readString(file));
        assertEquals(edited, motor(CatalogStore.open(folder), "test-m-small"), "the file loads back as saved");
    }
}
