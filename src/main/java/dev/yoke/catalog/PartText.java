package dev.yoke.catalog;

import dev.yoke.catalog.CatalogText.FieldValue;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.units.Units;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Function;

/**
 * How a part's fields are written back to a catalog file: the keys of {@link PartFields}, numbers
 * through {@link Units#formatExact} (so that they load back as the very same double) with a
 * readable unit, text quoted only where YAML needs it.
 *
 * @param <T> the part record
 */
final class PartText<T> {

    /** One record component and the key that holds it. */
    private record Binding<T>(FieldSpec spec, List<String> acceptedKeys, Function<T, Object> value) {
    }

    static final PartText<Motor> MOTOR = new PartText<>(PartKind.MOTOR, Motor::id,
            loaded -> loaded.catalog().motors(), LoadedCatalog::motorOrigins,
            (m, id, label) -> new Motor(id, label == null ? m.label() : label, m.nominalVoltage(), m.resistance(),
                    m.resistanceTemp(), m.inductance(), m.torqueConstant(), m.noLoadCurrent(), m.continuousCurrent(),
                    m.peakCurrent(), m.maxSpeed(), m.rotorInertia(), m.rthWindingHousing(), m.rthHousingAmbient(),
                    m.tauWinding(), m.tauHousing(), m.maxWindingTemp(), m.brushDrop(), m.mass(), m.price()),
            List.of(
            bind(PartKind.MOTOR, "id", Motor::id),
            bind(PartKind.MOTOR, "label", Motor::label),
            bind(PartKind.MOTOR, "nominal_voltage", Motor::nominalVoltage),
            bind(PartKind.MOTOR, "resistance", Motor::resistance),
            bind(PartKind.MOTOR, "resistance_temp", Motor::resistanceTemp),
            bind(PartKind.MOTOR, "inductance", Motor::inductance),
            // k_t = k_e in SI units; a file may give either, or the speed constant: an edit writes k_t.
            new Binding<>(PartFields.get(PartKind.MOTOR, "torque_constant"),
                    List.of("torque_constant", "back_emf_constant", "speed_constant"), Motor::torqueConstant),
            bind(PartKind.MOTOR, "no_load_current", Motor::noLoadCurrent),
            bind(PartKind.MOTOR, "continuous_current", Motor::continuousCurrent),
            bind(PartKind.MOTOR, "peak_current", Motor::peakCurrent),
            bind(PartKind.MOTOR, "max_speed", Motor::maxSpeed),
            bind(PartKind.MOTOR, "rotor_inertia", Motor::rotorInertia),
            bind(PartKind.MOTOR, "rth_winding_housing", Motor::rthWindingHousing),
            bind(PartKind.MOTOR, "rth_housing_ambient", Motor::rthHousingAmbient),
            bind(PartKind.MOTOR, "tau_winding", Motor::tauWinding),
            bind(PartKind.MOTOR, "tau_housing", Motor::tauHousing),
            bind(PartKind.MOTOR, "max_winding_temp", Motor::maxWindingTemp),
            bind(PartKind.MOTOR, "brush_drop", Motor::brushDrop),
            bind(PartKind.MOTOR, "mass", Motor::mass),
            bind(PartKind.MOTOR, "price", Motor::price)));

    static final PartText<PowerSwitch> SWITCH = new PartText<>(PartKind.SWITCH, PowerSwitch::id,
            loaded -> loaded.catalog().switches(), LoadedCatalog::switchOrigins,
            (s, id, label) -> new PowerSwitch(id, label == null ? s.label() : label, s.packageName(), s.vdsMax(),
                    s.idContinuous(), s.idPulsed(), s.rdsOn(), s.rdsOnHot(), s.rdsOnHotTemp(), s.gateCharge(),
                    s.gateSourceCharge(), s.gateDrainCharge(), s.plateauVoltage(), s.gateResistanceInternal(),
                    s.outputCapacitance(), s.diodeForwardVoltage(), s.reverseRecoveryCharge(), s.rthJunctionCase(),
                    s.maxJunctionTemp(), s.price()),
            List.of(
            bind(PartKind.SWITCH, "id", PowerSwitch::id),
            bind(PartKind.SWITCH, "label", PowerSwitch::label),
            bind(PartKind.SWITCH, "package", PowerSwitch::packageName),
            bind(PartKind.SWITCH, "vds_max", PowerSwitch::vdsMax),
            bind(PartKind.SWITCH, "id_continuous", PowerSwitch::idContinuous),
            bind(PartKind.SWITCH, "id_pulsed", PowerSwitch::idPulsed),
            bind(PartKind.SWITCH, "rds_on", PowerSwitch::rdsOn),
            bind(PartKind.SWITCH, "rds_on_hot", PowerSwitch::rdsOnHot),
            bind(PartKind.SWITCH, "rds_on_hot_temp", PowerSwitch::rdsOnHotTemp),
            bind(PartKind.SWITCH, "qg", PowerSwitch::gateCharge),
            bind(PartKind.SWITCH, "qgs", PowerSwitch::gateSourceCharge),
            bind(PartKind.SWITCH, "qgd", PowerSwitch::gateDrainCharge),
            bind(PartKind.SWITCH, "plateau_voltage", PowerSwitch::plateauVoltage),
            bind(PartKind.SWITCH, "gate_resistance_internal", PowerSwitch::gateResistanceInternal),
            bind(PartKind.SWITCH, "coss", PowerSwitch::outputCapacitance),
            bind(PartKind.SWITCH, "diode_vf", PowerSwitch::diodeForwardVoltage),
            bind(PartKind.SWITCH, "qrr", PowerSwitch::reverseRecoveryCharge),
            bind(PartKind.SWITCH, "rth_jc", PowerSwitch::rthJunctionCase),
            bind(PartKind.SWITCH, "tj_max", PowerSwitch::maxJunctionTemp),
            bind(PartKind.SWITCH, "price", PowerSwitch::price)));

