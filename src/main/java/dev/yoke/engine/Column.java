package dev.yoke.engine;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

/**
 * A column of the shortlist that rows can be sorted, filtered or shown by: every {@link Metric},
 * the identity of the pairing (motor id, switch id, PWM frequency, gear ratio) and the Pareto flag.
 *
 * @param key    short machine-readable name used in sort options, CSV headers and JSON
 * @param unit   unit symbol ("" when dimensionless or text)
 * @param kind   what the column reads
 * @param metric the metric when {@code kind} is {@link Kind#METRIC}, else null
 */
public record Column(String key, String unit, Kind kind, Metric metric) {

    /** What a column reads from a row. */
    public enum Kind { METRIC, MOTOR, SWITCH, FREQUENCY, RATIO, PARETO }

    public static final Column MOTOR = new Column("motor", "", Kind.MOTOR, null);
    public static final Column SWITCH = new Column("switch", "", Kind.SWITCH, null);
    public static final Column FREQUENCY = new Column("pwm_frequency", "Hz", Kind.FREQUENCY, null);
    public static final Column RATIO = new Column("gear_ratio", "", Kind.RATIO, null);
    public static final Column PARETO = new Column("pareto", "", Kind.PARETO, null);

    private static final List<Column> ALL;

    static {
        List<Column> all = new ArrayList<>(List.of(MOTOR, SWITCH, FREQUENCY, RATIO, PARETO));
        for (Metric m : Metric.values()) {
            all.add(of(m));
        }
        ALL = Collections.unmodifiableList(all);
    }

    /** The column of a metric. */
    public static Column of(Metric metric) {
        return new Column(metric.key(), metric.unit(), Kind.METRIC, metric);
    }

    /** Every column: identity, Pareto, then the metrics in their declared order. */
    public static List<Column> all() {
        return ALL;
    }

    /**
     * The column named {@code key} (case-insensitive; "frequency", "pwm", "ratio" and "id" style
     * short forms of the identity columns are accepted too).
     *
     * @throws IllegalArgumentException naming the known keys when none matches
     */
    public static Column parse(String key) {
        String k = key.trim().toLowerCase(Locale.ROOT);
        switch (k) {
            case "frequency", "pwm", "f" -> {
                return FREQUENCY;
            }
            case "ratio", "n" -> {
                return RATIO;
            }
            case "motor_id" -> {
                return MOTOR;
            }
            case "switch_id" -> {
                return SWITCH;
            }
            case "loss" -> {
                return of(Metric.TOTAL_LOSS);
            }
            default -> {
                // fall through to the exact keys
            }
        }
        for (Column c : ALL) {
            if (c.key.equals(k)) {
                return c;
            }
        }
        List<String> keys = new ArrayList<>();
        for (Column c : ALL) {
            keys.add(c.key);
        }
        throw new IllegalArgumentException("unknown column '" + key + "'; expected one of " + String.join(", ", keys));
    }

    /** Header text with the unit in brackets, e.g. {@code current_rms [A]}. */
    public String header() {
        return unit.isEmpty() ? key : key + " [" + unit + "]";
    }
}
