package dev.yoke.catalog;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.file.Path;

/** Catalog texts for the saving tests, and a check that a saved file still loads. */
final class CatalogTexts {

    private CatalogTexts() {
    }

    /** A catalog text with {@code motors} invented motors whose ids start with {@code prefix}. */
    static String catalog(int motors, String prefix) {
        StringBuilder text = new StringBuilder("# Invented parts for tests.\nmotors:\n");
        for (int i = 0; i < motors; i++) {
            text.append("  - id: ").append(prefix).append("-motor-").append(i).append('\n')
                .append("    label: test motor ").append(i).append('\n')
                .append("    resistance: ").append(1 + i % 7).append(".2 ohm\n");
        }
        return text.toString();
    }

    /** Fails when the file is not a whole YAML document. */
    static void assertParses(Path file) throws IOException {
        JsonNode root = new ObjectMapper(new YAMLFactory()).readTree(file.toFile());
        if (root == null || !root.has("motors")) {
            throw new AssertionError(file + " lost its motors");
        }
    }
}
