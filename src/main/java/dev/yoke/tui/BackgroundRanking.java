package dev.yoke.tui;

import dev.yoke.engine.Shortlist;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;

/**
 * One ranking running on its own daemon thread. The user-interface thread polls it and, when it
 * is done, takes the finished table: nothing is shared while it runs but these atomics.
 */
public final class BackgroundRanking {

    /** Where a run stands. */
    public enum State { RUNNING, DONE, CANCELLED, FAILED }

    private volatile double fraction = Double.NaN;
    private final AtomicBoolean cancelled = new AtomicBoolean();
    private final AtomicReference<State> state = new AtomicReference<>(State.RUNNING);
    private final AtomicReference<Shortlist> result = new AtomicReference<>();
    private final AtomicReference<String> failure = new AtomicReference<>();
    private final long startNanos = System.nanoTime();
    private volatile long endNanos;
    private final Thread thread;

    private BackgroundRanking(WorkbenchBackend backend, Scenario scenario, Catalog catalog) {
        RankProgress progress = new RankProgress() {
            @Override
            public void report(double f) {
                fraction = f;
            }

            @Override
            public boolean isCancelled() {
                return cancelled.get() || Thread.currentThread().isInterrupted();
            }
        };
        thread = new Thread(() -> {
            try {
                Shortlist table = backend.rank(scenario, catalog, progress);
                if (cancelled.get()) {
                    state.set(State.CANCELLED);
                } else {
                    result.set(table);
                    state.set(State.DONE);
                }
            } catch (InterruptedException | CancellationException e) {
                state.set(State.CANCELLED);
            } catch (OutOfMemoryError e) {
                // The run's rows are unreachable once this thread ends, so the screen can go on.
                failure.set("not enough memory for this many pairings: give Java more (-Xmx) or narrow the catalog");
                state.set(State.FAILED);
            } catch (Exception | StackOverflowError e) {
                if (cancelled.get()) {
                    state.set(State.CANCELLED);
                } else {
                    failure.set(e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage());
                    state.set(State.FAILED);
                }
            } finally {
                endNanos = System.nanoTime();
            }
        }, "yoke-ranking");
        thread.setDaemon(true);
    }

    /** Starts ranking on a new background thread. */
    public static BackgroundRanking start(WorkbenchBackend backend, Scenario scenario, Catalog catalog) {
        BackgroundRanking run = new BackgroundRanking(backend, scenario, catalog);
        run.thread.start();
        return run;
    }

    public State state() {
        return state.get();
    }

    /** Asks the run to stop; it finishes as {@link State#CANCELLED} shortly after. */
    public void cancel() {
        cancelled.set(true);
        thread.interrupt();
    }

    /** Fraction done in [0, 1], or NaN before the first report. */
    public double fraction() {
        return fraction;
    }

    /** Seconds since the start (or the run's length once finished). */
    public double seconds() {
        long end = endNanos == 0 ? System.nanoTime() : endNanos;
        return (end - startNanos) / 1e9;
    }

    /** The finished table; null unless {@link State#DONE}. */
    public Shortlist result() {
        return result.get();
    }

    /** Why the run failed; null unless {@link State#FAILED}. */
    public String failure() {
        return failure.get();
    }

    /** Waits for the run to end (tests and the batch path). */
    public void await(long millis) throws InterruptedException {
        thread.join(millis);
    }
}
