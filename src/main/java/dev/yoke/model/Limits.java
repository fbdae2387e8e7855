package dev.yoke.model;

/**
 * Derating rules of the bench.
 *
 * @param vdsDerating        fraction of the V_DS rating allowed at the maximum bus voltage (e.g. 0.8)
 * @param junctionTempLimit  allowed junction temperature, °C (at or below the part's own maximum)
 * @param windingTempMargin  kelvin kept below the motor's insulation limit
 * @param rippleFraction     allowed peak-to-peak ripple as a fraction of the motor's continuous current
 */
public record Limits(double vdsDerating, double junctionTempLimit, double windingTempMargin, double rippleFraction) {
}
