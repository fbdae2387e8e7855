package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import dev.yoke.model.Limits;
import dev.yoke.model.Modulation;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.util.List;
import java.util.function.UnaryOperator;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every margin and every advisory: one change that makes it fire, and the quiet baseline that keeps it
 * silent. The baseline is a gentle, comfortably sized drive (invented numbers).
 */
class MarginsAndAdvisoriesTest {

    /** A comfortable machine: sign-magnitude at 40 kHz, modest speeds and torques, repeating. */
    static Scenario quietScenario() {
        Bench bench = new Bench(24, 22, 26, List.of(40e3), Modulation.SIGN_MAGNITUDE, 300e-9, 12, 4.7, 0.97, 25, 30,
                List.of(5.0), 0.85, new Limits(0.8, 150, 10, 0.5));
        Profile profile = new Profile(0.005, true, List.of(
                new Segment("accelerate", 0.3, 0, 20, 0.5),
                new Segment("run", 1.0, 20, 20, 0.5),
                new Segment("brake", 0.3, 20, 0, 0.5),
                new Segment("reverse", 0.3, 0, -20, -0.5),
                new Segment("return", 1.0, -20, -20, -0.5),
                new Segment("stop", 0.3, -20, 0, -0.5)));
        return new Scenario("quiet", bench, profile);
    }

    static PairingResult evaluate(Scenario scenario, Motor motor, PowerSwitch q) {
        PairingEvaluator e = DriveEvaluator.of(scenario, new Catalog(List.of(motor), List.of(q)));
        PairingResult r = e.explain(0, 0, 0, 0);
        double[] row = new double[Metric.COUNT];
        e.summarize(e.prepare(0, 0, 0), 0, row);
        assertEquals(r.advisories().stream().mapToInt(Advisory::bit).sum(), (int) row[Metric.ADVISORIES.ordinal()]);
        return r;
    }

    static PairingResult quiet() {
        return evaluate(quietScenario(), TestParts.motor(), TestParts.powerSwitch());
    }

    @Test
    void quietBaselineIsFeasibleWithoutAdvisories() {
        PairingResult r = quiet();
        assertAll(Stream.of(Constraint.values()).map(c -> () ->
                assertTrue(r.margins().get(c) > 0, c + " margin " + r.margins().get(c))));
        assertTrue(r.feasible());
        assertEquals(List.of(), List.copyOf(r.advisories()));
    }

    static Scenario bench(Scenario s, UnaryOperator<Bench> change) {
        return new Scenario(s.name(), change.apply(s.bench()), s.profile());
    }

    static Bench limits(Bench b, String field, Object value) {
        return Records.with(b, "limits", Records.with(b.limits(), field, value));
    }

    static Stream<Arguments> violations() {
        Scenario s = quietScenario();
        Motor m = TestParts.motor();
        PowerSwitch q = TestParts.powerSwitch();
        return Stream.of(
                // Derated 0.8·60 V = 48 V against a 52 V bus peak.
                Arguments.of(Constraint.VDS_RATING, bench(s, b -> Records.with(b, "busVoltageMax", 52.0)), m, q),
                Arguments.of(Constraint.SWITCH_PEAK_CURRENT, s, m, Records.with(q, "idPulsed", 1.0)),
                Arguments.of(Constraint.SWITCH_RMS_CURRENT, s, m, Records.with(q, "idContinuous", 0.5)),
                Arguments.of(Constraint.JUNCTION_TEMP, bench(s, b -> limits(b, "junctionTempLimit", 25.5)), m, q),
                Arguments.of(Constraint.WINDING_TEMP, s, Records.with(m, "maxWindingTemp", 40.0), q),
                Arguments.of(Constraint.MOTOR_PEAK_CURRENT, s, Records.with(m, "peakCurrent", 1.0), q),
                Arguments.of(Constraint.MOTOR_SPEED, s, Records.with(m, "maxSpeed", 50.0), q),
                Arguments.of(Constraint.VOLTAGE_HEADROOM, bench(s, b -> Records.with(b, "busVoltageMin", 4.0)), m, q),
                Arguments.of(Constraint.RIPPLE, bench(s, b -> limits(b, "rippleFraction", 0.001)), m, q),
                Arguments.of(Constraint.DEAD_TIME, bench(s, b -> Records.with(b, "deadTime", 10e-9)), m, q),
                Arguments.of(Constraint.DUTY, bench(s, b -> Records.with(b, "maxDuty", 0.1)), m, q));
    }

    /** Each limit, pushed past, reads negative and fails the pairing; the margin formula is (limit − value)/limit. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("violations")
    void violatedLimitReadsNegativeAndFailsThePairing(Constraint c, Scenario s, Motor m, PowerSwitch q) {
        PairingResult r = evaluate(s, m, q);
        assertTrue(r.margins().get(c) < 0, c + " margin " + r.margins().get(c));
        assertFalse(r.feasible());
        assertTrue(r.bindingMargin() <= r.margins().get(c));
    }

    /** Margin arithmetic against hand values: V_DS 0.8·60 = 48 V vs 26 V gives (48 − 26)/48. */
    @Test
    void vdsMarginIsDeratedRatingAgainstHighestBus() {
        assertEquals((48.0 - 26.0) / 48.0, quiet().margins().get(Constraint.VDS_RATING), 1e-12);
    }

