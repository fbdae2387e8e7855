package dev.yoke.catalog;

import java.io.BufferedOutputStream;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.SecureRandom;
import java.time.Duration;
import java.time.Instant;
import java.util.Objects;
import java.util.Set;

/**
 * Replaces a file so that, whatever happens (the process is killed, the disk fills, the power
 * fails), the file on disk is either the complete old version or the complete new one.
 *
 * <p>Method (common practice for crash-safe saves on POSIX file systems):
 * <ol>
 *   <li>write the new content to a hidden temporary file in the same folder
 *       ({@code .NAME.<random>.yoke-tmp}) and force it to the device;</li>
 *   <li>keep the previous version as {@code NAME.bak}: it is copied to a hidden temporary file,
 *       forced, and renamed over the old backup, so the backup too is always whole. Only one
 *       backup is kept: the version before the last save;</li>
 *   <li>rename the temporary file over the target with an atomic move (one {@code rename(2)});</li>
 *   <li>force the folder, where the operating system allows it, so the rename itself survives
 *       a power failure.</li>
 * </ol>
 * A symbolic link as target is followed: the file it points to is replaced and the link kept.
 * Temporary files left behind by a killed writer are hidden, never loaded, and swept by a later
 * save once they are older than an hour.
 */
public final class AtomicFile {

    /** Ending of the backup kept beside each saved file. */
    public static final String BACKUP_SUFFIX = ".bak";

    /** Ending of the hidden temporary files; loaders skip hidden files and this ending. */
    public static final String TEMP_SUFFIX = ".yoke-tmp";

    private static final Duration STALE_TEMP_AGE = Duration.ofHours(1);

    /** Bytes buffered between the content and the temporary file. */
    private static final int BUFFER_BYTES = 1 << 16;

    private static final SecureRandom RANDOM = new SecureRandom();

    private AtomicFile() {
    }

    /** The backup path kept beside {@code target}: {@code NAME.bak} in the same folder. */
    public static Path backupOf(Path target) {
        return target.resolveSibling(target.getFileName() + BACKUP_SUFFIX);
    }

    /**
     * What a save writes: the new content, produced into the stream the save gives (a hidden
     * temporary file, buffered). The stream need not be closed; closing it only flushes.
     */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    /**
     * Writes {@code content} to {@code target} atomically, keeping the previous version as
     * {@link #backupOf(Path) NAME.bak}.
     *
     * @throws IOException when the folder is missing or not writable, or the disk is full; the
     *                     target is then unchanged and no temporary file is left behind
     */
    public static void write(Path target, byte[] content) throws IOException {
        write(target, content, true);
    }

    /**
     * Like {@link #write(Path, byte[])}; with {@code keepBackup} false the current backup is left
     * as it is (used when restoring a file from its own backup).
     */
    public static void write(Path target, byte[] content, boolean keepBackup) throws IOException {
        Objects.requireNonNull(content, "content");
        write(target, out -> out.write(content), keepBackup);
    }

    /**
     * Streams {@code content} to {@code target} atomically, keeping the previous version as
     * {@link #backupOf(Path) NAME.bak}: for content too large to hold in memory (an export of a
     * million rows), written straight into the temporary file.
     *
     * @throws IOException when the folder is missing or not writable, the disk is full, or
     *                     {@code content} fails; whatever fails (an unchecked exception or error of
     *                     {@code content} too), the target is unchanged and no temporary file is left
     */
    public static void write(Path target, Content content) throws IOException {
        write(target, content, true);
    }

    /** Like {@link #write(Path, Content)}; with {@code keepBackup} false the current backup is left as it is. */
    public static void write(Path target, Content content, boolean keepBackup) throws IOException {
        Objects.requireNonNull(content, "content");
        Path file = followLink(target.toAbsolutePath());
        Path folder = file.getParent();
        String name = file.getFileName().toString();
        sweepStaleTemps(folder, name);

        Path temp = createTemp(folder, "." + name + ".");
        try {
            writeForced(temp, content);
            copyPermissions(file, temp);
            if (keepBackup && Files.isRegularFile(file)) {
                keepBackup(file, folder, name);
            }
            moveAtomically(temp, file);
        } catch (Throwable e) {
            deleteQuietly(temp, e);
            throw e;
        }
        forceFolder(folder);
    }

    /**
     * Puts {@code NAME.bak} back in place of {@code target} (atomically, the backup kept).
     *
     * @throws NoSuchFileException when there is no backup
     */
    public static void restoreBackup(Path target) throws IOException {
        Path file = followLink(target.toAbsolutePath());
        Path backup = backupOf(file);
        write(file, out -> Files.copy(backup, out), false);
    }

