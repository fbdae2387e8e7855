package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class JunctionTemperatureTest {

    /**
     * Thermal Ohm's law (Mohan, Undeland &amp; Robbins, ch. 29; numbers our own): 2 W through 40 K/W from
     * 25 °C gives 105 °C when the loss does not depend on temperature. Exact arithmetic.
     */
    @Test
    void temperatureIndependentLossFollowsThermalOhmsLaw() {
        assertEquals(105.0, JunctionTemperature.steady(25, 40, 0, 0.01, 0.006, 2.0), 1e-12);
    }

    /**
     * The closed form must equal the fixed point found by plain iteration (an independent algorithm), for a
     * spread of conduction and switching loss; 1e-9 relative is the iteration's stopping tolerance with margin.
     */
    @Test
    void closedFormEqualsIteratedFixedPoint() {
        double r25 = 5e-3;
        double alpha = 0.0072; // ×1.9 at 150 °C, the common-practice rule of thumb
        for (double a : new double[] {0, 10, 100, 400, 900}) {
            for (double b : new double[] {0, 0.3, 1.5}) {
                for (double rth : new double[] {2, 20, 60}) {
                    if (JunctionTemperature.isRunaway(rth, a, r25, alpha)) {
                        continue;
                    }
                    double closed = JunctionTemperature.steady(40, rth, a, r25, alpha, b);
                    double iterated = JunctionTemperature.iterate(40, rth, a, r25, alpha, b, 100_000);
                    assertEquals(iterated, closed, Math.abs(closed) * 1e-9, "A=" + a + " B=" + b + " Rth=" + rth);
                }
            }
        }
    }

    /** Runaway: when R_th·A·R25·α ≥ 1 the iteration diverges and the closed form reports it. */
    @Test
    void runawayIsDetectedWhereIterationDiverges() {
        double r25 = 5e-3;
        double alpha = 0.0072;
        double a = 1.2 / (60 * r25 * alpha);
        assertTrue(JunctionTemperature.isRunaway(60, a, r25, alpha));
        assertTrue(Double.isNaN(JunctionTemperature.iterate(40, 60, a, r25, alpha, 0.1, 100_000)));
        assertFalse(JunctionTemperature.isRunaway(60, a / 2, r25, alpha));
    }
}
