package dev.yoke.engine;

import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;

/**
 * A scenario and a catalog made ready for evaluation. Implementations are immutable and
 * safe to call from many threads; they hoist everything that depends only on the motor,
 * gear ratio, PWM frequency or segment out of the per-switch work.
 *
 * <p>Indexes refer to {@code catalog().motors()}, {@code catalog().switches()},
 * {@code scenario().bench().pwmFrequencies()} and {@code scenario().bench().gearRatios()}.
 */
public interface PairingEvaluator {

    Scenario scenario();

    Catalog catalog();

    /** Everything about one motor at one frequency and ratio that no switch changes. Immutable. */
    interface MotorSide {
        int motorIndex();

        int frequencyIndex();

        int ratioIndex();
    }

    /** Prepares the switch-independent part of a motor, frequency and ratio (the hoisted work). */
    MotorSide prepare(int motor, int frequency, int ratio);

    /**
     * Fast path: fills {@code row[m.ordinal()]} for every {@link Metric} of one switch on a
     * prepared motor side. Allocates nothing; must agree with {@link #explain} to rounding.
     */
    void summarize(MotorSide motorSide, int switchIndex, double[] row);

    /** Detailed path: the whole evaluation, for explain, JSON and the detail screen. */
    PairingResult explain(int motor, int switchIndex, int frequency, int ratio);
}
