package dev.yoke.tui.edit;

import dev.yoke.catalog.FieldSpec;
import dev.yoke.catalog.FieldType;
import dev.yoke.catalog.PartFields;
import dev.yoke.catalog.PartKind;
import dev.yoke.catalog.PartRules;
import dev.yoke.catalog.Plausibility;
import dev.yoke.model.Bench;
import dev.yoke.model.Limits;
import dev.yoke.model.Modulation;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** The scenario's scalar fields (name, bench, limits, profile) as form fields, and back to a {@link Scenario}. */
final class ScenarioFields {

    private ScenarioFields() {
    }

    static final String NAME = "name";
    static final String BUS = "bus_voltage";
    static final String BUS_MIN = "bus_voltage_min";
    static final String BUS_MAX = "bus_voltage_max";
    static final String FREQUENCIES = "pwm_frequencies";
    static final String MODULATION = "modulation";
    static final String DEAD_TIME = "dead_time";
    static final String DRIVE_VOLTAGE = "gate_drive_voltage";
    static final String GATE_RESISTANCE = "gate_resistance";
    static final String MAX_DUTY = "max_duty";
    static final String AMBIENT = "ambient_temp";
    static final String RTH_CASE_AMBIENT = "switch_rth_case_ambient";
    static final String RATIOS = "gear_ratios";
    static final String GEAR_EFFICIENCY = "gear_efficiency";
    static final String VDS_DERATING = "vds_derating";
    static final String JUNCTION_LIMIT = "junction_temp_limit";
    static final String WINDING_MARGIN = "winding_temp_margin";
    static final String RIPPLE = "ripple_fraction";
    static final String LOAD_INERTIA = "load_inertia";
    static final String REPEAT = "repeat";

    /** Name, bench, limits and the profile's scalars, read as the scenario loader reads them. */
    static List<FormField> fields() {
        List<FormField> out = new ArrayList<>();
        out.add(FormField.of(PartKind.SCENARIO, NAME));
        for (FieldSpec f : PartFields.of(PartKind.BENCH)) {
            if (f.type() != FieldType.SECTION) {
                out.add(FormField.of(f));
            }
        }
        for (FieldSpec f : PartFields.of(PartKind.LIMITS)) {
            out.add(FormField.of(f));
        }
        out.add(FormField.of(PartKind.PROFILE, LOAD_INERTIA));
        out.add(FormField.of(PartKind.PROFILE, REPEAT));
        return out;
    }

    /** The loader's checks across bench fields (bus voltages in order, dead time shorter than a period…). */
    static List<FormRule> rules() {
        List<String> keys = fields().stream().map(FormField::key).toList();
        return List.of(FormRule.onRecord(keys, ScenarioFields::bench,
                b -> PartEditing.issues(PartRules.benchErrors(b))));
    }

    /** The loader's plausibility doubts about the bench: shown with {@code ?}, never blocking. */
    static List<FormRule> doubts() {
        List<String> keys = fields().stream().map(FormField::key).toList();
        return List.of(FormRule.onRecord(keys, ScenarioFields::bench,
                b -> PartEditing.issues(Plausibility.benchWarnings(b))));
    }

    static void fill(FieldForm form, Scenario s) {
        Bench b = s.bench();
        Limits l = b.limits();
        form.setValue(NAME, s.name());
        form.setValue(BUS, b.busVoltage());
        form.setValue(BUS_MIN, b.busVoltageMin());
        form.setValue(BUS_MAX, b.busVoltageMax());
        form.setValue(FREQUENCIES, b.pwmFrequencies());
        form.setValue(MODULATION, b.modulation());
        form.setValue(DEAD_TIME, b.deadTime());
        form.setValue(DRIVE_VOLTAGE, b.gateDriveVoltage());
        form.setValue(GATE_RESISTANCE, b.gateResistance());
        form.setValue(MAX_DUTY, b.maxDuty());
        form.setValue(AMBIENT, b.ambientTemp());
        form.setValue(RTH_CASE_AMBIENT, b.switchRthCaseAmbient());
        form.setValue(RATIOS, b.gearRatios());
        form.setValue(GEAR_EFFICIENCY, b.gearEfficiency());
        form.setValue(VDS_DERATING, l.vdsDerating());
        form.setValue(JUNCTION_LIMIT, l.junctionTempLimit());
        form.setValue(WINDING_MARGIN, l.windingTempMargin());
        form.setValue(RIPPLE, l.rippleFraction());
        form.setValue(LOAD_INERTIA, s.profile().loadInertia());
        form.setValue(REPEAT, s.profile().repeat());
    }

    static Scenario build(Map<String, Object> v, List<Segment> segments) {
        Profile profile = new Profile(d(v, LOAD_INERTIA), (Boolean) v.get(REPEAT), segments);
        return new Scenario((String) v.get(NAME), bench(v), profile);
    }

    @SuppressWarnings("unchecked")
    static Bench bench(Map<String, Object> v) {
        Limits limits = new Limits(d(v, VDS_DERATING), d(v, JUNCTION_LIMIT), d(v, WINDING_MARGIN), d(v, RIPPLE));
        Bench bench = new Bench(d(v, BUS), d(v, BUS_MIN), d(v, BUS_MAX),
                new ArrayList<>((List<Double>) v.get(FREQUENCIES)), (Modulation) v.get(MODULATION),
                d(v, DEAD_TIME), d(v, DRIVE_VOLTAGE), d(v, GATE_RESISTANCE), d(v, MAX_DUTY), d(v, AMBIENT),
                d(v, RTH_CASE_AMBIENT), new ArrayList<>((List<Double>) v.get(RATIOS)), d(v, GEAR_EFFICIENCY), limits);
        return bench;
    }

    private static double d(Map<String, Object> v, String key) {
        return (Double) v.get(key);
    }
}
