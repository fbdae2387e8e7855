package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.yoke.model.Modulation;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The conduction tables of the three modulations in all four quadrants. Source: the full-bridge dc-dc
 * converter of Mohan, Undeland &amp; Robbins, Power Electronics, ch. 7 (from memory), and the commutation
 * of a hard-switched leg (common practice): a leg sourcing current hard-switches its high switch and
 * freewheels in its low switch's diode; a leg sinking current does the reverse.
 */
class ConductionPatternTest {

    static Stream<Arguments> table() {
        return Stream.of(
                // modulation, V/Vbus, I sign, on-fractions HA LA HB LB, hard, freewheeling
                Arguments.of(Modulation.BIPOLAR, 0.4, 1, "0.7 0.3 0.3 0.7", "HA LB", "LA HB"),
                Arguments.of(Modulation.BIPOLAR, 0.4, -1, "0.7 0.3 0.3 0.7", "LA HB", "HA LB"),
                Arguments.of(Modulation.BIPOLAR, -0.4, -1, "0.3 0.7 0.7 0.3", "LA HB", "HA LB"),
                Arguments.of(Modulation.BIPOLAR, -0.4, 1, "0.3 0.7 0.7 0.3", "HA LB", "LA HB"),
                Arguments.of(Modulation.UNIPOLAR, 0.4, 1, "0.7 0.3 0.3 0.7", "HA LB", "LA HB"),
                Arguments.of(Modulation.UNIPOLAR, 0.4, -1, "0.7 0.3 0.3 0.7", "LA HB", "HA LB"),
                Arguments.of(Modulation.UNIPOLAR, -0.4, -1, "0.3 0.7 0.7 0.3", "LA HB", "HA LB"),
                Arguments.of(Modulation.UNIPOLAR, -0.4, 1, "0.3 0.7 0.7 0.3", "HA LB", "LA HB"),
                Arguments.of(Modulation.SIGN_MAGNITUDE, 0.4, 1, "0.4 0.6 0 1", "HA", "LA"),
                Arguments.of(Modulation.SIGN_MAGNITUDE, 0.4, -1, "0.4 0.6 0 1", "LA", "HA"),
                Arguments.of(Modulation.SIGN_MAGNITUDE, -0.4, -1, "0 1 0.4 0.6", "HB", "LB"),
                Arguments.of(Modulation.SIGN_MAGNITUDE, -0.4, 1, "0 1 0.4 0.6", "LB", "HB"));
    }

    @ParameterizedTest(name = "{0} v={1} i={2}")
    @MethodSource("table")
    void conductionPatternMatchesTheQuadrantTable(Modulation m, double v, int sign, String on, String hard,
            String free) {
        ConductionPattern p = ConductionPattern.of(m, v, sign * 3.0);
        double[] expectedOn = Arrays.stream(on.split(" ")).mapToDouble(Double::parseDouble).toArray();
        List<String> hardNames = List.of(hard.split(" "));
        List<String> freeNames = List.of(free.split(" "));
        assertAll(Stream.iterate(0, i -> i < 4, i -> i + 1).map(i -> () -> {
            String name = ConductionPattern.POSITION_NAMES[i];
            assertEquals(expectedOn[i], p.onFraction(i), 1e-12, name + " on-fraction");
            assertEquals(hardNames.contains(name) ? 1.0 : 0.0, p.hardSwitching(i), name + " hard");
            assertEquals(freeNames.contains(name) ? 1.0 : 0.0, p.freewheeling(i), name + " freewheeling");
        }));
    }

    /**
     * Law: the average leg voltages make the output: V/V_bus = (on-fraction HA) − (on-fraction HB), for every
     * scheme; and the ripple shape is ±V_bus at f (bipolar), V_bus at 2f (unipolar), V_bus at f (sign-magnitude).
     */
    @ParameterizedTest
    @MethodSource("table")
    void legAveragesMakeTheOutputVoltage(Modulation m, double v, int sign) {
        ConductionPattern p = ConductionPattern.of(m, v, sign);
        assertEquals(v, p.onFraction(ConductionPattern.HIGH_A) - p.onFraction(ConductionPattern.HIGH_B), 1e-12);
        double expectedSwing = m == Modulation.BIPOLAR ? 2 : 1;
        double expectedPeriod = m == Modulation.UNIPOLAR ? 0.5 : 1;
        assertEquals(expectedSwing, p.rippleSwing());
        assertEquals(expectedPeriod, p.ripplePeriodFactor());
        assertEquals(m == Modulation.SIGN_MAGNITUDE ? 2 : 4, p.switchingCount());
    }

    /**
     * Bootstrap limit (common practice): no high switch may stay on longer than D_max, so bipolar and
     * unipolar reach (2·D_max − 1)·V_bus (each leg's duty is (1 ± m)/2) and sign-magnitude D_max·V_bus.
     */
    @ParameterizedTest
    @MethodSource("table")
    void highestVoltageKeepsEveryHighSwitchWithinTheDutyLimit(Modulation m) {
        double maxDuty = 0.95;
        double ratio = ConductionPattern.maxVoltageRatio(m, maxDuty);
        assertEquals(maxDuty, ConductionPattern.of(m, ratio, 1).highSideDuty(), 1e-12);
        assertEquals(maxDuty, ConductionPattern.of(m, -ratio, 1).highSideDuty(), 1e-12);
    }

    /**
     * Law (conservation of time): in a switching leg the two channels and the freewheeling diode share the
     * period, channel + channel + 2·t_dead·f = 1, so with a dead time the freewheeling position's channel gives
     * up exactly the diode's share and the commutating position keeps its duty (the dead time is counted once).
     */
    @ParameterizedTest
    @MethodSource("table")
    void deadTimeComesOutOfTheFreewheelingChannelOnly(Modulation m, double v, int sign) {
        double deadFraction = 500e-9 * 20e3;
        ConductionPattern ideal = ConductionPattern.of(m, v, sign * 3.0);
        ConductionPattern p = ConductionPattern.of(m, v, sign * 3.0, deadFraction);
        for (int i = 0; i < ConductionPattern.POSITIONS; i++) {
            double expected = ideal.onFraction(i) - 2 * deadFraction * ideal.freewheeling(i);
            assertEquals(expected, p.onFraction(i), 1e-12, ConductionPattern.POSITION_NAMES[i]);
            assertEquals(ideal.hardSwitching(i), p.hardSwitching(i));
            assertEquals(ideal.freewheeling(i), p.freewheeling(i));
        }
        for (int high : new int[] {ConductionPattern.HIGH_A, ConductionPattern.HIGH_B}) {
            double diode = 2 * deadFraction * (p.freewheeling(high) + p.freewheeling(high + 1));
            double legBusy = p.onFraction(high) + p.onFraction(high + 1) + diode;
            assertEquals(1.0, legBusy, 1e-12, "leg of " + ConductionPattern.POSITION_NAMES[high]);
        }
    }
}
