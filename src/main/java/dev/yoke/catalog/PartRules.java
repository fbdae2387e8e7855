package dev.yoke.catalog;

import dev.yoke.model.Bench;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.units.Dimension;
import dev.yoke.units.Units;
import java.util.ArrayList;
import java.util.List;

/**
 * Rules that tie several fields of one part together (a peak current below the continuous one is
 * impossible). Public so that editors check a part exactly as the loader does.
 */
public final class PartRules {

    /**
     * One broken rule, attached to the field a user should change.
     *
     * @param field   YAML key
     * @param message what is wrong
     */
    public record FieldIssue(String field, String message) {
    }

    private PartRules() {
    }

    /** Impossible combinations in a motor. */
    public static List<FieldIssue> motorErrors(Motor m) {
        List<FieldIssue> issues = new ArrayList<>();
        if (m.peakCurrent() < m.continuousCurrent()) {
            issues.add(new FieldIssue("peak_current", "peak_current " + show(m.peakCurrent(), Dimension.CURRENT)
                    + " is below continuous_current " + show(m.continuousCurrent(), Dimension.CURRENT)));
        }
        if (m.noLoadCurrent() >= m.continuousCurrent()) {
            issues.add(new FieldIssue("no_load_current", "no_load_current "
                    + show(m.noLoadCurrent(), Dimension.CURRENT) + " must be below continuous_current "
                    + show(m.continuousCurrent(), Dimension.CURRENT)));
        }
        double drop = m.resistance() * m.noLoadCurrent() + m.brushDrop();
        if (m.nominalVoltage() <= drop) {
            issues.add(new FieldIssue("nominal_voltage", "nominal_voltage " + show(m.nominalVoltage(),
                    Dimension.VOLTAGE) + " does not exceed resistance x no_load_current + brush_drop = "
                    + show(drop, Dimension.VOLTAGE) + ": the motor could not turn at no load"));
        }
        return issues;
    }

    /** Impossible combinations in a switch. */
    public static List<FieldIssue> switchErrors(PowerSwitch s) {
        List<FieldIssue> issues = new ArrayList<>();
        if (s.rdsOnHot() < s.rdsOn()) {
            issues.add(new FieldIssue("rds_on_hot", "rds_on_hot " + show(s.rdsOnHot(), Dimension.RESISTANCE)
                    + " is below rds_on " + show(s.rdsOn(), Dimension.RESISTANCE)
                    + "; a silicon MOSFET's on-resistance rises with temperature"));
        }
        if (s.idPulsed() < s.idContinuous()) {
            issues.add(new FieldIssue("id_pulsed", "id_pulsed " + show(s.idPulsed(), Dimension.CURRENT)
                    + " is below id_continuous " + show(s.idContinuous(), Dimension.CURRENT)));
        }
        if (s.gateSourceCharge() + s.gateDrainCharge() > s.gateCharge()) {
            issues.add(new FieldIssue("qgd", "qgs + qgd = "
                    + show(s.gateSourceCharge() + s.gateDrainCharge(), Dimension.CHARGE)
                    + " exceeds the total gate charge qg " + show(s.gateCharge(), Dimension.CHARGE)));
        }
        return issues;
    }

    /** Impossible combinations in a bench. */
    public static List<FieldIssue> benchErrors(Bench b) {
        List<FieldIssue> issues = new ArrayList<>();
        if (b.busVoltageMin() > b.busVoltage()) {
            issues.add(new FieldIssue("bus_voltage_min", "bus_voltage_min " + show(b.busVoltageMin(),
                    Dimension.VOLTAGE) + " is above bus_voltage " + show(b.busVoltage(), Dimension.VOLTAGE)));
        }
        if (b.busVoltageMax() < b.busVoltage()) {
            issues.add(new FieldIssue("bus_voltage_max", "bus_voltage_max " + show(b.busVoltageMax(),
                    Dimension.VOLTAGE) + " is below bus_voltage " + show(b.busVoltage(), Dimension.VOLTAGE)));
        }
        if (b.limits().junctionTempLimit() <= b.ambientTemp()) {
            issues.add(new FieldIssue("junction_temp_limit", "junction_temp_limit "
                    + show(b.limits().junctionTempLimit(), Dimension.TEMPERATURE) + " is not above ambient_temp "
                    + show(b.ambientTemp(), Dimension.TEMPERATURE)));
        }
        for (double f : b.pwmFrequencies()) {
            if (2 * b.deadTime() >= 1 / f) {
                issues.add(new FieldIssue("dead_time", "dead_time " + show(b.deadTime(), Dimension.TIME)
                        + " leaves no on-time in a period of " + show(1 / f, Dimension.TIME) + " ("
                        + show(f, Dimension.FREQUENCY) + ")"));
                break;
            }
        }
        return issues;
    }

    static String show(double v, Dimension d) {
        return Units.formatAscii(v, d);
    }
}
