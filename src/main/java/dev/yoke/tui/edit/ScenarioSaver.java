package dev.yoke.tui.edit;

import dev.yoke.model.Scenario;

import java.io.IOException;
import java.nio.file.Path;

/** Writes a scenario file: atomically, keeping the previous file as a backup. */
@FunctionalInterface
public interface ScenarioSaver {

    /** @throws IOException when the file cannot be written; the old file is then unchanged */
    void save(Scenario scenario, Path file) throws IOException;
}
