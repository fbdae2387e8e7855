package dev.yoke.engine;

/** Conditions worth telling the user that do not, by themselves, fail a pairing (except the runaways). */
public enum Advisory {
    /** PWM below 20 kHz is audible (common practice: the upper limit of human hearing). */
    AUDIBLE_PWM("audible_pwm", "PWM frequency is audible (below 20 kHz)"),
    /** Electrical time constant L/R shorter than a few PWM periods: the current is far from smooth. */
    ROUGH_CURRENT("rough_current", "L/R is short against the PWM period: rough current"),
    /** The ripple reaches zero at some point: with diode freewheeling the current would be discontinuous. */
    DISCONTINUOUS_CURRENT("discontinuous", "current would be discontinuous at light load"),
    /** Less than 10 % voltage headroom at the lowest bus voltage (common practice margin for control). */
    LOW_HEADROOM("low_headroom", "little voltage headroom at the lowest bus"),
    /** Switch loss grows faster with temperature than cooling removes it. */
    SWITCH_RUNAWAY("switch_runaway", "switch thermal runaway"),
    /** Winding loss grows faster with temperature than cooling removes it. */
    WINDING_RUNAWAY("winding_runaway", "winding thermal runaway");

    private final String key;
    private final String message;

    Advisory(String key, String message) {
        this.key = key;
        this.message = message;
    }

    /** Machine-readable key used in JSON and CSV. */
    public String key() {
        return key;
    }

    /** Words shown to the user. */
    public String message() {
        return message;
    }

    /** Bit of this advisory in a packed set. */
    public int bit() {
        return 1 << ordinal();
    }
}
