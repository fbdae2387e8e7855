package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.engine.BridgeConductionNgspiceTest.Case;
import dev.yoke.model.Catalog;
import dev.yoke.model.Modulation;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Scenario;
import dev.yoke.physics.SwitchLossLaws;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The engine's hard-switching V·I overlap ({@link DriveEvaluator#explain}) with the current at each edge: the
 * hard switch turns on at the valley of the ripple and off at the peak. On the reference bench of
 * {@link BridgeConductionNgspiceTest} (24 V, 20 kHz, 2 Ω, L/R = 1 period, so the ripple is large) with the
 * bipolar output at V = 0, whose 50 % square wave makes the R-L ripple exactly symmetric about the mean for any
 * L/R (half-wave symmetry): valley and peak are |I| ∓ ΔI/2.
 */
class HardEdgeLossTest {

    private static final double BUS = 24;
    private static final double F = 20e3;
    /** Bipolar, V = 0 (d = ½), 4 A, L/R = 1 period: ΔI = (48 V / 2 Ω)·tanh(T/4τ) ≈ 5.9 A, valley 1.1 A, still continuous. */
    private static final Case SYMMETRIC = new Case(Modulation.BIPOLAR, 0.0, 4.0, 1);

    /** The reference switch with another Miller plateau (t_on ∝ 1/(12 V − plateau), t_off ∝ 1/plateau). */
    private static PowerSwitch withPlateau(double plateau) {
        PowerSwitch q = BridgeConductionNgspiceTest.powerSwitch();
        return new PowerSwitch(q.id(), q.label(), q.packageName(), q.vdsMax(), q.idContinuous(), q.idPulsed(),
                q.rdsOn(), q.rdsOnHot(), q.rdsOnHotTemp(), q.gateCharge(), q.gateSourceCharge(),
                q.gateDrainCharge(), plateau, q.gateResistanceInternal(), q.outputCapacitance(),
                q.diodeForwardVoltage(), q.reverseRecoveryCharge(), q.rthJunctionCase(), q.maxJunctionTemp(),
                q.price());
    }

    private static SegmentResult explain(PowerSwitch q) {
        Scenario scenario = BridgeConductionNgspiceTest.scenario(SYMMETRIC);
        Catalog catalog = new Catalog(List.of(BridgeConductionNgspiceTest.motor(SYMMETRIC)), List.of(q));
        return DriveEvaluator.of(scenario, catalog).explain(0, 0, 0, 0).segments().get(0);
    }

    private static SwitchConstants constants(PowerSwitch q) {
        return new SwitchConstants(q, BridgeConductionNgspiceTest.scenario(SYMMETRIC).bench());
    }

    /**
     * Equal edge times (plateau at half the 12 V drive): (I_valley + I_peak)/2 = I for a symmetric ripple, so the
     * edge-current loss is exactly the mean-current law ½·V·|I|·(t_on + t_off)·f (Mohan, Undeland &amp; Robbins,
     * eq. 2-6, from memory). 1e-6 relative: the reference winding still warms by a fraction of a millikelvin,
     * leaving 2.4 µV across the motor and d = ½ + 5e-8, an asymmetry of that order (measured 1.2e-8).
     */
    @Test
    void equalEdgeTimesGiveTheMeanCurrentLossWhenTheRippleIsSymmetric() {
        PowerSwitch q = withPlateau(6.0);
        SwitchConstants s = constants(q);
        assertEquals(s.turnOnEdge, s.turnOffEdge, 1e-20, "equal edge times at half the drive");
        SegmentResult y = explain(q);
        assertTrue(y.currentRipplePp() > 4.0, "a large ripple, so that a wrong edge current would show");
        double mean = SwitchLossLaws.hardSwitching(BUS, 4.0, s.turnOnEdge, s.turnOffEdge, F);
        for (int p : new int[] {0, 3}) { // HA and LB hard-switch (I > 0, bipolar)
            assertEquals(mean, y.switchLosses().get(p).switching(), 1e-6 * mean, "position " + p);
        }
    }

