package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every file of the broken corpus is refused with an {@link InputException} (nothing else escapes)
 * holding an error that names the file, the line and the field, with the expected message.
 * The corpus index is {@code broken/expected.csv}.
 */
class BrokenFilesTest {

    static Path dir() throws URISyntaxException {
        return Path.of(BrokenFilesTest.class.getResource("/broken/expected.csv").toURI()).getParent();
    }

    static Stream<Arguments> corpus() throws IOException, URISyntaxException {
        List<String> lines = Files.readAllLines(dir().resolve("expected.csv"), StandardCharsets.UTF_8);
        return lines.stream().filter(l -> !l.isBlank() && !l.startsWith("#")).map(l -> {
            String[] f = l.split("\\|", -1);
            return Arguments.of(f[0], f[1], Integer.parseInt(f[2]), f[3], f[4]);
        });
    }

    @ParameterizedTest(name = "{1}")
    @MethodSource("corpus")
    void brokenFileIsRefusedWithItsLineFieldAndMessage(String kind, String files, int line, String field,
            String fragment) throws URISyntaxException {
        Path base = dir();
        List<Path> paths = Arrays.stream(files.split("\\+")).map(base::resolve).toList();
        Path blamed = paths.get(paths.size() - 1);
        InputException e = assertThrows(InputException.class, () -> {
            if (kind.equals("catalog")) {
                CatalogLoader.loadFiles(paths);
            } else {
                ScenarioLoader.load(blamed);
            }
        });
        String all = e.problems().stream().map(Problem::toString).collect(Collectors.joining("\n"));
        boolean found = e.errors().stream().anyMatch(p -> p.file().equals(blamed) && p.line() == line
                && p.field().equals(field) && p.message().contains(fragment));
        assertTrue(found, () -> "expected " + blamed.getFileName() + ":" + line + ": " + field + ": ..." + fragment
                + "\n got:\n" + all);
        assertAll(e.errors().stream().map(p -> () -> {
            assertTrue(p.toString().startsWith(p.file().toString()), "the file leads every message");
            assertTrue(p.line() == 0 || p.column() > 0, () -> "a line comes with its column: " + p);
        }));
    }
}
