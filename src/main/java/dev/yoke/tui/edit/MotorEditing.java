package dev.yoke.tui.edit;

import dev.yoke.catalog.PartKind;
import dev.yoke.catalog.PartRules;
import dev.yoke.catalog.Plausibility;
import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.units.Dimension;
import dev.yoke.units.Units;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Motors in the parts editor: every {@link Motor} field with its unit and range. */
public final class MotorEditing extends PartEditing<Motor> {

    /** The one instance. */
    public static final MotorEditing INSTANCE = new MotorEditing();

    private MotorEditing() {
        // back-EMF and speed constants: the model does not keep them, the loader turns them into
        // the torque constant.
        super("motor", "motors", PartKind.MOTOR, Set.of("back_emf_constant", "speed_constant"),
                PartRules::motorErrors, Plausibility::motorWarnings,
                Motor::id, Motor::label, Catalog::motors);
    }

    @Override
    public Map<String, Object> values(Motor m) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("id", m.id());
        v.put("label", m.label());
        v.put("nominal_voltage", m.nominalVoltage());
        v.put("resistance", m.resistance());
        v.put("resistance_temp", m.resistanceTemp());
        v.put("inductance", m.inductance());
        v.put("torque_constant", m.torqueConstant());
        v.put("no_load_current", m.noLoadCurrent());
        v.put("continuous_current", m.continuousCurrent());
        v.put("peak_current", m.peakCurrent());
        v.put("max_speed", m.maxSpeed());
        v.put("rotor_inertia", m.rotorInertia());
        v.put("rth_winding_housing", m.rthWindingHousing());
        v.put("rth_housing_ambient", m.rthHousingAmbient());
        v.put("tau_winding", m.tauWinding());
        v.put("tau_housing", m.tauHousing());
        v.put("max_winding_temp", m.maxWindingTemp());
        v.put("brush_drop", m.brushDrop());
        v.put("mass", m.mass());
        v.put("price", m.price());
        return v;
    }

    @Override
    public Motor build(Map<String, Object> v) {
        return new Motor((String) v.get("id"), (String) v.get("label"),
                number(v, "nominal_voltage"), number(v, "resistance"),
                number(v, "resistance_temp"), number(v, "inductance"), number(v, "torque_constant"),
                number(v, "no_load_current"), number(v, "continuous_current"), number(v, "peak_current"),
                number(v, "max_speed"), number(v, "rotor_inertia"), number(v, "rth_winding_housing"),
                number(v, "rth_housing_ambient"), number(v, "tau_winding"), number(v, "tau_housing"),
                number(v, "max_winding_temp"), number(v, "brush_drop"), number(v, "mass"), number(v, "price"));
    }

    @Override
    public List<Column<Motor>> columns() {
        return List.of(
                new Column<>("U nom", 8, m -> Units.format(m.nominalVoltage(), Dimension.VOLTAGE)),
                new Column<>("R", 9, m -> Units.format(m.resistance(), Dimension.RESISTANCE)),
                new Column<>("k_t", 11, m -> Units.format(m.torqueConstant(), Dimension.TORQUE_CONSTANT)),
                new Column<>("I cont", 8, m -> Units.format(m.continuousCurrent(), Dimension.CURRENT)));
    }
}
