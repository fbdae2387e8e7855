package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.util.HashSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

class SyntheticPartsTest {

    @Test
    void aSmallCatalogIsTheHeadOfALargeOne() {
        Catalog small = SyntheticParts.catalog(10, 20, 5);
        Catalog large = SyntheticParts.catalog(200, 300, 5);
        assertEquals(small.motors(), large.motors().subList(0, 10));
        assertEquals(small.switches(), large.switches().subList(0, 20));
        assertNotEquals(SyntheticParts.motor(0, 5), SyntheticParts.motor(0, 6), "another seed, other parts");
    }

    @Test
    void motorsObeyTheMotorEquations() {
        Set<String> ids = new HashSet<>();
        for (int i = 0; i < 2000; i++) {
            Motor m = SyntheticParts.motor(i, 1);
            assertTrue(ids.add(m.id()));
            double tau = m.inductance() / m.resistance();
            assertTrue(tau >= 0.2e-3 && tau <= 3e-3, "L/R of small PM DC motors, 0.2-3 ms (common practice)");
            // no-load speed = (V - R·I0)/k_e must stay under the mechanical limit's reach: k_e·ω_max > V·0.95·1.2
            assertTrue(m.torqueConstant() * m.maxSpeed() >= 0.95 * 1.2 * m.nominalVoltage() - 1e-9);
            assertTrue(m.peakCurrent() > m.continuousCurrent() && m.noLoadCurrent() < m.continuousCurrent());
            // stall current V/R well above continuous: a motor that could stall at rated current would not need a limit
            assertTrue(m.nominalVoltage() / m.resistance() > 5 * m.continuousCurrent());
            assertTrue(Set.of(130.0, 155.0, 180.0).contains(m.maxWindingTemp()), "IEC 60085 classes B, F, H");
            assertTrue(m.tauHousing() > m.tauWinding(), "the housing is the slow thermal node (common practice)");
        }
    }

    @Test
    void switchesHavePlausibleMosfetRelations() {
        for (int i = 0; i < 2000; i++) {
            PowerSwitch s = SyntheticParts.powerSwitch(i, 1);
            assertTrue(s.rdsOnHot() > 1.5 * s.rdsOn() && s.rdsOnHot() < 2.2 * s.rdsOn(),
                    "R_DS(on) rises ×1.6–2.1 from 25 °C to 150–175 °C (common practice)");
            assertTrue(s.gateDrainCharge() < s.gateCharge() && s.gateSourceCharge() < s.gateCharge());
            assertTrue(s.idPulsed() > s.idContinuous());
            assertTrue(s.maxJunctionTemp() >= 150);
        }
        // higher voltage rating, higher R_DS(on) for the same die (silicon limit, R ∝ V^2.5)
        assertTrue(SyntheticParts.powerSwitch(0, 1).rdsOn() > 0);
    }

    /**
     * Generated parts pass the catalog's own plausibility checks (continuous current within what the
     * package sheds, heat capacity within what the motor's mass can store), so scale runs measure
     * realistic parts rather than thousands of warnings.
     */
    @Test
    void generatedPartsDrawNoPlausibilityWarnings() {
        Catalog catalog = SyntheticParts.catalog(400, 800, 3);
        long motorWarnings = catalog.motors().stream()
                .mapToLong(m -> dev.yoke.catalog.Plausibility.motorWarnings(m).size()).sum();
        long switchWarnings = catalog.switches().stream()
                .mapToLong(q -> dev.yoke.catalog.Plausibility.switchWarnings(q).size()).sum();
        assertEquals(0, motorWarnings, "motor warnings");
        assertEquals(0, switchWarnings, "switch warnings");
    }

    @Test
    void theProfileRepeatsFromRestAndHasTheAskedShape() {
        Scenario s = SyntheticParts.scenario(10, 3, 4, 2);
        assertEquals(10, s.profile().segments().size());
        assertEquals(3, s.bench().pwmFrequencies().size());
        assertEquals(4, s.bench().gearRatios().size());
        assertTrue(s.profile().repeat());
        Segment first = s.profile().segments().get(0);
        Segment last = s.profile().segments().get(9);
        assertEquals(0, first.speedStart(), 0.0);
        assertEquals(0, last.speedEnd(), 0.0, "a repeating cycle ends where it starts");
        for (int i = 1; i < 10; i++) {
            assertEquals(s.profile().segments().get(i - 1).speedEnd(), s.profile().segments().get(i).speedStart(), 0.0,
                    "speed is continuous between segments");
        }
    }
}
