package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFileTest {

    @TempDir
    Path folder;

    /** A new file is readable by others like any file the user creates (common practice: umask 022), not owner-only. */
    @Test
    void newFileIsReadableByOthers() throws IOException {
        Path target = folder.resolve("shortlist.csv");
        AtomicFile.write(target, bytes("a,b"));
        assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(target)));
    }

    @Test
    void newFileGetsContentAndNoBackup() throws IOException {
        Path target = folder.resolve("motors.yaml");
        AtomicFile.write(target, bytes("one"));
        assertEquals("one", Files.readString(target));
        assertFalse(Files.exists(AtomicFile.backupOf(target)));
        assertEquals(List.of("motors.yaml"), entries());
    }

    @Test
    void previousVersionIsKeptAsBackup() throws IOException {
        Path target = folder.resolve("motors.yaml");
        AtomicFile.write(target, bytes("one"));
        AtomicFile.write(target, bytes("two"));
        AtomicFile.write(target, bytes("three"));
        assertEquals("three", Files.readString(target));
        assertEquals("two", Files.readString(folder.resolve("motors.yaml.bak")));
        assertEquals(List.of("motors.yaml", "motors.yaml.bak"), entries(), "no temporary file is left behind");
    }

    @Test
    void restoreBackupPutsPreviousVersionBack() throws IOException {
        Path target = folder.resolve("motors.yaml");
        AtomicFile.write(target, bytes("good"));
        AtomicFile.write(target, bytes("bad"));
        AtomicFile.restoreBackup(target);
        assertEquals("good", Files.readString(target));
        assertEquals("good", Files.readString(AtomicFile.backupOf(target)));
    }

    @Test
    void restoreWithoutBackupIsRefused() throws IOException {
        Path target = folder.resolve("motors.yaml");
        AtomicFile.write(target, bytes("only"));
        assertThrows(NoSuchFileException.class, () -> AtomicFile.restoreBackup(target));
        assertEquals("only", Files.readString(target));
    }

    @Test
    void symbolicLinkIsFollowedAndKept() throws IOException {
        Path real = Files.createDirectories(folder.resolve("real")).resolve("switches.yaml");
        Files.writeString(real, "old");
        Path link = Files.createSymbolicLink(folder.resolve("switches.yaml"), real);
        AtomicFile.write(link, bytes("new"));
        assertTrue(Files.isSymbolicLink(link), "the link stays a link");
        assertEquals("new", Files.readString(real));
        assertEquals("old", Files.readString(AtomicFile.backupOf(real)));
    }

    @Test
    void permissionsOfTheOldFileAreKept() throws IOException {
        Path target = folder.resolve("motors.yaml");
        Files.writeString(target, "old");
        Files.setPosixFilePermissions(target, PosixFilePermissions.fromString("rw-r-----"));
        AtomicFile.write(target, bytes("new"));
        assertEquals("rw-r-----", PosixFilePermissions.toString(Files.getPosixFilePermissions(target)));
    }

    @Test
    void missingFolderFailsAndLeavesNothing() {
        Path target = folder.resolve("absent").resolve("motors.yaml");
        assertThrows(IOException.class, () -> AtomicFile.write(target, bytes("x")));
        assertFalse(Files.exists(target.getParent()));
    }

    @Test
    void failedMoveLeavesOldFileAndNoTemporary() throws IOException {
        // A folder where the target should be: the final rename fails after the temporary was written.
        Path target = Files.createDirectories(folder.resolve("motors.yaml"));
        Files.writeString(target.resolve("inside"), "keep");
        assertThrows(IOException.class, () -> AtomicFile.write(target, bytes("x")));
        assertEquals("keep", Files.readString(target.resolve("inside")));
        assertEquals(List.of("motors.yaml"), entries());
    }

    @Test
    void streamedContentReplacesTheFileAndKeepsTheBackup() throws IOException {
        Path target = folder.resolve("shortlist.csv");
        AtomicFile.write(target, bytes("first\r\n"));
        AtomicFile.write(target, out -> {
            for (int row = 0; row < 3; row++) {
                out.write(bytes("row " + row + "\r\n"));
            }
            out.close(); // closing only flushes: the save still forces and renames afterwards
        });
        assertEquals("row 0\r\nrow 1\r\nrow 2\r\n", Files.readString(target));
        assertEquals("first\r\n", Files.readString(AtomicFile.backupOf(target)));
        assertEquals(List.of("shortlist.csv", "shortlist.csv.bak"), entries(), "no temporary file is left behind");
    }

    /**
     * Content that fails part way, after more than one buffer has reached the temporary file, with a
     * checked exception, an unchecked one and an error: each comes back to the caller as it was
     * thrown, the old file and its backup stay byte for byte, and the temporary file is gone.
     */
    @Test
    void failingContentLeavesTheOldFileByteIdenticalAndNoTemporary() throws IOException {
        Path target = folder.resolve("motors.yaml");
        byte[] old = bytes("motors:\n  - id: old-motor # comment kept\n");
        AtomicFile.write(target, bytes("older"));
        AtomicFile.write(target, old);
        List<Throwable> failures = List.of(new IOException("disk full"), new IllegalStateException("bad row"),
                new Error("simulated"));
        for (Throwable failure : failures) {
            Throwable thrown = assertThrows(Throwable.class, () -> AtomicFile.write(target, out -> {
                out.write(new byte[200_000]); // past the buffer: part of it is already in the temporary file
                out.flush();
                throwUnchecked(failure);
            }));
            assertSame(failure, thrown);
            assertArrayEquals(old, Files.readAllBytes(target));
            assertEquals("older", Files.readString(AtomicFile.backupOf(target)));
            assertEquals(List.of("motors.yaml", "motors.yaml.bak"), entries(), "no temporary file is left behind");
        }
    }

    @SuppressWarnings("unchecked")
    private static <T extends Throwable> void throwUnchecked(Throwable failure) throws T {
        throw (T) failure;
    }

    private List<String> entries() throws IOException {
        try (Stream<Path> list = Files.list(folder)) {
            return list.map(p -> p.getFileName().toString()).sorted().collect(Collectors.toList());
        }
    }

    private static byte[] bytes(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }
}
