package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DcMotorTest {

    /** Hughes & Drury, Electric Motors and Drives, ch. 3: at standstill there is no back-EMF, I = V/R. */
    @Test
    void stallCurrentIsVoltageOverResistance() {
        assertEquals(48.0, DcMotor.stallCurrent(24, 0.5), 1e-12);
        // The same from the terminal equation with ω = 0: V = I·R.
        assertEquals(24.0, DcMotor.terminalVoltage(48, 0.5, 0.05, 0, 0), 1e-12);
    }

    /** Hughes & Drury ch. 3: with no load current the back-EMF balances the supply, ω0 = V/k_e. */
    @Test
    void noLoadSpeedIsVoltageOverEmfConstant() {
        assertEquals(480.0, DcMotor.noLoadSpeed(24, 0.05), 1e-12);
        assertEquals(24.0, DcMotor.terminalVoltage(0, 0.5, 0.05, 480, 0), 1e-12);
    }

    /**
     * Law (energy conservation, Hughes & Drury ch. 3): with k_t = k_e in SI units, electrical input
     * V·I equals copper loss I²R plus mechanical output T·ω, using the same constant for both.
     */
    @Test
    void torqueConstantEqualsEmfConstantInSiUnits() {
        double k = 0.05;
        double r = 0.5;
        double i = 3.0;
        double w = 200;
        double v = DcMotor.terminalVoltage(i, r, k, w, 0);
        double torque = k * i;
        assertEquals(v * i, i * i * r + torque * w, 1e-9);
        assertEquals(i, DcMotor.current(torque, k), 1e-12);
    }

    /** Gearbox convention (common practice): losses add to the motor's work when driving, subtract when driven. */
    @Test
    void gearboxLossFavoursTheLoadWhenItDrivesBack() {
        assertEquals(1.0 / (10 * 0.8), DcMotor.reflectedLoadTorque(1.0, 5, 10, 0.8), 1e-15);
        assertEquals(1.0 * 0.8 / 10, DcMotor.reflectedLoadTorque(1.0, -5, 10, 0.8), 1e-15);
        // Acceleration through the ratio: (J_m + J_L/N²)·α.
        assertEquals((1e-4 + 0.01 / 100) * 50, DcMotor.shaftTorque(0, 1, 10, 0.8, 1e-4, 0.01, 50, 0, 1), 1e-15);
    }
}
