package dev.yoke.physics;

/**
 * Periodic steady-state current ripple of an R-L load fed a rectangular voltage, as deviations
 * from the average current (which is (V_avg − e)/R whatever the ripple).
 *
 * @param peakToPeak    ΔI = highDeviation − lowDeviation, A
 * @param lowDeviation  lowest current minus the average, A (≤ 0)
 * @param highDeviation highest current minus the average, A (≥ 0)
 * @param variance      mean square of the deviation over a period, A² (I_rms² = I_avg² + variance)
 */
public record RippleWaveform(double peakToPeak, double lowDeviation, double highDeviation, double variance) {

    /** RMS of a current with this ripple around {@code average}, A. */
    public double rms(double average) {
        return Math.sqrt(average * average + variance);
    }

    /** Largest magnitude the current reaches around {@code average}, A. */
    public double peak(double average) {
        return Math.max(Math.abs(average + highDeviation), Math.abs(average + lowDeviation));
    }

    /** True when the current changes sign within a period (discontinuous with diode freewheeling). */
    public boolean crossesZero(double average) {
        return average + lowDeviation < 0 && average + highDeviation > 0;
    }
}
