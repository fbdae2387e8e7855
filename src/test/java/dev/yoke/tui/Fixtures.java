package dev.yoke.tui;

import dev.yoke.engine.Advisory;
import dev.yoke.engine.Constraint;
import dev.yoke.engine.Metric;
import dev.yoke.engine.PairingResult;
import dev.yoke.engine.SegmentResult;
import dev.yoke.engine.SwitchLoss;
import dev.yoke.engine.Totals;
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
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CountDownLatch;

/**
 * Invented parts, scenario and a synthetic table for the screen tests. The numbers are made up to
 * exercise the screens (sorting, filters, marks), not physics: the physics is tested in its own package.
 */
final class Fixtures {

    private Fixtures() {
    }

    static Motor motor(int i) {
        return new Motor(String.format(Locale.ROOT, "mo-%02d", i), "test motor " + (char) ('A' + i % 26), 24, 0.5 + 0.1 * i, 20,
                0.5e-3, 0.05, 0.2, 5 + i, 20 + i, 600, 1e-5, 2, 5, 30, 900, 155, 0, 0.5, 20 + i);
    }

    static PowerSwitch powerSwitch(int i) {
        return new PowerSwitch("sw-" + (char) ('a' + i), "test switch " + i, "pkg", 60, 50, 200, 0.005 + 0.001 * i,
                0.009, 150, 40e-9, 10e-9, 12e-9, 4.5, 1, 500e-12, 0.8, 50e-9, 1.0, 175, 1 + i);
    }

