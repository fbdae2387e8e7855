package dev.yoke.tui.edit;

import dev.yoke.catalog.ChangedOnDiskException;
import dev.yoke.model.Scenario;

import java.io.IOException;
import java.nio.file.Path;

/** Writes a scenario file: atomically, keeping the previous file as a backup. */
public interface ScenarioSaver {

    /**
     * Writes the file unless someone else changed it since it was read.
     *
     * @throws ChangedOnDiskException the file changed meanwhile; nothing was written
     * @throws IOException            the file cannot be written; the old file is then unchanged
     */
    void save(Scenario scenario, Path file) throws IOException, ChangedOnDiskException;

    /** Writes the file even if it changed meanwhile (that version becomes the backup). */
    void overwrite(Scenario scenario, Path file) throws IOException;
}
