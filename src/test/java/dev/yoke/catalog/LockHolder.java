package dev.yoke.catalog;

import java.nio.file.Path;
import java.time.Duration;

/** Child process for the lock tests: takes a catalog folder's lock, says {@code locked}, and holds it until killed. */
public final class LockHolder {

    private LockHolder() {
    }

    public static void main(String[] args) throws Exception {
        try (CatalogLock lock = CatalogLock.acquire(Path.of(args[0]), Duration.ofSeconds(10))) {
            System.out.println("locked");
            System.out.flush();
            Thread.sleep(60_000);
        }
    }

    /** Starts a child JVM holding the lock of {@code folder}; returns once it holds it. */
    static Process start(Path folder) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-XX:TieredStopAtLevel=1", "-XX:-UsePerfData", "-cp",
                System.getProperty("java.class.path"), LockHolder.class.getName(), folder.toString())
                .redirectErrorStream(true).start();
        String line = new java.io.BufferedReader(new java.io.InputStreamReader(child.getInputStream())).readLine();
        if (!"locked".equals(line)) {
            child.destroyForcibly();
            throw new IllegalStateException("lock holder did not start: " + line);
        }
        return child;
    }
}
