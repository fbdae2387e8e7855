package dev.yoke.catalog;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Child process for {@link AtomicFileKillTest}: saves two versions of one file alternately, forever,
 * through {@link AtomicFile}, until the test kills it. Prints {@code ready} after its first save.
 *
 * <p>Arguments: target file, file holding version A, file holding version B. With
 * {@code -Dyoke.plainWrite=true} it overwrites in place instead: the control that shows the kill
 * test can catch a torn file.
 */
public final class AtomicWriteLoop {

    private AtomicWriteLoop() {
    }

    public static void main(String[] args) throws Exception {
        Path target = Path.of(args[0]);
        byte[][] versions = {Files.readAllBytes(Path.of(args[1])), Files.readAllBytes(Path.of(args[2]))};
        AtomicFile.write(target, versions[1]);
        System.out.println("ready");
        System.out.flush();
        boolean plain = Boolean.getBoolean("yoke.plainWrite");
        for (long i = 0; ; i++) {
            if (plain) {
                Files.write(target, versions[(int) (i % 2)]);
            } else {
                AtomicFile.write(target, versions[(int) (i % 2)]);
            }
        }
    }
}
