package dev.yoke.catalog;

import dev.yoke.model.Bench;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.units.Dimension;
import dev.yoke.units.Units;
import java.util.ArrayList;
import java.util.List;

/**
 * Doubts about values that are possible but unlikely to be what the user meant: the file still
 * loads, the part is marked, and the warning says what disagrees with what.
 */
public final class Plausibility {

    /** A no-load speed this far below the stated maximum speed (or above it) suggests a wrong k_t, V or speed. */
    static final double SPEED_LOW = 0.7;
    /** Max speed more than this multiple of the no-load speed at nominal voltage is doubtful. */
    static final double SPEED_HIGH = 4.0;
    /** Electrical time constants of brushed motors are micro- to milliseconds; a second is a unit mistake. */
    static final double MAX_ELECTRICAL_TAU = 1.0;
    /** Highest specific heat among common motor materials: aluminium, ≈ 900 J/(kg·K) (CRC Handbook). */
    static final double MAX_SPECIFIC_HEAT = 900.0;
    /** Lowest: copper, ≈ 385 J/(kg·K) (CRC Handbook); a tenth of it leaves room for partial models. */
    static final double MIN_SPECIFIC_HEAT = 38.5;
    /** Tolerance on the datasheet's own continuous-current rating: 10 %. */
    static final double RATING_SLACK = 1.1;

    private Plausibility() {
    }

    /** Doubts about a motor, each attached to the key to look at. */
    public static List<PartRules.FieldIssue> motorWarnings(Motor m) {
        List<PartRules.FieldIssue> out = new ArrayList<>();
        // No-load speed at nominal voltage: ω0 = (V − R·I0 − V_brush)/k_e, k_e = k_t in SI
        // (Hughes & Drury, Electric Motors and Drives, 4th ed., ch. 3, steady-state equations).
        double noLoadSpeed = (m.nominalVoltage() - m.resistance() * m.noLoadCurrent() - m.brushDrop())
                / m.torqueConstant();
        if (noLoadSpeed > 0 && m.maxSpeed() < SPEED_LOW * noLoadSpeed) {
            out.add(new PartRules.FieldIssue("max_speed", "max_speed " + show(m.maxSpeed(), Dimension.ANGULAR_SPEED)
                    + " is far below the no-load speed (V - R*I0)/k_t = "
                    + show(noLoadSpeed, Dimension.ANGULAR_SPEED) + " at nominal_voltage; check torque_constant,"
                    + " nominal_voltage or max_speed"));
        } else if (noLoadSpeed > 0 && m.maxSpeed() > SPEED_HIGH * noLoadSpeed) {
            out.add(new PartRules.FieldIssue("max_speed", "max_speed " + show(m.maxSpeed(), Dimension.ANGULAR_SPEED)
                    + " is more than " + (int) SPEED_HIGH + "x the no-load speed (V - R*I0)/k_t = "
                    + show(noLoadSpeed, Dimension.ANGULAR_SPEED) + "; check torque_constant or nominal_voltage"));
        }
        double electricalTau = m.inductance() / m.resistance();
        if (electricalTau > MAX_ELECTRICAL_TAU) {
            out.add(new PartRules.FieldIssue("inductance", "electrical time constant L/R = "
                    + show(electricalTau, Dimension.TIME) + " is implausibly long; check the units of inductance"
                    + " and resistance"));
        }
        if (m.tauWinding() > m.tauHousing()) {
            out.add(new PartRules.FieldIssue("tau_winding", "tau_winding " + show(m.tauWinding(), Dimension.TIME)
                    + " is longer than tau_housing " + show(m.tauHousing(), Dimension.TIME)
                    + "; a winding usually heats much faster than its housing"));
        }
        double capacity = m.windingHeatCapacity() + m.housingHeatCapacity();
        if (capacity > MAX_SPECIFIC_HEAT * m.mass()) {
            out.add(new PartRules.FieldIssue("tau_housing", String.format(java.util.Locale.ROOT,
                    "heat capacities tau/R_th add to %.0f J/K, more than %s of motor can store (%.0f J/K at"
                            + " 900 J/(kg*K), aluminium); check the time constants and thermal resistances",
                    capacity, show(m.mass(), Dimension.MASS), MAX_SPECIFIC_HEAT * m.mass())));
        } else if (capacity < MIN_SPECIFIC_HEAT * m.mass()) {
            out.add(new PartRules.FieldIssue("tau_housing", String.format(java.util.Locale.ROOT,
                    "heat capacities tau/R_th add to only %.1f J/K for %s of motor (copper alone holds"
                            + " 385 J/(kg*K)); check the time constants and thermal resistances",
                    capacity, show(m.mass(), Dimension.MASS))));
        }
        return out;
    }

    /** Doubts about a switch, each attached to the key to look at. */
    public static List<PartRules.FieldIssue> switchWarnings(PowerSwitch s) {
        List<PartRules.FieldIssue> out = new ArrayList<>();
        // A datasheet's continuous drain current is the current whose conduction loss at T_j,max,
        // R_DS(on)(T_j,max)·I², lifts the junction to T_j,max through R_th,jc with the case at 25 °C
        // (common practice in MOSFET datasheets). A rating far beyond that cannot be shed.
        double loss = s.rdsOnAt(s.maxJunctionTemp()) * s.idContinuous() * s.idContinuous();
        double rise = loss * s.rthJunctionCase();
        double allowed = s.maxJunctionTemp() - 25.0;
        if (rise > RATING_SLACK * allowed) {
            out.add(new PartRules.FieldIssue("id_continuous", String.format(java.util.Locale.ROOT,
                    "at id_continuous the conduction loss %s through rth_jc lifts the junction %.0f K above a"
                            + " 25 degC case, more than the %.0f K that tj_max allows; check id_continuous,"
                            + " rds_on or rth_jc",
                    show(loss, Dimension.POWER), rise, allowed)));
        }
        if (s.plateauVoltage() >= 15) {
            out.add(new PartRules.FieldIssue("plateau_voltage", "plateau_voltage " + show(s.plateauVoltage(),
                    Dimension.VOLTAGE) + " is above any usual gate drive (10-15 V, common practice)"));
        }
        return out;
    }

    /** Doubts about a bench. */
    public static List<PartRules.FieldIssue> benchWarnings(Bench b) {
        List<PartRules.FieldIssue> out = new ArrayList<>();
        for (double f : b.pwmFrequencies()) {
            if (f < 1000 || f > 1e6) {
                out.add(new PartRules.FieldIssue("pwm_frequencies", "pwm frequency " + show(f, Dimension.FREQUENCY)
                        + " is outside 1 kHz - 1 MHz, the usual range for MOSFET motor drives (common practice)"));
                break;
            }
        }
        if (b.gateDriveVoltage() > 20) {
            out.add(new PartRules.FieldIssue("gate_drive_voltage", "gate_drive_voltage "
                    + show(b.gateDriveVoltage(), Dimension.VOLTAGE)
                    + " exceeds the +-20 V gate rating of most MOSFETs (common practice)"));
        }
        if (b.deadTime() > 10e-6) {
            out.add(new PartRules.FieldIssue("dead_time", "dead_time " + show(b.deadTime(), Dimension.TIME)
                    + " is unusually long (MOSFET bridges use tens of ns to a few us, common practice)"));
        }
        return out;
    }

    private static String show(double v, Dimension d) {
        return Units.formatAscii(v, d);
    }
}
