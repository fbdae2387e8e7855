package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills a process in the middle of saving, many times, and checks that the file is always whole.
 *
 * <p>A child JVM ({@link AtomicWriteLoop}) saves two valid catalog files alternately in a loop; the
 * test kills it with SIGKILL ({@link Process#destroyForcibly()}) after a random delay of a few
 * milliseconds. After each kill the target must be byte-for-byte the old or the new version, and
 * so must the backup, and the folder must load through the catalog loader (which skips the backup
 * and the hidden temporary files a kill leaves behind). The number of kills is {@code -Dyoke.kills=N} (default 100).
 *
 * <p>The two lanes save through the two entry points: lane 0 hands each version over as a byte
 * array, lane 1 streams it in small flushed pieces (as the CSV export streams its rows), so half the
 * kills land while the temporary file is only partly written.
 */
class AtomicFileKillTest {

    private static final int KILLS = Integer.getInteger("yoke.kills", 100);
    /** Two children at a time: the build machines have at least two cores. */
    private static final int LANES = 2;

    @TempDir
    Path folder;

    @Test
    void savedFileIsAlwaysOldOrNewVersionAfterKill() throws Exception {
        // Two valid catalog files of different lengths (about 1.3 kB and 40 kB).
        byte[] versionA = CatalogTexts.motorsVersionA().getBytes(StandardCharsets.UTF_8);
        byte[] versionB = CatalogTexts.motorsVersionB(60).getBytes(StandardCharsets.UTF_8);
        Path fileA = Files.write(folder.resolve("version-a.txt"), versionA);
        Path fileB = Files.write(folder.resolve("version-b.txt"), versionB);

        List<Lane> lanes = new ArrayList<>();
        for (int lane = 0; lane < LANES; lane++) {
            Path catalog = Files.createDirectories(folder.resolve("catalog-" + lane));
            lanes.add(new Lane(catalog.resolve("motors.yaml"), fileA, fileB, lane == 1, new Random(42L + lane)));
        }
        // kills, found A, found B, kills that left a temporary file behind, kills of the streaming lane, of which mid-save
        int[] counts = new int[6];
        for (int round = 0; round * LANES < KILLS; round++) {
            List<Process> running = new ArrayList<>();
            for (Lane lane : lanes) {
                running.add(lane.start());
            }
            for (int i = 0; i < LANES; i++) {
                Lane lane = lanes.get(i);
                lane.killAfterRandomDelay(running.get(i));
                byte[] found = Files.readAllBytes(lane.target);
                boolean isA = Arrays.equals(found, versionA);
                boolean isB = Arrays.equals(found, versionB);
                assertTrue(isA || isB, "after kill " + counts[0] + " the file is neither version ("
                        + found.length + " bytes)");
                // The folder (file, backup and any leftover temporary files) still loads as a catalog.
                CatalogTexts.assertLoads(lane.target.getParent());
                Path backup = AtomicFile.backupOf(lane.target);
                if (Files.exists(backup)) {
                    byte[] kept = Files.readAllBytes(backup);
                    assertTrue(Arrays.equals(kept, versionA) || Arrays.equals(kept, versionB),
                            "after kill " + counts[0] + " the backup is neither version");
                }
                counts[0]++;
                counts[isA ? 1 : 2]++;
                int midSave = lane.newTemps();
                counts[3] += midSave;
                counts[4] += lane.streamed ? 1 : 0;
                counts[5] += lane.streamed ? midSave : 0;
            }
        }
        System.out.printf("atomic save: %d kills survived (%d of them streaming; file found as old version %d times,"
                + " new %d times, %d kills landed mid-save and left a temporary file, %d of them streaming)%n",
                counts[0], counts[4], counts[1], counts[2], counts[3], counts[5]);
        assertEquals(0, counts[0] % LANES);
        assertTrue(counts[0] >= KILLS);
    }

    /** One folder saved by a succession of children. */
    private static final class Lane {
        final Path target;
        final Path fileA;
        final Path fileB;
        final boolean streamed;
        final Random random;
        int tempsSeen;

        Lane(Path target, Path fileA, Path fileB, boolean streamed, Random random) {
            this.target = target;
            this.fileA = fileA;
            this.fileB = fileB;
            this.streamed = streamed;
            this.random = random;
        }

        Process start() throws IOException {
            String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
            ProcessBuilder builder = new ProcessBuilder(java, "-Xshare:auto", "-XX:TieredStopAtLevel=1", "-XX:-UsePerfData",
                    "-XX:+UseSerialGC", "-Dyoke.plainWrite=" + Boolean.getBoolean("yoke.plainWrite"), "-cp", System.getProperty("java.class.path"),
                    AtomicWriteLoop.class.getName(), target.toString(), fileA.toString(), fileB.toString(),
                    streamed ? "stream" : "bytes");
            builder.redirectErrorStream(true);
            return builder.start();
        }

        void killAfterRandomDelay(Process child) throws Exception {
            try (BufferedReader out = new BufferedReader(
                    new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
                String line = out.readLine();
                if (!"ready".equals(line)) {
                    child.destroyForcibly();
                    fail("child did not start: " + line);
                }
                // A save here takes a few milliseconds (three forced writes and two renames), so a
                // delay spread over 0-20 ms lands at every stage of it.
                Thread.sleep(random.nextInt(20));
                child.destroyForcibly();
                if (!child.waitFor(10, TimeUnit.SECONDS)) {
                    fail("child survived SIGKILL");
                }
            }
        }

        int newTemps() throws IOException {
            try (Stream<Path> entries = Files.list(target.getParent())) {
                int temps = (int) entries.filter(p -> p.getFileName().toString().endsWith(AtomicFile.TEMP_SUFFIX)).count();
                int added = temps - tempsSeen;
                tempsSeen = temps;
                return added > 0 ? 1 : 0;
            }
        }
    }
}
