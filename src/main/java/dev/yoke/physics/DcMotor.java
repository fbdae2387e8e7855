package dev.yoke.physics;

/**
 * Steady-state laws of the permanent-magnet brushed DC motor (any electric-machines text,
 * e.g. Hughes &amp; Drury, <i>Electric Motors and Drives</i>, 4th ed., ch. 3):
 * T = k_t·I, e = k_e·ω, V = I·R + e (+ brush drop), and k_t = k_e in SI units.
 */
public final class DcMotor {

    private DcMotor() {
    }

    /** Current drawn at standstill (no back-EMF): V/R, A. */
    public static double stallCurrent(double voltage, double resistance) {
        return voltage / resistance;
    }

    /** Speed at which the back-EMF equals the supply with no load and no friction: V/k_e, rad/s. */
    public static double noLoadSpeed(double voltage, double emfConstant) {
        return voltage / emfConstant;
    }

    /** Current needed for a shaft torque: T/k_t, A. */
    public static double current(double torque, double torqueConstant) {
        return torque / torqueConstant;
    }

    /**
     * Average terminal voltage: V = I·R + k_e·ω + V_brush·sign(I), V. The brush drop always
     * opposes the current, so it adds to the voltage the drive must supply.
     */
    public static double terminalVoltage(double current, double resistance, double emfConstant,
            double speed, double brushDrop) {
        return current * resistance + emfConstant * speed + brushDrop * Math.signum(current);
    }

    /**
     * Motor shaft torque for a load seen through a gearbox (common practice, e.g. Hughes &amp; Drury ch. 11):
     * the load torque reflected as T_load/(N·η) when the motor drives the load and T_load·η/N when
     * the load overhauls the motor, plus the acceleration of the motor and the reflected load inertia
     * (J_motor + J_load/N²)·α_motor, plus friction T_f·sign(ω).
     *
     * @param loadTorque     load torque, N·m (positive opposes positive speed)
     * @param loadSpeed      load speed, rad/s, whose sign decides the direction of power flow
     * @param ratio          reduction N (motor speed = N × load speed)
     * @param efficiency     gearbox efficiency η
     * @param motorInertia   kg·m²
     * @param loadInertia    kg·m² at the load shaft
     * @param motorAcceleration rad/s² at the motor shaft
     * @param frictionTorque T_f = k_t·I0, N·m
     * @param speedSign      sign of the motor speed (−1, 0, 1)
     */
    public static double shaftTorque(double loadTorque, double loadSpeed, double ratio, double efficiency,
            double motorInertia, double loadInertia, double motorAcceleration, double frictionTorque,
            double speedSign) {
        return reflectedLoadTorque(loadTorque, loadSpeed, ratio, efficiency)
                + (motorInertia + loadInertia / (ratio * ratio)) * motorAcceleration
                + frictionTorque * speedSign;
    }

    /**
     * Load torque at the motor shaft: T/(N·η) while power flows to the load (T·ω ≥ 0, also at
     * standstill, the conservative side), T·η/N while the load drives back.
     */
    public static double reflectedLoadTorque(double loadTorque, double loadSpeed, double ratio, double efficiency) {
        return loadTorque * loadSpeed >= 0 ? loadTorque / (ratio * efficiency) : loadTorque * efficiency / ratio;
    }
}
