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

    static Stream<Arguments> shares() {
        return Stream.of(
                // modulation, V/Vbus, ripple sign, high-interval shares HA LA HB LB, low-interval shares
                Arguments.of(Modulation.BIPOLAR, 0.4, 1, "0.7 0 0 0.7", "0 0.3 0.3 0"),
                Arguments.of(Modulation.BIPOLAR, -0.4, 1, "0.3 0 0 0.3", "0 0.7 0.7 0"),
                Arguments.of(Modulation.UNIPOLAR, 0.4, 1, "0.4 0 0 0.4", "0.3 0.3 0.3 0.3"),
                Arguments.of(Modulation.UNIPOLAR, -0.4, -1, "0 0.4 0.4 0", "0.3 0.3 0.3 0.3"),
                Arguments.of(Modulation.SIGN_MAGNITUDE, 0.4, 1, "0.4 0 0 0.4", "0 0.6 0 0.6"),
                Arguments.of(Modulation.SIGN_MAGNITUDE, -0.4, -1, "0 0.4 0.4 0", "0 0.6 0 0.6"));
    }

    /**
     * Which switches are on while the output sits at each level of its rectangular voltage (Mohan, Undeland
     * &amp; Robbins, ch. 7, from memory): bipolar ±V_bus by diagonal pairs; unipolar two pulses per switching
     * period by the leg whose duty exceeds ½ and two zero intervals of (1 − m)/2, both high or both low;
     * sign-magnitude the switching leg's high switch for the pulse, its low switch for the zero, the other leg's
     * low switch throughout. With V &lt; 0 the pulse is −V_bus: the waveform is upside down (sign −1).
     */
    @ParameterizedTest(name = "{0} v={1}")
    @MethodSource("shares")
    void intervalSharesFollowTheOutputLevels(Modulation m, double v, int sign, String high, String low) {
        ConductionPattern p = ConductionPattern.of(m, v, 3.0);
        double[] expectedHigh = Arrays.stream(high.split(" ")).mapToDouble(Double::parseDouble).toArray();
        double[] expectedLow = Arrays.stream(low.split(" ")).mapToDouble(Double::parseDouble).toArray();
        assertEquals(sign, p.rippleSign());
        for (int i = 0; i < ConductionPattern.POSITIONS; i++) {
            String name = ConductionPattern.POSITION_NAMES[i];
            assertEquals(expectedHigh[i], p.highShare()[i], 1e-12, name + " high");
            assertEquals(expectedLow[i], p.lowShare()[i], 1e-12, name + " low");
            assertEquals(p.onFraction(i), p.highShare()[i] + p.lowShare()[i], 1e-12, name + " on-fraction");
        }
    }

    /**
     * Law (Kirchhoff's current law at each leg): at every instant the motor current flows through exactly one
     * channel of each leg, or through the freewheeling diode during a dead time. So over a period the two
     * channels' mean squares and the diode's share add up to the motor's I_rms², for any ripple shape: here an
     * exponential one (L/R = 0.7 period) and the triangular limit, in all four quadrants.
     */
    @ParameterizedTest
    @MethodSource("table")
    void eachLegCarriesTheWholeMeanSquare(Modulation m, double v, int sign) {
        double current = sign * 3.0;
        double deadFraction = 500e-9 * 20e3;
        for (double tauPeriods : new double[] {0.7, 1e4}) {
            ConductionPattern p = ConductionPattern.of(m, v, current, deadFraction);
            double period = p.ripplePeriodFactor() / 20e3;
            RippleWaveform w = PwmRipple.waveform(p.rippleSwing() * 24, 2.0, 2.0 * tauPeriods * period,
                    p.rippleOnFraction(), period);
            double meanSquare = current * current + w.variance();
            double atMax = current + p.rippleSign() * w.highDeviation();
            double atMin = current + p.rippleSign() * w.lowDeviation();
            for (int high : new int[] {ConductionPattern.HIGH_A, ConductionPattern.HIGH_B}) {
                double diode = deadFraction * (atMax * atMax + atMin * atMin)
                        * (p.freewheeling(high) + p.freewheeling(high + 1));
                double sum = p.channelSquare(high, current, meanSquare, w)
                        + p.channelSquare(high + 1, current, meanSquare, w) + diode;
                assertEquals(meanSquare, sum, meanSquare * 1e-12, "leg of " + ConductionPattern.POSITION_NAMES[high]
                        + " at L/R = " + tauPeriods + " periods");
            }
        }
    }

    /**
     * With a triangular ripple (L/R ≫ period) both intervals hold the same mean square, so each channel's share
     * is its on-fraction × I_rms² (the textbook conduction loss, Mohan, Undeland &amp; Robbins, ch. 2, from
     * memory) and a freewheeling diode carries |I| at its dead times.
     */
    @ParameterizedTest
    @MethodSource("table")
    void triangularRippleGivesOnFractionTimesMeanSquare(Modulation m, double v, int sign) {
        double current = sign * 3.0;
        ConductionPattern p = ConductionPattern.of(m, v, current);
        RippleWaveform w = PwmRipple.waveform(p.rippleSwing() * 24, 1e-5, 1e-3, p.rippleOnFraction(),
                p.ripplePeriodFactor() / 20e3);
        double meanSquare = current * current + w.variance();
        for (int i = 0; i < ConductionPattern.POSITIONS; i++) {
            assertEquals(p.onFraction(i) * meanSquare, p.channelSquare(i, current, meanSquare, w), 1e-9,
                    ConductionPattern.POSITION_NAMES[i]);
        }
        assertEquals(Math.abs(current), p.freewheelingCurrent(current, w), 1e-12);
    }

    /**
     * Hard edges with continuous current: the hard switch turns on at the valley of its current and off at the
     * peak, since the current grows while it conducts (the buck converter's switch current, Erickson &amp;
     * Maksimović, <i>Fundamentals of Power Electronics</i>, ch. 2 and 4, from memory); its partner's edges are
     * soft (0). With a triangular ripple the valley and peak are |I| ∓ ΔI/2. 1e-12 A: the ripple's own
     * rounding. The ngspice check of the same assignment is {@code engine.BridgeConductionNgspiceTest}.
     */
    @ParameterizedTest
    @MethodSource("table")
    void hardSwitchTurnsOnAtTheValleyAndOffAtThePeak(Modulation m, double v, int sign, String on, String hard) {
        double current = sign * 3.0;
        ConductionPattern p = ConductionPattern.of(m, v, current);
        RippleWaveform w = PwmRipple.waveform(p.rippleSwing() * 24, 1e-5, 1e-3, p.rippleOnFraction(),
                p.ripplePeriodFactor() / 20e3);
        double half = w.peakToPeak() / 2;
        List<String> hardNames = Arrays.asList(hard.split(" "));
        for (int i = 0; i < ConductionPattern.POSITIONS; i++) {
            String name = ConductionPattern.POSITION_NAMES[i];
            boolean isHard = hardNames.contains(name);
            assertEquals(isHard ? 3.0 - half : 0.0, p.turnOnCurrent(i, current, w), 1e-12, name + " turn-on");
            assertEquals(isHard ? 3.0 + half : 0.0, p.turnOffCurrent(i, current, w), 1e-12, name + " turn-off");
        }
    }

    /**
     * A ripple that crosses zero: at the valley edge the current flows the other way, so the hard switch turns
     * on softly onto its own body diode and its partner turns off hard with the reversed current (common
     * practice: zero-voltage turn-on of a synchronous leg with reversing current). Law: every edge of a
     * switching leg charges exactly one hard event, so the leg's turn-on and turn-off currents add up to
     * |valley| + peak. 1e-12 A: rounding.
     */
    @ParameterizedTest
    @MethodSource("table")
    void aReversingCurrentMovesTheValleyEdgeToThePartnersTurnOff(Modulation m, double v, int sign) {
        double current = sign * 0.5;
        ConductionPattern p = ConductionPattern.of(m, v, current);
        RippleWaveform w = PwmRipple.waveform(p.rippleSwing() * 24, 1e-5, 1e-4, p.rippleOnFraction(),
                p.ripplePeriodFactor() / 20e3);
        double half = w.peakToPeak() / 2;
        double legs = 0;
        double hardOn = 0;
        for (int i = 0; i < ConductionPattern.POSITIONS; i++) {
            legs += p.turnOnCurrent(i, current, w) + p.turnOffCurrent(i, current, w);
            hardOn += p.hardSwitching(i) * p.turnOnCurrent(i, current, w);
        }
        int switchingLegs = m == Modulation.SIGN_MAGNITUDE ? 1 : 2;
        assertEquals(true, half > 0.5, "the ripple must cross zero for this check");
        assertEquals(switchingLegs * ((half - 0.5) + (0.5 + half)), legs, 1e-12, "every edge once");
        assertEquals(0.0, hardOn, "soft turn-on of the hard switch");
    }

    /**
     * Dead-time diodes with continuous current: the nominal freewheeling diode carries the mean of the current at
     * the leg's two edges, the hard switch's diode nothing, and each hard switch makes exactly one hard turn-on per
     * period (common practice: clamped inductive switching of a synchronous leg). Same as the nominal assignment,
     * so continuous-current results do not move. 1e-12 A: rounding.
     */
    @ParameterizedTest
    @MethodSource("table")
    void continuousCurrentKeepsTheNominalDiodeAndOneHardTurnOn(Modulation m, double v, int sign) {
        double current = sign * 3.0;
        ConductionPattern p = ConductionPattern.of(m, v, current);
        RippleWaveform w = PwmRipple.waveform(p.rippleSwing() * 24, 1.0, 1e-3, p.rippleOnFraction(),
                p.ripplePeriodFactor() / 20e3);
        assertEquals(false, w.crossesZero(current), "continuous current for this check");
        for (int i = 0; i < ConductionPattern.POSITIONS; i++) {
            String name = ConductionPattern.POSITION_NAMES[i];
            assertEquals(p.freewheeling(i) * p.freewheelingCurrent(current, w), p.deadTimeDiodeCurrent(i, current, w),
                    1e-12, name + " diode");
            assertEquals(p.hardSwitching(i), p.hardTurnOns(i, current, w), name + " hard turn-ons");
        }
    }

    /**
     * A ripple that reverses at the valley edge: the current there flows in reverse through the nominal hard
     * switch, so the switch turning off (its partner) turns off hard and the current swings the node onto the hard
     * switch's own body diode, which carries that dead time with |valley|; at the peak edge the partner's diode
     * carries the peak as usual. Neither turn-on is hard: both are zero-voltage turn-ons, with no C_oss dump and no
     * diode recovered (Mohan, Undeland &amp; Robbins, ch. 9, and Erickson &amp; Maksimović, ch. 20, on
     * zero-voltage switching, from memory). Law: each edge's current is carried by exactly one diode, so a leg's
     * two diodes add up to the mean of |valley| and |peak|. 1e-12 A: rounding.
     */
    @ParameterizedTest
    @MethodSource("table")
    void aReversingValleyMovesThatDeadTimeToTheHardSwitchsOwnDiode(Modulation m, double v, int sign) {
        double current = sign * 0.5;
        ConductionPattern p = ConductionPattern.of(m, v, current);
        RippleWaveform w = PwmRipple.waveform(p.rippleSwing() * 24, 1.0, 1e-4, p.rippleOnFraction(),
                p.ripplePeriodFactor() / 20e3);
        assertEquals(true, w.crossesZero(current), "the ripple must cross zero for this check");
        // The two extremes of the real current; the valley is the one that flows against the mean current.
        double first = current + p.rippleSign() * w.highDeviation();
        double second = current + p.rippleSign() * w.lowDeviation();
        double valley = Math.abs(current > 0 ? Math.min(first, second) : Math.max(first, second));
        double peak = Math.abs(current > 0 ? Math.max(first, second) : Math.min(first, second));
        for (int high = 0; high < ConductionPattern.POSITIONS; high += 2) {
            if (p.hardSwitching(high) + p.hardSwitching(high + 1) == 0) {
                continue; // sign-magnitude's held leg makes no edges
            }
            int hard = p.hardSwitching(high) > 0 ? high : high + 1;
            int free = hard == high ? high + 1 : high;
            String leg = ConductionPattern.POSITION_NAMES[high];
            assertEquals(valley / 2, p.deadTimeDiodeCurrent(hard, current, w), 1e-12, leg + " hard switch's diode");
            assertEquals(peak / 2, p.deadTimeDiodeCurrent(free, current, w), 1e-12, leg + " partner's diode");
            assertEquals(p.freewheelingCurrent(current, w),
                    p.deadTimeDiodeCurrent(hard, current, w) + p.deadTimeDiodeCurrent(free, current, w), 1e-12,
                    leg + " both diodes");
            assertEquals(0.0, p.hardTurnOns(hard, current, w), leg + " zero-voltage turn-on of the hard switch");
            assertEquals(0.0, p.hardTurnOns(free, current, w), leg + " zero-voltage turn-on of its partner");
        }
    }

    /**
     * Zero mean current with a symmetric ripple (bipolar at V = 0: a 50 % square wave, so the R-L ripple is
     * symmetric about the mean for any L/R by half-wave symmetry): valley and peak are ∓ΔI/2, so each edge of a
     * leg is the mirror of the other, both diodes of a leg carry the same dead-time current, ΔI/4 over the two
     * dead times, and no switch turns on hard (law: symmetry; zero-voltage switching as above, from memory).
     * 1e-12 A: rounding.
     */
    @org.junit.jupiter.api.Test
    void symmetricReversingRippleAtZeroCurrentSplitsTheDeadTimeEquallyAndSwitchesNothingHard() {
        for (double current : new double[] {0.0, -0.0}) {
            ConductionPattern p = ConductionPattern.of(Modulation.BIPOLAR, 0.0, current);
            RippleWaveform w = PwmRipple.waveform(p.rippleSwing() * 24, 2.0, 1e-4, p.rippleOnFraction(), 1 / 20e3);
            assertEquals(-w.lowDeviation(), w.highDeviation(), 1e-12, "symmetric ripple");
            for (int i = 0; i < ConductionPattern.POSITIONS; i++) {
                String name = ConductionPattern.POSITION_NAMES[i];
                assertEquals(w.peakToPeak() / 4, p.deadTimeDiodeCurrent(i, current, w), 1e-12, name + " diode");
                assertEquals(0.0, p.hardTurnOns(i, current, w), name + " hard turn-ons");
            }
        }
    }

    /**
     * Exactly zero current at both edges (zero current and no ripple: e.g. unipolar at V = 0, or a resting segment):
     * nothing swings the node in the dead time, so each switch turning on discharges its own C_oss and charges its
     * partner's from the bus, C_oss·V² = 2 × ½·C_oss·V² in its channel (two equal linear capacitors: the discharged
     * one loses ½·C·V², the one charged from the source loses as much as it stores, ½·C·V²; Erickson &amp;
     * Maksimović, <i>Fundamentals of Power Electronics</i>, 2nd ed., ch. 4, capacitive switching loss, from memory).
     * Every switching position turns on once per period, so a switching leg dumps 4 × ½·C_oss·V² per period; no
     * body diode conducts, so no turn-on is hard (no Q_rr) and no diode carries a dead time. A held leg makes no
     * edges. Exact: counts.
     */
    @ParameterizedTest
    @MethodSource("table")
    void zeroCurrentAtBothEdgesDumpsBothOutputCapacitancesAtEveryTurnOnAndRecoversNothing(Modulation m, double v,
            int sign) {
        double current = sign * 0.0;
        ConductionPattern p = ConductionPattern.of(m, v, current);
        // No ripple: the waveform of a zero swing (every edge then sees exactly the zero mean current).
        RippleWaveform flat = PwmRipple.waveform(0.0, 1.0, 1e-3, p.rippleOnFraction(), p.ripplePeriodFactor() / 20e3);
        assertEquals(0.0, flat.highDeviation(), 0.0, "no ripple");
        assertEquals(0.0, flat.lowDeviation(), 0.0, "no ripple");
        for (int high = 0; high < ConductionPattern.POSITIONS; high += 2) {
            boolean switching = p.hardSwitching(high) + p.hardSwitching(high + 1) > 0;
            double legDumps = 0;
            for (int q = high; q <= high + 1; q++) {
                String name = ConductionPattern.POSITION_NAMES[q];
                assertEquals(switching ? 2.0 : 0.0, p.outputCapacitanceDumps(q, current, flat), 0.0, name + " dumps");
                assertEquals(0.0, p.hardTurnOns(q, current, flat), 0.0, name + " no hard turn-on, no Q_rr");
                assertEquals(0.0, p.deadTimeDiodeCurrent(q, current, flat), 0.0, name + " no diode current");
                assertEquals(0.0, p.turnOnCurrent(q, current, flat), 0.0, name + " no V·I overlap");
                legDumps += p.outputCapacitanceDumps(q, current, flat);
            }
            assertEquals(switching ? 4.0 : 0.0, legDumps, 0.0, ConductionPattern.POSITION_NAMES[high] + " leg");
        }
    }

    /**
     * Continuous current: the C_oss count is the hard turn-on count (1 × ½·C_oss·V² at each hard turn-on, 0 at its
     * partner's soft one, common practice: clamped inductive switching); a reversing ripple: 0 for both (zero-voltage
     * turn-ons, Mohan, Undeland &amp; Robbins, ch. 9, from memory). Exact: counts.
     */
    @ParameterizedTest
    @MethodSource("table")
    void outputCapacitanceDumpsFollowHardTurnOnsWheneverTheEdgeCurrentIsNotZero(Modulation m, double v, int sign) {
        for (double[] c : new double[][] {{3.0, 1e-3}, {0.5, 1e-4}}) {
            double current = sign * c[0];
            ConductionPattern p = ConductionPattern.of(m, v, current);
            RippleWaveform w = PwmRipple.waveform(p.rippleSwing() * 24, 1.0, c[1], p.rippleOnFraction(),
                    p.ripplePeriodFactor() / 20e3);
            for (int i = 0; i < ConductionPattern.POSITIONS; i++) {
                assertEquals(p.hardTurnOns(i, current, w), p.outputCapacitanceDumps(i, current, w), 0.0,
                        ConductionPattern.POSITION_NAMES[i] + " at " + current + " A");
            }
        }
    }
}
