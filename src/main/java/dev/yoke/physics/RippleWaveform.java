package dev.yoke.physics;

/**
 * Periodic steady-state current ripple of an R-L load fed a rectangular voltage, as deviations
 * from the average current (which is (V_avg − e)/R whatever the ripple).
 *
 * @param peakToPeak    ΔI = highDeviation − lowDeviation, A
 * @param lowDeviation  lowest current minus the average, A (≤ 0)
 * @param highDeviation highest current minus the average, A (≥ 0)
 * @param variance      mean square of the deviation over a period, A² (I_rms² = I_avg² + variance)
 * @param highIntervalMean   mean deviation over the interval where the voltage is high (the current rises), A
 * @param highIntervalSquare mean square deviation over that interval, A²
 * @param lowIntervalMean    mean deviation over the interval where the voltage is low (the current falls), A
 * @param lowIntervalSquare  mean square deviation over that interval, A²
 *
 * <p>The interval moments tell which switch carries the higher current: a triangular ripple (L/R ≫ period)
 * has mean 0 and mean square ΔI²/12 in both intervals; an exponential one does not. Weighted by the
 * on-fraction δ they add up: δ·highMean + (1 − δ)·lowMean = 0 and δ·highSquare + (1 − δ)·lowSquare = variance.
 */
public record RippleWaveform(double peakToPeak, double lowDeviation, double highDeviation, double variance,
        double highIntervalMean, double highIntervalSquare, double lowIntervalMean, double lowIntervalSquare) {

    /** No ripple at all (a steady voltage). */
    public static final RippleWaveform NONE = new RippleWaveform(0, 0, 0, 0, 0, 0, 0, 0);

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
