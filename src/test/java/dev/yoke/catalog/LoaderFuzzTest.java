package dev.yoke.catalog;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicLong;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.ShrinkingMode;
import net.jqwik.api.lifecycle.AfterContainer;

/**
 * Feeds generated documents ({@link FuzzDocuments}) to the catalog and scenario loaders and to the
 * store's text editor: the only way out is success or the project's own {@link InputException}
 * (for the editor: an {@link IOException}); no other exception, no error, and no document may take
 * longer than {@value #SECONDS_PER_DOCUMENT} s. 5,000 documents per loader, 10,000 in all.
 * A failing document is saved under {@code target/fuzz-failures/} for replay.
 */
class LoaderFuzzTest {

    private static final int SECONDS_PER_DOCUMENT = 10;
    private static final List<String> SEEDS = FuzzDocuments.seeds(builtInSeeds());
    private static final ExecutorService WORKER = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(null, r, "fuzz-loader", 16L << 20);
        t.setDaemon(true);
        return t;
    });
    private static final AtomicLong DOCUMENTS = new AtomicLong();
    private static final AtomicLong ACCEPTED = new AtomicLong();
    private static final AtomicLong REFUSED = new AtomicLong();
    private static final AtomicLong SLOWEST_NANOS = new AtomicLong();
    private static final Path FOLDER = temporaryFolder();

    @Provide
    Arbitrary<byte[]> documents() {
        return Arbitraries.randomValue(random -> FuzzDocuments.document(random, SEEDS));
    }

    @Property(tries = 5000, shrinking = ShrinkingMode.OFF)
    void catalogLoaderOnlyEverRefusesWithInputException(@ForAll("documents") byte[] document) throws Exception {
        Path catalog = FOLDER.resolve("catalog");
        Files.write(catalog.resolve("fuzz.yaml"), document);
        bounded(document, () -> {
            try {
                CatalogLoader.load(catalog);
                ACCEPTED.incrementAndGet();
            } catch (InputException e) {
                REFUSED.incrementAndGet();
                checkProblems(e);
            }
            try {
                CatalogText.parse(new String(document, StandardCharsets.UTF_8)).keysOf("motors", "x");
            } catch (IOException e) {
                // the editor refuses what it cannot parse, with a message: fine
            }
            return null;
        });
    }

    @Property(tries = 5000, shrinking = ShrinkingMode.OFF)
    void scenarioLoaderOnlyEverRefusesWithInputException(@ForAll("documents") byte[] document) throws Exception {
        Path file = FOLDER.resolve("scenario.yaml");
        Files.write(file, document);
        bounded(document, () -> {
            try {
                ScenarioLoader.load(file);
                ACCEPTED.incrementAndGet();
            } catch (InputException e) {
                REFUSED.incrementAndGet();
                checkProblems(e);
            }
            return null;
        });
    }

    @AfterContainer
    static void report() {
        System.out.printf("loader fuzz: %d documents (%d accepted, %d refused with InputException), slowest %.0f ms%n",
                DOCUMENTS.get(), ACCEPTED.get(), REFUSED.get(), SLOWEST_NANOS.get() / 1e6);
    }

    /** Every problem names its file, so the user can find it. */
    private static void checkProblems(InputException e) {
        for (Problem p : e.problems()) {
            if (p.file() == null || p.message() == null || p.message().isBlank()) {
                throw new AssertionError("problem without file or message: " + p);
            }
        }
    }

    private static void bounded(byte[] document, java.util.concurrent.Callable<Void> load) throws Exception {
        DOCUMENTS.incrementAndGet();
        long start = System.nanoTime();
        Future<Void> result = WORKER.submit(load);
        try {
            result.get(SECONDS_PER_DOCUMENT, TimeUnit.SECONDS);
        } catch (TimeoutException e) {
            result.cancel(true);
            fail("no answer within " + SECONDS_PER_DOCUMENT + " s; document saved as " + keep(document));
        } catch (ExecutionException e) {
            StringWriter trace = new StringWriter();
            e.getCause().printStackTrace(new PrintWriter(trace));
            fail("escaped " + e.getCause() + "; document saved as " + keep(document) + "\n" + trace);
        }
        SLOWEST_NANOS.accumulateAndGet(System.nanoTime() - start, Math::max);
    }

    private static Path keep(byte[] document) {
        try {
            Path folder = Files.createDirectories(Path.of("target", "fuzz-failures"));
            Path file = folder.resolve(Integer.toHexString(java.util.Arrays.hashCode(document)) + ".yaml");
            Files.write(file, document);
            return file.toAbsolutePath();
        } catch (IOException e) {
            return Path.of("(could not save: " + e.getMessage() + ")");
        }
    }

    private static List<String> builtInSeeds() {
        List<String> seeds = new ArrayList<>();
        for (String name : List.of("motors.yaml", "switches.yaml", "scenario.yaml")) {
            try (InputStream in = LoaderFuzzTest.class.getResourceAsStream("/store/" + name)) {
                seeds.add(new String(in.readAllBytes(), StandardCharsets.UTF_8));
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }
        return seeds;
    }

    private static Path temporaryFolder() {
        try {
            Path folder = Files.createTempDirectory("yoke-fuzz");
            Files.createDirectories(folder.resolve("catalog"));
            folder.toFile().deleteOnExit();
            return folder;
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
