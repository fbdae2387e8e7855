package dev.yoke.catalog;

import static dev.yoke.catalog.FieldType.BOOLEAN;
import static dev.yoke.catalog.FieldType.IDENTIFIER;
import static dev.yoke.catalog.FieldType.MODULATION;
import static dev.yoke.catalog.FieldType.QUANTITY;
import static dev.yoke.catalog.FieldType.QUANTITY_LIST;
import static dev.yoke.catalog.FieldType.SECTION;
import static dev.yoke.catalog.FieldType.SECTION_LIST;
import static dev.yoke.catalog.FieldType.TEXT;

import dev.yoke.model.PowerSwitch;
import dev.yoke.units.Dimension;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Every key of the catalog and scenario formats, per section, in the order files and editors show
 * them. Ranges are physical possibility (a resistance above zero), not plausibility; doubtful but
 * possible values get warnings from {@link Plausibility}.
 */
public final class PartFields {

    /** Widest ambient or reference temperature accepted, °C: outside it no electronics run. */
    private static final Range AMBIENT = Range.of(-60, true, 150, true);
    /** A part's temperature limit must lie above the 25 °C reference ambient of datasheets (common practice). */
    private static final Range LIMIT_TEMP = Range.of(25, false, 400, true);

    private static final Map<PartKind, List<FieldSpec>> TABLE = new EnumMap<>(PartKind.class);

    /** The same tables indexed by key: every key of every loaded part is looked up here. */
    private static final Map<PartKind, Map<String, FieldSpec>> BY_KEY = new EnumMap<>(PartKind.class);

