package dev.yoke.engine;

import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import dev.yoke.model.Limits;
import dev.yoke.model.Modulation;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.util.List;

/** Invented parts and an invented machine for engine tests (no real part is described). */
public final class TestParts {

    private TestParts() {
    }

    /** A small 24 V motor. */
    public static Motor motor() {
        return new Motor("m-test", "test motor", 24, 0.5, 20, 0.3e-3, 0.05, 0.2, 6, 30, 600, 2e-5,
                2.0, 6.0, 30, 900, 155, 0, 0.5, 80);
    }

    /** A 60 V switch in a power package. */
    public static PowerSwitch powerSwitch() {
        return new PowerSwitch("q-test", "test switch", "pkg", 60, 50, 200, 5e-3, 9e-3, 150,
                40e-9, 10e-9, 12e-9, 4.5, 1.0, 500e-12, 0.9, 50e-9, 1.0, 175, 1.0);
    }

    public static Limits limits() {
        return new Limits(0.8, 150, 10, 0.3);
    }

    public static Bench bench(Modulation modulation) {
        return new Bench(24, 20, 29, List.of(20e3, 40e3), modulation, 300e-9, 12, 4.7, 0.97, 40, 30,
                List.of(5.0, 10.0), 0.85, limits());
    }

    /** Accelerate, run, brake, hold, reverse through zero, brake: every quadrant, repeating. */
    public static Profile profile(boolean repeat) {
        return new Profile(0.01, repeat, List.of(
                new Segment("accelerate", 0.2, 0, 30, 1.0),
                new Segment("run", 1.0, 30, 30, 1.0),
                new Segment("brake", 0.2, 30, 0, 1.0),
                new Segment("hold", 0.5, 0, 0, 0.5),
                new Segment("lowering", 0.5, 0, 0, -0.3),
                new Segment("reverse", 0.4, 0, -30, -1.0),
                new Segment("overhauled", 0.6, -30, -30, 0.8),
                new Segment("swing", 0.6, -30, 30, 0.5),
                new Segment("stop", 0.3, 30, 0, -0.2)));
    }

    public static Scenario scenario(Modulation modulation, boolean repeat) {
        return new Scenario("test machine", bench(modulation), profile(repeat));
    }

    public static Catalog catalog() {
        return new Catalog(List.of(motor()), List.of(powerSwitch()));
    }
}
