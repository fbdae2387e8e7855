package dev.yoke.catalog;

import dev.yoke.engine.SyntheticParts;
import dev.yoke.model.Catalog;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/**
 * Scale harness, run by hand (not a unit test: timings belong in a harness): writes a generated
 * catalog as YAML files and times loading it.
 *
 * <pre>
 * mvn -q -DskipTests package &amp;&amp; mvn -q test-compile
 * java -cp target/yoke.jar:target/test-classes dev.yoke.catalog.CatalogScaleBench write /tmp/big 5000 10000
 * java -cp target/yoke.jar:target/test-classes dev.yoke.catalog.CatalogScaleBench load /tmp/big 5
 * </pre>
 * {@code write} splits the parts into files of {@value #PARTS_PER_FILE} (as a user would keep
 * them, and well under the loader's 8 MB file cap). {@code load} times the first load of a fresh
 * JVM (what {@code yoke} does on every start) and then repeated loads, with the CPU time of the
 * whole JVM (loader threads, compiler, collector) beside the wall time: on a busy machine the wall
 * time mostly measures the wait.
 */
public final class CatalogScaleBench {

    static final int PARTS_PER_FILE = 2500;

    private CatalogScaleBench() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args[1]);
        switch (args[0]) {
            case "write" -> {
                int motors = args.length > 2 ? Integer.parseInt(args[2]) : 5000;
                int switches = args.length > 3 ? Integer.parseInt(args[3]) : 10000;
                long start = System.nanoTime();
                long bytes = write(SyntheticParts.catalog(motors, switches, 20261201L), folder);
                System.out.printf(Locale.ROOT, "wrote %d motors and %d switches, %.1f MB in %s, %.0f ms%n",
                        motors, switches, bytes / 1048576.0, folder, (System.nanoTime() - start) / 1e6);
            }
            case "load" -> {
                int repeats = args.length > 2 ? Integer.parseInt(args[2]) : 5;
                for (int i = 0; i <= repeats; i++) {
                    long start = System.nanoTime();
                    long cpuStart = processCpuNanos();
                    LoadedCatalog loaded = CatalogLoader.load(folder);
                    double ms = (System.nanoTime() - start) / 1e6;
                    double cpuMs = (processCpuNanos() - cpuStart) / 1e6;
                    System.out.printf(Locale.ROOT, "%s load: %d motors, %d switches from %d files in %.0f ms"
                            + " (%.0f ms of CPU, all threads of the JVM; load average %.1f)%n",
                            i == 0 ? "first" : "again", loaded.catalog().motors().size(),
                            loaded.catalog().switches().size(), loaded.files().size(), ms, cpuMs,
                            java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
                }
            }
            default -> throw new IllegalArgumentException("write DIR [motors switches] | load DIR [repeats]");
        }
    }

    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean)
                java.lang.management.ManagementFactory.getOperatingSystemMXBean()).getProcessCpuTime();
    }

    /** Writes {@code catalog} into {@code folder} as numbered files; returns the bytes written. */
    static long write(Catalog catalog, Path folder) throws IOException {
        Files.createDirectories(folder);
        String header = "# Generated parts for scale tests: invented, not real products.\n";
        long bytes = 0;
        List<Motor> motors = catalog.motors();
        for (int from = 0, n = 1; from < motors.size(); from += PARTS_PER_FILE, n++) {
            String text = PartText.MOTOR.renderFile(header, motors.subList(from, Math.min(motors.size(), from + PARTS_PER_FILE)));
            bytes += save(folder.resolve(String.format(Locale.ROOT, "motors-%02d.yaml", n)), text);
        }
        List<PowerSwitch> switches = catalog.switches();
        for (int from = 0, n = 1; from < switches.size(); from += PARTS_PER_FILE, n++) {
            String text = PartText.SWITCH.renderFile(header, switches.subList(from, Math.min(switches.size(), from + PARTS_PER_FILE)));
            bytes += save(folder.resolve(String.format(Locale.ROOT, "switches-%02d.yaml", n)), text);
        }
        return bytes;
    }

    private static long save(Path file, String text) throws IOException {
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        AtomicFile.write(file, bytes);
        return bytes.length;
    }
}
