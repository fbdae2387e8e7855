package dev.yoke.catalog;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Child process for {@link AtomicFileKillTest}: saves two versions of one file alternately, forever,
 * through {@link AtomicFile}, until the test kills it. Prints {@code ready} after its first save.
 *
 * <p>Arguments: target file, file holding version A, file holding version B, and optionally
 * {@code stream}: then each version is streamed through {@link AtomicFile#write(Path, AtomicFile.Content)}
 * in small flushed pieces, so the temporary file grows while the kill can land (as a large export
 * does), instead of being handed over as one byte array. With {@code -Dyoke.plainWrite=true} it
 * overwrites in place instead: the control that shows the kill test can catch a torn file.
 */
public final class AtomicWriteLoop {

    private AtomicWriteLoop() {
    }

    /** Bytes per flushed piece in stream mode: a 40 kB version reaches the disk in 80 writes. */
    private static final int PIECE_BYTES = 512;

    public static void main(String[] args) throws Exception {
        Path target = Path.of(args[0]);
        byte[][] versions = {Files.readAllBytes(Path.of(args[1])), Files.readAllBytes(Path.of(args[2]))};
        AtomicFile.write(target, versions[1]);
        System.out.println("ready");
        System.out.flush();
        boolean plain = Boolean.getBoolean("yoke.plainWrite");
        boolean stream = args.length > 3 && "stream".equals(args[3]);
        for (long i = 0; ; i++) {
            byte[] version = versions[(int) (i % 2)];
            if (plain) {
                Files.write(target, version);
            } else if (stream) {
                AtomicFile.write(target, out -> writeInPieces(version, out));
            } else {
                AtomicFile.write(target, version);
            }
        }
    }

    private static void writeInPieces(byte[] version, OutputStream out) throws IOException {
        for (int offset = 0; offset < version.length; offset += PIECE_BYTES) {
            out.write(version, offset, Math.min(PIECE_BYTES, version.length - offset));
            out.flush();
        }
    }
}
