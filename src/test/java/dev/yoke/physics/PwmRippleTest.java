package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Modulation;
import org.junit.jupiter.api.Test;

class PwmRippleTest {

    private static final double BUS = 24;
    private static final double L = 1e-3;
    private static final double F = 20e3;
    /** A resistance so small that τ = L/R is 10⁶ periods: the triangular limit applies. */
    private static final double R_TINY = 1e-5;

    private static double ripple(Modulation m, double duty) {
        ConductionPattern shape = ConductionPattern.of(m, duty, 1.0);
        return PwmRipple.peakToPeak(shape.rippleSwing() * BUS, R_TINY, L, shape.rippleOnFraction(),
                shape.ripplePeriodFactor() / F);
    }

    /**
     * Mohan, Undeland &amp; Robbins, Power Electronics, ch. 7 (from memory): for L/R much longer than the
     * period the worst ripple is V/(2Lf) bipolar, V/(4Lf) sign-magnitude (one leg) and V/(8Lf) unipolar
     * (doubled output frequency). Tolerance 1e-6: the exact formula differs from the limit by O(T/τ).
     */
    @Test
    void largeTimeConstantRippleMaximaMatchTheTextbook() {
        assertEquals(BUS / (2 * L * F), ripple(Modulation.BIPOLAR, 0.0), BUS / (2 * L * F) * 1e-6);
        assertEquals(BUS / (4 * L * F), ripple(Modulation.SIGN_MAGNITUDE, 0.5), BUS / (4 * L * F) * 1e-6);
        assertEquals(BUS / (8 * L * F), ripple(Modulation.UNIPOLAR, 0.5), BUS / (8 * L * F) * 1e-6);
    }

    /** The same maxima are the largest ripple over all duties (the ripple peaks at an on-fraction of ½). */
    @Test
    void rippleIsLargestAtHalfOnFraction() {
        for (Modulation m : Modulation.values()) {
            double max = 0;
            for (int i = -100; i <= 100; i++) {
                max = Math.max(max, ripple(m, i / 100.0));
            }
            double at = m == Modulation.BIPOLAR ? 0.0 : 0.5;
            assertEquals(ripple(m, at), max, 1e-12, m.toString());
        }
    }

    /**
     * First-order circuit law: the exact ripple formula tends to ΔV·δ(1−δ)·T/L as τ/T grows (Taylor
     * expansion of the exponentials); at τ = 1000·T the two agree to about T/τ = 1e-3.
     */
    @Test
    void exactRippleApproachesTriangularForLongTimeConstants() {
        double period = 1 / F;
        double r = L / (1000 * period);
        RippleWaveform exact = PwmRipple.waveform(BUS, r, L, 0.3, period);
        double triangle = BUS * 0.3 * 0.7 * period / L;
        assertEquals(triangle, exact.peakToPeak(), triangle * 2e-3);
        // Variance of a triangle is ΔI²/12 (any statistics text: uniform distribution over the swing).
        assertEquals(triangle * triangle / 12, exact.variance(), triangle * triangle / 12 * 4e-3);
    }

    /**
     * Independent check of the closed-form ripple and mean square: integrate di/dt = (v − R·i)/L with
     * many small exact exponential steps over many periods from zero deviation, and compare the last
     * period. Tolerance 1e-6 relative: the stepped solution is exact per step, the residual transient is
     * e^(−200) after 200 time constants.
     */
    @Test
    void closedFormMatchesSteppedSimulation() {
        double period = 1 / F;
        double r = 2.0;
        double l = r * period * 0.7; // τ comparable to the period
        double swing = 24;
        double duty = 0.35;
        double tau = l / r;
        int steps = 20000;
        double dt = period / steps;
        double y = 0;
        int periods = (int) Math.ceil(200 * tau / period) + 1;
        double min = 0;
        double max = 0;
        double sum2 = 0;
        double sum = 0;
        double highSum = 0;
        double highSum2 = 0;
        for (int p = 0; p < periods; p++) {
            boolean last = p == periods - 1;
            min = Double.POSITIVE_INFINITY;
            max = Double.NEGATIVE_INFINITY;
            for (int s = 0; s < steps; s++) {
                double t = (s + 0.5) * dt;
                double target = (t < duty * period ? (1 - duty) : -duty) * swing / r;
                double next = target + (y - target) * Math.exp(-dt / tau);
                if (last) {
                    // Exact integral of the exponential over the step for the mean and mean square.
                    double c = y - target;
                    double g = -Math.expm1(-dt / tau);
                    double first = target * dt + c * tau * g;
                    double second = target * target * dt + 2 * target * c * tau * g + c * c * tau / 2 * g * (2 - g);
                    sum += first;
                    sum2 += second;
                    if (t < duty * period) {
                        highSum += first;
                        highSum2 += second;
                    }
                    min = Math.min(min, Math.min(y, next));
                    max = Math.max(max, Math.max(y, next));
                }
                y = next;
            }
        }
        double mean = sum / period;
        double variance = sum2 / period - mean * mean;
        RippleWaveform w = PwmRipple.waveform(swing, r, l, duty, period);
        assertEquals(max - min, w.peakToPeak(), w.peakToPeak() * 1e-6);
        assertEquals(variance, w.variance(), w.variance() * 1e-6);
        assertEquals(min - mean, w.lowDeviation(), w.peakToPeak() * 1e-6);
        assertTrue(Math.abs(mean) < w.peakToPeak() * 1e-6, "deviation averages to zero");
        // The same stepped solution split at the voltage step: the moments of each interval.
        double high = duty * period;
        double low = period - high;
        assertEquals(highSum / high, w.highIntervalMean(), w.peakToPeak() * 1e-6);
        assertEquals(highSum2 / high, w.highIntervalSquare(), w.variance() * 1e-6);
        assertEquals((sum - highSum) / low, w.lowIntervalMean(), w.peakToPeak() * 1e-6);
        assertEquals((sum2 - highSum2) / low, w.lowIntervalSquare(), w.variance() * 1e-6);
    }

    /** Law: no switching (δ = 0 or 1) means no ripple. */
    @Test
    void noRippleWithoutSwitching() {
        assertEquals(0.0, PwmRipple.peakToPeak(24, 1, 1e-3, 0, 1e-4), 0.0);
        assertEquals(0.0, PwmRipple.peakToPeak(24, 1, 1e-3, 1, 1e-4), 0.0);
    }
}
