package dev.yoke.tui.edit;

import dev.yoke.tui.EditorHooks;
import dev.yoke.tui.Workbench;

import java.nio.file.Path;
import java.util.Objects;

/**
 * Plugs the parts editor and the scenario editor into the workbench's edit keys: a saved part
 * hands the new catalog to {@link Workbench#catalogChanged}, a valid scenario edit goes to
 * {@link Workbench#scenarioChanged}; both rank again in the background.
 */
public final class WorkbenchEditors implements EditorHooks {

    private final PartStore parts;
    private final Path scenarioFile;
    private final ScenarioSaver scenarioSaver;

    /**
     * @param parts         the catalog folder opened for editing
     * @param scenarioFile  where the scenario editor saves
     * @param scenarioSaver how it saves (atomic, with a backup)
     */
    public WorkbenchEditors(PartStore parts, Path scenarioFile, ScenarioSaver scenarioSaver) {
        this.parts = Objects.requireNonNull(parts, "parts");
        this.scenarioFile = Objects.requireNonNull(scenarioFile, "scenarioFile");
        this.scenarioSaver = Objects.requireNonNull(scenarioSaver, "scenarioSaver");
    }

    @Override
    public void openParts(Workbench workbench) {
        PartsEditor.open(workbench.gui(), parts,
                () -> workbench.catalogChanged(parts.catalog(), parts.doubtfulIds()));
    }

    @Override
    public void openBench(Workbench workbench) {
        ScenarioEditor.open(workbench.gui(), workbench.scenario(), scenarioFile, workbench::scenarioChanged,
                scenarioSaver);
    }
}