    static {
        Table catalog = new Table(PartKind.CATALOG);
        catalog.optional("motors", SECTION_LIST, null, null, "", Range.ANY, "the motors of this file");
        catalog.optional("switches", SECTION_LIST, null, null, "", Range.ANY, "the switches of this file");

        Table motor = new Table(PartKind.MOTOR);
        motor.required("id", IDENTIFIER, null, Range.ANY, "unique key of the motor across the catalog");
        motor.optional("label", TEXT, null, "", "", Range.ANY, "free text shown beside the id");
        motor.required("nominal_voltage", QUANTITY, Dimension.VOLTAGE, Range.POSITIVE, "rated terminal voltage");
        motor.required("resistance", QUANTITY, Dimension.RESISTANCE, Range.POSITIVE,
                "terminal resistance at resistance_temp");
        motor.optional("resistance_temp", QUANTITY, Dimension.TEMPERATURE, 20.0, "20 degC", AMBIENT,
                "temperature at which resistance was measured");
        motor.required("inductance", QUANTITY, Dimension.INDUCTANCE, Range.POSITIVE, "terminal inductance");
        motor.optional("torque_constant", QUANTITY, Dimension.TORQUE_CONSTANT, null, "", Range.POSITIVE,
                "k_t; give exactly one of torque_constant, back_emf_constant, speed_constant");
        motor.optional("back_emf_constant", QUANTITY, Dimension.BACK_EMF_CONSTANT, null, "", Range.POSITIVE,
                "k_e (equals k_t in SI units); alternative to torque_constant");
        motor.optional("speed_constant", QUANTITY, Dimension.SPEED_CONSTANT, null, "", Range.POSITIVE,
                "k_n = 1/k_e; alternative to torque_constant");
        motor.required("no_load_current", QUANTITY, Dimension.CURRENT, Range.NON_NEGATIVE,
                "current at no load and nominal voltage (gives the friction torque)");
        motor.required("continuous_current", QUANTITY, Dimension.CURRENT, Range.POSITIVE,
                "thermally allowed continuous current");
        motor.required("peak_current", QUANTITY, Dimension.CURRENT, Range.POSITIVE,
                "short-time current limit (at least continuous_current)");
        motor.required("max_speed", QUANTITY, Dimension.ANGULAR_SPEED, Range.POSITIVE, "mechanical speed limit");
        motor.required("rotor_inertia", QUANTITY, Dimension.INERTIA, Range.POSITIVE, "rotor inertia");
        motor.required("rth_winding_housing", QUANTITY, Dimension.THERMAL_RESISTANCE, Range.POSITIVE,
                "winding-to-housing thermal resistance");
        motor.required("rth_housing_ambient", QUANTITY, Dimension.THERMAL_RESISTANCE, Range.POSITIVE,
                "housing-to-ambient thermal resistance");
        motor.required("tau_winding", QUANTITY, Dimension.TIME, Range.POSITIVE, "winding thermal time constant");
        motor.required("tau_housing", QUANTITY, Dimension.TIME, Range.POSITIVE, "housing thermal time constant");
        motor.required("max_winding_temp", QUANTITY, Dimension.TEMPERATURE, LIMIT_TEMP,
                "insulation limit (IEC 60085 classes B/F/H: 130/155/180 degC)");
        motor.optional("brush_drop", QUANTITY, Dimension.VOLTAGE, 0.0, "0 V", Range.NON_NEGATIVE,
                "voltage lost across the brushes");
        motor.required("mass", QUANTITY, Dimension.MASS, Range.POSITIVE, "mass");
        motor.required("price", QUANTITY, Dimension.PRICE, Range.NON_NEGATIVE, "unit price, catalog currency");

        Table sw = new Table(PartKind.SWITCH);
        sw.required("id", IDENTIFIER, null, Range.ANY, "unique key of the switch across the catalog");
        sw.optional("label", TEXT, null, "", "", Range.ANY, "free text shown beside the id");
        sw.optional("package", TEXT, null, "", "", Range.ANY, "case style, free text");
        sw.required("vds_max", QUANTITY, Dimension.VOLTAGE, Range.POSITIVE, "drain-source voltage rating");
        sw.required("id_continuous", QUANTITY, Dimension.CURRENT, Range.POSITIVE, "continuous drain current rating");
        sw.required("id_pulsed", QUANTITY, Dimension.CURRENT, Range.POSITIVE,
                "pulsed drain current rating (at least id_continuous)");
        sw.required("rds_on", QUANTITY, Dimension.RESISTANCE, Range.POSITIVE, "on-resistance at T_j = 25 degC");
        sw.optional("rds_on_hot", QUANTITY, Dimension.RESISTANCE, null,
                PowerSwitch.DEFAULT_HOT_FACTOR + " x rds_on", Range.POSITIVE,
                "on-resistance at rds_on_hot_temp (common practice default when absent)");
        sw.optional("rds_on_hot_temp", QUANTITY, Dimension.TEMPERATURE, null,
                (int) PowerSwitch.DEFAULT_HOT_TEMP + " degC", LIMIT_TEMP,
                "junction temperature of rds_on_hot; required when rds_on_hot is given");
        sw.required("qg", QUANTITY, Dimension.CHARGE, Range.POSITIVE, "total gate charge Q_g");
        sw.required("qgs", QUANTITY, Dimension.CHARGE, Range.POSITIVE, "gate-source charge Q_gs");
        sw.required("qgd", QUANTITY, Dimension.CHARGE, Range.POSITIVE, "gate-drain (Miller) charge Q_gd");
        sw.required("plateau_voltage", QUANTITY, Dimension.VOLTAGE, Range.POSITIVE, "Miller plateau voltage");
        sw.required("gate_resistance_internal", QUANTITY, Dimension.RESISTANCE, Range.NON_NEGATIVE,
                "internal gate resistance");
        sw.required("coss", QUANTITY, Dimension.CAPACITANCE, Range.POSITIVE, "output capacitance C_oss");
        sw.required("diode_vf", QUANTITY, Dimension.VOLTAGE, Range.POSITIVE, "body-diode forward voltage");
        sw.required("qrr", QUANTITY, Dimension.CHARGE, Range.NON_NEGATIVE, "body-diode reverse-recovery charge");
        sw.required("rth_jc", QUANTITY, Dimension.THERMAL_RESISTANCE, Range.POSITIVE,
                "junction-to-case thermal resistance");
        sw.required("tj_max", QUANTITY, Dimension.TEMPERATURE, LIMIT_TEMP, "maximum junction temperature");
        sw.required("price", QUANTITY, Dimension.PRICE, Range.NON_NEGATIVE, "unit price, catalog currency");

        Table scenario = new Table(PartKind.SCENARIO);
        scenario.required("name", TEXT, null, Range.ANY, "the machine's name");
        scenario.required("bench", SECTION, null, Range.ANY, "the drive set-up");
        scenario.required("profile", SECTION, null, Range.ANY, "the duty the load asks for");

        Table bench = new Table(PartKind.BENCH);
        bench.required("bus_voltage", QUANTITY, Dimension.VOLTAGE, Range.POSITIVE, "nominal bus voltage");
        bench.optional("bus_voltage_min", QUANTITY, Dimension.VOLTAGE, null, "bus_voltage", Range.POSITIVE,
                "lowest bus voltage (battery sag); voltage headroom is checked here");
        bench.optional("bus_voltage_max", QUANTITY, Dimension.VOLTAGE, null, "bus_voltage", Range.POSITIVE,
                "highest bus voltage (charging, regeneration); V_DS is checked here");
        bench.required("pwm_frequencies", QUANTITY_LIST, Dimension.FREQUENCY, Range.POSITIVE,
                "candidate switching frequencies");
        bench.required("modulation", MODULATION, null, Range.ANY, "switching scheme");
        bench.required("dead_time", QUANTITY, Dimension.TIME, Range.NON_NEGATIVE,
                "gap between one switch of a leg turning off and the other turning on");
        bench.required("gate_drive_voltage", QUANTITY, Dimension.VOLTAGE, Range.POSITIVE, "gate driver supply");
        bench.required("gate_resistance", QUANTITY, Dimension.RESISTANCE, Range.NON_NEGATIVE,
                "external gate resistance");
        bench.required("max_duty", QUANTITY, Dimension.DIMENSIONLESS, Range.FRACTION,
                "largest duty the driver can hold (bootstrap supplies cap it below 1)");
        bench.required("ambient_temp", QUANTITY, Dimension.TEMPERATURE, AMBIENT, "ambient temperature");
        bench.required("switch_rth_case_ambient", QUANTITY, Dimension.THERMAL_RESISTANCE, Range.POSITIVE,
                "each switch's case-to-ambient thermal resistance (heatsink, copper area)");
        bench.required("gear_ratios", QUANTITY_LIST, Dimension.DIMENSIONLESS, Range.POSITIVE,
                "candidate reductions N (motor speed = N x load speed)");
        bench.required("gear_efficiency", QUANTITY, Dimension.DIMENSIONLESS, Range.FRACTION, "gearbox efficiency");
        bench.required("limits", SECTION, null, Range.ANY, "derating rules");

        Table limits = new Table(PartKind.LIMITS);
        limits.required("vds_derating", QUANTITY, Dimension.DIMENSIONLESS, Range.FRACTION,
                "fraction of the V_DS rating allowed at bus_voltage_max");
        limits.required("junction_temp_limit", QUANTITY, Dimension.TEMPERATURE, LIMIT_TEMP,
                "allowed junction temperature (above ambient_temp)");
        limits.required("winding_temp_margin", QUANTITY, Dimension.TEMPERATURE_DIFFERENCE, Range.NON_NEGATIVE,
                "kelvin kept below the motor's insulation limit");
        limits.required("ripple_fraction", QUANTITY, Dimension.DIMENSIONLESS, Range.POSITIVE,
                "allowed peak-to-peak ripple as a fraction of the motor's continuous current");

        Table profile = new Table(PartKind.PROFILE);
        profile.required("load_inertia", QUANTITY, Dimension.INERTIA, Range.NON_NEGATIVE,
                "inertia of the load, load side");
        profile.optional("repeat", BOOLEAN, null, Boolean.TRUE, "true", Range.ANY,
                "true: the cycle repeats forever; false: one run from ambient");
        profile.required("segments", SECTION_LIST, null, Range.ANY, "the pieces of the cycle, in order");

        Table segment = new Table(PartKind.SEGMENT);
        segment.optional("label", TEXT, null, "", "segment N", Range.ANY, "shown in tables");
        segment.required("duration", QUANTITY, Dimension.TIME, Range.POSITIVE, "length of the segment");
        segment.required("speed_start", QUANTITY, Dimension.ANGULAR_SPEED, Range.ANY,
                "load speed at the start (signed)");
        segment.optional("speed_end", QUANTITY, Dimension.ANGULAR_SPEED, null, "speed_start", Range.ANY,
                "load speed at the end, linear ramp between (signed)");
        segment.required("torque", QUANTITY, Dimension.TORQUE, Range.ANY,
                "load torque, load side (positive needs driving, negative drives back)");
        for (Map.Entry<PartKind, List<FieldSpec>> table : TABLE.entrySet()) {
            Map<String, FieldSpec> byKey = new java.util.HashMap<>();
            table.getValue().forEach(f -> byKey.put(f.key(), f));
            BY_KEY.put(table.getKey(), byKey);
        }
    }

