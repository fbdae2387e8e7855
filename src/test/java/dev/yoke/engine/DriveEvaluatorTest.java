package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.model.Modulation;
import dev.yoke.model.Motor;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class DriveEvaluatorTest {

    static Stream<Arguments> benches() {
        List<Arguments> list = new ArrayList<>();
        for (Modulation m : Modulation.values()) {
            list.add(Arguments.of(m, true));
            list.add(Arguments.of(m, false));
        }
        return list.stream();
    }

    /** The fast path and the detailed path must give the same numbers (same arithmetic; 1e-9 relative). */
    @ParameterizedTest
    @MethodSource("benches")
    void explainAgreesWithSummarize(Modulation modulation, boolean repeat) {
        PairingEvaluator e = DriveEvaluator.of(TestParts.scenario(modulation, repeat), TestParts.catalog());
        for (int f = 0; f < 2; f++) {
            for (int n = 0; n < 2; n++) {
                double[] row = new double[Metric.COUNT];
                e.summarize(e.prepare(0, f, n), 0, row);
                PairingResult r = e.explain(0, 0, f, n);
                Totals t = r.totals();
                List<Executable> checks = new ArrayList<>();
                checks.add(() -> close(row[Metric.BRIDGE_LOSS.ordinal()], t.bridgeLoss(), "bridge"));
                checks.add(() -> close(row[Metric.JUNCTION_TEMP_MAX.ordinal()], t.junctionTempMax(), "tj"));
                checks.add(() -> close(row[Metric.ENERGY_IN.ordinal()], t.energyIn(), "energy in"));
                checks.add(() -> assertEquals(row[Metric.BINDING.ordinal()], r.binding().ordinal()));
                checks.add(() -> assertEquals(row[Metric.FEASIBLE.ordinal()] == 1.0, r.feasible()));
                for (Constraint c : Constraint.values()) {
                    checks.add(() -> close(row[Metric.marginOf(c).ordinal()], r.margins().get(c), c.key()));
                }
                // The segment breakdown adds up to the cycle figures.
                double cycle = 0;
                double bridge = 0;
                double bus = 0;
                double gate = 0;
                double square = 0;
                double tj = Double.NEGATIVE_INFINITY;
                double winding = Double.NEGATIVE_INFINITY;
                for (SegmentResult s : r.segments()) {
                    cycle += s.duration();
                    bridge += s.duration() * s.switchLosses().stream().mapToDouble(SwitchLoss::total).sum();
                    bus += s.duration() * s.busPower();
                    gate += s.duration() * s.gateDriveLoss();
                    square += s.duration() * s.currentRms() * s.currentRms();
                    for (double j : s.junctionTemps()) {
                        tj = Math.max(tj, j);
                    }
                    winding = Math.max(winding, s.windingTempPeak());
                }
                double c = cycle;
                double br = bridge;
                double bu = bus;
                double ga = gate;
                double sq = square;
                double tjs = tj;
                double wi = winding;
                checks.add(() -> close(t.bridgeLoss(), br / c, "segments' bridge loss"));
                checks.add(() -> close(t.energyIn(), bu, "segments' bus energy"));
                checks.add(() -> close(t.gateDriveLoss(), ga / c, "segments' gate loss"));
                checks.add(() -> close(t.currentRms(), Math.sqrt(sq / c), "segments' rms"));
                checks.add(() -> close(t.junctionTempMax(), tjs, "segments' junction"));
                if (r.advisories().contains(Advisory.WINDING_RUNAWAY)) {
                    checks.add(() -> assertTrue(t.windingTempMax() >= wi, "runaway reads above the segments"));
                } else {
                    checks.add(() -> close(t.windingTempMax(), wi, "segments' winding"));
                }
                assertAll(checks);
            }
        }
    }

    static void close(double expected, double actual, String what) {
        assertEquals(expected, actual, 1e-9 * Math.max(1e-12, Math.abs(expected)), what);
    }

    /**
     * Conservation of energy over the cycle: what the bus delivers (terminal power plus bridge loss, summed
     * per segment) equals the load's work (torque × speed at the load) plus copper, friction and brush loss,
     * bridge loss, gearbox loss and the change of kinetic energy. The gearbox loss, friction loss and kinetic
     * energy are computed here independently by integrating the profile in fine time steps from the scenario,
     * not by the engine. Tolerance 1e-7 relative to the energy turned over: the midpoint integration of
     * piecewise-linear speeds with kinks at zero errs far below that.
     */
    @ParameterizedTest
    @MethodSource("benches")
    void busEnergyBalancesLoadWorkLossesAndKineticEnergy(Modulation modulation, boolean repeat) {
        for (Profile profile : List.of(TestParts.profile(repeat), new Profile(0.01, repeat, List.of(
                new Segment("spin up", 0.3, 0, 25, 0.8), new Segment("cruise", 0.7, 25, 25, 0.8),
                new Segment("overhaul", 0.4, 25, 10, -0.6))))) {
            Scenario scenario = new Scenario("balance", TestParts.bench(modulation), profile);
            PairingEvaluator e = DriveEvaluator.of(scenario, TestParts.catalog());
            for (int n = 0; n < 2; n++) {
                double ratio = scenario.bench().gearRatios().get(n);
                PairingResult r = e.explain(0, 0, 1, n);
                Motor m = TestParts.motor();
                double eta = scenario.bench().gearEfficiency();
                double busIn = 0;
                double electricLoss = 0;
                double loadWork = 0;
                double turnover = 0;
                for (SegmentResult s : r.segments()) {
                    busIn += s.busPower() * s.duration();
                    double bridge = s.switchLosses().stream().mapToDouble(SwitchLoss::total).sum();
                    double brush = s.motorLoss() - s.copperLoss() - s.frictionLoss();
                    electricLoss += (s.copperLoss() + brush + bridge) * s.duration();
                    turnover += (Math.abs(s.busPower()) + s.motorLoss() + bridge) * s.duration();
                }
                double gearLoss = 0;
                double friction = 0;
                for (Segment seg : profile.segments()) {
                    int steps = 200_000;
                    double dt = seg.duration() / steps;
                    for (int i = 0; i < steps; i++) {
                        double w = seg.speedStart() + (seg.speedEnd() - seg.speedStart()) * (i + 0.5) / steps;
                        double p = seg.torque() * w;
                        loadWork += p * dt;
                        // Gearbox (common practice): η of the power passing through, whichever way it flows.
                        gearLoss += (p >= 0 ? p * (1 / eta - 1) : -p * (1 - eta)) * dt;
                        friction += m.frictionTorque() * Math.abs(ratio * w) * dt;
                    }
                }
                double inertia = profile.loadInertia() + m.rotorInertia() * ratio * ratio;
                List<Segment> segs = profile.segments();
                double w0 = segs.get(0).speedStart();
                double w1 = segs.get(segs.size() - 1).speedEnd();
                double kinetic = 0.5 * inertia * (w1 * w1 - w0 * w0);
                double out = loadWork + gearLoss + friction + electricLoss + kinetic;
                assertEquals(busIn, out, 1e-7 * turnover, modulation + " repeat=" + repeat + " N=" + ratio);
                assertEquals(loadWork, r.totals().energyOut(), 1e-7 * Math.abs(turnover));
            }
        }
    }

    /** Law: every figure of every pairing is a finite number. */
    @ParameterizedTest
    @MethodSource("benches")
    void everyFigureIsFinite(Modulation modulation, boolean repeat) {
        PairingEvaluator e = DriveEvaluator.of(TestParts.scenario(modulation, repeat), TestParts.catalog());
        double[] row = new double[Metric.COUNT];
        e.summarize(e.prepare(0, 0, 0), 0, row);
        for (Metric m : Metric.values()) {
            assertTrue(Double.isFinite(row[m.ordinal()]), m.key());
        }
        Finite.check(e.explain(0, 0, 0, 0));
    }
}
