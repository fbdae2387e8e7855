package dev.yoke.physics;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Runs the ngspice circuit simulator (Debian package {@code ngspice}) in batch mode on a netlist and reads
 * back its {@code .meas} results. Skips the calling test when ngspice is missing, unless the environment
 * sets {@code YOKE_REQUIRE_REFERENCES=1} (CI), where a missing simulator fails. Public for the engine's
 * reference tests (test sources only).
 */
public final class Ngspice {

    private static final Pattern MEASURE = Pattern.compile("^\\s*(\\w+)\\s*=\\s*([-+0-9.eE]+)");

    private Ngspice() {
    }

    /** Skips (or, when references are required, fails) when ngspice is not on the PATH. */
    public static void requireInstalled() {
        boolean found = false;
        String path = System.getenv("PATH");
        if (path != null) {
            for (String dir : path.split(File.pathSeparator)) {
                if (Files.isExecutable(Path.of(dir, "ngspice"))) {
                    found = true;
                }
            }
        }
        if (!found && "1".equals(System.getenv("YOKE_REQUIRE_REFERENCES"))) {
            fail("ngspice is required (YOKE_REQUIRE_REFERENCES=1) but is not on the PATH");
        }
        assumeTrue(found, "ngspice not on the PATH: reference simulation skipped");
    }

    /** Simulates a netlist in a fresh temporary folder; returns every measurement by lower-case name. */
    public static Map<String, Double> measure(String netlist) {
        try {
            Path dir = Files.createTempDirectory("yoke-ngspice");
            try {
                Path cir = dir.resolve("circuit.cir");
                Files.writeString(cir, netlist, StandardCharsets.US_ASCII);
                Path out = dir.resolve("out.txt");
                Process p = new ProcessBuilder("ngspice", "-b", cir.toString())
                        .directory(dir.toFile())
                        .redirectErrorStream(true)
                        .redirectOutput(out.toFile())
                        .start();
                if (!p.waitFor(120, TimeUnit.SECONDS)) {
                    p.destroyForcibly();
                    throw new AssertionError("ngspice timed out");
                }
                Map<String, Double> result = new HashMap<>();
                for (String line : Files.readAllLines(out, StandardCharsets.ISO_8859_1)) {
                    Matcher m = MEASURE.matcher(line);
                    if (m.find()) {
                        try {
                            result.put(m.group(1).toLowerCase(), Double.parseDouble(m.group(2)));
                        } catch (NumberFormatException ignored) {
                            // not a measurement line
                        }
                    }
                }
                if (result.isEmpty()) {
                    throw new AssertionError("ngspice gave no measurements:\n" + Files.readString(out,
                            StandardCharsets.ISO_8859_1));
                }
                return result;
            } finally {
                try (var files = Files.list(dir)) {
                    for (Path f : (Iterable<Path>) files::iterator) {
                        Files.deleteIfExists(f);
                    }
                }
                Files.deleteIfExists(dir);
            }
        } catch (IOException e) {
            throw new AssertionError("could not run ngspice", e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted", e);
        }
    }
}
