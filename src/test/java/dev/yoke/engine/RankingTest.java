package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class RankingTest {

    private static final Shortlist SHORTLIST = Sweep.all(new FakeEvaluator(23, 17, 3, 2, 42));

    @Test
    void defaultOrderPutsFeasibleFirstThenLeastLossThenCostThenIds() {
        int[] order = Ranking.order(SHORTLIST, SortKey.DEFAULT);
        assertEquals(SHORTLIST.size(), order.length);
        for (int i = 1; i < order.length; i++) {
            int a = order[i - 1];
            int b = order[i];
            boolean fa = SHORTLIST.feasible(a);
            boolean fb = SHORTLIST.feasible(b);
            assertFalse(!fa && fb, "an infeasible row before a feasible one at " + i);
            if (fa == fb) {
                double la = SHORTLIST.value(a, Metric.TOTAL_LOSS);
                double lb = SHORTLIST.value(b, Metric.TOTAL_LOSS);
                assertTrue(la <= lb, "loss must not fall at " + i);
                if (la == lb) {
                    double ca = SHORTLIST.value(a, Metric.COST);
                    double cb = SHORTLIST.value(b, Metric.COST);
                    assertTrue(ca <= cb, "cost breaks loss ties at " + i);
                    if (ca == cb) {
                        assertTrue(SHORTLIST.motorId(a).compareTo(SHORTLIST.motorId(b)) <= 0, "then motor id");
                    }
                }
            }
        }
    }

    @Test
    void anyKeyListMatchesAnIndependentComparatorChain() {
        SplittableRandom random = new SplittableRandom(7);
        List<Column> columns = Column.all();
        List<Reference.Row> rows = Reference.rows(SHORTLIST);
        for (int trial = 0; trial < 60; trial++) {
            List<SortKey> keys = new ArrayList<>();
            int n = 1 + random.nextInt(4);
            for (int k = 0; k < n; k++) {
                keys.add(new SortKey(columns.get(random.nextInt(columns.size())), random.nextBoolean()));
            }
            List<Reference.Row> expected = new ArrayList<>(rows);
            expected.sort(Reference.comparator(keys));
            int[] order = Ranking.order(SHORTLIST, keys);
            int[] want = expected.stream().mapToInt(Reference.Row::row).toArray();
            assertArrayEquals(want, order, "keys " + keys);
        }
    }

    @Test
    void packedPrefixSortAgreesWithTheComparatorOnTieHeavyKeys() {
        // 12,000 rows; keys with few distinct values (feasible, binding, ratio, pareto) force long
        // runs of equal prefixes that the full comparator must finish
        Shortlist big = Sweep.all(new FakeEvaluator(60, 50, 2, 2, 77));
        List<Reference.Row> rows = Reference.rows(big);
        List<List<SortKey>> cases = List.of(
                List.of(SortKey.descending(Column.of(Metric.FEASIBLE))),
                List.of(SortKey.ascending(Column.of(Metric.BINDING)), SortKey.descending(Column.RATIO)),
                List.of(SortKey.descending(Column.PARETO), SortKey.descending(Column.of(Metric.EFFICIENCY))),
                List.of(SortKey.descending(Column.SWITCH), SortKey.ascending(Column.of(Metric.MARGIN_VDS))),
                List.of(SortKey.ascending(Column.of(Metric.TOTAL_LOSS)), SortKey.descending(Column.of(Metric.COST)),
                        SortKey.descending(Column.of(Metric.BINDING_MARGIN))),
                List.of());
        for (List<SortKey> keys : cases) {
            List<Reference.Row> expected = new ArrayList<>(rows);
            expected.sort(Reference.comparator(keys));
            assertArrayEquals(expected.stream().mapToInt(Reference.Row::row).toArray(), Ranking.order(big, keys), "keys " + keys);
        }
    }

    @Test
    void missingValuesSortLastInBothDirections() {
        for (boolean descending : new boolean[] {false, true}) {
            int[] order = Ranking.order(SHORTLIST, List.of(new SortKey(Column.of(Metric.EFFICIENCY), descending)));
            boolean seenNaN = false;
            for (int row : order) {
                boolean nan = Double.isNaN(SHORTLIST.value(row, Metric.EFFICIENCY));
                assertFalse(seenNaN && !nan, "a number after a NaN");
                seenNaN |= nan;
            }
            assertTrue(seenNaN, "the fake evaluator makes some NaN efficiencies");
        }
    }

    @Test
    void filtersKeepExactlyTheRowsThatPassEveryCondition() {
        RowFilter filter = RowFilter.ALL.withFeasibleOnly(true).withMaxCost(40).withAtLeast(Metric.MARGIN_JUNCTION, 0.2);
        int[] view = Ranking.view(SHORTLIST, SortKey.DEFAULT, filter);
        int expected = 0;
        for (int r = 0; r < SHORTLIST.size(); r++) {
            boolean pass = SHORTLIST.feasible(r) && SHORTLIST.value(r, Metric.COST) <= 40
                    && SHORTLIST.value(r, Metric.MARGIN_JUNCTION) >= (float) 0.2;
            expected += pass ? 1 : 0;
        }
        assertEquals(expected, view.length);
        assertTrue(expected > 0 && expected < SHORTLIST.size(), "the filter should cut some rows and keep some");
        for (int r : view) {
            assertTrue(SHORTLIST.feasible(r));
            assertTrue(SHORTLIST.value(r, Metric.COST) <= 40);
        }
        // the filtered view keeps the relative order of the full view
        int[] full = Ranking.order(SHORTLIST, SortKey.DEFAULT);
        assertArrayEquals(view, Ranking.filter(SHORTLIST, full, filter));
    }

    @Test
    void textFilterNeedsEveryWordInTheMotorOrTheSwitch() {
        int[] view = Ranking.view(SHORTLIST, SortKey.DEFAULT, RowFilter.ALL.withText("FAST m1"));
        assertTrue(view.length > 0);
        for (int r : view) {
            String switchText = (SHORTLIST.switchId(r) + " " + SHORTLIST.evaluator().catalog().switches().get(SHORTLIST.switchIndex(r)).label()).toLowerCase();
            String motorText = SHORTLIST.motorId(r).toLowerCase();
            assertTrue(switchText.contains("fast") || motorText.contains("fast"));
            assertTrue(motorText.contains("m1") || switchText.contains("m1"));
        }
        assertEquals(0, Ranking.view(SHORTLIST, SortKey.DEFAULT, RowFilter.ALL.withText("no-such-part")).length);
    }

    @Test
    void paretoOnlyShowsTheFront() {
        int[] view = Ranking.view(SHORTLIST, SortKey.DEFAULT, RowFilter.ALL.withParetoOnly(true));
        assertEquals(SHORTLIST.paretoCount(), view.length);
        for (int r : view) {
            assertTrue(SHORTLIST.isPareto(r));
        }
    }

    @Test
    void sortKeysParseAscendingAndDescending() {
        List<SortKey> keys = SortKey.parseList("feasible:desc, total_loss ,cost:asc,motor");
        assertEquals(List.of(new SortKey(Column.of(Metric.FEASIBLE), true), new SortKey(Column.of(Metric.TOTAL_LOSS), false),
                new SortKey(Column.of(Metric.COST), false), new SortKey(Column.MOTOR, false)), keys);
        assertEquals(Column.FREQUENCY, SortKey.parse("pwm_frequency").column());
        IllegalArgumentException bad = assertThrows(IllegalArgumentException.class, () -> SortKey.parse("cheapness"));
        assertTrue(bad.getMessage().contains("cheapness") && bad.getMessage().contains("total_loss"), bad.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SortKey.parse("cost:up"));
    }
}
