package dev.yoke.physics;

/**
 * Switching times of a MOSFET estimated from its gate charge and the gate drive (the gate-charge
 * method: the driver moves a known charge through the gate resistance at a known voltage; see e.g.
 * L. Balogh, "Fundamentals of MOSFET and IGBT Gate Driver Circuits", Texas Instruments application
 * report SLUA618, and Erickson &amp; Maksimović, <i>Fundamentals of Power Electronics</i>, 2nd ed., ch. 4).
 *
 * <ul>
 * <li>Gate current on the Miller plateau: turning on (V_drive − V_plateau)/R_G, turning off V_plateau/R_G,
 * with R_G = R_G,ext + R_G,int.</li>
 * <li>Hard edge (the V·I overlap): the switching charge Q_sw = Q_gs2 + Q_gd moved at that current, where
 * Q_gs2, the part of Q_gs above the threshold, is taken as Q_gs/2 (common practice when the datasheet does
 * not give it). The floor estimate Q_gd/I_g omits the current-rise interval; this one includes it.</li>
 * <li>Turn-off delay: the gate discharges from V_drive to the plateau through R_G; the charge above the
 * plateau, Q_g − Q_gs − Q_gd, over that voltage span gives an effective capacitance C, and the RC discharge
 * takes R_G·C·ln(V_drive/V_plateau).</li>
 * </ul>
 * The drive voltage is kept at least {@link #MIN_OVERDRIVE} above the plateau so that a badly chosen
 * bench gives very slow (and clearly infeasible) edges, never an infinite time.
 */
public final class GateCharge {

    /** Smallest gate overdrive used, V: keeps times finite when the drive barely exceeds the plateau. */
    public static final double MIN_OVERDRIVE = 0.05;

    private GateCharge() {
    }

    /** Total gate loop resistance, Ω. */
    public static double gateResistance(double external, double internal) {
        return external + internal;
    }

    /** Switching charge Q_sw = Q_gs/2 + Q_gd, C (common practice). */
    public static double switchingCharge(double gateSourceCharge, double gateDrainCharge) {
        return gateSourceCharge / 2 + gateDrainCharge;
    }

    /** Gate current on the plateau while turning on, A. */
    public static double turnOnGateCurrent(double driveVoltage, double plateauVoltage, double gateResistance) {
        return Math.max(MIN_OVERDRIVE, driveVoltage - plateauVoltage) / gateResistance;
    }

    /** Gate current on the plateau while turning off (driver pulls the gate to 0 V), A. */
    public static double turnOffGateCurrent(double plateauVoltage, double gateResistance) {
        return Math.max(MIN_OVERDRIVE, plateauVoltage) / gateResistance;
    }

    /** Hard turn-on edge time Q_sw/I_g,on, s. */
    public static double turnOnEdge(double gateSourceCharge, double gateDrainCharge, double driveVoltage,
            double plateauVoltage, double gateResistance) {
        return switchingCharge(gateSourceCharge, gateDrainCharge)
                / turnOnGateCurrent(driveVoltage, plateauVoltage, gateResistance);
    }

    /** Hard turn-off edge time Q_sw/I_g,off, s. */
    public static double turnOffEdge(double gateSourceCharge, double gateDrainCharge, double plateauVoltage,
            double gateResistance) {
        return switchingCharge(gateSourceCharge, gateDrainCharge) / turnOffGateCurrent(plateauVoltage, gateResistance);
    }

    /** Turn-off delay: R_G·C·ln(V_drive/V_plateau) with C = (Q_g − Q_gs − Q_gd)/(V_drive − V_plateau), s. */
    public static double turnOffDelay(double gateCharge, double gateSourceCharge, double gateDrainCharge,
            double driveVoltage, double plateauVoltage, double gateResistance) {
        double overdrive = Math.max(MIN_OVERDRIVE, driveVoltage - plateauVoltage);
        double charge = Math.max(0.0, gateCharge - gateSourceCharge - gateDrainCharge);
        double plateau = Math.max(MIN_OVERDRIVE, plateauVoltage);
        return gateResistance * (charge / overdrive) * Math.log((plateau + overdrive) / plateau);
    }

    /** Time from the turn-off command until the channel stops conducting: delay + edge, s. */
    public static double turnOffTime(double gateCharge, double gateSourceCharge, double gateDrainCharge,
            double driveVoltage, double plateauVoltage, double gateResistance) {
        return turnOffDelay(gateCharge, gateSourceCharge, gateDrainCharge, driveVoltage, plateauVoltage, gateResistance)
                + turnOffEdge(gateSourceCharge, gateDrainCharge, plateauVoltage, gateResistance);
    }
}
