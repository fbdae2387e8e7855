package dev.yoke.model;

/**
 * A permanent-magnet brushed DC motor as the catalog describes it, in SI units
 * (temperatures in °C, names ending in {@code Temp}).
 *
 * <p>In SI units the torque constant k_t (N·m/A) and the back-EMF constant k_e (V·s/rad)
 * are the same number (any electric-machines text, e.g. Hughes &amp; Drury, <i>Electric
 * Motors and Drives</i>, 4th ed., ch. 3), so only k_t is kept; the loader converts
 * a back-EMF constant or an rpm-per-volt speed constant.
 *
 * @param id                  unique key across the catalog
 * @param label               free text shown beside the id
 * @param nominalVoltage      rated terminal voltage, V
 * @param resistance          terminal resistance at {@code resistanceTemp}, Ω
 * @param resistanceTemp      temperature at which {@code resistance} was measured, °C
 * @param inductance          terminal inductance, H
 * @param torqueConstant      k_t, N·m/A (= k_e in V·s/rad)
 * @param noLoadCurrent       current at no load and nominal voltage, A; gives the friction torque k_t·I0
 * @param continuousCurrent   thermally allowed continuous current, A
 * @param peakCurrent         short-time (demagnetisation/commutation) current limit, A
 * @param maxSpeed            mechanical speed limit, rad/s
 * @param rotorInertia        kg·m²
 * @param rthWindingHousing   winding-to-housing thermal resistance, K/W
 * @param rthHousingAmbient   housing-to-ambient thermal resistance, K/W
 * @param tauWinding          winding thermal time constant, s
 * @param tauHousing          housing thermal time constant, s
 * @param maxWindingTemp      insulation limit, °C (IEC 60085 classes B/F/H: 130/155/180 °C)
 * @param brushDrop           voltage lost across the brushes, V (0 when not given)
 * @param mass                kg
 * @param price               per unit, in the catalog's currency
 */
public record Motor(
        String id,
        String label,
        double nominalVoltage,
        double resistance,
        double resistanceTemp,
        double inductance,
        double torqueConstant,
        double noLoadCurrent,
        double continuousCurrent,
        double peakCurrent,
        double maxSpeed,
        double rotorInertia,
        double rthWindingHousing,
        double rthHousingAmbient,
        double tauWinding,
        double tauHousing,
        double maxWindingTemp,
        double brushDrop,
        double mass,
        double price) {

    /** Friction torque T_f = k_t·I0, N·m (common practice: the no-load current feeds only friction). */
    public double frictionTorque() {
        return torqueConstant * noLoadCurrent;
    }

    /** Winding heat capacity C = τ/R_th, J/K. */
    public double windingHeatCapacity() {
        return tauWinding / rthWindingHousing;
    }

    /** Housing heat capacity C = τ/R_th, J/K. */
    public double housingHeatCapacity() {
        return tauHousing / rthHousingAmbient;
    }
}