    private PartFields() {
    }

    /** The keys of a section, in file order. */
    public static List<FieldSpec> of(PartKind kind) {
        return TABLE.get(kind);
    }

    /** The spec of {@code key} in {@code kind}, if there is one. */
    public static Optional<FieldSpec> find(PartKind kind, String key) {
        return Optional.ofNullable(BY_KEY.get(kind).get(key));
    }

    /** The spec of {@code key} in {@code kind}; for keys the code itself names. */
    static FieldSpec get(PartKind kind, String key) {
        return find(kind, key).orElseThrow(() -> new IllegalArgumentException(kind + " has no key " + key));
    }

    /** The closest key of {@code kind} to a misspelt {@code key}, when close enough to be a likely typo. */
    public static Optional<String> suggest(PartKind kind, String key) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (FieldSpec f : of(kind)) {
            int d = EditDistance.between(key.toLowerCase(java.util.Locale.ROOT), f.key());
            if (d < bestDistance) {
                bestDistance = d;
                best = f.key();
            }
        }
        int allowed = Math.max(2, key.length() / 3);
        return bestDistance <= allowed ? Optional.of(best) : Optional.empty();
    }

    private static final class Table {
        private final PartKind kind;
        private final List<FieldSpec> fields = new ArrayList<>();

        Table(PartKind kind) {
            this.kind = kind;
            TABLE.put(kind, java.util.Collections.unmodifiableList(fields));
        }

        void required(String key, FieldType type, Dimension d, Range range, String description) {
            fields.add(new FieldSpec(kind, key, type, d, true, null, "", range, description));
        }

        void optional(String key, FieldType type, Dimension d, Object defaultValue, String defaultText,
                Range range, String description) {
            fields.add(new FieldSpec(kind, key, type, d, false, defaultValue, defaultText, range, description));
        }
    }
}
