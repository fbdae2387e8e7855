package dev.yoke.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class PowerSwitchTest {

    private static PowerSwitch withHot(double cold, double hot, double hotTemp) {
        return new PowerSwitch("q", "", "pkg", 60, 50, 200, cold, hot, hotTemp,
                40e-9, 10e-9, 12e-9, 4.5, 1.0, 500e-12, 0.9, 50e-9, 0.8, 175, 1.0);
    }

    /** The interpolation must return both datasheet points exactly (law: a line through two points). */
    @Test
    void rdsOnPassesThroughBothGivenPoints() {
        PowerSwitch q = withHot(4e-3, 7.2e-3, 125);
        assertEquals(4e-3, q.rdsOnAt(25), 1e-15);
        assertEquals(7.2e-3, q.rdsOnAt(125), 1e-15);
    }
}
