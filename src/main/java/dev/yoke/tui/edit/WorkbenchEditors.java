package dev.yoke.tui.edit;

import dev.yoke.tui.EditorHooks;
import dev.yoke.tui.Workbench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Objects;

/**
 * Plugs the parts editor and the scenario editor into the workbench's edit keys: a saved part
 * hands the new catalog to {@link Workbench#catalogChanged}, a valid scenario edit goes to
 * {@link Workbench#scenarioChanged}; both rank again in the background.
 */
public final class WorkbenchEditors implements EditorHooks {

    /** Opens the parts store when first needed. */
    @FunctionalInterface
    interface StoreOpener {
        PartStore open() throws IOException;
    }

    private final StoreOpener opener;
    private final Path scenarioFile;
    private final ScenarioSaver scenarioSaver;
    private PartStore parts;

    private WorkbenchEditors(StoreOpener opener, Path scenarioFile, ScenarioSaver scenarioSaver) {
        this.opener = Objects.requireNonNull(opener, "opener");
        this.scenarioFile = Objects.requireNonNull(scenarioFile, "scenarioFile");
        this.scenarioSaver = Objects.requireNonNull(scenarioSaver, "scenarioSaver");
    }

    /**
     * @param parts         the catalog opened for editing
     * @param scenarioFile  where the scenario editor saves
     * @param scenarioSaver how it saves (atomic, with a backup)
     */
    public WorkbenchEditors(PartStore parts, Path scenarioFile, ScenarioSaver scenarioSaver) {
        this(() -> parts, scenarioFile, scenarioSaver);
    }

    /**
     * The editors for a catalog folder and a scenario file, as the workbench was started with.
     * The scenario file as it is now counts as the version being edited; the catalog folder is
     * opened for editing when the parts editor is first opened.
     */
    public static WorkbenchEditors forFiles(Path catalogFolder, Path scenarioFile) {
        return new WorkbenchEditors(() -> CatalogPartStore.open(catalogFolder), scenarioFile,
                ScenarioFiles.startingFromDisk(scenarioFile));
    }

    @Override
    public void openParts(Workbench workbench) {
        if (parts == null) {
            try {
                parts = opener.open();
            } catch (IOException e) {
                workbench.showMessage("cannot edit the catalog: " + e.getMessage());
                return;
            }
        }
        PartStore store = parts;
        PartsEditor.open(workbench.gui(), store,
                () -> workbench.catalogChanged(store.catalog(), store.doubtfulIds()))
                .useUnicode(workbench.traits().unicode());
    }

    @Override
    public void openBench(Workbench workbench) {
        ScenarioEditor.open(workbench.gui(), workbench.scenario(), scenarioFile, workbench::scenarioChanged,
                scenarioSaver).useUnicode(workbench.traits().unicode());
    }
}
