package dev.yoke.report;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.yoke.engine.Advisory;
import dev.yoke.engine.Constraint;
import dev.yoke.engine.PairingResult;
import dev.yoke.engine.SegmentResult;
import dev.yoke.engine.SwitchLoss;
import dev.yoke.engine.Totals;

/**
 * One evaluated pairing as a JSON object, the form {@code yoke explain --json} prints and
 * {@code yoke rank --json} repeats in an array. SI units throughout (V, A, W, J, s, Hz, rad/s,
 * N·m, Ω, kg), temperatures in °C, margins and duty as fractions; non-finite numbers are
 * {@code null}. The field list is in {@code docs/json-report.md}.
 */
public final class PairingJson {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private PairingJson() {
    }

    /** The shared mapper (plain JSON, no indentation unless the caller asks). */
    public static ObjectMapper mapper() {
        return MAPPER;
    }

    /**
     * @param segments include the per-segment array
     * @param pareto   the Pareto flag when known (rank), else null (explain)
     */
    public static ObjectNode of(PairingResult r, boolean segments, Boolean pareto) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("motor", r.motor().id());
        o.put("motor_label", r.motor().label());
        o.put("switch", r.powerSwitch().id());
        o.put("switch_label", r.powerSwitch().label());
        num(o, "pwm_frequency", r.pwmFrequency());
        num(o, "gear_ratio", r.gearRatio());
        o.put("feasible", r.feasible());
        if (pareto != null) {
            o.put("pareto", pareto);
        }
        o.put("binding", r.binding().key());
        num(o, "binding_margin", r.bindingMargin());
        ArrayNode warnings = o.putArray("warnings");
        for (Advisory a : Advisory.values()) {
            if (r.advisories().contains(a)) {
                ObjectNode w = warnings.addObject();
                w.put("key", a.key());
                w.put("message", a.message());
            }
        }
        ObjectNode margins = o.putObject("margins");
        for (Constraint c : Constraint.values()) {
            Double m = r.margins().get(c);
            if (m != null) {
                num(margins, c.key(), m);
            }
        }
        Totals t = r.totals();
        ObjectNode totals = o.putObject("totals");
        num(totals, "current_rms", t.currentRms());
        num(totals, "current_peak", t.currentPeak());
        num(totals, "duty_max", t.dutyMax());
        num(totals, "ripple_pp", t.ripplePeakToPeak());
        num(totals, "bridge_loss", t.bridgeLoss());
        num(totals, "motor_loss", t.motorLoss());
        num(totals, "gate_drive_loss", t.gateDriveLoss());
        num(totals, "total_loss", t.bridgeLoss() + t.motorLoss() + t.gateDriveLoss());
        num(totals, "efficiency", t.efficiency());
        num(totals, "energy_in", t.energyIn());
        num(totals, "energy_out", t.energyOut());
        num(totals, "junction_temp_max", t.junctionTempMax());
        num(totals, "winding_temp_max", t.windingTempMax());
        num(totals, "cost", t.cost());
        num(totals, "mass", t.mass());
        if (segments) {
            ArrayNode list = o.putArray("segments");
            for (SegmentResult s : r.segments()) {
                list.add(segment(s));
            }
        }
        return o;
    }

    private static ObjectNode segment(SegmentResult s) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("label", s.label());
        num(o, "duration", s.duration());
        num(o, "motor_speed", s.motorSpeed());
        num(o, "motor_torque", s.motorTorque());
        num(o, "current_avg", s.currentAvg());
        num(o, "terminal_voltage", s.terminalVoltage());
        num(o, "duty", s.duty());
        num(o, "current_ripple_pp", s.currentRipplePp());
        num(o, "current_rms", s.currentRms());
        num(o, "current_peak", s.currentPeak());
        num(o, "winding_resistance", s.windingResistance());
        num(o, "winding_temp", s.windingTemp());
        num(o, "winding_temp_peak", s.windingTempPeak());
        ArrayNode losses = o.putArray("switch_losses");
        for (SwitchLoss l : s.switchLosses()) {
            ObjectNode n = losses.addObject();
            n.put("position", l.position());
            num(n, "conduction", l.conduction());
            num(n, "switching", l.switching());
            num(n, "output_capacitance", l.outputCapacitance());
            num(n, "dead_time_diode", l.deadTimeDiode());
            num(n, "reverse_recovery", l.reverseRecovery());
            num(n, "total", l.total());
        }
        ArrayNode tj = o.putArray("junction_temps");
        for (double v : s.junctionTemps()) {
            if (Double.isFinite(v)) {
                tj.add(v);
            } else {
                tj.addNull();
            }
        }
        num(o, "motor_loss", s.motorLoss());
        num(o, "copper_loss", s.copperLoss());
        num(o, "friction_loss", s.frictionLoss());
        num(o, "gate_drive_loss", s.gateDriveLoss());
        num(o, "mechanical_power", s.mechanicalPower());
        num(o, "bus_power", s.busPower());
        return o;
    }

    private static void num(ObjectNode o, String field, double v) {
        if (Double.isFinite(v)) {
            o.put(field, v);
        } else {
            o.putNull(field);
        }
    }
}
