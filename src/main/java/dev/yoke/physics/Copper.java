package dev.yoke.physics;

/**
 * Resistance of annealed copper against temperature.
 *
 * <p>IEC 60028 (international standard of resistance for copper): the temperature coefficient
 * of resistance referred to 20 °C is 0.00393 per kelvin, and resistance is linear in temperature
 * over the range a winding sees.
 */
public final class Copper {

    /** Temperature coefficient of resistance of annealed copper at 20 °C, 1/K (IEC 60028). */
    public static final double ALPHA_20 = 0.00393;

    /** Reference temperature of {@link #ALPHA_20}, °C. */
    public static final double REFERENCE_TEMP = 20.0;

    private Copper() {
    }

    /**
     * Resistance at {@code temp} of a copper winding measured as {@code resistance} at {@code measuredTemp}
     * (both °C): R(T) = R_20·(1 + α_20·(T − 20)) with R_20 recovered from the measured value.
     */
    public static double resistanceAt(double resistance, double measuredTemp, double temp) {
        return resistance20(resistance, measuredTemp) * (1.0 + ALPHA_20 * (temp - REFERENCE_TEMP));
    }

    /** Resistance at 20 °C of a winding measured as {@code resistance} at {@code measuredTemp} (°C). */
    public static double resistance20(double resistance, double measuredTemp) {
        return resistance / (1.0 + ALPHA_20 * (measuredTemp - REFERENCE_TEMP));
    }
}
