package dev.yoke.engine;

import dev.yoke.model.Segment;
import java.util.ArrayList;
import java.util.List;

/**
 * A stretch of a profile segment in which the load speed keeps one sign, so that friction, the
 * direction of power through the gearbox and hence the current are constant. A segment whose speed
 * ramp crosses zero becomes two pieces, split at the crossing. Load-side values, SI units.
 *
 * @param segmentIndex index of the segment in the profile
 * @param duration     s
 * @param speedStart   load speed at the start, rad/s
 * @param speedEnd     load speed at the end, rad/s
 * @param torque       load torque, N·m
 * @param acceleration load acceleration, rad/s²
 */
record ProfilePiece(int segmentIndex, double duration, double speedStart, double speedEnd, double torque,
        double acceleration) {

    /** Average load speed over the piece (the ramp is linear), rad/s. */
    double meanSpeed() {
        return (speedStart + speedEnd) / 2;
    }

    /** Splits every segment at its zero-speed crossing, keeping profile order. */
    static List<ProfilePiece> split(List<Segment> segments) {
        List<ProfilePiece> pieces = new ArrayList<>();
        for (int i = 0; i < segments.size(); i++) {
            Segment s = segments.get(i);
            double a = s.acceleration();
            if (s.speedStart() * s.speedEnd() < 0) {
                double first = s.duration() * Math.abs(s.speedStart())
                        / (Math.abs(s.speedStart()) + Math.abs(s.speedEnd()));
                if (first > 0) {
                    pieces.add(new ProfilePiece(i, first, s.speedStart(), 0.0, s.torque(), a));
                }
                if (s.duration() - first > 0) {
                    pieces.add(new ProfilePiece(i, s.duration() - first, 0.0, s.speedEnd(), s.torque(), a));
                }
            } else if (s.duration() > 0) {
                pieces.add(new ProfilePiece(i, s.duration(), s.speedStart(), s.speedEnd(), s.torque(), a));
            }
        }
        return pieces;
    }
}
