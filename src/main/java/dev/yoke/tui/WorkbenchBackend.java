package dev.yoke.tui;

import dev.yoke.engine.Shortlist;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.io.IOException;
import java.nio.file.Path;

/**
 * The calculation and file work the workbench starts: ranking every pairing and writing a view
 * to CSV. {@link EngineBackend} does it with the engine and the report writer; tests wrap it to
 * hold a ranking back or to count runs.
 */
public interface WorkbenchBackend {

    /**
     * Evaluates every pairing; called on a background thread.
     *
     * @throws java.util.concurrent.CancellationException when {@code progress} says the user stopped it
     */
    Shortlist rank(Scenario scenario, Catalog catalog, RankProgress progress) throws Exception;

    /** Writes the rows of {@code order}, in that order, to a CSV file (atomically) with its sidecar. */
    void writeCsv(Path file, Shortlist shortlist, int[] order, ViewSettings view) throws IOException;
}
