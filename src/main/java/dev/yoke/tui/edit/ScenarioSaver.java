package dev.yoke.tui.edit;

import dev.yoke.catalog.ChangedOnDiskException;
import dev.yoke.model.Scenario;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Optional;

/** Writes a scenario file: atomically, keeping the previous file as a backup. */
public interface ScenarioSaver {

    /**
     * Writes the file unless someone else changed it since it was read.
     *
     * @return why the file's body was written anew rather than edited in place (its comments then
     *         survive only in the backup), or empty when nothing of the user's text was dropped
     * @throws ChangedOnDiskException the file changed meanwhile; nothing was written
     * @throws IOException            the file cannot be written; the old file is then unchanged
     */
    Optional<String> save(Scenario scenario, Path file) throws IOException, ChangedOnDiskException;

    /** Writes the file even if it changed meanwhile (that version becomes the backup); returns as {@link #save} does. */
    Optional<String> overwrite(Scenario scenario, Path file) throws IOException;
}
