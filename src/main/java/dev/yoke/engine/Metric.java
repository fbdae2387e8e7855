package dev.yoke.engine;

/**
 * The headline figures of one pairing, as the ranking, the CSV, the JSON and the grid need them.
 * The fast path of the engine writes one {@code double} per metric into a row indexed by
 * {@link #ordinal()}, so a million pairings fit in primitive columns.
 * Temperatures in °C, everything else SI; margins as signed fractions.
 */
public enum Metric {
    FEASIBLE("feasible", "", "1 when no margin is negative, else 0"),
    BINDING("binding", "", "ordinal of the binding Constraint"),
    BINDING_MARGIN("binding_margin", "", "smallest margin, signed fraction"),
    ADVISORIES("advisories", "", "packed Advisory bits"),
    CURRENT_RMS("current_rms", "A", "RMS motor current over the cycle"),
    CURRENT_PEAK("current_peak", "A", "largest instantaneous current, ripple included"),
    DUTY_MAX("duty_max", "", "largest duty over the cycle"),
    RIPPLE_PP("ripple_pp", "A", "largest peak-to-peak ripple over the cycle"),
    BRIDGE_LOSS("bridge_loss", "W", "cycle-average loss of the four switches"),
    MOTOR_LOSS("motor_loss", "W", "cycle-average copper and friction loss"),
    GATE_DRIVE_LOSS("gate_drive_loss", "W", "cycle-average gate-drive loss"),
    TOTAL_LOSS("total_loss", "W", "bridge + motor + gate drive"),
    EFFICIENCY("efficiency", "", "mechanical energy out / bus energy in"),
    ENERGY_IN("energy_in", "J", "bus energy per cycle"),
    ENERGY_OUT("energy_out", "J", "mechanical energy delivered to the load per cycle"),
    JUNCTION_TEMP_MAX("junction_temp_max", "degC", "hottest switch junction"),
    WINDING_TEMP_MAX("winding_temp_max", "degC", "hottest winding temperature over the cycle"),
    COST("cost", "", "motor + four switches"),
    MASS("mass", "kg", "motor mass"),
    MARGIN_VDS("margin_vds", "", "V_DS rating margin"),
    MARGIN_SWITCH_PEAK("margin_switch_peak", "", "switch peak current margin"),
    MARGIN_SWITCH_RMS("margin_switch_rms", "", "switch RMS current margin"),
    MARGIN_JUNCTION("margin_junction", "", "junction temperature margin"),
    MARGIN_WINDING("margin_winding", "", "winding temperature margin"),
    MARGIN_MOTOR_PEAK("margin_motor_peak", "", "motor peak current margin"),
    MARGIN_SPEED("margin_speed", "", "motor speed margin"),
    MARGIN_HEADROOM("margin_headroom", "", "voltage headroom margin"),
    MARGIN_RIPPLE("margin_ripple", "", "ripple margin"),
    MARGIN_DEAD_TIME("margin_dead_time", "", "dead time margin"),
    MARGIN_DUTY("margin_duty", "", "duty margin");

    /** Number of metrics: the length of a summary row. */
    public static final int COUNT = values().length;

    private final String key;
    private final String unit;
    private final String description;

    Metric(String key, String unit, String description) {
        this.key = key;
        this.unit = unit;
        this.description = description;
    }

    public String key() {
        return key;
    }

    /** Unit symbol for headers ("" when dimensionless). */
    public String unit() {
        return unit;
    }

    public String description() {
        return description;
    }

    /** The margin metric of a constraint. */
    public static Metric marginOf(Constraint c) {
        return values()[MARGIN_VDS.ordinal() + c.ordinal()];
    }
}
