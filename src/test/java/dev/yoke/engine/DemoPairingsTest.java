package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.catalog.CatalogLoader;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every pairing of the bundled catalog on every demo scenario: all figures finite, and the detailed path
 * ({@code explain}) equal to the fast path ({@code summarize}) to 1e-9 relative (they share the arithmetic;
 * the only differences allowed are summation order).
 */
class DemoPairingsTest {

    static Stream<Path> demos() throws Exception {
        try (Stream<Path> files = Files.list(Path.of("demo-data"))) {
            return files.filter(p -> p.toString().endsWith(".yaml")).sorted().toList().stream();
        }
    }

    @ParameterizedTest
    @MethodSource("demos")
    void everyDemoPairingIsFiniteAndExplainEqualsSummarize(Path demo) throws Exception {
        Catalog catalog = CatalogLoader.load(Path.of("catalog")).catalog();
        Scenario scenario = ScenarioLoader.load(demo).scenario();
        DriveEvaluator e = (DriveEvaluator) DriveEvaluator.of(scenario, catalog);
        int nf = scenario.bench().pwmFrequencies().size();
        int nr = scenario.bench().gearRatios().size();
        double[] row = new double[Metric.COUNT];
        int pairings = 0;
        for (int m = 0; m < catalog.motors().size(); m++) {
            for (int f = 0; f < nf; f++) {
                for (int n = 0; n < nr; n++) {
                    PairingEvaluator.MotorSide side = e.prepare(m, f, n);
                    for (int q = 0; q < catalog.switches().size(); q++) {
                        e.summarize(side, q, row);
                        // The public explain on a sample (it prepares again), the prepared one on every pairing.
                        PairingResult r = (q == 0 && n == 0) ? e.explain(m, q, f, n) : e.explain(side, q);
                        Finite.check(r);
                        sameFigures(row, r, demo.getFileName() + " motor " + m + " switch " + q + " frequency " + f
                                + " ratio " + n);
                        pairings++;
                    }
                }
            }
        }
        assertTrue(pairings > 0);
    }

    /** The fast-path row against the detailed result, every metric. */
    static void sameFigures(double[] row, PairingResult r, String where) {
        for (Metric m : Metric.values()) {
            assertTrue(Double.isFinite(row[m.ordinal()]), () -> where + " " + m.key());
        }
        Totals t = r.totals();
        List<double[]> pairs = List.of(
                new double[] {row[Metric.CURRENT_RMS.ordinal()], t.currentRms()},
                new double[] {row[Metric.CURRENT_PEAK.ordinal()], t.currentPeak()},
                new double[] {row[Metric.DUTY_MAX.ordinal()], t.dutyMax()},
                new double[] {row[Metric.RIPPLE_PP.ordinal()], t.ripplePeakToPeak()},
                new double[] {row[Metric.BRIDGE_LOSS.ordinal()], t.bridgeLoss()},
                new double[] {row[Metric.MOTOR_LOSS.ordinal()], t.motorLoss()},
                new double[] {row[Metric.GATE_DRIVE_LOSS.ordinal()], t.gateDriveLoss()},
                new double[] {row[Metric.EFFICIENCY.ordinal()], t.efficiency()},
                new double[] {row[Metric.ENERGY_IN.ordinal()], t.energyIn()},
                new double[] {row[Metric.ENERGY_OUT.ordinal()], t.energyOut()},
                new double[] {row[Metric.JUNCTION_TEMP_MAX.ordinal()], t.junctionTempMax()},
                new double[] {row[Metric.WINDING_TEMP_MAX.ordinal()], t.windingTempMax()},
                new double[] {row[Metric.COST.ordinal()], t.cost()},
                new double[] {row[Metric.MASS.ordinal()], t.mass()},
                new double[] {row[Metric.BINDING_MARGIN.ordinal()], r.bindingMargin()});
        for (double[] p : pairs) {
            assertEquals(p[0], p[1], 1e-9 * Math.abs(p[0]), where);
        }
        for (Constraint c : Constraint.values()) {
            assertEquals(row[Metric.marginOf(c).ordinal()], r.margins().get(c),
                    1e-9 * Math.abs(row[Metric.marginOf(c).ordinal()]), () -> where + " " + c.key());
        }
        assertEquals(row[Metric.BINDING.ordinal()], r.binding().ordinal(), where);
        assertEquals(row[Metric.FEASIBLE.ordinal()] == 1.0, r.feasible(), where);
        int bits = 0;
        for (Advisory a : r.advisories()) {
            bits |= a.bit();
        }
        assertEquals((int) row[Metric.ADVISORIES.ordinal()], bits, where);
        // Segment breakdown must also be finite and consistent with the totals.
        double bus = 0;
        for (SegmentResult s : r.segments()) {
            bus += s.busPower() * s.duration();
        }
        assertEquals(t.energyIn(), bus, 1e-9 * Math.max(1e-9, Math.abs(t.energyIn())), () -> where + " segments");
    }
}
