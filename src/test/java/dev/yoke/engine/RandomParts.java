package dev.yoke.engine;

import dev.yoke.model.Bench;
import dev.yoke.model.Limits;
import dev.yoke.model.Modulation;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** Random but valid parts, benches and profiles over wide, plausible ranges (invented, for property tests). */
final class RandomParts {

    private RandomParts() {
    }

    static double uniform(Random r, double lo, double hi) {
        return lo + (hi - lo) * r.nextDouble();
    }

    static double logUniform(Random r, double lo, double hi) {
        return Math.exp(uniform(r, Math.log(lo), Math.log(hi)));
    }

    static Motor motor(Random r) {
        double resistance = logUniform(r, 0.05, 10);
        double continuous = logUniform(r, 0.5, 30);
        return new Motor("m", "", uniform(r, 6, 48), resistance, uniform(r, 20, 25),
                resistance * logUniform(r, 20e-6, 20e-3), logUniform(r, 0.005, 0.5), logUniform(r, 0.02, 1),
                continuous, continuous * uniform(r, 2, 10), logUniform(r, 100, 2000), logUniform(r, 1e-7, 1e-3),
                uniform(r, 0.5, 10), uniform(r, 1, 20), uniform(r, 5, 100), uniform(r, 100, 3000),
                new double[] {130, 155, 180}[r.nextInt(3)], r.nextBoolean() ? 0 : uniform(r, 0, 1.5),
                uniform(r, 0.05, 5), uniform(r, 5, 500));
    }

    static PowerSwitch powerSwitch(Random r) {
        double rds = logUniform(r, 0.5e-3, 100e-3);
        double qg = logUniform(r, 5e-9, 200e-9);
        double id = logUniform(r, 5, 300);
        return new PowerSwitch("q", "", "pkg", uniform(r, 20, 200), id, id * uniform(r, 2, 5), rds,
                rds * uniform(r, 1.3, 2.2), uniform(r, 125, 175), qg, qg * uniform(r, 0.15, 0.35),
                qg * uniform(r, 0.2, 0.45), uniform(r, 2.5, 6), uniform(r, 0.3, 5), logUniform(r, 50e-12, 5e-9),
                uniform(r, 0.6, 1.2), logUniform(r, 5e-9, 500e-9), uniform(r, 0.2, 5),
                r.nextBoolean() ? 150 : 175, uniform(r, 0.2, 10));
    }

    static Bench bench(Random r) {
        double bus = uniform(r, 12, 48);
        return new Bench(bus, bus * uniform(r, 0.7, 1), bus * uniform(r, 1, 1.3),
                List.of(logUniform(r, 5e3, 100e3), logUniform(r, 5e3, 100e3)),
                Modulation.values()[r.nextInt(3)], logUniform(r, 50e-9, 2e-6), uniform(r, 10, 15),
                logUniform(r, 1, 20), uniform(r, 0.9, 1), uniform(r, -20, 60), logUniform(r, 5, 60),
                List.of(logUniform(r, 1, 50), logUniform(r, 1, 50)), uniform(r, 0.6, 0.98),
                new Limits(uniform(r, 0.7, 0.9), uniform(r, 125, 175), uniform(r, 0, 20), uniform(r, 0.1, 0.5)));
    }

    static Profile profile(Random r) {
        int n = 1 + r.nextInt(10);
        List<Segment> segments = new ArrayList<>();
        double speed = r.nextBoolean() ? 0 : uniform(r, -50, 50);
        for (int i = 0; i < n; i++) {
            double next = r.nextInt(4) == 0 ? speed : (r.nextInt(4) == 0 ? 0 : uniform(r, -50, 50));
            segments.add(new Segment("s" + i, logUniform(r, 0.01, 5), speed, next, uniform(r, -0.5, 0.5)));
            speed = next;
        }
        return new Profile(uniform(r, 0, 0.05), r.nextBoolean(), segments);
    }

    static Scenario scenario(Random r) {
        return new Scenario("random", bench(r), profile(r));
    }
}
