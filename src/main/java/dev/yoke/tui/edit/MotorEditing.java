package dev.yoke.tui.edit;

import dev.yoke.catalog.PartFields;
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
public final class MotorEditing implements EditablePart<Motor> {

    /** The one instance. */
    public static final MotorEditing INSTANCE = new MotorEditing();

    /** Keys the model does not keep: the loader turns them into the torque constant. */
    private static final Set<String> NOT_EDITED = Set.of("back_emf_constant", "speed_constant");

    private static final List<FormField> FIELDS = PartFields.of(PartKind.MOTOR).stream()
            .filter(f -> !NOT_EDITED.contains(f.key()))
            .map(FormField::of)
            .toList();

    private static final List<FormRule> RULES = List.of(FormRule.onRecord(
            FIELDS.stream().map(FormField::key).toList(),
            INSTANCE::build,
            m -> issues(PartRules.motorErrors(m))));

    private MotorEditing() {
    }

    @Override
    public String noun() {
        return "motor";
    }

    @Override
    public String plural() {
        return "motors";
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
                m -> MotorEditing.issues(Plausibility.motorWarnings(m))));
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
                d(v, "nominal_voltage"), d(v, "resistance"), d(v, "resistance_temp"), d(v, "inductance"),
                d(v, "torque_constant"), d(v, "no_load_current"), d(v, "continuous_current"),
                d(v, "peak_current"), d(v, "max_speed"), d(v, "rotor_inertia"), d(v, "rth_winding_housing"),
                d(v, "rth_housing_ambient"), d(v, "tau_winding"), d(v, "tau_housing"), d(v, "max_winding_temp"),
                d(v, "brush_drop"), d(v, "mass"), d(v, "price"));
    }

    /** The catalog's issues by field, first message per field. */
    static Map<String, String> issues(List<PartRules.FieldIssue> issues) {
        Map<String, String> out = new LinkedHashMap<>();
        for (PartRules.FieldIssue i : issues) {
            out.putIfAbsent(i.field(), i.message());
        }
        return out;
    }

    private static double d(Map<String, Object> v, String key) {
        return (Double) v.get(key);
    }

    @Override
    public String id(Motor part) {
        return part.id();
    }

    @Override
    public String label(Motor part) {
        return part.label();
    }

    @Override
    public List<Motor> parts(Catalog catalog) {
        return catalog.motors();
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