    /**
     * Keys whose default the loader derives from another key: absent from the file, they must be
     * written out when that key changes, or the part would load back different.
     */
    private static final Map<String, List<String>> DERIVED_FROM = Map.of(
            "rds_on_hot", List.of("rds_on"),
            // and the loader refuses a hot resistance without the temperature it was measured at
            "rds_on_hot_temp", List.of("rds_on", "rds_on_hot"));

    private final PartKind kind;
    private final Function<T, String> id;
    private final List<Binding<T>> bindings;

    /** A copy of a part under another id and, unless null, another label. */
    private interface Renamer<T> {
        T rename(T part, String id, String label);
    }

    private final Function<LoadedCatalog, List<T>> parts;
    private final Function<LoadedCatalog, Map<String, Origin>> origins;
    private final Renamer<T> renamer;

    private PartText(PartKind kind, Function<T, String> id, Function<LoadedCatalog, List<T>> parts,
            Function<LoadedCatalog, Map<String, Origin>> origins, Renamer<T> renamer, List<Binding<T>> bindings) {
        this.kind = kind;
        this.id = id;
        this.parts = parts;
        this.origins = origins;
        this.renamer = renamer;
        this.bindings = bindings;
    }

    /** The parts of this kind in a loaded catalog. */
    List<T> parts(LoadedCatalog loaded) {
        return parts.apply(loaded);
    }

    /** Where each part of this kind is defined. */
    Map<String, Origin> origins(LoadedCatalog loaded) {
        return origins.apply(loaded);
    }

    /** {@code part} under another id and, unless {@code label} is null, another label. */
    T withIdAndLabel(T part, String newId, String label) {
        return renamer.rename(part, newId, label);
    }

    private static <T> Binding<T> bind(PartKind kind, String key, Function<T, Object> value) {
        return new Binding<>(PartFields.get(kind, key), List.of(key), value);
    }

    /** The list key of this kind in catalog files: {@code motors} or {@code switches}. */
    String listKey() {
        return kind.key();
    }

    /** The part kind. */
    PartKind kind() {
        return kind;
    }

    /** The part's id. */
    String id(T part) {
        return id.apply(part);
    }

    /**
     * A whole catalog file holding {@code parts}: {@code header} (comment lines), then the list,
     * each part in table order. Used to write generated catalogs in one go.
     */
    String renderFile(String header, List<T> parts) {
        StringBuilder out = new StringBuilder(header).append(listKey()).append(parts.isEmpty() ? ": []\n" : ":\n");
        for (T part : parts) {
            String prefix = "  - ";
            for (FieldValue field : allFields(part)) {
                out.append(prefix).append(field.key()).append(": ").append(field.scalar()).append('\n');
                prefix = "    ";
            }
        }
        return out.toString();
    }

    /**
     * Every key a part of this kind may spell, in table order, a field's other accepted spellings
     * beside it: where a key the part lacks is placed when an edit adds it.
     */
    List<String> keyOrder() {
        return bindings.stream().flatMap(b -> b.acceptedKeys().stream()).toList();
    }

    /** Every field of a new part, in table order; empty optional text (label, package) is left out. */
    List<FieldValue> allFields(T part) {
        List<FieldValue> fields = new ArrayList<>();
        for (Binding<T> binding : bindings) {
            Object value = binding.value().apply(part);
            if (value instanceof String text && text.isEmpty() && !binding.spec().required()) {
                continue;
            }
            fields.add(field(binding, value));
        }
        return fields;
    }

    /**
     * The fields to write so that the file, which holds {@code before} with the keys
     * {@code keysInFile}, then holds {@code after}: the fields whose value changed, plus values the
     * loader would otherwise derive from a changed field (the hot on-resistance defaults to a
     * multiple of the cold one, so an edit of the cold value writes the hot one out), in table order.
     */
    List<FieldValue> changedFields(T before, T after, List<String> keysInFile) {
        List<String> changed = new ArrayList<>();
        for (Binding<T> binding : bindings) {
            if (!Objects.equals(binding.value().apply(before), binding.value().apply(after))) {
                changed.add(binding.spec().key());
            }
        }
        // One pass in table order, so that keys added at the same place come out in that order too.
        List<FieldValue> fields = new ArrayList<>();
        for (Binding<T> binding : bindings) {
            String key = binding.spec().key();
            boolean derivedFromChange = DERIVED_FROM.getOrDefault(key, List.of()).stream().anyMatch(changed::contains);
            boolean absent = binding.acceptedKeys().stream().noneMatch(keysInFile::contains);
            if (changed.contains(key) || (derivedFromChange && absent)) {
                fields.add(field(binding, binding.value().apply(after)));
            }
        }
        return fields;
    }

    private FieldValue field(Binding<T> binding, Object value) {
        FieldSpec spec = binding.spec();
        return new FieldValue(spec.key(), binding.acceptedKeys(), spec.scalar(value));
    }
}
