package dev.yoke.model;

/**
 * An N-channel MOSFET, one of the four switches of the H-bridge, in SI units
 * (temperatures in °C, names ending in {@code Temp}).
 *
 * @param id                     unique key across the catalog
 * @param label                  free text shown beside the id
 * @param packageName            case style, e.g. a power package name of the user's choosing
 * @param vdsMax                 drain-source voltage rating, V
 * @param idContinuous           continuous drain current rating, A
 * @param idPulsed               pulsed drain current rating, A
 * @param rdsOn                  on-resistance at T_j = 25 °C, Ω
 * @param rdsOnHot               on-resistance at {@code rdsOnHotTemp}, Ω
 * @param rdsOnHotTemp           junction temperature of {@code rdsOnHot}, °C
 * @param gateCharge             total gate charge Q_g, C
 * @param gateSourceCharge       gate-source charge Q_gs, C
 * @param gateDrainCharge        gate-drain (Miller) charge Q_gd, C
 * @param plateauVoltage         Miller plateau voltage, V
 * @param gateResistanceInternal internal gate resistance, Ω
 * @param outputCapacitance      C_oss, F
 * @param diodeForwardVoltage    body-diode forward voltage, V
 * @param reverseRecoveryCharge  body-diode Q_rr, C
 * @param rthJunctionCase        junction-to-case thermal resistance, K/W
 * @param maxJunctionTemp        absolute maximum junction temperature, °C
 * @param price                  per unit, in the catalog's currency
 */
public record PowerSwitch(
        String id,
        String label,
        String packageName,
        double vdsMax,
        double idContinuous,
        double idPulsed,
        double rdsOn,
        double rdsOnHot,
        double rdsOnHotTemp,
        double gateCharge,
        double gateSourceCharge,
        double gateDrainCharge,
        double plateauVoltage,
        double gateResistanceInternal,
        double outputCapacitance,
        double diodeForwardVoltage,
        double reverseRecoveryCharge,
        double rthJunctionCase,
        double maxJunctionTemp,
        double price) {

    /** Rule of thumb when no hot value is given: R_DS(on) at 150 °C ≈ 1.9 × the 25 °C value (common practice). */
    public static final double DEFAULT_HOT_FACTOR = 1.9;

    /** Junction temperature of the default hot value, °C (common practice). */
    public static final double DEFAULT_HOT_TEMP = 150.0;

    /**
     * On-resistance at junction temperature {@code junctionTemp} (°C), linear between the
     * 25 °C value and the hot value (common practice: the datasheet curve is close to linear
     * over 25–150 °C).
     */
    public double rdsOnAt(double junctionTemp) {
        return rdsOn * (1.0 + rdsOnTempCoefficient() * (junctionTemp - 25.0));
    }

    /** Fractional rise of R_DS(on) per kelvin above 25 °C, 1/K. */
    public double rdsOnTempCoefficient() {
        return (rdsOnHot / rdsOn - 1.0) / (rdsOnHotTemp - 25.0);
    }
}
