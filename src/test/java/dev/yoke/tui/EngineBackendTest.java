package dev.yoke.tui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.yoke.engine.Metric;
import dev.yoke.engine.Shortlist;
import dev.yoke.engine.SyntheticParts;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.util.List;
import org.junit.jupiter.api.Test;

class EngineBackendTest {

    private static final RankProgress QUIET = new RankProgress() {
        @Override
        public void report(double fraction) {
        }

        @Override
        public boolean isCancelled() {
            return false;
        }
    };

    /**
     * A sweep larger than the grid's row limit keeps only the best rows (bounded heap), still counts
     * every pairing it evaluated, and the rows it keeps are the head of the default order: no
     * feasible pairing is dropped while an infeasible one is kept.
     */
    @Test
    void largeSweepsKeepTheBestRowsAndCountEveryPairing() {
        Catalog catalog = SyntheticParts.catalog(60, 120, 7);
        Scenario scenario = SyntheticParts.scenario(4, 6, 6, 7);
        long pairings = 60L * 120 * 6 * 6;
        Shortlist kept = new EngineBackend("test", null, List.of()).rank(scenario, catalog, QUIET);
        int infeasibleKept = countInfeasible(kept);
        long feasible = kept.feasibleCount();
        int expectedInfeasible = (int) Math.max(0, EngineBackend.GRID_ROW_LIMIT - feasible);
        assertAll(
                () -> assertEquals(pairings, kept.evaluatedCount()),
                () -> assertEquals(EngineBackend.GRID_ROW_LIMIT, kept.size()),
                () -> assertEquals(expectedInfeasible, infeasibleKept, "feasible pairings come first"));
    }

    private static int countInfeasible(Shortlist kept) {
        int n = 0;
        for (int row = 0; row < kept.size(); row++) {
            if (kept.value(row, Metric.FEASIBLE) == 0) {
                n++;
            }
        }
        return n;
    }
}
