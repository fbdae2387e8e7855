package dev.yoke.model;

import java.util.List;

/**
 * The duty the load asks for.
 *
 * @param loadInertia inertia of the load at the load side, kg·m²
 * @param repeat      true: the cycle repeats forever (periodic steady state); false: one run from ambient
 * @param segments    in order
 */
public record Profile(double loadInertia, boolean repeat, List<Segment> segments) {

    public Profile {
        segments = List.copyOf(segments);
    }

    /** Length of one cycle, s. */
    public double cycleTime() {
        double total = 0;
        for (Segment s : segments) {
            total += s.duration();
        }
        return total;
    }
}
