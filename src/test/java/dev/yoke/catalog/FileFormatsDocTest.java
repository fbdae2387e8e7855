package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** docs/file-formats.md shows exactly the keys, units, defaults and ranges the loader applies. */
class FileFormatsDocTest {

    @Test
    void documentedKeyTablesMatchTheLoadersTable() throws Exception {
        String doc = Files.readString(Path.of("docs", "file-formats.md"), StandardCharsets.UTF_8);
        String start = "<!-- generated: key tables -->\n";
        String end = "<!-- end of generated tables -->";
        String between = doc.substring(doc.indexOf(start) + start.length(), doc.indexOf(end));
        String expected = FormatReference.allTables();
        if (!expected.equals(between)) {
            Files.createDirectories(Path.of("target"));
            Files.writeString(Path.of("target", "file-formats-tables.md"), expected, StandardCharsets.UTF_8);
        }
        assertEquals(expected, between, "regenerate the tables: see target/file-formats-tables.md");
    }

    @Test
    void documentedExampleCatalogLoadsCleanly(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        String doc = Files.readString(Path.of("docs", "file-formats.md"), StandardCharsets.UTF_8);
        int from = doc.indexOf("```yaml\n") + "```yaml\n".length();
        String example = doc.substring(from, doc.indexOf("```", from));
        Path file = Files.writeString(dir.resolve("example.yaml"), example, StandardCharsets.UTF_8);
        LoadedCatalog loaded = CatalogLoader.loadFiles(java.util.List.of(file));
        assertEquals(1, loaded.catalog().motors().size());
        assertEquals(1, loaded.catalog().switches().size());
        assertEquals(java.util.List.of(), loaded.warnings());
    }
}