    static Scenario scenario() {
        Bench bench = new Bench(24, 20, 28, List.of(16e3, 20e3, 40e3), Modulation.UNIPOLAR, 200e-9, 12, 10, 0.95, 40, 30,
                List.of(5.0, 10.0), 0.9, new Limits(0.8, 125, 10, 0.3));
        Profile profile = new Profile(0.01, true, List.of(
                new Segment("start", 0.5, 0, 10, 1), new Segment("cruise", 2, 10, 10, 0.5), new Segment("stop", 0.5, 10, 0, 0.2)));
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

    /** A columnar table of made-up figures: every motor × switch × frequency × ratio. */
    static final class SyntheticTable implements PairingTable {
        final int motors;
        final int switches;
        final int frequencies;
        final int ratios;
        final int size;
        final double[][] values;
        final boolean[] pareto;

        SyntheticTable(int motors, int switches, int frequencies, int ratios, int size) {
            this.motors = motors;
            this.switches = switches;
            this.frequencies = frequencies;
            this.ratios = ratios;
            this.size = size;
            values = new double[Metric.COUNT][size];
            pareto = new boolean[size];
            Constraint[] constraints = Constraint.values();
            for (int r = 0; r < size; r++) {
                long h = mix(r);
                double min = Double.POSITIVE_INFINITY;
                int binding = 0;
                for (Constraint c : constraints) {
                    double m = ((h >>> (c.ordinal() * 5)) & 1023) / 1023.0 * 1.4 - 0.25;
                    values[Metric.marginOf(c).ordinal()][r] = m;
                    if (m < min) {
                        min = m;
                        binding = c.ordinal();
                    }
                }
                values[Metric.BINDING_MARGIN.ordinal()][r] = min;
                values[Metric.BINDING.ordinal()][r] = binding;
                values[Metric.FEASIBLE.ordinal()][r] = min >= 0 ? 1 : 0;
                values[Metric.COST.ordinal()][r] = 20 + (mix(r + 7) & 4095) / 40.0;
                values[Metric.CURRENT_RMS.ordinal()][r] = 1 + (mix(r + 11) & 1023) / 100.0;
                values[Metric.CURRENT_PEAK.ordinal()][r] = 2 + (mix(r + 13) & 1023) / 50.0;
                values[Metric.EFFICIENCY.ordinal()][r] = 0.5 + (mix(r + 17) & 1023) / 2500.0;
                values[Metric.BRIDGE_LOSS.ordinal()][r] = (mix(r + 19) & 1023) / 100.0;
                values[Metric.MOTOR_LOSS.ordinal()][r] = (mix(r + 23) & 1023) / 30.0;
                values[Metric.JUNCTION_TEMP_MAX.ordinal()][r] = 40 + (mix(r + 29) & 127);
                values[Metric.WINDING_TEMP_MAX.ordinal()][r] = 40 + (mix(r + 31) & 127);
                values[Metric.DUTY_MAX.ordinal()][r] = (mix(r + 37) & 1023) / 1024.0;
                values[Metric.RIPPLE_PP.ordinal()][r] = (mix(r + 41) & 1023) / 500.0;
                pareto[r] = (mix(r + 43) & 15) == 0;
            }
        }

        private static long mix(long x) {
            x += 0x9E3779B97F4A7C15L;
            x = (x ^ (x >>> 30)) * 0xBF58476D1CE4E5B9L;
            x = (x ^ (x >>> 27)) * 0x94D049BB133111EBL;
            return x ^ (x >>> 31);
        }

        @Override
        public int size() {
            return size;
        }

        @Override
        public int motorIndex(int row) {
            return row / (switches * frequencies * ratios) % motors;
        }

        @Override
        public int switchIndex(int row) {
            return row / (frequencies * ratios) % switches;
        }

        @Override
        public int frequencyIndex(int row) {
            return row / ratios % frequencies;
        }

        @Override
        public int ratioIndex(int row) {
            return row % ratios;
        }

        @Override
        public double value(int row, Metric metric) {
            return values[metric.ordinal()][row];
        }

        @Override
        public boolean isPareto(int row) {
            return pareto[row];
        }
    }

    /** A backend over {@link SyntheticTable}; can be held back to test a long ranking. */
    static final class FakeBackend implements WorkbenchBackend {
        final int motors;
        final int switches;
        volatile CountDownLatch hold;
        volatile int rankings;

        FakeBackend(int motors, int switches) {
            this.motors = motors;
            this.switches = switches;
        }

        @Override
        public PairingTable rank(Scenario scenario, Catalog catalog, RankProgress progress) throws Exception {
            rankings++;
            int f = scenario.bench().pwmFrequencies().size();
            int g = scenario.bench().gearRatios().size();
            int n = catalog.motors().size() * catalog.switches().size() * f * g;
            progress.report(n / 3, n);
            CountDownLatch latch = hold;
            while (latch != null && latch.getCount() > 0) {
                if (progress.isCancelled()) {
                    return null;
                }
                Thread.sleep(5);
            }
            progress.report(n, n);
            return new SyntheticTable(catalog.motors().size(), catalog.switches().size(), f, g, n);
        }

        @Override
        public PairingResult explain(Scenario scenario, Catalog catalog, int motor, int powerSwitch, int frequency, int ratio) {
            Map<Constraint, Double> margins = new EnumMap<>(Constraint.class);
            for (Constraint c : Constraint.values()) {
                margins.put(c, 0.5 + 0.01 * c.ordinal());
            }
            margins.put(Constraint.JUNCTION_TEMP, -0.123);
            List<SegmentResult> segs = new ArrayList<>();
            double tw = 60;
            for (Segment s : scenario.profile().segments()) {
                List<SwitchLoss> losses = List.of(new SwitchLoss("HA", 1, 0.5, 0.1, 0.05, 0.02),
                        new SwitchLoss("LA", 0.8, 0.4, 0.1, 0.05, 0.02), new SwitchLoss("HB", 0.3, 0, 0, 0, 0),
                        new SwitchLoss("LB", 0.3, 0, 0, 0, 0));
                segs.add(new SegmentResult(s.label(), s.duration(), 100, 0.2, 4, 12, 0.5, 0.8, 4.1, 4.5, 0.6, tw, tw + 2,
                        losses, new double[] {90, 85, 70, 70}, 9, 8.5, 0.5, 0.1, 30, 45));
                tw += 15;
            }
            Totals totals = new Totals(4.1, 4.5, 0.5, 0.8, 3.5, 9, 0.1, 0.72, 130, 95, 90, tw, 27, 0.5);
            return new PairingResult(catalog.motors().get(motor), catalog.switches().get(powerSwitch),
                    scenario.bench().pwmFrequencies().get(frequency), scenario.bench().gearRatios().get(ratio), margins,
                    Constraint.JUNCTION_TEMP, EnumSet.of(Advisory.AUDIBLE_PWM), totals, segs);
        }

        @Override
        public void writeCsv(Path file, PairingTable table, ShortlistContext context, int[] order) throws IOException {
            try (Writer w = Files.newBufferedWriter(file)) {
                w.write("motor,switch,cost\n");
                for (int row : order) {
                    w.write(context.motor(table.motorIndex(row)).id() + "," + context.powerSwitch(table.switchIndex(row)).id()
                            + "," + table.value(row, Metric.COST) + "\n");
                }
            }
        }
    }
}
