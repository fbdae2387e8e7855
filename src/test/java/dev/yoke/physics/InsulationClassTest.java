package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class InsulationClassTest {

    /** IEC 60085 thermal classes: B 130 °C, F 155 °C, H 180 °C (the classes of motor windings). */
    @Test
    void motorClassesHaveTheStandardLimits() {
        assertEquals(130.0, InsulationClass.B.limitTemp());
        assertEquals(155.0, InsulationClass.F.limitTemp());
        assertEquals(180.0, InsulationClass.H.limitTemp());
        assertEquals(InsulationClass.F, InsulationClass.fromLetter(" f "));
        assertThrows(IllegalArgumentException.class, () -> InsulationClass.fromLetter("Q"));
    }
}
