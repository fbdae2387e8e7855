package dev.yoke.model;

import java.util.List;

/** The candidate parts: every motor and every switch the user keeps. */
public record Catalog(List<Motor> motors, List<PowerSwitch> switches) {

    public Catalog {
        motors = List.copyOf(motors);
        switches = List.copyOf(switches);
    }
}
