package dev.yoke.tui.edit;

import dev.yoke.catalog.CatalogFile;
import dev.yoke.catalog.ChangedOnDiskException;
import dev.yoke.catalog.InputException;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.catalog.SavedScenario;
import dev.yoke.catalog.ScenarioStore;
import dev.yoke.model.Scenario;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Saves scenario files through the catalog package's {@link ScenarioStore}: atomic, the previous
 * version kept as {@code NAME.bak}, the file edited in place so that the user's comments and layout
 * survive, the written file loaded back and compared. It remembers the version it last read or wrote, so a file changed by someone else
 * in between is reported rather than overwritten.
 */
final class ScenarioFiles implements ScenarioSaver {

    private CatalogFile known;

    /** A saver that takes the file as it is on disk now as the version the user started from. */
    static ScenarioFiles startingFromDisk(Path file) {
        ScenarioFiles saver = new ScenarioFiles();
        if (Files.isRegularFile(file)) {
            try {
                saver.known = ScenarioLoader.load(file).file();
            } catch (InputException e) {
                saver.known = null; // a broken file: the first save replaces it (keeping it as .bak)
            }
        }
        return saver;
    }

    @Override
    public Optional<String> save(Scenario scenario, Path file) throws IOException, ChangedOnDiskException {
        try {
            SavedScenario written = known == null ? ScenarioStore.save(scenario, file)
                    : ScenarioStore.save(scenario, file, known);
            known = written.file();
            return written.bodyRewritten();
        } catch (InputException e) {
            throw new IOException(CatalogPartStore.describe(e), e);
        }
    }

    @Override
    public Optional<String> overwrite(Scenario scenario, Path file) throws IOException {
        try {
            SavedScenario written = ScenarioStore.save(scenario, file);
            known = written.file();
            return written.bodyRewritten();
        } catch (InputException e) {
            throw new IOException(CatalogPartStore.describe(e), e);
        }
    }
}
