package dev.yoke.engine;

/**
 * Loss of one switch over one segment, split by mechanism, in watts (segment averages).
 *
 * @param position        which of the four switches: "HA", "LA", "HB", "LB" (high/low side of legs A and B)
 * @param conduction      the channel's mean-square current × R_DS(on)(T_j) over its on-fraction (dead times,
 *                        which its body diode carries, excluded)
 * @param switching       hard-edge V·I overlap loss
 * @param outputCapacitance ½·C_oss·V² at each hard turn-on, C_oss·V² at each turn-on at exactly zero current
 * @param deadTimeDiode   body-diode conduction during the dead times, at the current's two ripple extremes
 * @param reverseRecovery Q_rr·V at each hard turn-on that commutates a diode
 */
public record SwitchLoss(
        String position,
        double conduction,
        double switching,
        double outputCapacitance,
        double deadTimeDiode,
        double reverseRecovery) {

    /** Sum of all mechanisms, W. */
    public double total() {
        return conduction + switching + outputCapacitance + deadTimeDiode + reverseRecovery;
    }
}