    /**
     * A slower turn-off (plateau 4.5 V: t_off = t_on·7.5/4.5): the hard switch turns off at the peak, so its loss
     * rises above the mean-current value by ½·V·f·(t_off − t_on)·ΔI/2 (hand algebra in
     * {@code SwitchLossLawsTest.slowerTurnOffAtThePeakAddsHalfTheRippleTimesTheTimeDifference}), with ΔI the
     * engine's own peak-to-peak ripple (checked against ngspice in {@code PwmRippleNgspiceTest}). 1e-6 relative,
     * as above.
     */
    @Test
    void slowerTurnOffAtThePeakRaisesTheLossByHalfTheRippleTimesTheTimeDifference() {
        PowerSwitch q = withPlateau(4.5);
        SwitchConstants s = constants(q);
        assertTrue(s.turnOffEdge > 1.5 * s.turnOnEdge, "turn-off clearly slower");
        SegmentResult y = explain(q);
        double mean = SwitchLossLaws.hardSwitching(BUS, 4.0, s.turnOnEdge, s.turnOffEdge, F);
        double expected = mean + 0.5 * BUS * F * (s.turnOffEdge - s.turnOnEdge) * y.currentRipplePp() / 2;
        assertTrue(expected > 1.05 * mean, "the effect is material here");
        for (int p : new int[] {0, 3}) {
            assertEquals(expected, y.switchLosses().get(p).switching(), 1e-6 * expected, "position " + p);
        }
        // The freewheeling switches make no hard edge.
        assertEquals(0.0, y.switchLosses().get(1).switching(), 0.0);
        assertEquals(0.0, y.switchLosses().get(2).switching(), 0.0);
    }

    /**
     * C_oss and Q_rr once per hard turn-on only. With continuous current (4 A) the switch whose turn-on takes the
     * current from its partner's diode is charged ½·C_oss·V²·f and Q_rr·V·f (Erickson &amp; Maksimović, ch. 4,
     * from memory) and its partner nothing; at zero mean current the symmetric ripple (±ΔI/2) reverses at every
     * edge, so every turn-on is a zero-voltage one and nothing is charged (Mohan, Undeland &amp; Robbins, ch. 9,
     * zero-voltage switching, from memory), while each of the four diodes carries ΔI/2 for one of its leg's two
     * dead times: V_f·(ΔI/4)·2·t_dead·f each (law: symmetry), and each switch turns off hard once, at ΔI/2.
     * 1e-9 relative: rounding; the winding does not warm at zero current, so the square wave stays exactly 50 %.
     */
    @Test
    void outputCapacitanceAndRecoveryAreChargedOnlyToHardTurnOns() {
        PowerSwitch q = BridgeConductionNgspiceTest.powerSwitch();
        SwitchConstants s = constants(q);
        double capacitance = SwitchLossLaws.outputCapacitance(q.outputCapacitance(), BUS, F);
        double recovery = SwitchLossLaws.reverseRecovery(q.reverseRecoveryCharge(), BUS, F);
        SegmentResult continuous = explain(q);
        for (int p = 0; p < 4; p++) {
            boolean hard = p == 0 || p == 3; // HA and LB hard-switch (I > 0, bipolar)
            SwitchLoss l = continuous.switchLosses().get(p);
            assertEquals(hard ? capacitance : 0.0, l.outputCapacitance(), 1e-9 * capacitance, "C_oss " + p);
            assertEquals(hard ? recovery : 0.0, l.reverseRecovery(), 1e-9 * recovery, "Q_rr " + p);
        }

        Case zero = new Case(Modulation.BIPOLAR, 0.0, 0.0, 1);
        Catalog catalog = new Catalog(List.of(BridgeConductionNgspiceTest.motor(zero)), List.of(q));
        SegmentResult y = DriveEvaluator.of(BridgeConductionNgspiceTest.scenario(zero), catalog)
                .explain(0, 0, 0, 0).segments().get(0);
        assertEquals(0.0, y.currentAvg(), 1e-12, "zero mean current");
        assertTrue(y.currentRipplePp() > 4.0, "a ripple that reverses at both edges");
        double diode = SwitchLossLaws.deadTimeDiode(q.diodeForwardVoltage(), y.currentRipplePp() / 4,
                BridgeConductionNgspiceTest.scenario(zero).bench().deadTime(), F);
        for (int p = 0; p < 4; p++) {
            SwitchLoss l = y.switchLosses().get(p);
            assertEquals(0.0, l.outputCapacitance(), 0.0, "no C_oss dump at a zero-voltage turn-on " + p);
            assertEquals(0.0, l.reverseRecovery(), 0.0, "no diode recovered at a zero-voltage turn-on " + p);
            // Each switch turns off hard once, at the edge where it carries +ΔI/2 forward; no turn-on overlap.
            double overlap = SwitchLossLaws.hardTurnOff(BUS, y.currentRipplePp() / 2, s.turnOffEdge, F);
            assertEquals(overlap, l.switching(), 1e-9 * overlap, "one hard turn-off, no hard turn-on " + p);
            assertEquals(diode, l.deadTimeDiode(), 1e-9 * diode, "equal dead-time diode share " + p);
        }
    }