    /**
     * Winding margin: the insulation class limit (IEC 60085 class F, 155 °C, the test motor's) less the bench's
     * 10 K, against the hottest winding temperature: (145 − T)/145. Exact arithmetic.
     */
    @Test
    void windingMarginIsInsulationClassLessBenchMargin() {
        PairingResult r = quiet();
        double limit = dev.yoke.physics.InsulationClass.F.limitTemp() - 10;
        assertEquals((limit - r.totals().windingTempMax()) / limit, r.margins().get(Constraint.WINDING_TEMP), 1e-12);
    }

    /**
     * Bus corners: losses and temperatures at the nominal bus, headroom at the lowest, V_DS at the highest.
     * Moving the lowest bus changes only the headroom; moving the highest changes only the V_DS margin.
     */
    @Test
    void eachBusCornerMovesOnlyItsOwnFigure() {
        PairingResult base = quiet();
        PairingResult lower = evaluate(bench(quietScenario(), b -> Records.with(b, "busVoltageMin", 18.0)),
                TestParts.motor(), TestParts.powerSwitch());
        PairingResult higher = evaluate(bench(quietScenario(), b -> Records.with(b, "busVoltageMax", 30.0)),
                TestParts.motor(), TestParts.powerSwitch());
        assertEquals(base.totals(), lower.totals());
        assertEquals(base.totals(), higher.totals());
        assertTrue(lower.margins().get(Constraint.VOLTAGE_HEADROOM) < base.margins().get(Constraint.VOLTAGE_HEADROOM));
        assertTrue(higher.margins().get(Constraint.VDS_RATING) < base.margins().get(Constraint.VDS_RATING));
        for (Constraint c : Constraint.values()) {
            if (c != Constraint.VOLTAGE_HEADROOM) {
                assertEquals(base.margins().get(c), lower.margins().get(c), c.key());
            }
            if (c != Constraint.VDS_RATING) {
                assertEquals(base.margins().get(c), higher.margins().get(c), c.key());
            }
        }
    }

    /** Dead time vs turn-off time: a longer dead time always raises the margin (shoot-through safety). */
    @Test
    void longerDeadTimeRaisesDeadTimeMargin() {
        Scenario longer = bench(quietScenario(), b -> Records.with(b, "deadTime", 1e-6));
        assertTrue(evaluate(longer, TestParts.motor(), TestParts.powerSwitch()).margins().get(Constraint.DEAD_TIME)
                > quiet().margins().get(Constraint.DEAD_TIME));
    }

    static Stream<Arguments> advisories() {
        Scenario s = quietScenario();
        Motor m = TestParts.motor();
        PowerSwitch q = TestParts.powerSwitch();
        return Stream.of(
                Arguments.of(Advisory.AUDIBLE_PWM, bench(s, b -> Records.with(b, "pwmFrequencies", List.of(12e3))), m, q),
                // τ = 10 µH / 0.5 Ω = 20 µs, shorter than three 25 µs periods.
                Arguments.of(Advisory.ROUGH_CURRENT, s, Records.with(m, "inductance", 10e-6), q),
                Arguments.of(Advisory.DISCONTINUOUS_CURRENT, bench(s, b -> Records.with(b, "modulation",
                        Modulation.BIPOLAR)), Records.with(m, "inductance", 30e-6), q),
                // The baseline needs about 7.4 V; 0.97 × 8.0 V = 7.76 V leaves a few per cent, under the 10 % advisory.
                Arguments.of(Advisory.LOW_HEADROOM, bench(s, b -> Records.with(b, "busVoltageMin", 8.0)), m, q),
                Arguments.of(Advisory.SWITCH_RUNAWAY, bench(s, b -> Records.with(b, "switchRthCaseAmbient", 1e6)), m, q),
                Arguments.of(Advisory.WINDING_RUNAWAY, s, Records.with(m, "rthHousingAmbient", 5000.0), q));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("advisories")
    void advisoryFiresWhenItsConditionHolds(Advisory a, Scenario s, Motor m, PowerSwitch q) {
        PairingResult r = evaluate(s, m, q);
        assertTrue(r.advisories().contains(a), a + " in " + r.advisories());
        Finite.check(r);
        if (a == Advisory.LOW_HEADROOM) {
            double headroom = r.margins().get(Constraint.VOLTAGE_HEADROOM);
            assertTrue(headroom > 0 && headroom < DriveEvaluator.LOW_HEADROOM, "feasible but low: " + headroom);
        }
        if (a == Advisory.SWITCH_RUNAWAY) {
            // A runaway fails the pairing with a finite, negative junction margin.
            assertTrue(r.margins().get(Constraint.JUNCTION_TEMP) <= -1);
            assertFalse(r.feasible());
        }
        if (a == Advisory.WINDING_RUNAWAY) {
            assertTrue(r.margins().get(Constraint.WINDING_TEMP) <= -1);
            assertFalse(r.feasible());
        }
    }

    /** Unipolar output ripples at twice the switching frequency: 12 kHz switching is 24 kHz ripple, not audible. */
    @Test
    void unipolarDoublesTheAudibleFrequency() {
        Scenario s = bench(quietScenario(), b -> Records.with(Records.with(b, "pwmFrequencies", List.of(12e3)),
                "modulation", Modulation.UNIPOLAR));
        assertFalse(evaluate(s, TestParts.motor(), TestParts.powerSwitch()).advisories().contains(Advisory.AUDIBLE_PWM));
    }
}
