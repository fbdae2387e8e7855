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
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;

/**
 * A stand-in evaluator for ranking tests: every metric is a pseudo-random function of the pairing's
 * identity (the same on every thread and call), with costs and losses on coarse steps so that
 * ties occur, and some NaN efficiencies. It is not physics: it only exercises sorting, filtering,
 * the Pareto front and the sweep's bookkeeping.
 */
class FakeEvaluator implements PairingEvaluator {

    private final Scenario scenario;
    private final Catalog catalog;
    private final long seed;
    private final double feasibleShare;

    FakeEvaluator(int motors, int switches, int frequencies, int ratios, long seed) {
        this(motors, switches, frequencies, ratios, seed, 0.6);
    }

    FakeEvaluator(int motors, int switches, int frequencies, int ratios, long seed, double feasibleShare) {
        this.seed = seed;
        this.feasibleShare = feasibleShare;
        SplittableRandom random = new SplittableRandom(seed);
        List<Motor> ms = new ArrayList<>();
        for (int i = 0; i < motors; i++) {
            // ids deliberately not in index order, so sorting by id differs from index order
            String id = "M" + ((i * 7919) % Math.max(1, motors) + 100);
            ms.add(motor(id + (i % 3 == 0 ? "" : "-" + i), "motor label " + i, 5 + random.nextInt(50)));
        }
        List<PowerSwitch> ss = new ArrayList<>();
        for (int i = 0; i < switches; i++) {
            String id = "Q" + ((i * 104729) % Math.max(1, switches) + 10);
            ss.add(powerSwitch(id + "-" + i, i % 4 == 0 ? "fast trench" : "plain", 0.5 + random.nextInt(6) * 0.25));
        }
        catalog = new Catalog(ms, ss);
        List<Double> fs = new ArrayList<>();
        for (int i = 0; i < frequencies; i++) {
            fs.add(40_000.0 - i * 5_000.0); // descending on purpose: the order follows values, not indexes
        }
        List<Double> rs = new ArrayList<>();
        for (int i = 0; i < ratios; i++) {
            rs.add(1.0 + 3 * i);
        }
        scenario = scenario(fs, rs);
    }

    static Motor motor(String id, String label, double price) {
        return new Motor(id, label, 24, 0.5, 20, 0.5e-3, 0.05, 0.2, 5, 20, 600, 1e-5, 3, 6, 30, 600, 155, 0, 0.4, price);
    }

    static PowerSwitch powerSwitch(String id, String label, double price) {
        return new PowerSwitch(id, label, "PKG-A", 60, 40, 160, 5e-3, 9e-3, 150, 40e-9, 10e-9, 12e-9, 4.5, 1.5,
                500e-12, 0.8, 50e-9, 1.0, 175, price);
    }

    static Scenario scenario(List<Double> frequencies, List<Double> ratios) {
        Bench bench = new Bench(24, 20, 28, frequencies, Modulation.UNIPOLAR, 300e-9, 12, 10, 0.95, 25, 20,
                ratios, 0.9, new Limits(0.8, 125, 10, 0.3));
        Profile profile = new Profile(1e-3, true, List.of(
                new Segment("up", 0.5, 0, 20, 0.5), new Segment("run", 2, 20, 20, 0.5), new Segment("down", 0.5, 20, 0, 0.2)));
        return new Scenario("fake", bench, profile);
    }

    @Override
    public Scenario scenario() {
        return scenario;
    }

    @Override
    public Catalog catalog() {
        return catalog;
    }

    record Side(int motorIndex, int frequencyIndex, int ratioIndex) implements MotorSide {
    }

    @Override
    public MotorSide prepare(int motor, int frequency, int ratio) {
        return new Side(motor, frequency, ratio);
    }

    @Override
    public void summarize(MotorSide side, int switchIndex, double[] row) {
        fill(side.motorIndex(), switchIndex, side.frequencyIndex(), side.ratioIndex(), row);
    }

