package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

/** Laws of the R-L ripple over random windings and duties (jqwik). */
class RipplePropertiesTest {

    /** First-order filter law: a shorter period leaves the inductor less time to swing, so ripple falls as f rises. */
    @Property(tries = 3000)
    void rippleFallsAsFrequencyRises(@ForAll @DoubleRange(min = 0.01, max = 20) double resistance,
            @ForAll @DoubleRange(min = 1e-6, max = 0.05) @Scale(9) double inductance,
            @ForAll @DoubleRange(min = 0.0, max = 1.0) double onFraction,
            @ForAll @DoubleRange(min = 1e3, max = 200e3) double frequency,
            @ForAll @DoubleRange(min = 1.0001, max = 10) @Scale(6) double factor) {
        double slow = PwmRipple.peakToPeak(24, resistance, inductance, onFraction, 1 / frequency);
        double fast = PwmRipple.peakToPeak(24, resistance, inductance, onFraction, 1 / (frequency * factor));
        assertTrue(fast <= slow * (1 + 1e-12), fast + " > " + slow);
    }

    /** Law: the RMS of any waveform is at least its average magnitude, and the peak at least its RMS. */
    @Property(tries = 3000)
    void peakExceedsRmsExceedsAverage(@ForAll @DoubleRange(min = 0.01, max = 20) double resistance,
            @ForAll @DoubleRange(min = 1e-6, max = 0.05) @Scale(9) double inductance,
            @ForAll @DoubleRange(min = 0.0, max = 1.0) double onFraction,
            @ForAll @DoubleRange(min = -50, max = 50) double average) {
        RippleWaveform w = PwmRipple.waveform(48, resistance, inductance, onFraction, 1 / 20e3);
        assertTrue(w.rms(average) >= Math.abs(average) * (1 - 1e-12));
        assertTrue(w.peak(average) >= w.rms(average) * (1 - 1e-9));
    }

    /**
     * Law: the two intervals make up the period. Weighted by their lengths the interval means cancel (the
     * deviation averages to zero) and the interval mean squares add up to the variance; each interval's mean
     * lies between the extremes, and its mean square is at least its mean squared.
     */
    @Property(tries = 3000)
    void intervalMomentsAddUpToThePeriod(@ForAll @DoubleRange(min = 0.01, max = 20) double resistance,
            @ForAll @DoubleRange(min = 1e-6, max = 0.05) @Scale(9) double inductance,
            @ForAll @DoubleRange(min = 0.0, max = 1.0) double onFraction) {
        RippleWaveform w = PwmRipple.waveform(48, resistance, inductance, onFraction, 1 / 20e3);
        double scale = Math.max(w.peakToPeak(), 1e-300);
        assertEquals(0.0, onFraction * w.highIntervalMean() + (1 - onFraction) * w.lowIntervalMean(), scale * 1e-9);
        assertEquals(w.variance(), onFraction * w.highIntervalSquare() + (1 - onFraction) * w.lowIntervalSquare(),
                scale * scale * 1e-9);
        for (double mean : new double[] {w.highIntervalMean(), w.lowIntervalMean()}) {
            assertTrue(mean >= w.lowDeviation() - scale * 1e-9 && mean <= w.highDeviation() + scale * 1e-9);
        }
        assertTrue(w.highIntervalSquare() >= w.highIntervalMean() * w.highIntervalMean() * (1 - 1e-9));
        assertTrue(w.lowIntervalSquare() >= w.lowIntervalMean() * w.lowIntervalMean() * (1 - 1e-9));
    }
}
