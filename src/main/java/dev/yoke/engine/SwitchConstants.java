package dev.yoke.engine;

import dev.yoke.model.Bench;
import dev.yoke.model.PowerSwitch;
import dev.yoke.physics.GateCharge;
import dev.yoke.physics.SwitchLossLaws;
import java.util.List;

/**
 * Everything about one switch on one bench that no motor changes, computed once so that the fast path
 * needs only multiply-adds: edge times from the gate charge, the R_DS(on) temperature line, the thermal
 * resistance to ambient, the per-frequency loss factors and the margins that depend on the switch alone.
 */
final class SwitchConstants {

    final PowerSwitch part;
    /** R_DS(on) at 25 °C, Ω. */
    final double r25;
    /** Fractional rise of R_DS(on) per kelvin. */
    final double alpha;
    /** Junction-to-ambient thermal resistance: R_th,jc + the bench's R_th,ca, K/W. */
    final double rth;
    /** R_DS(on) at the ambient temperature, Ω. */
    final double rAmbient;
    /** R_th·R_25·α: the closed-form junction solution's denominator is 1 − this × A. */
    final double runawayFactor;
    /** Hard turn-on and turn-off edge times, s. */
    final double turnOnEdge;
    final double turnOffEdge;
    /** Time from the turn-off command until the channel stops, s (dead-time check). */
    final double turnOffTime;
    /** Per frequency: ½·C_oss·V² per period, W (charged per output-capacitance dump). */
    final double[] capacitanceLoss;
    /** Per frequency: Q_rr·V per period, W (charged per hard turn-on). */
    final double[] recoveryLoss;
    /**
     * Per frequency: V·I overlap loss per ampere of current at a hard turn-on and at a hard turn-off, W/A
     * (separate because the two edges see different currents and take different times).
     */
    final double[] turnOnLossPerAmp;
    final double[] turnOffLossPerAmp;
    /** Per frequency: dead-time diode loss per ampere of mean diode current over both dead times, W/A. */
    final double[] diodeLossPerAmp;
    /** Per frequency: gate-drive loss of one driven switch, W. */
    final double[] gateLossPerSwitch;
    /** Junction limit: the bench's, capped by the part's own maximum, °C. */
    final double junctionLimit;
    /** Reported junction temperature when no steady state exists (margin −1), °C. */
    final double runawayJunctionTemp;
    final double marginVds;
    final double marginDeadTime;

    SwitchConstants(PowerSwitch q, Bench bench) {
        part = q;
        r25 = q.rdsOn();
        alpha = q.rdsOnTempCoefficient();
        rth = q.rthJunctionCase() + bench.switchRthCaseAmbient();
        double ambient = bench.ambientTemp();
        rAmbient = q.rdsOnAt(ambient);
        runawayFactor = rth * r25 * alpha;
        double rg = GateCharge.gateResistance(bench.gateResistance(), q.gateResistanceInternal());
        turnOnEdge = GateCharge.turnOnEdge(q.gateSourceCharge(), q.gateDrainCharge(), bench.gateDriveVoltage(),
                q.plateauVoltage(), rg);
        turnOffEdge = GateCharge.turnOffEdge(q.gateSourceCharge(), q.gateDrainCharge(), q.plateauVoltage(), rg);
        turnOffTime = GateCharge.turnOffTime(q.gateCharge(), q.gateSourceCharge(), q.gateDrainCharge(),
                bench.gateDriveVoltage(), q.plateauVoltage(), rg);
        List<Double> frequencies = bench.pwmFrequencies();
        int nf = frequencies.size();
        capacitanceLoss = new double[nf];
        recoveryLoss = new double[nf];
        turnOnLossPerAmp = new double[nf];
        turnOffLossPerAmp = new double[nf];
        diodeLossPerAmp = new double[nf];
        gateLossPerSwitch = new double[nf];
        double v = bench.busVoltage();
        for (int i = 0; i < nf; i++) {
            double f = frequencies.get(i);
            capacitanceLoss[i] = SwitchLossLaws.outputCapacitance(q.outputCapacitance(), v, f);
            recoveryLoss[i] = SwitchLossLaws.reverseRecovery(q.reverseRecoveryCharge(), v, f);
            turnOnLossPerAmp[i] = SwitchLossLaws.hardTurnOn(v, 1.0, turnOnEdge, f);
            turnOffLossPerAmp[i] = SwitchLossLaws.hardTurnOff(v, 1.0, turnOffEdge, f);
            diodeLossPerAmp[i] = SwitchLossLaws.deadTimeDiode(q.diodeForwardVoltage(), 1.0, bench.deadTime(), f);
            gateLossPerSwitch[i] = SwitchLossLaws.gateDrive(q.gateCharge(), bench.gateDriveVoltage(), f);
        }
        junctionLimit = Math.min(bench.limits().junctionTempLimit(), q.maxJunctionTemp());
        runawayJunctionTemp = Margins.valueAtMargin(junctionLimit, -1.0);
        marginVds = Margins.of(bench.limits().vdsDerating() * q.vdsMax(), bench.busVoltageMax());
        marginDeadTime = Margins.of(bench.deadTime(), turnOffTime);
    }

    /** R_DS(on) at a junction temperature, Ω (linear, as {@link PowerSwitch#rdsOnAt}). */
    double rdsOnAt(double junctionTemp) {
        return r25 * (1.0 + alpha * (junctionTemp - 25.0));
    }
}
