package dev.yoke.tui;

import dev.yoke.engine.Column;
import dev.yoke.engine.Metric;
import dev.yoke.engine.Shortlist;
import java.util.Set;

/**
 * The columns of the shortlist grid: the Pareto mark and the part ids (frozen), the settings,
 * the verdict, the headline figures, then every constraint's margin. Each maps to the engine's
 * {@link Column}, which sorting and filtering use.
 */
public enum ShortlistColumn {
    FRONT("", 1, false, Column.PARETO, true),
    MOTOR("motor", 10, false, Column.MOTOR, false),
    SWITCH("switch", 10, false, Column.SWITCH, false),
    FREQUENCY("kHz", 5, true, Column.FREQUENCY, false),
    RATIO("gear", 5, true, Column.RATIO, false),
    VERDICT("verdict", 7, false, Column.of(Metric.FEASIBLE), true),
    BINDING("binding", 11, false, Column.of(Metric.BINDING), false),
    BINDING_MARGIN("margin", 7, true, Column.of(Metric.BINDING_MARGIN), true),
    TOTAL_LOSS("loss W", 7, true, Column.of(Metric.TOTAL_LOSS), false),
    COST("cost", 8, true, Column.of(Metric.COST), false),
    CURRENT_RMS("Irms A", 7, true, Column.of(Metric.CURRENT_RMS), false),
    CURRENT_PEAK("Ipk A", 7, true, Column.of(Metric.CURRENT_PEAK), false),
    JUNCTION_TEMP("Tj C", 6, true, Column.of(Metric.JUNCTION_TEMP_MAX), false),
    WINDING_TEMP("Tw C", 6, true, Column.of(Metric.WINDING_TEMP_MAX), false),
    DUTY_MAX("duty%", 6, true, Column.of(Metric.DUTY_MAX), false),
    RIPPLE("ripple A", 8, true, Column.of(Metric.RIPPLE_PP), false),
    BRIDGE_LOSS("bridge W", 8, true, Column.of(Metric.BRIDGE_LOSS), false),
    MOTOR_LOSS("motor W", 8, true, Column.of(Metric.MOTOR_LOSS), false),
    EFFICIENCY("eff%", 6, true, Column.of(Metric.EFFICIENCY), true),
    MARGIN_VDS("m:vds", 7, true, Column.of(Metric.MARGIN_VDS), true),
    MARGIN_SWITCH_PEAK("m:sw pk", 7, true, Column.of(Metric.MARGIN_SWITCH_PEAK), true),
    MARGIN_SWITCH_RMS("m:sw rms", 8, true, Column.of(Metric.MARGIN_SWITCH_RMS), true),
    MARGIN_JUNCTION("m:Tj", 7, true, Column.of(Metric.MARGIN_JUNCTION), true),
    MARGIN_WINDING("m:Tw", 7, true, Column.of(Metric.MARGIN_WINDING), true),
    MARGIN_MOTOR_PEAK("m:mot pk", 8, true, Column.of(Metric.MARGIN_MOTOR_PEAK), true),
    MARGIN_SPEED("m:speed", 7, true, Column.of(Metric.MARGIN_SPEED), true),
    MARGIN_HEADROOM("m:volts", 7, true, Column.of(Metric.MARGIN_HEADROOM), true),
    MARGIN_RIPPLE("m:ripple", 8, true, Column.of(Metric.MARGIN_RIPPLE), true),
    MARGIN_DEAD_TIME("m:dead", 7, true, Column.of(Metric.MARGIN_DEAD_TIME), true),
    MARGIN_DUTY("m:duty", 7, true, Column.of(Metric.MARGIN_DUTY), true);

    private final String title;
    private final int width;
    private final boolean alignRight;
    private final Column column;
    private final boolean largerIsBetter;

    ShortlistColumn(String title, int width, boolean alignRight, Column column, boolean largerIsBetter) {
        this.title = title;
        this.width = width;
        this.alignRight = alignRight;
        this.column = column;
        this.largerIsBetter = largerIsBetter;
    }

    public String title() {
        return title;
    }

    /** Default width; part id columns widen to the catalog's longest id. */
    public int width() {
        return width;
    }

    public boolean alignRight() {
        return alignRight;
    }

    /** The engine column this grid column shows, sorts and filters by. */
    public Column column() {
        return column;
    }

    /** The metric behind the column, or null for identity columns and the Pareto mark. */
    public Metric metric() {
        return column.metric();
    }

    /** Whether the first press of the sort key puts the largest values first (margins, efficiency, front). */
    public boolean largerIsBetter() {
        return largerIsBetter;
    }

    /** Whether this column is a margin (the binding one or one constraint's): it can take a threshold. */
    public boolean isMargin() {
        Metric m = metric();
        return m == Metric.BINDING_MARGIN || (m != null && m.name().startsWith("MARGIN_"));
    }

    /** The grid column showing an engine column, or null when the grid has none. */
    public static ShortlistColumn of(Column column) {
        for (ShortlistColumn c : values()) {
            if (c.column.equals(column)) {
                return c;
            }
        }
        return null;
    }

    /** The heading to show: the title, or the Pareto mark for the mark column. */
    public String heading(Glyphs glyphs) {
        return this == FRONT ? String.valueOf(glyphs.paretoMark()) : title;
    }

    /** The text of this column's cell for one row. */
    public String cell(Shortlist s, int row, Set<String> suspects, Glyphs glyphs) {
        return switch (this) {
            case FRONT -> s.isPareto(row) ? String.valueOf(glyphs.paretoMark()) : "";
            case MOTOR -> partCell(s.motorId(row), suspects, glyphs);
            case SWITCH -> partCell(s.switchId(row), suspects, glyphs);
            case FREQUENCY -> Cells.number(s.frequency(row) / 1000.0);
            case RATIO -> Cells.number(s.ratio(row));
            case VERDICT -> s.feasible(row) ? "ok" : "FAIL";
            case BINDING -> s.binding(row).key();
            case DUTY_MAX, EFFICIENCY -> Cells.percent(s.value(row, metric()));
            case COST -> Cells.fixed(s.value(row, metric()), 2);
            default -> isMargin() ? Cells.signedPercent(s.value(row, metric())) : Cells.number(s.value(row, metric()));
        };
    }

    /** The role of this column's cell text for one row (colour repeats what the text says). */
    public Tone tone(Shortlist s, int row, Set<String> suspects) {
        switch (this) {
            case VERDICT:
                return s.feasible(row) ? Tone.GOOD : Tone.BAD;
            case MOTOR:
                return suspects.contains(s.motorId(row)) ? Tone.WARN : Tone.NORMAL;
            case SWITCH:
                return suspects.contains(s.switchId(row)) ? Tone.WARN : Tone.NORMAL;
            case FRONT:
                return Tone.HEADING;
            case BINDING:
                return s.bindingMargin(row) < 0 ? Tone.BAD : Tone.NORMAL;
            default:
                if (isMargin()) {
                    double m = s.value(row, metric());
                    return m < 0 ? Tone.BAD : m < 0.1 ? Tone.WARN : Tone.NORMAL;
                }
                return Tone.NORMAL;
        }
    }

    private static String partCell(String id, Set<String> suspects, Glyphs glyphs) {
        return suspects.contains(id) ? glyphs.suspectMark() + id : id;
    }
}