    private static void keepBackup(Path file, Path folder, String name) throws IOException {
        Path backupTemp = createTemp(folder, "." + name + BACKUP_SUFFIX + ".");
        try {
            Files.copy(file, backupTemp, StandardCopyOption.REPLACE_EXISTING);
            try (FileChannel channel = FileChannel.open(backupTemp, StandardOpenOption.WRITE)) {
                channel.force(true);
            }
            moveAtomically(backupTemp, backupOf(file));
        } catch (Throwable e) {
            deleteQuietly(backupTemp, e);
            throw e;
        }
    }

    /** A new empty hidden file; created without explicit permissions so the user's umask applies. */
    private static Path createTemp(Path folder, String prefix) throws IOException {
        for (int attempt = 0; ; attempt++) {
            Path temp = folder.resolve(prefix + Long.toUnsignedString(RANDOM.nextLong(), 36) + TEMP_SUFFIX);
            try {
                Files.newByteChannel(temp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE).close();
                return temp;
            } catch (FileAlreadyExistsException e) {
                if (attempt > 10) {
                    throw e;
                }
            }
        }
    }

    /** Runs {@code content} into {@code temp} through a buffer, then forces the bytes to the device. */
    private static void writeForced(Path temp, Content content) throws IOException {
        try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE,
                StandardOpenOption.TRUNCATE_EXISTING)) {
            OutputStream buffered = new BufferedOutputStream(Channels.newOutputStream(channel), BUFFER_BYTES);
            content.writeTo(new FilterOutputStream(buffered) {
                @Override
                public void write(byte[] bytes, int offset, int length) throws IOException {
                    buffered.write(bytes, offset, length); // FilterOutputStream would go byte by byte
                }

                @Override
                public void close() throws IOException {
                    flush(); // the channel is ours to force and close
                }
            });
            buffered.flush();
            channel.force(true);
        }
    }

    /** Deletes a temporary after a failure; a failure to delete is added to {@code cause}, not thrown. */
    private static void deleteQuietly(Path temp, Throwable cause) {
        try {
            Files.deleteIfExists(temp);
        } catch (IOException | RuntimeException e) {
            cause.addSuppressed(e);
        }
    }

    private static void moveAtomically(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            // Same folder, so this only happens on exotic file systems; say so rather than
            // silently falling back to a copy that could be cut in half.
            throw new IOException("cannot replace " + to + " atomically on this file system", e);
        }
    }

    /** Forces the folder entry (the rename) to the device; not possible on every OS, so best effort. */
    private static void forceFolder(Path folder) {
        try (FileChannel channel = FileChannel.open(folder, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // Windows cannot open a folder as a channel; NTFS journals the rename itself.
        }
    }

    private static Path followLink(Path path) throws IOException {
        Path current = path;
        for (int hops = 0; hops < 40 && Files.isSymbolicLink(current); hops++) {
            Path link = Files.readSymbolicLink(current);
            current = current.resolveSibling(link).normalize();
        }
        if (Files.isSymbolicLink(current)) {
            throw new IOException("too many symbolic links: " + path);
        }
        return current;
    }

    /**
     * Gives the temporary the permissions of the file it replaces, or, for a new file, read-write for
     * the owner and read for everyone else (what a new file gets under the usual umask 022; a
     * temporary file alone would be owner-only, and an exported shortlist unreadable to colleagues).
     */
    private static void copyPermissions(Path from, Path to) throws IOException {
        PosixFileAttributeView target = Files.getFileAttributeView(to, PosixFileAttributeView.class);
        if (target == null) {
            return;
        }
        if (!Files.exists(from, LinkOption.NOFOLLOW_LINKS)) {
            target.setPermissions(PosixFilePermissions.fromString("rw-r--r--"));
            return;
        }
        PosixFileAttributeView source = Files.getFileAttributeView(from, PosixFileAttributeView.class);
        if (source != null) {
            Set<PosixFilePermission> permissions = source.readAttributes().permissions();
            target.setPermissions(permissions);
        }
    }

    /** Deletes this file's temporaries that a killed writer left behind more than an hour ago. */
    private static void sweepStaleTemps(Path folder, String name) {
        Instant cutoff = Instant.now().minus(STALE_TEMP_AGE);
        String prefix = "." + name + ".";
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder)) {
            for (Path temp : entries) {
                String entry = temp.getFileName().toString();
                if (!entry.startsWith(prefix) || !entry.endsWith(TEMP_SUFFIX)) {
                    continue;
                }
                FileTime modified = Files.getLastModifiedTime(temp, LinkOption.NOFOLLOW_LINKS);
                if (modified.toInstant().isBefore(cutoff)) {
                    Files.deleteIfExists(temp);
                }
            }
        } catch (IOException e) {
            // Sweeping is housekeeping: a failure must not stop the save.
        }
    }
}
