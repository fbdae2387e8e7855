package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class SwitchLossLawsTest {

    /**
     * Mohan, Undeland &amp; Robbins, Power Electronics, 3rd ed., ch. 2, the generic controllable switch, eq. 2-6
     * (from memory): P_s = ½·V_d·I_o·f_s·(t_on + t_off).
     * Our numbers: 48 V, 10 A, 50 kHz, 100 ns + 150 ns gives ½·48·10·50e3·250e-9 = 3 W. Exact arithmetic.
     */
    @Test
    void hardSwitchingLossFollowsTheLinearOverlapFormula() {
        assertEquals(3.0, SwitchLossLaws.hardSwitching(48, 10, 100e-9, 150e-9, 50e3), 1e-12);
        assertEquals(3.0, SwitchLossLaws.hardSwitching(48, -10, 100e-9, 150e-9, 50e3), 1e-12);
    }

    /**
     * Equal edge times and a symmetric (triangular) ripple: the valley and the peak average to the mean current,
     * (I − ΔI/2 + I + ΔI/2)/2 = I, so ½·V·f·(I_on·t + I_off·t) = ½·V·I·2t·f, the mean-current law above
     * (Mohan, Undeland &amp; Robbins, eq. 2-6, from memory). Our numbers: 48 V, 10 A ± 2 A, 100 ns each, 50 kHz:
     * ½·48·50e3·(8 + 12)·100e-9 = 2.4 W. Exact arithmetic up to rounding.
     */
    @Test
    void equalEdgeTimesWithASymmetricRippleGiveTheMeanCurrentLoss() {
        double mean = SwitchLossLaws.hardSwitching(48, 10, 100e-9, 100e-9, 50e3);
        assertEquals(2.4, mean, 1e-12);
        assertEquals(mean, SwitchLossLaws.hardSwitching(48, 8, 100e-9, 12, 100e-9, 50e3), 1e-12);
    }

    /**
     * A slower turn-off at the ripple's peak. With I_on = I − ΔI/2 and I_off = I + ΔI/2 (hand algebra):
     * ½·V·f·(I_on·t_on + I_off·t_off) = ½·V·f·I·(t_on + t_off) + ½·V·f·(t_off − t_on)·ΔI/2,
     * the mean-current value plus ½·V·f·(t_off − t_on)·ΔI/2. Our numbers: 48 V, 10 A, ΔI = 4 A, 100 ns on,
     * 300 ns off, 50 kHz: 4.8 W + ½·48·50e3·200e-9·2 = 4.8 W + 0.48 W = 5.28 W. Exact arithmetic up to rounding.
     */
    @Test
    void slowerTurnOffAtThePeakAddsHalfTheRippleTimesTheTimeDifference() {
        double mean = SwitchLossLaws.hardSwitching(48, 10, 100e-9, 300e-9, 50e3);
        double edges = SwitchLossLaws.hardSwitching(48, 8, 100e-9, 12, 300e-9, 50e3);
        assertEquals(4.8, mean, 1e-12);
        assertEquals(mean + 0.5 * 48 * 50e3 * (300e-9 - 100e-9) * 4 / 2, edges, 1e-12);
        assertEquals(5.28, edges, 1e-12);
        // The two edges add up: each is its own half of the overlap law.
        assertEquals(edges, SwitchLossLaws.hardTurnOn(48, 8, 100e-9, 50e3)
                + SwitchLossLaws.hardTurnOff(48, 12, 300e-9, 50e3), 1e-15);
    }

    /** Energy in a charged capacitor ½CV² (any circuits text): 1 nF at 48 V at 50 kHz is 57.6 mW. */
    @Test
    void outputCapacitanceLossIsCapacitorEnergyTimesFrequency() {
        assertEquals(0.5 * 1e-9 * 48 * 48 * 50e3, SwitchLossLaws.outputCapacitance(1e-9, 48, 50e3), 1e-15);
    }

    /** Erickson &amp; Maksimović, ch. 4 (from memory): recovered charge Q_rr drawn through the bus costs Q_rr·V per edge. */
    @Test
    void reverseRecoveryLossIsChargeTimesVoltage() {
        assertEquals(100e-9 * 48 * 20e3, SwitchLossLaws.reverseRecovery(100e-9, 48, 20e3), 1e-15);
    }

    /** Dead-time diode: two gaps per period, V_f·|I| during each (common practice). */
    @Test
    void deadTimeLossCountsBothGapsOfAPeriod() {
        assertEquals(0.8 * 10 * 2 * 500e-9 * 20e3, SwitchLossLaws.deadTimeDiode(0.8, -10, 500e-9, 20e3), 1e-15);
    }

    /** Gate drive: the driver moves Q_g from 0 to V_drive and back each period: Q_g·V_drive·f (common practice). */
    @Test
    void gateDriveLossIsChargeTimesDriveVoltageTimesFrequency() {
        assertEquals(50e-9 * 12 * 100e3, SwitchLossLaws.gateDrive(50e-9, 12, 100e3), 1e-15);
    }

    /**
     * Gate-charge method (Balogh, TI SLUA618; numbers our own): Q_gs = 10 nC, Q_gd = 20 nC, plateau 5 V,
     * drive 12 V, 7 Ω loop. Turn-on current (12−5)/7 = 1 A moves Q_gs/2 + Q_gd = 25 nC in 25 ns; turn-off
     * current 5/7 A takes 35 ns. Delay: 15 nC above the plateau over 7 V is 2.143 nF; 7 Ω·2.143 nF·ln(12/5).
     */
    @Test
    void edgeTimesFollowTheGateChargeMethod() {
        assertEquals(25e-9, GateCharge.turnOnEdge(10e-9, 20e-9, 12, 5, 7), 1e-18);
        assertEquals(35e-9, GateCharge.turnOffEdge(10e-9, 20e-9, 5, 7), 1e-18);
        double delay = 7 * (15e-9 / 7) * Math.log(12.0 / 5);
        assertEquals(delay, GateCharge.turnOffDelay(45e-9, 10e-9, 20e-9, 12, 5, 7), 1e-18);
        assertEquals(delay + 35e-9, GateCharge.turnOffTime(45e-9, 10e-9, 20e-9, 12, 5, 7), 1e-18);
    }
}
