package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The catalog and demo scenarios shipped with Yoke load cleanly and obey the physics they claim. */
class BundledDataTest {

    private static final Path CATALOG = Path.of("catalog");

    static Stream<Path> demoScenarios() {
        return Stream.of("rover-wheel.yaml", "arm-joint.yaml", "conveyor.yaml").map(n -> Path.of("demo-data", n));
    }

    @Test
    void bundledCatalogLoadsWithoutErrorsOrWarnings() throws InputException {
        LoadedCatalog loaded = CatalogLoader.load(CATALOG);
        assertTrue(loaded.catalog().motors().size() >= 12, "at least 12 motors");
        assertTrue(loaded.catalog().switches().size() >= 15, "at least 15 switches");
        assertEquals(List.of(), loaded.warnings());
        assertEquals(2, loaded.files().size());
    }

    @ParameterizedTest
    @MethodSource("demoScenarios")
    void everyDemoScenarioLoadsWithoutWarnings(Path file) throws InputException {
        LoadedScenario loaded = ScenarioLoader.load(file);
        assertEquals(List.of(), loaded.warnings());
        assertTrue(loaded.scenario().profile().segments().size() >= 3);
        long pairings = 14L * 17 * loaded.scenario().bench().pwmFrequencies().size()
                * loaded.scenario().bench().gearRatios().size();
        assertTrue(pairings <= 5000, "keep demo sweeps modest");
    }

    /**
     * Law: at no load the terminal voltage balances the back-EMF, the resistive drop of the
     * no-load current and the brush drop, so ω0 = (V − R·I0 − V_brush)/k_e with k_e = k_t in SI
     * (Hughes &amp; Drury, Electric Motors and Drives, 4th ed., ch. 3). The bundled data set each
     * max_speed at 1.25 × ω0 and then rounded max_speed to 2 significant digits (up to 5 %
     * error) and R, I0, k_t to 3 digits (0.5 % each): hence the ±6 % band.
     */
    @Test
    void bundledMotorsObeyTheNoLoadSpeedLaw() throws InputException {
        List<Motor> motors = CatalogLoader.load(CATALOG).catalog().motors();
        assertAll(motors.stream().map(m -> () -> {
            double noLoadSpeed = (m.nominalVoltage() - m.resistance() * m.noLoadCurrent() - m.brushDrop())
                    / m.torqueConstant();
            double ratio = m.maxSpeed() / noLoadSpeed;
            assertEquals(1.25, ratio, 1.25 * 0.06, m.id());
        }));
    }

    /**
     * Law: steady-state energy balance of the winding: at the continuous current the copper
     * loss I²·R(T_max) through R_th,wh + R_th,ha must not lift the winding above its class limit
     * from a 25 °C ambient. R(T) = R_20·(1 + 0.00393·(T − 20)) for annealed copper (IEC 60028).
     */
    @Test
    void bundledMotorsCanCarryTheirContinuousCurrent() throws InputException {
        List<Motor> motors = CatalogLoader.load(CATALOG).catalog().motors();
        assertAll(motors.stream().map(m -> () -> {
            double hot = m.resistance() * (1 + 0.00393 * (m.maxWindingTemp() - m.resistanceTemp()));
            double rise = m.continuousCurrent() * m.continuousCurrent() * hot
                    * (m.rthWindingHousing() + m.rthHousingAmbient());
            assertTrue(rise <= m.maxWindingTemp() - 25, m.id() + " rises " + rise + " K");
            assertTrue(m.peakCurrent() >= m.continuousCurrent(), m.id());
        }));
    }

    /**
     * Datasheet convention (common practice): the continuous drain current is the one whose
     * conduction loss at T_j,max heats the junction to T_j,max from a 25 °C case through R_th,jc;
     * the bundled ratings may be lower (package limit) but never above it.
     */
    @Test
    void bundledSwitchRatingsRespectTheirThermalPath() throws InputException {
        List<PowerSwitch> switches = CatalogLoader.load(CATALOG).catalog().switches();
        assertAll(switches.stream().map(s -> () -> {
            double loss = s.rdsOnAt(s.maxJunctionTemp()) * s.idContinuous() * s.idContinuous();
            assertTrue(loss * s.rthJunctionCase() <= s.maxJunctionTemp() - 25, s.id());
            assertTrue(s.gateSourceCharge() + s.gateDrainCharge() < s.gateCharge(), s.id());
        }));
    }
}
