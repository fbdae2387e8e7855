package dev.yoke.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** Two valid versions of a catalog file for the saving tests, and a check that a folder still loads. */
final class CatalogTexts {

    private CatalogTexts() {
    }

    /** The test catalog's motor file, as shipped in the test resources. */
    static String motorsVersionA() throws IOException {
        try (InputStream in = CatalogTexts.class.getResourceAsStream("/store/motors.yaml")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    /**
     * Version A with {@code extra} more motors appended (copies of the first under new ids), so the
     * two versions differ in length and a torn write could not pass for either.
     */
    static String motorsVersionB(int extra) throws IOException {
        String a = motorsVersionA();
        int start = a.indexOf("  - id: test-m-small");
        int end = a.indexOf("  - id: test-m-fast");
        String block = a.substring(start, end).stripTrailing() + "\n";
        StringBuilder b = new StringBuilder(a);
        for (int i = 0; i < extra; i++) {
            b.append(block.replace("test-m-small", "test-m-extra-" + i));
        }
        return b.toString();
    }

    /** Fails unless the catalog loader accepts {@code folder} as it is on disk. */
    static void assertLoads(Path folder) {
        try {
            CatalogLoader.load(folder);
        } catch (InputException e) {
            throw new AssertionError("the saved catalog no longer loads:\n" + e.getMessage(), e);
        }
    }
}
