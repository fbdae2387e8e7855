package dev.yoke.engine;

import java.util.List;

/**
 * One segment of the duty profile as one pairing sees it. SI units, temperatures in °C.
 * Voltages and duty are at the segment's worst (fastest, hardest) point and the nominal bus
 * unless stated; losses are averages over the segment.
 *
 * @param label            the segment's label
 * @param duration         s
 * @param motorSpeed       motor speed at the segment's fastest end, rad/s (signed)
 * @param motorTorque      motor shaft torque (load through gearbox, acceleration, friction), N·m
 * @param currentAvg       average winding current, A (signed)
 * @param terminalVoltage  motor terminal voltage at the worst point, V (signed)
 * @param duty             duty of the switching leg for the bench's modulation (bipolar d, else m)
 * @param currentRipplePp  peak-to-peak ripple, A
 * @param currentRms       RMS current with ripple, A
 * @param currentPeak      |I| + ΔI/2, A
 * @param windingResistance R at this segment's winding temperature, Ω
 * @param windingTemp      mean winding temperature over the segment, °C
 * @param windingTempPeak  hottest winding temperature within the segment, °C
 * @param switchLosses     the four switches (high-A, low-A, high-B, low-B), W each
 * @param junctionTemps    the four junction temperatures, °C
 * @param motorLoss        copper + friction, W
 * @param copperLoss       W
 * @param frictionLoss     W
 * @param gateDriveLoss    W
 * @param mechanicalPower  load-side output T_load·ω_load averaged over the segment, W (negative when the load drives back)
 * @param busPower         average power from the bus, W (negative when regenerating)
 */
public record SegmentResult(
        String label,
        double duration,
        double motorSpeed,
        double motorTorque,
        double currentAvg,
        double terminalVoltage,
        double duty,
        double currentRipplePp,
        double currentRms,
        double currentPeak,
        double windingResistance,
        double windingTemp,
        double windingTempPeak,
        List<SwitchLoss> switchLosses,
        double[] junctionTemps,
        double motorLoss,
        double copperLoss,
        double frictionLoss,
        double gateDriveLoss,
        double mechanicalPower,
        double busPower) {

    public SegmentResult {
        switchLosses = List.copyOf(switchLosses);
        junctionTemps = junctionTemps.clone();
    }

    @Override
    public double[] junctionTemps() {
        return junctionTemps.clone();
    }
}
