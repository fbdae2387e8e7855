package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class CopperTest {

    /** IEC 60028: annealed copper's coefficient is 0.00393/K referred to 20 °C. */
    @Test
    void temperatureCoefficientIsTheStandardValue() {
        assertEquals(0.00393, Copper.ALPHA_20, 0.0); // IEC 60028, exact constant
    }

    /** IEC 60028: R(120 °C) = R20·(1 + 0.00393·100) = 1.393·R20; exact arithmetic, tolerance is rounding. */
    @Test
    void resistanceRisesLinearlyFromTwentyDegrees() {
        assertEquals(1.393, Copper.resistanceAt(1.0, 20, 120), 1e-12);
        assertEquals(1.0, Copper.resistanceAt(1.0, 20, 20), 1e-15);
    }

    /** A value measured at 25 °C is first referred back to 20 °C (IEC 60028 linear law), then forward. */
    @Test
    void resistanceMeasuredAtAnotherTemperatureIsReferredToTwenty() {
        double r25 = 1.0;
        double r20 = r25 / (1 + 0.00393 * 5);
        assertEquals(r20 * (1 + 0.00393 * 80), Copper.resistanceAt(r25, 25, 100), 1e-12);
        assertEquals(r25, Copper.resistanceAt(r25, 25, 25), 1e-15);
    }
}
