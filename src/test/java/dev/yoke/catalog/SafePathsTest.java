package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class SafePathsTest {

    @TempDir
    Path root;

    Path folder;
    Path outside;

    @BeforeEach
    void folders() throws IOException {
        folder = Files.createDirectories(root.resolve("chosen"));
        outside = Files.createDirectories(root.resolve("elsewhere"));
        Files.createDirectories(folder.resolve("sub"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"export.csv", "sub/export.csv", "sub\\export.csv", "new motors.yaml", "./a.yaml",
            "report-ü.csv"})
    void plainNamesStayInside(String name) throws IOException {
        Path resolved = SafePaths.resolveInside(folder, name);
        assertTrue(resolved.startsWith(folder), resolved.toString());
        assertTrue(resolved.isAbsolute());
    }

    @Test
    void nameResolvesUnderTheFolder() throws IOException {
        assertEquals(folder.toAbsolutePath().resolve("sub").resolve("x.csv"), SafePaths.resolveInside(folder, "sub/x.csv"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "  ", "../x.csv", "sub/../../x.csv", "..", "/etc/passwd", "\\\\server\\share\\x",
            "C:\\temp\\x.csv", "c:x.csv", "~/x.csv", "a\u0000b", "line\nbreak.csv", ".yoke.lock", "sub/.hidden",
            "sub/..", ".", "sub/."})
    void escapingOrOddNamesAreRefused(String name) {
        assertThrows(UnsafePathException.class, () -> SafePaths.resolveInside(folder, name));
    }

    @Test
    void symbolicLinkFolderLeadingOutIsRefused() throws IOException {
        Files.createSymbolicLink(folder.resolve("out"), outside);
        UnsafePathException e = assertThrows(UnsafePathException.class,
                () -> SafePaths.resolveInside(folder, "out/x.csv"));
        assertTrue(e.getMessage().contains("symbolic link"), e.getMessage());
    }

    @Test
    void symbolicLinkFileLeadingOutIsRefused() throws IOException {
        Files.writeString(outside.resolve("victim.txt"), "keep");
        Files.createSymbolicLink(folder.resolve("x.csv"), outside.resolve("victim.txt"));
        assertThrows(UnsafePathException.class, () -> SafePaths.resolveInside(folder, "x.csv"));
    }

    @Test
    void danglingLinkIsRefused() throws IOException {
        Files.createSymbolicLink(folder.resolve("x.csv"), outside.resolve("not-yet"));
        assertThrows(UnsafePathException.class, () -> SafePaths.resolveInside(folder, "x.csv"));
    }

    @Test
    void symbolicLinkStayingInsideIsAllowed() throws IOException {
        Files.createSymbolicLink(folder.resolve("alias"), folder.resolve("sub"));
        assertTrue(SafePaths.resolveInside(folder, "alias/x.csv").startsWith(folder));
    }

    @Test
    void chosenFolderReachedThroughALinkStillWorks() throws IOException {
        Path link = Files.createSymbolicLink(root.resolve("link-to-chosen"), folder);
        assertEquals(link.toAbsolutePath().resolve("x.csv"), SafePaths.resolveInside(link, "x.csv"));
    }
}
