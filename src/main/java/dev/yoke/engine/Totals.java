package dev.yoke.engine;

/**
 * Per-cycle figures of one pairing. SI units, temperatures in °C; powers are cycle averages.
 */
public record Totals(
        double currentRms,
        double currentPeak,
        double dutyMax,
        double ripplePeakToPeak,
        double bridgeLoss,
        double motorLoss,
        double gateDriveLoss,
        double efficiency,
        double energyIn,
        double energyOut,
        double junctionTempMax,
        double windingTempMax,
        double cost,
        double mass) {
}
