package dev.yoke.tui.edit;

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
import java.util.Set;

/** Switches (MOSFETs) in the parts editor: every {@link PowerSwitch} field with its unit and range. */
public final class SwitchEditing extends PartEditing<PowerSwitch> {

    /** The one instance. */
    public static final SwitchEditing INSTANCE = new SwitchEditing();

    private SwitchEditing() {
        super("switch", "switches", PartKind.SWITCH, Set.of(),
                PartRules::switchErrors, Plausibility::switchWarnings,
                PowerSwitch::id, PowerSwitch::label, Catalog::switches);
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
                number(v, "vds_max"),
                number(v, "id_continuous"), number(v, "id_pulsed"), number(v, "rds_on"), number(v, "rds_on_hot"),
                number(v, "rds_on_hot_temp"), number(v, "qg"), number(v, "qgs"), number(v, "qgd"),
                number(v, "plateau_voltage"), number(v, "gate_resistance_internal"), number(v, "coss"),
                number(v, "diode_vf"), number(v, "qrr"), number(v, "rth_jc"), number(v, "tj_max"), number(v, "price"));
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
