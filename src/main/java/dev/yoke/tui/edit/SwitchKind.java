package dev.yoke.tui.edit;

import dev.yoke.model.Catalog;
import dev.yoke.model.PowerSwitch;
import dev.yoke.units.Dimension;
import dev.yoke.units.Units;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Switches (MOSFETs) in the parts editor: every {@link PowerSwitch} field with its unit and range. */
public final class SwitchKind implements PartKind<PowerSwitch> {

    /** The one instance. */
    public static final SwitchKind INSTANCE = new SwitchKind();

    private static final List<FieldSpec> FIELDS = List.of(
            FieldSpec.text("id", false),
            FieldSpec.text("label", true),
            FieldSpec.text("package", true),
            FieldSpec.quantity("vds_max", Quantities.VOLTS, FieldCheck.POSITIVE),
            FieldSpec.quantity("id_continuous", Quantities.AMPERES, FieldCheck.POSITIVE),
            FieldSpec.quantity("id_pulsed", Quantities.AMPERES, FieldCheck.POSITIVE),
            FieldSpec.quantity("rds_on", Quantities.OHMS, FieldCheck.POSITIVE),
            FieldSpec.quantity("rds_on_hot", Quantities.OHMS, FieldCheck.POSITIVE),
            FieldSpec.quantity("rds_on_hot_temp", Quantities.CELSIUS, FieldCheck.between(26, 250, "26…250 °C")),
            FieldSpec.quantity("gate_charge", Quantities.COULOMBS, FieldCheck.POSITIVE),
            FieldSpec.quantity("gate_source_charge", Quantities.COULOMBS, FieldCheck.NOT_NEGATIVE),
            FieldSpec.quantity("gate_drain_charge", Quantities.COULOMBS, FieldCheck.POSITIVE),
            FieldSpec.quantity("plateau_voltage", Quantities.VOLTS, FieldCheck.POSITIVE),
            FieldSpec.optionalQuantity("gate_resistance_internal", Quantities.OHMS, FieldCheck.NOT_NEGATIVE, 0.0),
            FieldSpec.quantity("output_capacitance", Quantities.FARADS, FieldCheck.NOT_NEGATIVE),
            FieldSpec.quantity("diode_forward_voltage", Quantities.VOLTS, FieldCheck.POSITIVE),
            FieldSpec.optionalQuantity("reverse_recovery_charge", Quantities.COULOMBS, FieldCheck.NOT_NEGATIVE, 0.0),
            FieldSpec.quantity("rth_junction_case", Quantities.KELVIN_PER_WATT, FieldCheck.POSITIVE),
            FieldSpec.quantity("max_junction_temp", Quantities.CELSIUS, FieldCheck.between(50, 250, "50…250 °C")),
            FieldSpec.optionalQuantity("price", Quantities.PRICE, FieldCheck.NOT_NEGATIVE, 0.0));

    private static final List<FormRule> RULES = List.of(
            FormRule.notBelow("id_pulsed", "id_continuous"),
            FormRule.notBelow("rds_on_hot", "rds_on"),
            FormRule.notAbove("gate_drain_charge", "gate_charge"),
            FormRule.notAbove("gate_source_charge", "gate_charge"));

    private SwitchKind() {
    }

    @Override
    public String noun() {
        return "switch";
    }

    @Override
    public String plural() {
        return "switches";
    }

    @Override
    public List<FieldSpec> fields() {
        return FIELDS;
    }

    @Override
    public List<FormRule> rules() {
        return RULES;
    }

    @Override
    public Map<String, Object> values(PowerSwitch s) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("id", s.id());
        v.put("label", s.label());
        v.put("package", s.packageName());
        v.put("vds_max", s.vdsMax());
        v.put("id_continuous", s.idContinuous());
        v.put("id_pulsed", s.idPulsed());
        v.put("rds_on", s.rdsOn());
        v.put("rds_on_hot", s.rdsOnHot());
        v.put("rds_on_hot_temp", s.rdsOnHotTemp());
        v.put("gate_charge", s.gateCharge());
        v.put("gate_source_charge", s.gateSourceCharge());
        v.put("gate_drain_charge", s.gateDrainCharge());
        v.put("plateau_voltage", s.plateauVoltage());
        v.put("gate_resistance_internal", s.gateResistanceInternal());
        v.put("output_capacitance", s.outputCapacitance());
        v.put("diode_forward_voltage", s.diodeForwardVoltage());
        v.put("reverse_recovery_charge", s.reverseRecoveryCharge());
        v.put("rth_junction_case", s.rthJunctionCase());
        v.put("max_junction_temp", s.maxJunctionTemp());
        v.put("price", s.price());
        return v;
    }

    @Override
    public PowerSwitch build(Map<String, Object> v) {
        return new PowerSwitch((String) v.get("id"), (String) v.get("label"), (String) v.get("package"),
                d(v, "vds_max"), d(v, "id_continuous"), d(v, "id_pulsed"), d(v, "rds_on"), d(v, "rds_on_hot"),
                d(v, "rds_on_hot_temp"), d(v, "gate_charge"), d(v, "gate_source_charge"),
                d(v, "gate_drain_charge"), d(v, "plateau_voltage"), d(v, "gate_resistance_internal"),
                d(v, "output_capacitance"), d(v, "diode_forward_voltage"), d(v, "reverse_recovery_charge"),
                d(v, "rth_junction_case"), d(v, "max_junction_temp"), d(v, "price"));
    }

    private static double d(Map<String, Object> v, String key) {
        return (Double) v.get(key);
    }

    @Override
    public String id(PowerSwitch part) {
        return part.id();
    }

    @Override
    public String label(PowerSwitch part) {
        return part.label();
    }

    @Override
    public List<PowerSwitch> parts(Catalog catalog) {
        return catalog.switches();
    }

    @Override
    public List<Column<PowerSwitch>> columns() {
        return List.of(
                new Column<>("V_DS", 7, s -> Units.format(s.vdsMax(), Dimension.VOLTAGE)),
                new Column<>("R_DS(on)", 9, s -> Units.format(s.rdsOn(), Dimension.RESISTANCE)),
                new Column<>("Q_g", 8, s -> Units.format(s.gateCharge(), Dimension.CHARGE)),
                new Column<>("I_D", 8, s -> Units.format(s.idContinuous(), Dimension.CURRENT)));
    }
}
