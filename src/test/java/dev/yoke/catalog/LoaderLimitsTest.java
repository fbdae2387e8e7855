package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The loader's defences against hostile files: each refused with a located message, none expanded or parsed at length. */
class LoaderLimitsTest {

    @TempDir
    Path folder;

    @Test
    void veryLongLineIsRefusedBeforeParsing() throws IOException {
        Files.writeString(folder.resolve("long.yaml"), "motors:\n  - id: " + "a".repeat(3_000_000) + "\n");
        Problem p = onlyProblem();
        assertEquals(2, p.line());
        assertTrue(p.message().contains("characters long"), p.message());
    }

    @Test
    void aliasesAreRefusedSoNothingExpands() throws IOException {
        StringBuilder laughs = new StringBuilder("a0: &a0 [x, x, x, x, x, x, x, x, x]\n");
        for (int i = 1; i < 10; i++) {
            laughs.append("a").append(i).append(": &a").append(i).append(" [")
                    .append(String.join(", ", java.util.Collections.nCopies(9, "*a" + (i - 1)))).append("]\n");
        }
        Files.writeString(folder.resolve("laughs.yaml"), laughs + "motors: *a9\n");
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(folder));
        assertTrue(e.getMessage().contains("alias"), e.getMessage());
    }

    @Test
    void deepNestingIsRefused() throws IOException {
        Files.writeString(folder.resolve("deep.yaml"), "motors: " + "[".repeat(2000) + "]".repeat(2000) + "\n");
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(folder));
        Problem p = e.errors().get(0);
        assertEquals(1, p.line());
        assertTrue(p.message().contains("nested"), p.message());
    }

    @Test
    void oversizedFileIsRefusedWithoutParsing() throws IOException {
        Files.write(folder.resolve("huge.yaml"), new byte[YamlReader.MAX_FILE_BYTES + 1]);
        assertTrue(onlyProblem().message().contains("MB"));
    }

    private Problem onlyProblem() {
        InputException e = assertThrows(InputException.class, () -> CatalogLoader.load(folder));
        List<Problem> errors = e.errors();
        assertEquals(1, errors.size(), errors.toString());
        return errors.get(0);
    }
}
