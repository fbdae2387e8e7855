package dev.yoke.catalog;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Duration;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.locks.ReentrantLock;

/**
 * The catalog folder's save lock, {@code .yoke.lock}, held while one save reads, checks, writes and
 * verifies its files, so two Yoke processes (or two windows of one) never interleave their saves.
 *
 * <p>Between processes it is an operating-system lock ({@link FileChannel#tryLock()}), released by
 * the kernel when the holder dies, so a killed Yoke never leaves the catalog locked. Inside one
 * process, where such locks are per process, a lock per folder serialises the threads. The lock
 * file itself stays (empty) in the folder; it is hidden and never loaded.
 */
public final class CatalogLock implements AutoCloseable {

    /** Name of the lock file in the catalog folder. */
    public static final String FILE_NAME = ".yoke.lock";

    private static final ConcurrentHashMap<Path, ReentrantLock> IN_PROCESS = new ConcurrentHashMap<>();

    private final ReentrantLock threadLock;
    private final FileChannel channel;
    private final FileLock fileLock;

    private CatalogLock(ReentrantLock threadLock, FileChannel channel, FileLock fileLock) {
        this.threadLock = threadLock;
        this.channel = channel;
        this.fileLock = fileLock;
    }

    /**
     * Takes the lock of {@code folder}, waiting up to {@code patience} for another holder to finish.
     *
     * @throws CatalogBusyException when another process still holds it after {@code patience}
     * @throws IOException          when the lock file cannot be created (read-only folder)
     */
    public static CatalogLock acquire(Path folder, Duration patience) throws IOException {
        Path lockFile = folder.toAbsolutePath().normalize().resolve(FILE_NAME);
        ReentrantLock threadLock = IN_PROCESS.computeIfAbsent(lockFile, k -> new ReentrantLock());
        long deadline = System.nanoTime() + patience.toNanos();
        try {
            if (!threadLock.tryLock(patience.toNanos(), TimeUnit.NANOSECONDS)) {
                throw new CatalogBusyException(folder);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CatalogBusyException(folder);
        }
        FileChannel channel = null;
        try {
            channel = FileChannel.open(lockFile, StandardOpenOption.CREATE, StandardOpenOption.WRITE);
            while (true) {
                FileLock lock;
                try {
                    lock = channel.tryLock();
                } catch (OverlappingFileLockException e) {
                    lock = null; // cannot happen while the thread lock is held; treated as busy
                }
                if (lock != null) {
                    return new CatalogLock(threadLock, channel, lock);
                }
                if (System.nanoTime() > deadline) {
                    throw new CatalogBusyException(folder);
                }
                Thread.sleep(20);
            }
        } catch (IOException | RuntimeException e) {
            closeQuietly(channel);
            threadLock.unlock();
            throw e;
        } catch (InterruptedException e) {
            closeQuietly(channel);
            threadLock.unlock();
            Thread.currentThread().interrupt();
            throw new CatalogBusyException(folder);
        }
    }

    @Override
    public void close() throws IOException {
        try {
            fileLock.release();
            channel.close();
        } finally {
            threadLock.unlock();
        }
    }

    private static void closeQuietly(FileChannel channel) {
        if (channel != null) {
            try {
                channel.close();
            } catch (IOException ignored) {
                // closing after a failure: the first error is the one to report
            }
        }
    }
}
