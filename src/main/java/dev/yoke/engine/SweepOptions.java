package dev.yoke.engine;

import java.util.List;
import java.util.Objects;
import java.util.function.BooleanSupplier;
import java.util.function.DoubleConsumer;

/**
 * How to run a {@link Sweep}.
 *
 * @param threads   worker threads; 0 or less: one per available core
 * @param top       0: keep every pairing; N &gt; 0: keep only the first N of {@code order} that pass
 *                  {@code filter} (bounded memory for very large runs; the Pareto flags stay exact)
 * @param order     the order that decides the top N (ignored when keeping every pairing)
 * @param filter    rows eligible for the top N (ignored when keeping every pairing)
 * @param progress  called with the fraction done (0..1) from worker threads, at most about 200 times
 * @param cancelled checked between tasks; when it turns true the sweep stops and throws
 *                  {@link java.util.concurrent.CancellationException}
 */
public record SweepOptions(int threads, int top, List<SortKey> order, RowFilter filter,
                           DoubleConsumer progress, BooleanSupplier cancelled) {

    /** Every pairing, every core, no progress reports, never cancelled. */
    public static final SweepOptions DEFAULT = new SweepOptions(0, 0, SortKey.DEFAULT, RowFilter.ALL, p -> { }, () -> false);

    public SweepOptions {
        if (top < 0) {
            throw new IllegalArgumentException("top must be 0 (all) or positive, was " + top);
        }
        order = List.copyOf(order);
        Objects.requireNonNull(filter, "filter");
        Objects.requireNonNull(progress, "progress");
        Objects.requireNonNull(cancelled, "cancelled");
    }

    public SweepOptions withThreads(int n) {
        return new SweepOptions(n, top, order, filter, progress, cancelled);
    }

    /** Keep only the first {@code n} pairings by {@code keys} among those passing {@code rows}. */
    public SweepOptions withTop(int n, List<SortKey> keys, RowFilter rows) {
        return new SweepOptions(threads, n, keys, rows, progress, cancelled);
    }

    public SweepOptions withProgress(DoubleConsumer listener) {
        return new SweepOptions(threads, top, order, filter, listener, cancelled);
    }

    public SweepOptions withCancel(BooleanSupplier flag) {
        return new SweepOptions(threads, top, order, filter, progress, flag);
    }

    /** The worker count this will use. */
    public int effectiveThreads() {
        return threads > 0 ? threads : Runtime.getRuntime().availableProcessors();
    }
}
