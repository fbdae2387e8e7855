package dev.yoke.tui.edit;

import dev.yoke.model.Scenario;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/** A scenario saver that records what it was asked to write, or fails with a given error. */
final class RecordingSaver implements ScenarioSaver {

    private final List<Scenario> saved;
    private final IOException failure;

    RecordingSaver(List<Scenario> saved, IOException failure) {
        this.saved = saved;
        this.failure = failure;
    }

    @Override
    public Optional<String> save(Scenario scenario, Path file) throws IOException {
        return overwrite(scenario, file);
    }

    @Override
    public Optional<String> overwrite(Scenario scenario, Path file) throws IOException {
        if (failure != null) {
            throw failure;
        }
        saved.add(scenario);
        return Optional.empty();
    }
}
