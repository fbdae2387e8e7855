package dev.yoke.engine;

/**
 * Every limit a pairing is judged against. Each yields the margin (limit − value)/limit, with
 * its sign: below zero the limit is broken, and the smallest margin is the binding one.
 */
public enum Constraint {
    /** Derated V_DS rating against the highest bus voltage. */
    VDS_RATING("vds", "V_DS rating"),
    /** Switch pulsed current rating against the peak current. */
    SWITCH_PEAK_CURRENT("switch_peak", "switch peak current"),
    /** Switch continuous current rating against the RMS current. */
    SWITCH_RMS_CURRENT("switch_rms", "switch RMS current"),
    /** Junction temperature limit (bench limit, capped by the part's maximum). */
    JUNCTION_TEMP("junction", "junction temperature"),
    /** Insulation limit minus the bench's margin against the hottest winding temperature. */
    WINDING_TEMP("winding", "winding temperature"),
    /** Motor peak current rating against the peak current. */
    MOTOR_PEAK_CURRENT("motor_peak", "motor peak current"),
    /** Motor speed limit against the fastest point of the cycle. */
    MOTOR_SPEED("speed", "motor speed"),
    /** Voltage the bridge can make at the lowest bus against what the motor needs. */
    VOLTAGE_HEADROOM("headroom", "voltage headroom"),
    /** Allowed peak-to-peak ripple against the worst segment's ripple. */
    RIPPLE("ripple", "current ripple"),
    /** Dead time against the switch's turn-off time (shoot-through risk). */
    DEAD_TIME("dead_time", "dead time"),
    /** Largest duty the driver can hold against the largest duty needed. */
    DUTY("duty", "duty");

    private final String key;
    private final String title;

    Constraint(String key, String title) {
        this.key = key;
        this.title = title;
    }

    /** Short machine-readable key used in JSON, CSV and sort options. */
    public String key() {
        return key;
    }

    /** Words shown to the user. */
    public String title() {
        return title;
    }
}
