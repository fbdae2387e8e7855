package dev.yoke.model;

/**
 * One piece of the duty profile: the load's speed ramps linearly from start to end
 * while it needs a constant torque. Load-side values, SI units.
 *
 * @param label      shown in tables
 * @param duration   s
 * @param speedStart load speed at the start, rad/s (signed)
 * @param speedEnd   load speed at the end, rad/s (signed)
 * @param torque     load torque, N·m (signed; positive opposes positive speed, i.e. the load needs driving)
 */
public record Segment(String label, double duration, double speedStart, double speedEnd, double torque) {

    /** Load acceleration of the linear ramp, rad/s². */
    public double acceleration() {
        return (speedEnd - speedStart) / duration;
    }
}