    /**
     * Exactly zero current and no ripple (unipolar at V = 0: both legs at ½ in phase, the output never leaves 0, so
     * the motor at rest carries nothing): every switch turns on once per period with no current to swing the node,
     * so each turn-on discharges its own C_oss and charges its partner's from the bus, C_oss·V² per turn-on
     * (= 2 × ½·C_oss·V²: two equal linear capacitors, one discharged and one charged through the channel, each
     * losing ½·C·V²; Erickson &amp; Maksimović, <i>Fundamentals of Power Electronics</i>, 2nd ed., ch. 4,
     * capacitive switching loss, from memory). Per switch C_oss·V²·f, per leg 2·C_oss·V²·f, the bridge
     * 4·C_oss·V²·f (by hand: 500 pF × 24² V² × 20 kHz = 5.76 mW per switch, 23.04 mW for the bridge); no body diode
     * conducts, so no Q_rr, no dead-time diode loss and no V·I overlap. 1e-9 relative: rounding.
     */
    @Test
    void zeroCurrentTurnOnsDumpBothOutputCapacitancesAndRecoverNoDiode() {
        PowerSwitch q = BridgeConductionNgspiceTest.powerSwitch();
        Case rest = new Case(Modulation.UNIPOLAR, 0.0, 0.0, 1);
        Catalog catalog = new Catalog(List.of(BridgeConductionNgspiceTest.motor(rest)), List.of(q));
        DriveEvaluator evaluator = (DriveEvaluator) DriveEvaluator.of(BridgeConductionNgspiceTest.scenario(rest),
                catalog);
        SegmentResult y = evaluator.explain(0, 0, 0, 0).segments().get(0);
        assertEquals(0.0, y.currentAvg(), 0.0, "zero current");
        assertEquals(0.0, y.currentRipplePp(), 0.0, "no ripple");
        double perSwitch = q.outputCapacitance() * BUS * BUS * F;
        assertEquals(5.76e-3, perSwitch, 1e-15, "hand algebra: 500 pF × 576 V² × 20 kHz");
        double bridge = 0;
        for (int p = 0; p < 4; p++) {
            SwitchLoss l = y.switchLosses().get(p);
            assertEquals(perSwitch, l.outputCapacitance(), 1e-9 * perSwitch, "C_oss·V²·f per switch " + p);
            assertEquals(0.0, l.reverseRecovery(), 0.0, "no diode recovered " + p);
            assertEquals(0.0, l.deadTimeDiode(), 0.0, "no dead-time diode current " + p);
            assertEquals(0.0, l.switching(), 0.0, "no V·I overlap " + p);
            assertEquals(0.0, l.conduction(), 0.0, "no channel current " + p);
            bridge += l.total();
        }
        assertEquals(4 * perSwitch, bridge, 1e-9 * bridge, "bridge: two legs of 2·C_oss·V²·f");
        double[] row = new double[Metric.COUNT];
        evaluator.summarize(evaluator.prepare(0, 0, 0), 0, row);
        double explained = evaluator.explain(0, 0, 0, 0).totals().bridgeLoss();
        assertEquals(explained, row[Metric.BRIDGE_LOSS.ordinal()], 1e-9 * explained, "summarize equals explain");
    }
}