    private void fill(int m, int s, int f, int r, double[] row) {
        long key = ((((long) m * 1_000_003 + s) * 101 + f) * 103 + r) ^ seed;
        SplittableRandom random = new SplittableRandom(key);
        java.util.Arrays.fill(row, 0);
        boolean feasible = random.nextDouble() < feasibleShare;
        double least = Double.POSITIVE_INFINITY;
        int binding = 0;
        for (Constraint c : Constraint.values()) {
            double margin = feasible ? random.nextDouble() : random.nextDouble() * 1.2 - 0.2;
            row[Metric.marginOf(c).ordinal()] = margin;
            if (margin < least) {
                least = margin;
                binding = c.ordinal();
            }
        }
        if (!feasible && least >= 0) {
            Constraint c = Constraint.values()[random.nextInt(Constraint.values().length)];
            row[Metric.marginOf(c).ordinal()] = -0.05;
            least = -0.05;
            binding = c.ordinal();
        }
        row[Metric.FEASIBLE.ordinal()] = least >= 0 ? 1 : 0;
        row[Metric.BINDING.ordinal()] = binding;
        row[Metric.BINDING_MARGIN.ordinal()] = least;
        row[Metric.ADVISORIES.ordinal()] = random.nextInt(1 << Advisory.values().length);
        row[Metric.CURRENT_RMS.ordinal()] = 1 + random.nextDouble() * 10;
        row[Metric.CURRENT_PEAK.ordinal()] = row[Metric.CURRENT_RMS.ordinal()] * 1.5;
        row[Metric.BRIDGE_LOSS.ordinal()] = random.nextInt(20) * 0.5;
        row[Metric.MOTOR_LOSS.ordinal()] = random.nextInt(20) * 0.5;
        row[Metric.GATE_DRIVE_LOSS.ordinal()] = 0;
        row[Metric.TOTAL_LOSS.ordinal()] = row[Metric.BRIDGE_LOSS.ordinal()] + row[Metric.MOTOR_LOSS.ordinal()];
        row[Metric.EFFICIENCY.ordinal()] = random.nextInt(10) == 0 ? Double.NaN : random.nextDouble();
        row[Metric.JUNCTION_TEMP_MAX.ordinal()] = 25 + random.nextDouble() * 150;
        row[Metric.WINDING_TEMP_MAX.ordinal()] = 25 + random.nextDouble() * 150;
        row[Metric.COST.ordinal()] = catalog.motors().get(m).price() + 4 * catalog.switches().get(s).price();
        row[Metric.MASS.ordinal()] = catalog.motors().get(m).mass();
    }

    @Override
    public PairingResult explain(int motor, int switchIndex, int frequency, int ratio) {
        double[] row = new double[Metric.COUNT];
        fill(motor, switchIndex, frequency, ratio, row);
        Map<Constraint, Double> margins = new EnumMap<>(Constraint.class);
        for (Constraint c : Constraint.values()) {
            margins.put(c, row[Metric.marginOf(c).ordinal()]);
        }
        EnumSet<Advisory> advisories = EnumSet.noneOf(Advisory.class);
        for (Advisory a : Advisory.values()) {
            if (((int) row[Metric.ADVISORIES.ordinal()] & a.bit()) != 0) {
                advisories.add(a);
            }
        }
        Totals totals = new Totals(row[Metric.CURRENT_RMS.ordinal()], row[Metric.CURRENT_PEAK.ordinal()], 0.5, 0.1,
                row[Metric.BRIDGE_LOSS.ordinal()], row[Metric.MOTOR_LOSS.ordinal()], 0, row[Metric.EFFICIENCY.ordinal()],
                100, 80, row[Metric.JUNCTION_TEMP_MAX.ordinal()], row[Metric.WINDING_TEMP_MAX.ordinal()],
                row[Metric.COST.ordinal()], row[Metric.MASS.ordinal()]);
        List<SegmentResult> segments = new ArrayList<>();
        for (Segment seg : scenario.profile().segments()) {
            List<SwitchLoss> losses = List.of(new SwitchLoss("HA", 1, 0.5, 0.1, 0.05, 0.02), new SwitchLoss("LA", 1, 0.5, 0.1, 0.05, 0.02),
                    new SwitchLoss("HB", 0.2, 0, 0, 0, 0), new SwitchLoss("LB", 0.2, 0, 0, 0, 0));
            segments.add(new SegmentResult(seg.label(), seg.duration(), seg.speedEnd() * 10, 0.1, 2, 12, 0.5, 0.3, 2.01, 2.15,
                    0.52, 60, 62, losses, new double[] {60, 60, 40, 40}, 2.1, 2.0, 0.1, 0.01, 8, 12));
        }
        return new PairingResult(catalog.motors().get(motor), catalog.switches().get(switchIndex),
                scenario.bench().pwmFrequencies().get(frequency), scenario.bench().gearRatios().get(ratio),
                margins, Constraint.values()[(int) row[Metric.BINDING.ordinal()]], advisories, totals, segments);
    }
}
