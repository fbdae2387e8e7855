package dev.yoke.physics;

/**
 * Loss mechanisms of a MOSFET in a hard-switched leg, as averages in watts at switching frequency f
 * (Mohan, Undeland &amp; Robbins, <i>Power Electronics</i>, 3rd ed., ch. 2, eq. 2-6, from memory, for the linear V·I
 * overlap; Erickson &amp; Maksimović, ch. 4, for capacitive and recovery loss; gate charge for drive loss).
 */
public final class SwitchLossLaws {

    private SwitchLossLaws() {
    }

    /** Channel conduction: on-fraction × I_rms² × R_DS(on), W. */
    public static double conduction(double onFraction, double meanSquareCurrent, double onResistance) {
        return onFraction * meanSquareCurrent * onResistance;
    }

    /** Linear V·I overlap of one hard turn-on and one hard turn-off per period: ½·V·I·(t_on + t_off)·f, W. */
    public static double hardSwitching(double voltage, double current, double turnOnTime, double turnOffTime,
            double frequency) {
        return 0.5 * voltage * Math.abs(current) * (turnOnTime + turnOffTime) * frequency;
    }

    /**
     * Linear V·I overlap of one hard turn-on at current I_on and one hard turn-off at I_off per period:
     * ½·V·f·(I_on·t_on + I_off·t_off), W. With a ripple the two edges see different currents: in continuous
     * conduction the hard switch turns on at the valley of its current and off at the peak (clamped inductive
     * switching, Erickson &amp; Maksimović, ch. 4, from memory; device loss estimates with separate turn-on and
     * turn-off currents are common practice). Equal currents give {@link #hardSwitching(double, double, double,
     * double, double)}.
     */
    public static double hardSwitching(double voltage, double turnOnCurrent, double turnOnTime,
            double turnOffCurrent, double turnOffTime, double frequency) {
        return hardTurnOn(voltage, turnOnCurrent, turnOnTime, frequency)
                + hardTurnOff(voltage, turnOffCurrent, turnOffTime, frequency);
    }

    /** V·I overlap of one hard turn-on per period at current I_on: ½·V·|I_on|·t_on·f, W. */
    public static double hardTurnOn(double voltage, double turnOnCurrent, double turnOnTime, double frequency) {
        return 0.5 * voltage * Math.abs(turnOnCurrent) * turnOnTime * frequency;
    }

    /** V·I overlap of one hard turn-off per period at current I_off: ½·V·|I_off|·t_off·f, W. */
    public static double hardTurnOff(double voltage, double turnOffCurrent, double turnOffTime, double frequency) {
        return 0.5 * voltage * Math.abs(turnOffCurrent) * turnOffTime * frequency;
    }

    /** Output capacitance discharged in the channel at each hard turn-on: ½·C_oss·V²·f, W. */
    public static double outputCapacitance(double capacitance, double voltage, double frequency) {
        return 0.5 * capacitance * voltage * voltage * frequency;
    }

    /** Reverse recovery of the opposite body diode at each hard turn-on: Q_rr·V·f, W. */
    public static double reverseRecovery(double recoveryCharge, double voltage, double frequency) {
        return recoveryCharge * voltage * frequency;
    }

    /** Body diode carrying the current through both dead times of a period: V_f·|I|·2·t_dead·f, W. */
    public static double deadTimeDiode(double forwardVoltage, double current, double deadTime, double frequency) {
        return forwardVoltage * Math.abs(current) * 2 * deadTime * frequency;
    }

    /** Gate drive of one switch: Q_g·V_drive·f, W (dissipated in the driver and gate resistors). */
    public static double gateDrive(double gateCharge, double driveVoltage, double frequency) {
        return gateCharge * driveVoltage * frequency;
    }
}
