package dev.yoke.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.yoke.app.Main;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code yoke check}: summary and exit 0 for good files, every error and exit 2 for bad ones. */
class CheckCommandTest {

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return Main.run(new PrintWriter(out), new PrintWriter(err), args);
    }

    @Test
    void bundledCatalogAndDemosPassWithACountOfPairings() {
        int status = run("check", "--catalog", "catalog", "demo-data/rover-wheel.yaml");
        assertEquals(0, status, err.toString());
        assertTrue(out.toString().contains("14 motors, 17 switches"), out.toString());
        // 14 motors × 17 switches × 3 frequencies × 4 ratios
        assertTrue(out.toString().contains("2856 pairings"), out.toString());
    }

    @Test
    void brokenScenarioExitsTwoWithLocatedErrorsAndNoStackTrace(@TempDir Path dir) throws Exception {
        Path bad = Files.writeString(dir.resolve("bad.yaml"), """
                name: x
                bench:
                  bus_voltage: 24 mH
                profile: 3
                """);
        int status = run("check", "--catalog", "catalog", bad.toString());
        assertEquals(YokeCommand.BAD_INPUT, status);
        String text = err.toString();
        assertTrue(text.contains(bad + ":3:16: bus_voltage: expected volts (V), got '24 mH' (an inductance)"), text);
        assertTrue(text.contains(bad + ":4:10: profile: expected a section"), text);
        assertTrue(text.contains(bad + ":3:3: pwm_frequencies: missing"), text);
        assertFalse(text.contains("Exception"), text);
        assertFalse(text.contains("\tat "), text);
    }

    @Test
    void binaryGarbageExitsTwoWithoutStackTrace(@TempDir Path dir) throws Exception {
        Files.write(dir.resolve("junk.yaml"), new byte[] {(byte) 0xff, 0, 1, 2, (byte) 0x80, 10, 13});
        int status = run("check", "--catalog", dir.toString());
        assertEquals(YokeCommand.BAD_INPUT, status);
        assertTrue(err.toString().contains("junk.yaml:1:1: invalid UTF-8"), err.toString());
        assertFalse(err.toString().contains("Exception"), err.toString());
    }
}
