package dev.yoke.tui;

import dev.yoke.catalog.InputException;
import dev.yoke.catalog.LoadListener;
import dev.yoke.catalog.Problem;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;

/**
 * The workbench's inputs (catalog and scenario) read on their own daemon thread, so the screen
 * can open at once and show how far the reading has got. The reader reports each file through
 * the {@link LoadListener} it is given; the screen thread polls this object. Nothing is shared
 * but concurrent maps, lists and atomics.
 *
 * @param <T> what the reader produces
 */
public final class BackgroundLoad<T> {

    /** Reads the inputs, telling the listener about each file. */
    @FunctionalInterface
    public interface Reader<T> {
        T read(LoadListener listener) throws InputException;
    }

    /** Where the reading stands. */
    public enum State { RUNNING, DONE, FAILED }

    /** How far one file has got. */
    public enum Stage { WAITING, READING, READ }

    /**
     * One file as last reported.
     *
     * @param bytes its size, or -1 when it could not be asked
     * @param parts motors and switches found in it, once read
     */
    public record FileStatus(Path file, long bytes, Stage stage, int parts) {
    }

    private final List<Path> order = new CopyOnWriteArrayList<>();
    private final Map<Path, FileStatus> files = new ConcurrentHashMap<>();
    private final AtomicInteger parts = new AtomicInteger();
    private final AtomicInteger changes = new AtomicInteger();
    private final AtomicReference<State> state = new AtomicReference<>(State.RUNNING);
    private final AtomicReference<T> result = new AtomicReference<>();
    private final AtomicReference<List<Problem>> problems = new AtomicReference<>(List.of());
    private final AtomicReference<Throwable> crash = new AtomicReference<>();
    private volatile long startNanos;
    private volatile long endNanos;
    private final Thread thread;

    private BackgroundLoad(Reader<T> reader) {
        LoadListener listener = new LoadListener() {
            @Override
            public void filesFound(List<Path> found) {
                for (Path f : found) {
                    note(f, Stage.WAITING, 0);
                }
            }

            @Override
            public void fileStarted(Path file) {
                note(file, Stage.READING, 0);
            }

            @Override
            public void fileRead(Path file, int count) {
                note(file, Stage.READ, count);
                parts.addAndGet(count);
            }
        };
        thread = new Thread(() -> {
            try {
                result.set(reader.read(listener));
                state.set(State.DONE);
            } catch (InputException e) {
                problems.set(List.copyOf(e.problems()));
                state.set(State.FAILED);
            } catch (RuntimeException | Error e) {
                // Not the user's mistake: handed back to the caller once the screen is closed.
                crash.set(e);
                state.set(State.FAILED);
            } finally {
                endNanos = System.nanoTime();
            }
        }, "yoke-reading");
        thread.setDaemon(true);
    }

    /** A reading not yet started (the screen starts it once it has drawn its first view). */
    public static <T> BackgroundLoad<T> of(Reader<T> reader) {
        return new BackgroundLoad<>(reader);
    }

    /** Starts reading on a new background thread. */
    public static <T> BackgroundLoad<T> start(Reader<T> reader) {
        return of(reader).start();
    }

    /** Starts the reading thread unless it is already started; the clock starts now. */
    public synchronized BackgroundLoad<T> start() {
        if (startNanos == 0) {
            startNanos = System.nanoTime();
            thread.start();
        }
        return this;
    }

    private void note(Path file, Stage stage, int count) {
        FileStatus before = files.get(file);
        long bytes = before != null ? before.bytes() : sizeOf(file);
        if (before == null) {
            order.add(file);
        }
        files.put(file, new FileStatus(file, bytes, stage, count));
        changes.incrementAndGet();
    }

    private static long sizeOf(Path file) {
        try {
            return Files.size(file);
        } catch (IOException | SecurityException e) {
            return -1;
        }
    }

    public State state() {
        return state.get();
    }

    /** Every file heard of, in the order first heard of (the catalog's in name order, then the scenario). */
    public List<FileStatus> files() {
        List<FileStatus> out = new ArrayList<>();
        for (Path p : order) {
            FileStatus s = files.get(p);
            if (s != null) {
                out.add(s);
            }
        }
        return out;
    }

    /** A count that grows with every file reported: the screen redraws when it moved. */
    public int changes() {
        return changes.get();
    }

    /** Motors and switches read so far. */
    public int partsRead() {
        return parts.get();
    }

    /** Share of the known bytes in files read so far, in [0, 1]; NaN before any file is known. */
    public double fraction() {
        long total = 0;
        long done = 0;
        for (FileStatus s : files()) {
            long b = Math.max(0, s.bytes());
            total += b;
            if (s.stage() == Stage.READ) {
                done += b;
            }
        }
        return total == 0 ? Double.NaN : (double) done / total;
    }

    /** Seconds since the start (or the reading's length once ended); 0 before the start. */
    public double seconds() {
        if (startNanos == 0) {
            return 0;
        }
        long end = endNanos == 0 ? System.nanoTime() : endNanos;
        return (end - startNanos) / 1e9;
    }

    /** What was read; null unless {@link State#DONE}. */
    public T result() {
        return result.get();
    }

    /** The problems of the files (errors and the warnings found with them); empty unless they stopped the reading. */
    public List<Problem> problems() {
        return problems.get();
    }

    /** An unexpected failure of the reader (not a problem in the user's files), or null. */
    public Throwable crash() {
        return crash.get();
    }

    /** Waits for the reading to end (tests); returns at once when it was never started. */
    public void await(long millis) throws InterruptedException {
        thread.join(millis);
    }
}
