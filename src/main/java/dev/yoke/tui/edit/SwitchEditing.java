package dev.yoke.tui.edit;

import dev.yoke.catalog.PartFields;
import dev.yoke.catalog.PartKind;
import dev.yoke.catalog.PartRules;
import dev.yoke.catalog.Plausibility;
import dev.yoke.model.Catalog;
import dev.yoke.model.PowerSwitch;
import dev.yoke.units.Dimension;
import dev.yoke.units.Units;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Switches (MOSFETs) in the parts editor: every {@link PowerSwitch} field with its unit and range. */
public final class SwitchEditing implements EditablePart<PowerSwitch> {

    /** The one instance. */
    public static final SwitchEditing INSTANCE = new SwitchEditing();

    private static final List<FormField> FIELDS = PartFields.of(PartKind.SWITCH).stream()
            .map(FormField::of)
            .toList();

    private static final List<FormRule> RULES = List.of(FormRule.onRecord(
            FIELDS.stream().map(FormField::key).toList(),
            INSTANCE::build,
            s -> MotorEditing.issues(PartRules.switchErrors(s))));

    private SwitchEditing() {
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
    public List<FormField> fields() {
        return FIELDS;
    }

    @Override
    public List<FormRule> rules() {
        return RULES;
    }

    @Override
    public List<FormRule> doubts() {
        return List.of(FormRule.onRecord(FIELDS.stream().map(FormField::key).toList(), INSTANCE::build,
                s -> MotorEditing.issues(Plausibility.switchWarnings(s))));
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
        v.put("qg", s.gateCharge());
        v.put("qgs", s.gateSourceCharge());
        v.put("qgd", s.gateDrainCharge());
        v.put("plateau_voltage", s.plateauVoltage());
        v.put("gate_resistance_internal", s.gateResistanceInternal());
        v.put("coss", s.outputCapacitance());
        v.put("diode_vf", s.diodeForwardVoltage());
        v.put("qrr", s.reverseRecoveryCharge());
        v.put("rth_jc", s.rthJunctionCase());
        v.put("tj_max", s.maxJunctionTemp());
        v.put("price", s.price());
        return v;
    }

    @Override
    public PowerSwitch build(Map<String, Object> v) {
        return new PowerSwitch((String) v.get("id"), (String) v.get("label"), (String) v.get("package"),
                d(v, "vds_max"), d(v, "id_continuous"), d(v, "id_pulsed"), d(v, "rds_on"), d(v, "rds_on_hot"),
                d(v, "rds_on_hot_temp"), d(v, "qg"), d(v, "qgs"),
                d(v, "qgd"), d(v, "plateau_voltage"), d(v, "gate_resistance_internal"),
                d(v, "coss"), d(v, "diode_vf"), d(v, "qrr"),
                d(v, "rth_jc"), d(v, "tj_max"), d(v, "price"));
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
