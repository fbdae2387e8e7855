package dev.yoke.physics;

/**
 * Steady junction temperature of a switch whose loss is P(T_j) = A·R_DS(on)(T_j) + B, with
 * R_DS(on)(T) = R_25·(1 + α·(T − 25)) and T_j = T_a + R_th·P (thermal Ohm's law, e.g. Mohan, Undeland &amp;
 * Robbins, ch. 29). The fixed point is linear in T_j, so it has a closed form:
 * T_j = T_a + R_th·(A·R_25·(1 + α(T_a − 25)) + B) / (1 − R_th·A·R_25·α).
 * When the denominator is not positive, loss grows at least as fast as cooling removes it: thermal runaway.
 */
public final class JunctionTemperature {

    private JunctionTemperature() {
    }

    /** Denominator of the closed form; runaway when ≤ 0. */
    public static double stability(double thermalResistance, double conductionCoefficient, double r25, double alpha) {
        return 1.0 - thermalResistance * conductionCoefficient * r25 * alpha;
    }

    /** True when no steady junction temperature exists. */
    public static boolean isRunaway(double thermalResistance, double conductionCoefficient, double r25, double alpha) {
        return !(stability(thermalResistance, conductionCoefficient, r25, alpha) > 0);
    }

    /**
     * Closed-form steady junction temperature, °C (only meaningful when not {@link #isRunaway}).
     *
     * @param ambientTemp           °C
     * @param thermalResistance     junction-to-ambient, K/W
     * @param conductionCoefficient A = on-fraction × I_rms², A² (conduction loss = A·R_DS(on))
     * @param r25                   R_DS(on) at 25 °C, Ω
     * @param alpha                 fractional rise of R_DS(on) per kelvin
     * @param otherLoss             B, loss that does not depend on T_j, W
     */
    public static double steady(double ambientTemp, double thermalResistance, double conductionCoefficient,
            double r25, double alpha, double otherLoss) {
        double lossAtAmbient = conductionCoefficient * r25 * (1 + alpha * (ambientTemp - 25)) + otherLoss;
        return ambientTemp + thermalResistance * lossAtAmbient
                / stability(thermalResistance, conductionCoefficient, r25, alpha);
    }

    /**
     * The same fixed point found by plain iteration T ← T_a + R_th·P(T), for checking the closed form;
     * returns NaN when it does not settle within {@code maxIterations} (runaway or too slow).
     */
    public static double iterate(double ambientTemp, double thermalResistance, double conductionCoefficient,
            double r25, double alpha, double otherLoss, int maxIterations) {
        double t = ambientTemp;
        for (int i = 0; i < maxIterations; i++) {
            double next = ambientTemp + thermalResistance
                    * (conductionCoefficient * r25 * (1 + alpha * (t - 25)) + otherLoss);
            if (Math.abs(next - t) <= 1e-12 * Math.max(1.0, Math.abs(next))) {
                return next;
            }
            if (!Double.isFinite(next) || next > 1e6) {
                return Double.NaN;
            }
            t = next;
        }
        return Double.NaN;
    }
}
