package dev.yoke.catalog;

import dev.yoke.catalog.CatalogText.FieldValue;
import dev.yoke.catalog.CatalogText.ListEntry;
import dev.yoke.model.Bench;
import dev.yoke.model.Limits;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import dev.yoke.units.Units;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A scenario's values as the keys of its file ({@link PartFields} order, numbers through
 * {@link Units#formatExact} so that they load back as the same doubles), and the text edit that
 * turns a file holding one scenario into one holding another while keeping what the user wrote.
 *
 * <p>The edit goes through {@link CatalogText}, as a part edit does: a changed value is replaced
 * where it stands (a comment after it stays); a value the file leaves to its default is written
 * only when the default would no longer give it (a minimum bus voltage left out follows the
 * nominal one, so changing the nominal one writes the minimum out). Segments are paired with the
 * file's by {@link SegmentMatch}: a kept or edited segment keeps its lines and comments, moving
 * with them when reordered; a removed one's lines go; a new one is written like its neighbours.
 */
final class ScenarioText {

    static final List<String> TOP = List.of();
    static final List<String> BENCH = List.of("bench");
    static final List<String> LIMITS = List.of("bench", "limits");
    static final List<String> PROFILE = List.of("profile");
    static final List<String> SEGMENTS = List.of("profile", "segments");

    private ScenarioText() {
    }

    /**
     * {@code text}, which loads as {@code before}, edited so that it loads as {@code after}.
     *
     * @throws IOException when the file is laid out in a way Yoke does not edit in place (flow style)
     */
    static String edited(String text, Scenario before, Scenario after) throws IOException {
        String out = text;
        out = withSection(out, TOP, PartKind.SCENARIO, topValues(before), topValues(after));
        out = withSection(out, BENCH, PartKind.BENCH, benchValues(before.bench()), benchValues(after.bench()));
        out = withSection(out, LIMITS, PartKind.LIMITS, limitsValues(before.bench().limits()),
                limitsValues(after.bench().limits()));
        out = withSection(out, PROFILE, PartKind.PROFILE, profileValues(before.profile()),
                profileValues(after.profile()));
        return withSegments(out, before.profile().segments(), after.profile().segments());
    }

    private static String withSection(String text, List<String> path, PartKind kind, Map<String, Object> before,
            Map<String, Object> after) throws IOException {
        CatalogText document = CatalogText.parse(text);
        List<FieldValue> writes = writes(kind, before, after, document.keysAt(path), -1, -1);
        return writes.isEmpty() ? text : document.withSectionFields(path, writes, keyOrder(kind));
    }

    private static String withSegments(String text, List<Segment> was, List<Segment> now) throws IOException {
        int[] source = SegmentMatch.sources(was, now);
        String out = text;
        boolean sameRows = was.size() == now.size();
        for (int j = 0; j < now.size(); j++) {
            int i = source[j];
            sameRows &= i == j;
            if (i < 0) {
                continue;
            }
            CatalogText document = CatalogText.parse(out);
            List<FieldValue> writes = writes(PartKind.SEGMENT, segmentValues(was.get(i)), segmentValues(now.get(j)),
                    document.keysOfItem(SEGMENTS, i), i, j);
            if (!writes.isEmpty()) {
                out = document.withItemFields(SEGMENTS, i, writes, keyOrder(PartKind.SEGMENT));
            }
        }
        if (sameRows) {
            return out;
        }
        List<ListEntry> entries = new ArrayList<>();
        for (int j = 0; j < now.size(); j++) {
            entries.add(source[j] >= 0 ? ListEntry.kept(source[j])
                    : ListEntry.added(allFields(PartKind.SEGMENT, segmentValues(now.get(j)))));
        }
        return CatalogText.parse(out).withItemsArranged(SEGMENTS, entries);
    }

    /**
     * The fields to write so that a section whose file spells {@code keysInFile}, and which loads
     * as {@code before}, loads as {@code after}: every value that differs from what the file would
     * give if the key were left alone. For a segment, {@code from} and {@code to} are its places
     * before and after, which decide the label an unlabelled segment gets.
     */
    private static List<FieldValue> writes(PartKind kind, Map<String, Object> before, Map<String, Object> after,
            List<String> keysInFile, int from, int to) {
        List<FieldValue> writes = new ArrayList<>();
        for (FieldSpec spec : PartFields.of(kind)) {
            String key = spec.key();
            if (!after.containsKey(key)) {
                continue; // a section or list, edited on its own
            }
            Object wanted = after.get(key);
            Object kept;
            if (kind == PartKind.SEGMENT && key.equals("label")) {
                boolean spelled = keysInFile.contains(key) && !before.get(key).equals(defaultLabel(from));
                kept = spelled ? before.get(key) : defaultLabel(to);
                wanted = "".equals(wanted) ? defaultLabel(to) : wanted;
            } else if (keysInFile.contains(key)) {
                kept = before.get(key);
            } else {
                kept = spec.defaultValue() != null ? spec.defaultValue() : after.get(spec.defaultText());
            }
            if (!Objects.equals(kept, wanted)) {
                writes.add(FieldValue.of(key, spec.scalar(wanted)));
            }
        }
        return writes;
    }

    /** The keys of {@code kind} in table order: where a key the file lacks is put. */
    private static List<String> keyOrder(PartKind kind) {
        return PartFields.of(kind).stream().map(FieldSpec::key).toList();
    }

    /** The label the loader gives the unlabelled segment at {@code index} (from 0). */
    static String defaultLabel(int index) {
        return "segment " + (index + 1);
    }

    /** The keys of {@code kind} that have a value in {@code values}, in table order; empty text is left out. */
    static List<FieldValue> allFields(PartKind kind, Map<String, Object> values) {
        List<FieldValue> fields = new ArrayList<>();
        for (FieldSpec spec : PartFields.of(kind)) {
            Object value = values.get(spec.key());
            if (value != null && !(value instanceof String text && text.isEmpty())) {
                fields.add(FieldValue.of(spec.key(), spec.scalar(value)));
            }
        }
        return fields;
    }

    static Map<String, Object> topValues(Scenario scenario) {
        return Map.of("name", scenario.name());
    }

    static Map<String, Object> benchValues(Bench bench) {
        Map<String, Object> values = new LinkedHashMap<>();
        values.put("bus_voltage", bench.busVoltage());
        values.put("bus_voltage_min", bench.busVoltageMin());
        values.put("bus_voltage_max", bench.busVoltageMax());
        values.put("pwm_frequencies", bench.pwmFrequencies());
        values.put("modulation", bench.modulation().fileName());
        values.put("dead_time", bench.deadTime());
        values.put("gate_drive_voltage", bench.gateDriveVoltage());
        values.put("gate_resistance", bench.gateResistance());
        values.put("max_duty", bench.maxDuty());
        values.put("ambient_temp", bench.ambientTemp());
        values.put("switch_rth_case_ambient", bench.switchRthCaseAmbient());
        values.put("gear_ratios", bench.gearRatios());
        values.put("gear_efficiency", bench.gearEfficiency());
        return values;
    }

    static Map<String, Object> limitsValues(Limits limits) {
        return Map.of(
                "vds_derating", limits.vdsDerating(),
                "junction_temp_limit", limits.junctionTempLimit(),
                "winding_temp_margin", limits.windingTempMargin(),
                "ripple_fraction", limits.rippleFraction());
    }

    static Map<String, Object> profileValues(Profile profile) {
        return Map.of(
                "load_inertia", profile.loadInertia(),
                "repeat", profile.repeat());
    }

    static Map<String, Object> segmentValues(Segment segment) {
        return Map.of(
                "label", segment.label(),
                "duration", segment.duration(),
                "speed_start", segment.speedStart(),
                "speed_end", segment.speedEnd(),
                "torque", segment.torque());
    }
}
