package dev.yoke.tui;

import dev.yoke.engine.Shortlist;
import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import dev.yoke.model.Limits;
import dev.yoke.model.Modulation;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CountDownLatch;

/**
 * Invented parts and scenario for the screen tests, spread so that some pairings pass and some fail.
 * The screens show what the real engine computes; the physics is tested in its own package.
 */
final class Fixtures {

    private Fixtures() {
    }

    static Motor motor(int i) {
        return new Motor(String.format(Locale.ROOT, "mo-%02d", i), "test motor " + (char) ('A' + i % 26), 24, 0.5 + 0.1 * i, 20,
                0.5e-3, 0.04 + 0.01 * i, 0.2, 3 + i, 12 + 2 * i, 600, 1e-5, 2, 5, 30, 900, 155, 0, 0.5, 20 + 3 * i);
    }

    static PowerSwitch powerSwitch(int i) {
        return new PowerSwitch("sw-" + (char) ('a' + i), "test switch " + i, "pkg", 30 + 10 * i, 2 + 3 * i, 6 + 9 * i, 0.02 - 0.003 * i,
                0.036 - 0.005 * i, 150, 40e-9, 10e-9, 12e-9, 4.5, 1, 500e-12, 0.8, 50e-9, 1.0, 175, 1 + i);
    }

    static Scenario scenario() {
        Bench bench = new Bench(24, 20, 28, List.of(16e3, 20e3, 40e3), Modulation.UNIPOLAR, 200e-9, 12, 10, 0.95, 40, 30,
                List.of(5.0, 10.0), 0.9, new Limits(0.8, 125, 10, 0.3));
        Profile profile = new Profile(0.01, true, List.of(
                new Segment("start", 0.5, 0, 10, 3), new Segment("cruise", 2, 10, 10, 1.2), new Segment("stop", 0.5, 10, 0, 0.5)));
        return new Scenario("test-bench", bench, profile);
    }

    static Catalog catalog(int motors, int switches) {
        List<Motor> m = new ArrayList<>();
        for (int i = 0; i < motors; i++) {
            m.add(motor(i));
        }
        List<PowerSwitch> s = new ArrayList<>();
        for (int i = 0; i < switches; i++) {
            s.add(powerSwitch(i));
        }
        return new Catalog(m, s);
    }

    /** The real engine and CSV writer, with a switch to hold a ranking back and a count of runs. */
    static final class TestBackend implements WorkbenchBackend {
        final int motors;
        final int switches;
        final EngineBackend engine = new EngineBackend("test", null, List.of());
        volatile CountDownLatch hold;
        volatile int rankings;

        TestBackend(int motors, int switches) {
            this.motors = motors;
            this.switches = switches;
        }

        @Override
        public Shortlist rank(Scenario scenario, Catalog catalog, RankProgress progress) throws Exception {
            rankings++;
            progress.report(1.0 / 3);
            CountDownLatch latch = hold;
            while (latch != null && latch.getCount() > 0) {
                if (progress.isCancelled()) {
                    throw new java.util.concurrent.CancellationException("stopped");
                }
                Thread.sleep(5);
            }
            return engine.rank(scenario, catalog, progress);
        }

        @Override
        public void writeCsv(Path file, Shortlist shortlist, int[] order, ViewSettings view) throws IOException {
            engine.writeCsv(file, shortlist, order, view);
        }
    }
}
