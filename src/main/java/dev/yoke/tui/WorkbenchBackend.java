package dev.yoke.tui;

import dev.yoke.engine.PairingResult;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.io.IOException;
import java.nio.file.Path;

/**
 * The calculation and file work the workbench calls: ranking, explaining one pairing and writing
 * a view to CSV. The screens know only this, so they are tested with a small fake and run with the
 * real engine.
 */
public interface WorkbenchBackend {

    /** Evaluates every pairing; called on a background thread, may be cancelled through {@code progress}. */
    PairingTable rank(Scenario scenario, Catalog catalog, RankProgress progress) throws Exception;

    /** Everything about one pairing, for the detail screen. */
    PairingResult explain(Scenario scenario, Catalog catalog, int motor, int powerSwitch, int frequency, int ratio);

    /** Writes the rows of {@code order} (table rows, in view order) to a CSV file. */
    void writeCsv(Path file, PairingTable table, ShortlistContext context, int[] order) throws IOException;
}
