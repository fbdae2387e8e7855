package dev.yoke.tui.edit;

import dev.yoke.model.Bench;
import dev.yoke.model.Limits;
import dev.yoke.model.Modulation;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;

import java.util.List;

/** An invented conveyor for the editor tests (demo data, no real machine). */
final class DemoScenario {

    private DemoScenario() {
    }

    static Scenario conveyor() {
        Bench bench = new Bench(24.0, 20.0, 28.0, List.of(16000.0, 20000.0, 40000.0), Modulation.UNIPOLAR,
                5e-7, 12.0, 10.0, 0.95, 40.0, 2.5, List.of(5.0, 10.0), 0.9,
                new Limits(0.8, 125.0, 10.0, 0.3));
        Profile profile = new Profile(0.002, true, List.of(
                new Segment("start", 0.5, 0.0, 20.0, 0.4),
                new Segment("run", 3.0, 20.0, 20.0, 0.4),
                new Segment("stop", 0.5, 20.0, 0.0, 0.4)));
        return new Scenario("demo conveyor", bench, profile);
    }
}
