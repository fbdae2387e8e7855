package dev.yoke.units;

/**
 * A quantity a user wrote that cannot be read: not a number, not finite, out of range,
 * or in a unit that is unknown or of the wrong kind.
 *
 * <p>The message is written to follow {@code file:line:column: field: }, e.g.
 * {@code expected ohms (Ω, Ohm), got '4.7 mH' (an inductance)}. Checked, so every caller
 * that reads user text has to say what happens to a refused value.
 */
public final class UnitException extends Exception {

    /** @param message what is wrong, quoting what the user wrote */
    public UnitException(String message) {
        super(message);
    }
}
