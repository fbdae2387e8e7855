package dev.yoke.engine;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Evaluates every pairing (each motor × each switch × each PWM frequency × each gear ratio) on
 * all cores and gathers the summary rows into a {@link Shortlist}.
 *
 * <p>The work is cut into one task per motor, frequency and ratio: the task calls
 * {@link PairingEvaluator#prepare} once and {@link PairingEvaluator#summarize} for every switch,
 * so the switch-independent work is done once per task. Worker threads take tasks from a shared
 * counter (no queue, no allocation per pairing); cancellation is checked between tasks.
 */
public final class Sweep {

    private Sweep() {
    }

    /** Every pairing, on every core. */
    public static Shortlist all(PairingEvaluator evaluator) {
        return run(evaluator, SweepOptions.DEFAULT);
    }

    /**
     * Runs the sweep.
     *
     * @throws CancellationException when {@code options.cancelled()} turned true or the caller was interrupted
     * @throws IllegalArgumentException when keeping every pairing would not fit in an array
     */
    public static Shortlist run(PairingEvaluator evaluator, SweepOptions options) {
        int motors = evaluator.catalog().motors().size();
        int switches = evaluator.catalog().switches().size();
        int frequencies = evaluator.scenario().bench().pwmFrequencies().size();
        int ratios = evaluator.scenario().bench().gearRatios().size();
        if (frequencies > Short.MAX_VALUE || ratios > Short.MAX_VALUE) {
            throw new IllegalArgumentException("at most " + Short.MAX_VALUE + " frequencies and ratios");
        }
        long tasks = (long) motors * frequencies * ratios;
        long total = tasks * switches;
        if (tasks > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("too many motor × frequency × ratio combinations: " + tasks);
        }
        PartRanks ranks = new PartRanks(evaluator);
        int threads = (int) Math.max(1, Math.min(options.effectiveThreads(), Math.max(1, tasks)));
        // An ascending Pareto key would rank non-front rows first, which streaming cannot know
        // before the front is complete: such runs keep every row and cut afterwards.
        boolean paretoLast = options.order().stream()
                .anyMatch(k -> k.column().kind() == Column.Kind.PARETO && !k.descending());
        boolean keepAll = options.top() == 0 || paretoLast || (long) options.top() * threads * 2 >= total;
        if (keepAll && total > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException(total + " pairings are too many to keep; keep only the top N");
        }
        Job job = new Job(evaluator, options, ranks, (int) tasks, switches, frequencies, ratios, keepAll ? (int) total : -1);
        job.runOn(threads);

        if (keepAll) {
            RowStore store = job.all;
            store.size = (int) total;
            long feasible = job.feasible.get();
            Shortlist full = new Shortlist(evaluator, ranks, store, Pareto.mark(store), total, feasible);
            return options.top() == 0 ? full : head(full, options);
        }
        // Merge what each worker kept: its top rows and its front candidates.
        RowStore merged = new RowStore(1024);
        Set<Long> seen = new HashSet<>();
        for (Worker w : job.workers) {
            w.top.flush();
            w.front.compact();
            for (int slot : w.top.keptRows()) {
                add(merged, w.top.store, slot, seen, switches, frequencies, ratios);
            }
            for (int r = 0; r < w.front.store.size; r++) {
                add(merged, w.front.store, r, seen, switches, frequencies, ratios);
            }
        }
        Shortlist union = new Shortlist(evaluator, ranks, merged, Pareto.mark(merged), total, job.feasible.get());
        return head(union, options);
    }

    private static void add(RowStore to, RowStore from, int row, Set<Long> seen, int switches, int frequencies, int ratios) {
        if (seen.add(from.identity(row, switches, frequencies, ratios))) {
            to.ensureCapacity(to.size + 1);
            to.copyRow(from, row, to.size++);
        }
    }

    /** The first N rows of a view of {@code s}, as a new shortlist in that order. */
    private static Shortlist head(Shortlist s, SweepOptions options) {
        int[] view = Ranking.view(s, options.order(), options.filter());
        int n = Math.min(options.top(), view.length);
        RowStore store = s.store().select(view, n);
        long[] bits = new long[(n + 63) >>> 6];
        for (int i = 0; i < n; i++) {
            if (s.isPareto(view[i])) {
                RowOrder.setBit(bits, i);
            }
        }
        return new Shortlist(s.evaluator(), s.ranks(), store, bits, s.evaluatedCount(), s.feasibleCount());
    }

    /** Shared state of one run. */
    private static final class Job {
        final PairingEvaluator evaluator;
        final SweepOptions options;
        final PartRanks ranks;
        final int tasks;
        final int switches;
        final int frequencies;
        final int ratios;
        final RowStore all;
        final RowFilter.Prepared filter;
        final int[] earlyColumns;
        final AtomicInteger next = new AtomicInteger();
        final AtomicInteger done = new AtomicInteger();
        final AtomicInteger reported = new AtomicInteger(-1);
        final java.util.concurrent.atomic.AtomicLong feasible = new java.util.concurrent.atomic.AtomicLong();
        final AtomicBoolean stop = new AtomicBoolean();
        final AtomicReference<Throwable> failure = new AtomicReference<>();
        final List<Worker> workers = new ArrayList<>();

        Job(PairingEvaluator evaluator, SweepOptions options, PartRanks ranks, int tasks, int switches,
            int frequencies, int ratios, int keepAll) {
            this.evaluator = evaluator;
            this.options = options;
            this.ranks = ranks;
            this.tasks = tasks;
            this.switches = switches;
            this.frequencies = frequencies;
            this.ratios = ratios;
            this.all = keepAll >= 0 ? new RowStore(keepAll) : null;
            this.filter = options.filter().prepare(evaluator.catalog());
            java.util.BitSet early = new java.util.BitSet();
            for (int m : filter.metricsRead()) {
                early.set(m);
            }
            for (SortKey k : options.order()) {
                if (k.column().kind() == Column.Kind.METRIC) {
                    early.set(k.column().metric().ordinal());
                }
            }
            this.earlyColumns = early.stream().toArray();
        }

        void runOn(int threads) {
            List<Thread> started = new ArrayList<>();
            for (int t = 0; t < threads; t++) {
                Worker w = new Worker(this);
                workers.add(w);
                if (t > 0) {
                    Thread thread = new Thread(w, "yoke-sweep-" + t);
                    thread.setDaemon(true);
                    started.add(thread);
                    thread.start();
                }
            }
            workers.get(0).run(); // the calling thread works too
            try {
                for (Thread thread : started) {
                    thread.join();
                }
            } catch (InterruptedException e) {
                stop.set(true);
                Thread.currentThread().interrupt();
                throw new CancellationException("sweep interrupted");
            }
            Throwable f = failure.get();
            if (f instanceof CancellationException c) {
                throw c;
            }
            if (f instanceof RuntimeException r) {
                throw r;
            }
            if (f instanceof Error e) {
                throw e;
            }
            if (f != null) {
                throw new IllegalStateException(f);
            }
        }

        void taskDone() {
            int d = done.incrementAndGet();
            int step = (int) ((long) d * 200 / tasks);
            int last = reported.get();
            if (step > last && reported.compareAndSet(last, step)) {
                options.progress().accept((double) d / tasks);
            }
        }
    }

    /** One worker thread's loop and its private buffers. */
    private static final class Worker implements Runnable {
        final Job job;
        final double[] row = new double[Metric.COUNT];
        final TopBuffer top;
        final FrontTracker front;

        Worker(Job job) {
            this.job = job;
            boolean keepAll = job.all != null;
            this.top = keepAll ? null : new TopBuffer(job.options.top(), job.ranks, job.options.order());
            this.front = keepAll ? null : new FrontTracker();
        }

        @Override
        public void run() {
            try {
                loop();
            } catch (Throwable t) {
                job.failure.compareAndSet(null, t);
                job.stop.set(true);
            }
        }

        private void loop() {
            final Job j = job;
            final PairingEvaluator ev = j.evaluator;
            final int perMotor = j.frequencies * j.ratios;
            final int switches = j.switches;
            final double[] r = row;
            final int feasibleSlot = Metric.FEASIBLE.ordinal();
            long feasible = 0;
            try {
                while (true) {
                    if (j.stop.get()) {
                        return;
                    }
                    if (j.options.cancelled().getAsBoolean()) {
                        j.stop.set(true);
                        throw new CancellationException("sweep cancelled");
                    }
                    int task = j.next.getAndIncrement();
                    if (task >= j.tasks) {
                        return;
                    }
                    int motor = task / perMotor;
                    int frequency = (task / j.ratios) % j.frequencies;
                    int ratio = task % j.ratios;
                    PairingEvaluator.MotorSide side = ev.prepare(motor, frequency, ratio);
                    if (j.all != null) {
                        RowStore store = j.all;
                        int base = task * switches;
                        for (int s = 0; s < switches; s++) {
                            ev.summarize(side, s, r);
                            store.set(base + s, motor, s, frequency, ratio, r);
                            if (r[feasibleSlot] != 0) {
                                feasible++;
                            }
                        }
                    } else {
                        // Only the columns the order and the filter read are written before the
                        // row is judged; the whole row is written for the few that are kept.
                        TopBuffer t = top;
                        RowStore ts = t.store;
                        int[] early = j.earlyColumns;
                        for (int s = 0; s < switches; s++) {
                            ev.summarize(side, s, r);
                            if (r[feasibleSlot] != 0) {
                                feasible++;
                                front.offer(r, motor, s, frequency, ratio);
                            }
                            int slot = t.claim();
                            ts.setSome(slot, motor, s, frequency, ratio, r, early);
                            if (t.wouldKeep() && j.filter.testWithoutPareto(ts, slot)) {
                                ts.set(slot, motor, s, frequency, ratio, r);
                                t.offer();
                            }
                        }
                    }
                    j.taskDone();
                }
            } finally {
                j.feasible.addAndGet(feasible);
            }
        }
    }
}
