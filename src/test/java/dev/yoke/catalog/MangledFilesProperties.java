package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.lifecycle.AfterTry;
import net.jqwik.api.lifecycle.BeforeTry;

/**
 * Law: whatever a file holds, the loaders either return a catalog or throw {@link InputException}
 * whose problems all carry a message and a sane position; no other exception escapes.
 */
class MangledFilesProperties {

    private static final String YAML_NOISE = ":-[]{}&*!|>'\"%@`#,? \t\n\r\u00a0\u00e9\u20ac\ufeff";

    private Path dir;

    @BeforeTry
    void makeDir() throws Exception {
        dir = Files.createTempDirectory("yoke-mangled");
    }

    @AfterTry
    void removeDir() throws Exception {
        try (var files = Files.list(dir)) {
            for (Path p : files.toList()) {
                Files.delete(p);
            }
        }
        Files.delete(dir);
    }

    @Provide
    Arbitrary<String> mangledCatalogs() {
        String base = LoaderEdgeCasesTest.MOTOR + LoaderEdgeCasesTest.SWITCH;
        return Arbitraries.integers().between(0, base.length() - 1).list().ofMinSize(1).ofMaxSize(6)
                .flatMap(positions -> Arbitraries.of(YAML_NOISE.chars().mapToObj(c -> (char) c).toList())
                        .list().ofSize(positions.size())
                        .map(noise -> {
                            StringBuilder b = new StringBuilder(base);
                            for (int i = 0; i < positions.size(); i++) {
                                int at = Math.min(positions.get(i), b.length() - 1);
                                if (i % 2 == 0) {
                                    b.setCharAt(at, noise.get(i));
                                } else {
                                    b.insert(at, noise.get(i));
                                }
                            }
                            return b.toString();
                        }));
    }

    @Property(tries = 150)
    void mangledCatalogIsLoadedOrRefusedWithLocatedProblems(@ForAll("mangledCatalogs") String text)
            throws Exception {
        Path file = Files.writeString(dir.resolve("c.yaml"), text, StandardCharsets.UTF_8);
        long lines = text.lines().count() + 1;
        try {
            CatalogLoader.loadFiles(List.of(file));
        } catch (InputException e) {
            for (Problem p : e.problems()) {
                assertFalse(p.message().isBlank(), p.toString());
                assertTrue(p.line() >= 0 && p.line() <= lines + 1, p.toString());
                assertFalse(p.message().contains("Exception"), p.toString());
            }
        }
        try {
            ScenarioLoader.load(file);
        } catch (InputException e) {
            assertFalse(e.problems().isEmpty());
        }
    }

    @Property(tries = 80)
    void randomBytesAreRefusedCleanly(@ForAll byte[] bytes) throws Exception {
        Path file = Files.write(dir.resolve("b.yaml"), bytes);
        try {
            CatalogLoader.loadFiles(List.of(file));
        } catch (InputException e) {
            assertFalse(e.problems().isEmpty());
        }
    }
}
