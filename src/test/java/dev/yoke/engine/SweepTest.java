package dev.yoke.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;

class SweepTest {

    @Test
    void everyPairingIsEvaluatedOnceWithTheEvaluatorsValues() {
        FakeEvaluator ev = new FakeEvaluator(9, 11, 3, 2, 1);
        Shortlist s = Sweep.run(ev, SweepOptions.DEFAULT.withThreads(2));
        assertEquals(9 * 11 * 3 * 2, s.size());
        assertEquals(s.size(), s.evaluatedCount());
        Set<String> seen = new HashSet<>();
        double[] row = new double[Metric.COUNT];
        long feasible = 0;
        for (int r = 0; r < s.size(); r++) {
            assertTrue(seen.add(s.motorIndex(r) + "/" + s.switchIndex(r) + "/" + s.frequencyIndex(r) + "/" + s.ratioIndex(r)));
            ev.summarize(ev.prepare(s.motorIndex(r), s.frequencyIndex(r), s.ratioIndex(r)), s.switchIndex(r), row);
            for (Metric m : Metric.values()) {
                // stored as float: equal to the engine's double narrowed once
                assertEquals((float) row[m.ordinal()], (float) s.value(r, m), 0.0, m.key());
            }
            feasible += s.feasible(r) ? 1 : 0;
        }
        assertEquals(feasible, s.feasibleCount());
    }

    @Test
    void oneAndTwoThreadsGiveTheSameRanking() {
        FakeEvaluator ev = new FakeEvaluator(13, 7, 2, 2, 3);
        List<String> one = identities(Sweep.run(ev, SweepOptions.DEFAULT.withThreads(1)), SortKey.DEFAULT);
        List<String> two = identities(Sweep.run(ev, SweepOptions.DEFAULT.withThreads(2)), SortKey.DEFAULT);
        assertEquals(one, two);
    }

    @Test
    void topNEqualsTheHeadOfAFullSort() {
        SplittableRandom random = new SplittableRandom(11);
        List<Column> columns = Column.all();
        for (int trial = 0; trial < 40; trial++) {
            FakeEvaluator ev = new FakeEvaluator(5 + random.nextInt(40), 5 + random.nextInt(60), 1 + random.nextInt(3),
                    1 + random.nextInt(3), trial, random.nextDouble());
            List<SortKey> keys = new ArrayList<>();
            if (trial % 3 == 0) {
                keys.addAll(SortKey.DEFAULT);
            } else {
                int n = 1 + random.nextInt(3);
                for (int k = 0; k < n; k++) {
                    keys.add(new SortKey(columns.get(random.nextInt(columns.size())), random.nextBoolean()));
                }
            }
            RowFilter filter = RowFilter.ALL;
            if (random.nextBoolean()) {
                filter = filter.withFeasibleOnly(true);
            }
            if (random.nextInt(3) == 0) {
                filter = filter.withMaxCost(20 + random.nextInt(20));
            }
            if (random.nextInt(4) == 0) {
                filter = filter.withParetoOnly(true);
            }
            int top = 1 + random.nextInt(30);
            int threads = 1 + random.nextInt(2);

            Shortlist full = Sweep.run(ev, SweepOptions.DEFAULT.withThreads(threads));
            int[] view = Ranking.view(full, keys, filter);
            List<String> expected = new ArrayList<>();
            for (int i = 0; i < Math.min(top, view.length); i++) {
                expected.add(identity(full, view[i]) + " pareto=" + full.isPareto(view[i]));
            }
            Shortlist head = Sweep.run(ev, SweepOptions.DEFAULT.withThreads(threads).withTop(top, keys, filter));
            List<String> got = new ArrayList<>();
            for (int r = 0; r < head.size(); r++) {
                got.add(identity(head, r) + " pareto=" + head.isPareto(r));
            }
            assertEquals(expected, got, "trial " + trial + " keys " + keys + " filter " + filter + " top " + top);
            assertEquals(full.evaluatedCount(), head.evaluatedCount());
            assertEquals(full.feasibleCount(), head.feasibleCount());
        }
    }

    @Test
    void topNOnALargeRunKeepsBoundedRowsAndTheExactFront() {
        // 60 000 pairings, top 50: the streaming path (not the keep-all fallback) is taken
        FakeEvaluator ev = new FakeEvaluator(100, 200, 3, 1, 99);
        Shortlist full = Sweep.all(ev);
        Shortlist head = Sweep.run(ev, SweepOptions.DEFAULT.withTop(50, List.of(SortKey.descending(Column.PARETO),
                SortKey.ascending(Column.of(Metric.COST))), RowFilter.ALL));
        assertEquals(50, head.size());
        int[] view = Ranking.order(full, List.of(SortKey.descending(Column.PARETO), SortKey.ascending(Column.of(Metric.COST))));
        for (int i = 0; i < 50; i++) {
            assertEquals(identity(full, view[i]), identity(head, i));
            assertEquals(full.isPareto(view[i]), head.isPareto(i));
        }
    }

    @Test
    void progressRisesToOne() {
        List<Double> seen = new CopyOnWriteArrayList<>();
        Sweep.run(new FakeEvaluator(50, 3, 2, 2, 1), SweepOptions.DEFAULT.withThreads(1).withProgress(seen::add));
        assertTrue(seen.size() >= 2);
        for (int i = 1; i < seen.size(); i++) {
            assertTrue(seen.get(i) >= seen.get(i - 1));
        }
        assertEquals(1.0, seen.get(seen.size() - 1), 0.0);
    }

    @Test
    void cancellingStopsTheSweepBetweenTasks() {
        AtomicInteger polls = new AtomicInteger();
        SweepOptions options = SweepOptions.DEFAULT.withThreads(2).withCancel(() -> polls.incrementAndGet() > 10);
        assertThrows(CancellationException.class, () -> Sweep.run(new FakeEvaluator(200, 5, 2, 2, 1), options));
        assertTrue(polls.get() < 200 * 4, "stopped early, polled " + polls.get());
    }

    @Test
    void anEvaluatorFailureReachesTheCaller() {
        FakeEvaluator ev = new FakeEvaluator(4, 4, 1, 1, 1) {
            @Override
            public void summarize(MotorSide side, int switchIndex, double[] row) {
                throw new IllegalStateException("boom");
            }
        };
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> Sweep.all(ev));
        assertEquals("boom", e.getMessage());
    }

    static String identity(Shortlist s, int r) {
        return s.motorId(r) + "|" + s.switchId(r) + "|" + s.frequency(r) + "|" + s.ratio(r);
    }

    private static List<String> identities(Shortlist s, List<SortKey> keys) {
        List<String> out = new ArrayList<>();
        for (int r : Ranking.order(s, keys)) {
            out.add(identity(s, r) + " " + s.value(r, Metric.TOTAL_LOSS) + " " + s.isPareto(r));
        }
        return out;
    }
}
