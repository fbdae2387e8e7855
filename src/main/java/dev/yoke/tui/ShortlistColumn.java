package dev.yoke.tui;

import dev.yoke.engine.Constraint;
import dev.yoke.engine.Metric;

/**
 * The columns of the shortlist grid: identity (frozen), settings, verdict, headline figures,
 * then every constraint's margin. Each column has a numeric sort key and a cell text.
 */
public enum ShortlistColumn {
    FRONT("", 1, false, null, false),
    MOTOR("motor", 10, false, null, false),
    SWITCH("switch", 10, false, null, false),
    FREQUENCY("kHz", 5, true, null, false),
    RATIO("gear", 5, true, null, false),
    VERDICT("verdict", 7, false, Metric.FEASIBLE, true),
    BINDING("binding", 11, false, Metric.BINDING, false),
    BINDING_MARGIN("margin", 7, true, Metric.BINDING_MARGIN, true),
    CURRENT_RMS("Irms A", 7, true, Metric.CURRENT_RMS, false),
    CURRENT_PEAK("Ipk A", 7, true, Metric.CURRENT_PEAK, false),
    DUTY_MAX("duty%", 6, true, Metric.DUTY_MAX, false),
    RIPPLE("ripple A", 8, true, Metric.RIPPLE_PP, false),
    BRIDGE_LOSS("bridge W", 8, true, Metric.BRIDGE_LOSS, false),
    MOTOR_LOSS("motor W", 8, true, Metric.MOTOR_LOSS, false),
    EFFICIENCY("eff%", 6, true, Metric.EFFICIENCY, true),
    JUNCTION_TEMP("Tj C", 6, true, Metric.JUNCTION_TEMP_MAX, false),
    WINDING_TEMP("Tw C", 6, true, Metric.WINDING_TEMP_MAX, false),
    COST("cost", 8, true, Metric.COST, false),
    MARGIN_VDS("m:vds", 7, true, Metric.MARGIN_VDS, true),
    MARGIN_SWITCH_PEAK("m:sw pk", 7, true, Metric.MARGIN_SWITCH_PEAK, true),
    MARGIN_SWITCH_RMS("m:sw rms", 8, true, Metric.MARGIN_SWITCH_RMS, true),
    MARGIN_JUNCTION("m:Tj", 7, true, Metric.MARGIN_JUNCTION, true),
    MARGIN_WINDING("m:Tw", 7, true, Metric.MARGIN_WINDING, true),
    MARGIN_MOTOR_PEAK("m:mot pk", 8, true, Metric.MARGIN_MOTOR_PEAK, true),
    MARGIN_SPEED("m:speed", 7, true, Metric.MARGIN_SPEED, true),
    MARGIN_HEADROOM("m:volts", 7, true, Metric.MARGIN_HEADROOM, true),
    MARGIN_RIPPLE("m:ripple", 8, true, Metric.MARGIN_RIPPLE, true),
    MARGIN_DEAD_TIME("m:dead", 7, true, Metric.MARGIN_DEAD_TIME, true),
    MARGIN_DUTY("m:duty", 7, true, Metric.MARGIN_DUTY, true);

    private final String title;
    private final int width;
    private final boolean alignRight;
    private final Metric metric;
    private final boolean largerIsBetter;

    ShortlistColumn(String title, int width, boolean alignRight, Metric metric, boolean largerIsBetter) {
        this.title = title;
        this.width = width;
        this.alignRight = alignRight;
        this.metric = metric;
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

    /** The metric behind the column, or null for identity and settings columns. */
    public Metric metric() {
        return metric;
    }

    /** Whether the first press of the sort key puts the largest values first (margins, efficiency). */
    public boolean largerIsBetter() {
        return largerIsBetter;
    }

    /** Whether this column is a margin (binding or one constraint's): it can take a threshold. */
    public boolean isMargin() {
        return metric == Metric.BINDING_MARGIN || (metric != null && metric.name().startsWith("MARGIN_"));
    }

    /** The column showing a constraint's margin. */
    public static ShortlistColumn marginOf(Constraint c) {
        Metric m = Metric.marginOf(c);
        for (ShortlistColumn col : values()) {
            if (col.metric == m) {
                return col;
            }
        }
        throw new IllegalArgumentException(c.name());
    }

    /** Number the column sorts by (NaN sorts last either way). */
    public double sortKey(PairingTable table, int row, ShortlistContext context) {
        return switch (this) {
            case FRONT -> table.isPareto(row) ? 0 : 1;
            case MOTOR -> context.motorRank(table.motorIndex(row));
            case SWITCH -> context.switchRank(table.switchIndex(row));
            case FREQUENCY -> context.frequency(table.frequencyIndex(row));
            case RATIO -> context.ratio(table.ratioIndex(row));
            default -> table.value(row, metric);
        };
    }

    /** The text of this column's cell for one row. */
    public String cell(PairingTable table, int row, ShortlistContext context, Glyphs glyphs) {
        return switch (this) {
            case FRONT -> table.isPareto(row) ? String.valueOf(glyphs.paretoMark()) : "";
            case MOTOR -> partCell(context.motor(table.motorIndex(row)).id(), context, glyphs);
            case SWITCH -> partCell(context.powerSwitch(table.switchIndex(row)).id(), context, glyphs);
            case FREQUENCY -> Cells.number(context.frequency(table.frequencyIndex(row)) / 1000.0);
            case RATIO -> Cells.number(context.ratio(table.ratioIndex(row)));
            case VERDICT -> table.value(row, Metric.FEASIBLE) >= 0.5 ? "ok" : "FAIL";
            case BINDING -> bindingOf(table, row).key();
            case DUTY_MAX, EFFICIENCY -> Cells.percent(table.value(row, metric));
            case COST -> Cells.fixed(table.value(row, metric), 2);
            default -> isMargin() ? Cells.signedPercent(table.value(row, metric)) : Cells.number(table.value(row, metric));
        };
    }

    /** The role of this column's cell text for one row. */
    public Tone tone(PairingTable table, int row, ShortlistContext context) {
        switch (this) {
            case VERDICT:
                return table.value(row, Metric.FEASIBLE) >= 0.5 ? Tone.GOOD : Tone.BAD;
            case MOTOR:
                return context.isSuspect(context.motor(table.motorIndex(row)).id()) ? Tone.WARN : Tone.NORMAL;
            case SWITCH:
                return context.isSuspect(context.powerSwitch(table.switchIndex(row)).id()) ? Tone.WARN : Tone.NORMAL;
            case FRONT:
                return Tone.HEADING;
            case BINDING:
                return table.value(row, Metric.BINDING_MARGIN) < 0 ? Tone.BAD : Tone.NORMAL;
            default:
                if (isMargin()) {
                    double m = table.value(row, metric);
                    return m < 0 ? Tone.BAD : m < 0.1 ? Tone.WARN : Tone.NORMAL;
                }
                return Tone.NORMAL;
        }
    }

    /** The binding constraint of a row. */
    static Constraint bindingOf(PairingTable table, int row) {
        int ordinal = (int) table.value(row, Metric.BINDING);
        Constraint[] all = Constraint.values();
        return ordinal >= 0 && ordinal < all.length ? all[ordinal] : Constraint.values()[0];
    }

    private static String partCell(String id, ShortlistContext context, Glyphs glyphs) {
        return context.isSuspect(id) ? glyphs.suspectMark() + id : id;
    }
}
