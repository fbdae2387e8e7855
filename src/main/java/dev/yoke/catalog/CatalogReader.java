package dev.yoke.catalog;

import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BiConsumer;

/** Builds the motors and switches of one catalog file's tree, recording every problem. */
final class CatalogReader {

    /** A part with the line of its entry. */
    record Located<T>(T part, int line, int column, int idLine, int idColumn, boolean implausible) {
    }

    private final SectionReader reader;
    final List<Located<Motor>> motors = new ArrayList<>();
    final List<Located<PowerSwitch>> switches = new ArrayList<>();

    CatalogReader(SectionReader reader) {
        this.reader = reader;
    }

    void read(YamlNode root) {
        if (root instanceof YamlNode.Mapping map
                && (map.entries().containsKey("bench") || map.entries().containsKey("profile"))) {
            reader.error(map.line(), map.column(), "", "this is a scenario file (it has 'bench:' or 'profile:'),"
                    + " not a catalog file; keep scenarios out of the catalog folder");
            return;
        }
        SectionValues top = reader.read(root, PartKind.CATALOG, "", "a catalog file");
        if (top == null) {
            return;
        }
        if (!top.given("motors") && !top.given("switches") && !top.failed()) {
            reader.error(top.map().line(), top.map().column(), "", "a catalog file holds 'motors:' and/or 'switches:'");
            return;
        }
        if (top.has("motors")) {
            each(top.node("motors"), PartKind.MOTOR, this::readMotor);
        }
        if (top.has("switches")) {
            each(top.node("switches"), PartKind.SWITCH, this::readSwitch);
        }
    }

    private void each(YamlNode list, PartKind kind, BiConsumer<YamlNode, String> action) {
        int n = 0;
        for (YamlNode item : ((YamlNode.Sequence) list).items()) {
            n++;
            action.accept(item, describe(item, kind, n));
        }
    }

    /** "motor 'm1'" or "motor #3" when it has no readable id. */
    static String describe(YamlNode item, PartKind kind, int index) {
        if (item instanceof YamlNode.Mapping map) {
            YamlNode.Entry id = map.entries().get("id");
            if (id != null && id.value() instanceof YamlNode.Scalar s && !s.nul()) {
                return kind.noun() + " '" + s.text() + "'";
            }
        }
        return kind.noun() + " #" + index;
    }

    private void readMotor(YamlNode node, String where) {
        SectionValues v = reader.read(node, PartKind.MOTOR, PartKind.MOTOR.key(), where);
        if (v == null) {
            return;
        }
        List<String> constants = new ArrayList<>();
        for (String key : List.of("torque_constant", "back_emf_constant", "speed_constant")) {
            if (v.given(key)) {
                constants.add(key);
            }
        }
        if (constants.isEmpty()) {
            reader.error(v.map().line(), v.map().column(), "torque_constant",
                    "missing; give one of torque_constant, back_emf_constant or speed_constant (" + where + ")");
            return;
        }
        if (constants.size() > 1) {
            String second = constants.get(1);
            reader.error(v.line(second), v.column(second), second, "give only one of torque_constant,"
                    + " back_emf_constant or speed_constant; " + constants.get(0) + " is already given");
            return;
        }
        if (v.failed() || !v.has(constants.get(0))) {
            return;
        }
        double kt = switch (constants.get(0)) {
            case "speed_constant" -> 1.0 / v.number("speed_constant"); // k_e = 1/k_n in SI (rad/s/V)
            default -> v.number(constants.get(0)); // k_t [N·m/A] = k_e [V·s/rad] in SI
        };
        Motor m = new Motor(v.text("id"), v.text("label"), v.number("nominal_voltage"), v.number("resistance"),
                v.number("resistance_temp"), v.number("inductance"), kt, v.number("no_load_current"),
                v.number("continuous_current"), v.number("peak_current"), v.number("max_speed"),
                v.number("rotor_inertia"), v.number("rth_winding_housing"), v.number("rth_housing_ambient"),
                v.number("tau_winding"), v.number("tau_housing"), v.number("max_winding_temp"),
                v.number("brush_drop"), v.number("mass"), v.number("price"));
        boolean ok = true;
        for (PartRules.FieldIssue issue : PartRules.motorErrors(m)) {
            reader.error(v.line(issue.field()), v.column(issue.field()), issue.field(), issue.message());
            ok = false;
        }
        if (ok) {
            boolean doubtful = warn(Plausibility.motorWarnings(m), v, where);
            motors.add(new Located<>(m, v.map().line(), v.map().column(), v.line("id"), v.column("id"), doubtful));
        }
    }

    private void readSwitch(YamlNode node, String where) {
        SectionValues v = reader.read(node, PartKind.SWITCH, PartKind.SWITCH.key(), where);
        if (v == null) {
            return;
        }
        if (v.given("rds_on_hot_temp") && !v.given("rds_on_hot")) {
            reader.error(v.line("rds_on_hot_temp"), v.column("rds_on_hot_temp"), "rds_on_hot_temp",
                    "given without rds_on_hot; give both or neither");
            return;
        }
        if (v.given("rds_on_hot") && !v.given("rds_on_hot_temp")) {
            reader.error(v.line("rds_on_hot"), v.column("rds_on_hot"), "rds_on_hot",
                    "needs rds_on_hot_temp, the junction temperature it was measured at");
            return;
        }
        if (v.failed()) {
            return;
        }
        double hot = v.has("rds_on_hot") ? v.number("rds_on_hot") : v.number("rds_on") * PowerSwitch.DEFAULT_HOT_FACTOR;
        double hotTemp = v.has("rds_on_hot_temp") ? v.number("rds_on_hot_temp") : PowerSwitch.DEFAULT_HOT_TEMP;
        PowerSwitch s = new PowerSwitch(v.text("id"), v.text("label"), v.text("package"), v.number("vds_max"),
                v.number("id_continuous"), v.number("id_pulsed"), v.number("rds_on"), hot, hotTemp,
                v.number("qg"), v.number("qgs"), v.number("qgd"), v.number("plateau_voltage"),
                v.number("gate_resistance_internal"), v.number("coss"), v.number("diode_vf"), v.number("qrr"),
                v.number("rth_jc"), v.number("tj_max"), v.number("price"));
        boolean ok = true;
        for (PartRules.FieldIssue issue : PartRules.switchErrors(s)) {
            reader.error(v.line(issue.field()), v.column(issue.field()), issue.field(), issue.message());
            ok = false;
        }
        if (ok) {
            boolean doubtful = warn(Plausibility.switchWarnings(s), v, where);
            switches.add(new Located<>(s, v.map().line(), v.map().column(), v.line("id"), v.column("id"), doubtful));
        }
    }

    private boolean warn(List<PartRules.FieldIssue> issues, SectionValues v, String where) {
        for (PartRules.FieldIssue issue : issues) {
            reader.warning(v.line(issue.field()), v.column(issue.field()), issue.field(),
                    issue.message() + " (" + where + ")");
        }
        return !issues.isEmpty();
    }
}
