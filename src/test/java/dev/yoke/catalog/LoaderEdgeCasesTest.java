package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Loading behaviour beyond the broken corpus: encodings, size limits, defaults, conversions, warnings. */
class LoaderEdgeCasesTest {

    static final String MOTOR = """
            motors:
              - id: m1
                label: test motor
                nominal_voltage: 24 V
                resistance: 1.2 Ohm
                inductance: 0.5 mH
                torque_constant: 50 mN*m/A
                no_load_current: 0.2 A
                continuous_current: 3 A
                peak_current: 15 A
                max_speed: 5000 rpm
                rotor_inertia: 50 g*cm^2
                rth_winding_housing: 3 K/W
                rth_housing_ambient: 8 K/W
                tau_winding: 30 s
                tau_housing: 900 s
                max_winding_temp: 155 degC
                mass: 0.5 kg
                price: 30
            """;

    static final String SWITCH = """
            switches:
              - id: q1
                vds_max: 60 V
                id_continuous: 80 A
                id_pulsed: 300 A
                rds_on: 4 mOhm
                qg: 50 nC
                qgs: 15 nC
                qgd: 12 nC
                plateau_voltage: 4.5 V
                gate_resistance_internal: 1.5 Ohm
                coss: 600 pF
                diode_vf: 0.9 V
                qrr: 40 nC
                rth_jc: 0.6 K/W
                tj_max: 175 degC
                price: 1.2
            """;

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
    }

    @Test
    void byteOrderMarkIsSkipped() throws Exception {
        Path file = dir.resolve("bom.yaml");
        byte[] body = MOTOR.getBytes(StandardCharsets.UTF_8);
        byte[] withBom = new byte[body.length + 3];
        withBom[0] = (byte) 0xEF;
        withBom[1] = (byte) 0xBB;
        withBom[2] = (byte) 0xBF;
        System.arraycopy(body, 0, withBom, 3, body.length);
        Files.write(file, withBom);
        LoadedCatalog loaded = CatalogLoader.loadFiles(List.of(file));
        assertEquals("m1", loaded.catalog().motors().get(0).id());
        assertEquals(2, loaded.motorOrigins().get("m1").line(), "line numbers are not shifted by the mark");
    }

    @Test
    void crlfLineEndingsLoadWithTheSameLines() throws Exception {
        Path file = write("crlf.yaml", MOTOR.replace("\n", "\r\n"));
        LoadedCatalog loaded = CatalogLoader.loadFiles(List.of(file));
        assertEquals(1.2, loaded.catalog().motors().get(0).resistance());
        Path broken = write("crlf-broken.yaml", MOTOR.replace("1.2 Ohm", "1.2 mH").replace("\n", "\r\n"));
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.loadFiles(List.of(broken)));
        assertEquals(5, e.errors().get(0).line());
    }

    /** A 50 MB file is refused from its size alone, before any byte is parsed. */
    @Test
    void fiftyMegabyteFileIsRefusedWithItsSize() throws Exception {
        Path big = dir.resolve("huge.yaml");
        byte[] block = ("# " + "x".repeat(1021) + "\n").getBytes(StandardCharsets.US_ASCII);
        try (OutputStream out = Files.newOutputStream(big)) {
            out.write(MOTOR.getBytes(StandardCharsets.UTF_8));
            for (int i = 0; i < 50 * 1024; i++) {
                out.write(block);
            }
        }
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.loadFiles(List.of(big)));
        assertTrue(e.errors().get(0).message().startsWith("the file is 50.0 MB"), e.getMessage());
        InputException s = assertThrows(InputException.class, () -> ScenarioLoader.load(big));
        assertTrue(s.errors().get(0).message().contains("MB"), s.getMessage());
    }

    @Test
    void everyErrorOfEveryFileIsReportedInOneRun() throws Exception {
        Path a = write("a.yaml", MOTOR.replace("1.2 Ohm", "1.2 mH").replace("0.5 mH", "-1 mH"));
        Path b = write("b.yaml", SWITCH.replace("60 V", "60 A").replace("4 mOhm", "NaN"));
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.loadFiles(List.of(a, b)));
        assertEquals(List.of("a.yaml:5:resistance", "a.yaml:6:inductance", "b.yaml:3:vds_max", "b.yaml:6:rds_on"),
                e.errors().stream().map(p -> p.file().getFileName() + ":" + p.line() + ":" + p.field()).toList());
    }

    @Test
    void folderLoadReadsYamlFilesInNameOrderAndSkipsOthers() throws Exception {
        write("b-switches.yml", SWITCH);
        write("a-motors.yaml", MOTOR);
        write("notes.txt", "not yaml");
        LoadedCatalog loaded = CatalogLoader.load(dir);
        assertEquals(List.of("a-motors.yaml", "b-switches.yml"),
                loaded.files().stream().map(f -> f.path().getFileName().toString()).toList());
        assertEquals(1, loaded.catalog().motors().size());
        assertEquals(1, loaded.catalog().switches().size());
        assertEquals(Files.size(dir.resolve("a-motors.yaml")), loaded.files().get(0).size());
    }

    @Test
    void defaultsApplyWhenOptionalKeysAreAbsent() throws Exception {
        LoadedCatalog loaded = CatalogLoader.loadFiles(List.of(write("m.yaml", MOTOR), write("s.yaml", SWITCH)));
        Motor m = loaded.catalog().motors().get(0);
        assertEquals(20.0, m.resistanceTemp());
        assertEquals(0.0, m.brushDrop());
        PowerSwitch s = loaded.catalog().switches().get(0);
        // Common-practice default hot on-resistance: 1.9 × the 25 °C value at 150 °C.
        assertEquals(4e-3 * PowerSwitch.DEFAULT_HOT_FACTOR, s.rdsOnHot(), 1e-15);
        assertEquals(PowerSwitch.DEFAULT_HOT_TEMP, s.rdsOnHotTemp());
        assertEquals("", s.packageName());
    }

    /**
     * k_e = 1/k_n and k_t = k_e in SI units (Hughes &amp; Drury, Electric Motors and Drives, ch. 3):
     * 382 rpm/V = 40.003 rad/s/V gives k_t = 0.024998 N·m/A; 2.618 V/krpm = 0.0250 V·s/rad.
     */
    @Test
    void speedAndBackEmfConstantsBecomeTheTorqueConstant() throws Exception {
        Motor byKn = CatalogLoader.loadFiles(List.of(write("kn.yaml",
                MOTOR.replace("torque_constant: 50 mN*m/A", "speed_constant: 382 rpm/V")))).catalog().motors().get(0);
        assertEquals(30 / Math.PI / 382, byKn.torqueConstant(), 1e-12);
        Motor byKe = CatalogLoader.loadFiles(List.of(write("ke.yaml",
                MOTOR.replace("torque_constant: 50 mN*m/A", "back_emf_constant: 2.618 V/krpm")))).catalog()
                .motors().get(0);
        assertEquals(2.618 * 60 / (2 * Math.PI * 1000), byKe.torqueConstant(), 1e-12);
    }

    /** (24 − 1.2·0.2)/0.05 = 475 rad/s no-load; a 20 000 rpm (2094 rad/s) max speed is 4.4× that. */
    @Test
    void implausibleMotorLoadsWithAWarningAndIsMarked() throws Exception {
        Path file = write("odd.yaml", MOTOR.replace("5000 rpm", "20000 rpm"));
        LoadedCatalog loaded = CatalogLoader.loadFiles(List.of(file));
        assertEquals(1, loaded.catalog().motors().size());
        assertEquals(1, loaded.warnings().size());
        Problem w = loaded.warnings().get(0);
        assertTrue(w.warning());
        assertEquals("max_speed", w.field());
        assertEquals(11, w.line());
        assertTrue(w.toString().contains(": warning: max_speed: "), w.toString());
        assertTrue(loaded.implausibleIds().contains("m1"));
    }

    /**
     * Datasheet convention (common practice): I_D = sqrt((T_j,max − 25)/(R_DS(on)(T_j,max)·R_th,jc)).
     * Here: R(175 °C) = 4 mΩ·(1 + 0.9/125·150) = 8.32 mΩ, so I_D ≤ sqrt(150/(8.32e-3·0.6)) = 173 A; 400 A is not.
     */
    @Test
    void switchRatedBeyondItsThermalPathDrawsAWarning() throws Exception {
        Path file = write("hot.yaml", SWITCH.replace("id_continuous: 80 A", "id_continuous: 400 A")
                .replace("id_pulsed: 300 A", "id_pulsed: 1000 A"));
        LoadedCatalog loaded = CatalogLoader.loadFiles(List.of(file));
        assertEquals(List.of("id_continuous"), loaded.warnings().stream().map(Problem::field).toList());
        Path fine = write("fine.yaml", SWITCH.replace("id_continuous: 80 A", "id_continuous: 170 A"));
        assertEquals(List.of(), CatalogLoader.loadFiles(List.of(fine)).warnings());
    }

    @Test
    void longElectricalTimeConstantDrawsAWarning() throws Exception {
        LoadedCatalog loaded = CatalogLoader.loadFiles(List.of(write("l.yaml", MOTOR.replace("0.5 mH", "5 H"))));
        assertEquals(List.of("inductance"), loaded.warnings().stream().map(Problem::field).toList());
    }

    @Test
    void scenarioDefaultsAndConversions() throws Exception {
        Path file = write("s.yaml", """
                name: minimal
                bench:
                  bus_voltage: 24
                  pwm_frequencies: 20 kHz
                  modulation: Sign-Magnitude
                  dead_time: 0.2 us
                  gate_drive_voltage: 12 V
                  gate_resistance: 0
                  max_duty: 95 %
                  ambient_temp: 300 K
                  switch_rth_case_ambient: 20 K/W
                  gear_ratios: [10]
                  gear_efficiency: 0.9
                  limits:
                    vds_derating: 0.8
                    junction_temp_limit: 125 degC
                    winding_temp_margin: 10 K
                    ripple_fraction: 0.3
                profile:
                  load_inertia: 0
                  segments:
                    - duration: 2 min
                      speed_start: 60 rpm
                      torque: 1 N*m
                """);
        Scenario s = ScenarioLoader.load(file).scenario();
        assertEquals(24.0, s.bench().busVoltageMin());
        assertEquals(24.0, s.bench().busVoltageMax());
        assertEquals(List.of(20000.0), s.bench().pwmFrequencies());
        assertEquals(0.95, s.bench().maxDuty());
        assertEquals(26.85, s.bench().ambientTemp(), 1e-12); // SI Brochure 2.3.1: 300 K − 273.15
        Profile p = s.profile();
        assertTrue(p.repeat());
        assertEquals("segment 1", p.segments().get(0).label());
        assertEquals(120.0, p.segments().get(0).duration());
        assertEquals(2 * Math.PI, p.segments().get(0).speedEnd(), 1e-12); // 60 rpm = 1 rev/s = 2π rad/s
    }

    /** FIPS 180-2, appendix B.1: SHA-256("abc"). */
    @Test
    void fileDigestIsSha256() {
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                CatalogFile.sha256("abc".getBytes(StandardCharsets.US_ASCII)));
    }

    @Test
    void missingFolderAndFileAreReportedNotThrown() {
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(dir.resolve("nope")));
        assertTrue(e.getMessage().endsWith("nope: no such catalog folder"), e.getMessage());
        InputException f = assertThrows(InputException.class, () -> ScenarioLoader.load(dir.resolve("x.yaml")));
        assertTrue(f.getMessage().endsWith("x.yaml: no such file"), f.getMessage());
    }
}
