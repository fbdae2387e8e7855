package dev.yoke.cli;

import dev.yoke.catalog.CatalogLoader;
import dev.yoke.catalog.InputException;
import dev.yoke.catalog.LoadListener;
import dev.yoke.catalog.LoadedCatalog;
import dev.yoke.catalog.LoadedScenario;
import dev.yoke.catalog.Problem;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.report.Meta;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * A scenario and a catalog loaded for a command, with their warnings printed. Both are read even
 * when the first fails, so the user sees every problem of one run at once.
 */
record Inputs(LoadedScenario scenario, LoadedCatalog catalog) {

    /**
     * Loads both; prints warnings to {@code err}.
     *
     * @throws InputException with the problems of both files
     */
    static Inputs load(Path scenarioFile, Path catalogDir, PrintWriter err) throws InputException {
        Inputs inputs = read(scenarioFile, catalogDir);
        for (Problem w : inputs.catalog.warnings()) {
            err.println(w);
        }
        for (Problem w : inputs.scenario.warnings()) {
            err.println(w);
        }
        return inputs;
    }

    /**
     * Loads both without printing anything (for the workbench, which shows warnings itself).
     *
     * @throws InputException with the problems of both files
     */
    static Inputs read(Path scenarioFile, Path catalogDir) throws InputException {
        return read(scenarioFile, catalogDir, LoadListener.NONE);
    }

    /**
     * As {@link #read(Path, Path)}, telling {@code listener} about each file as it is read (the
     * workbench shows it while a large catalog loads); the scenario is the last file.
     */
    static Inputs read(Path scenarioFile, Path catalogDir, LoadListener listener) throws InputException {
        List<Problem> problems = new ArrayList<>();
        LoadedCatalog catalog = null;
        LoadedScenario scenario = null;
        try {
            catalog = CatalogLoader.load(catalogDir, listener);
        } catch (InputException e) {
            problems.addAll(e.problems());
        }
        listener.fileStarted(scenarioFile);
        try {
            scenario = ScenarioLoader.load(scenarioFile);
        } catch (InputException e) {
            problems.addAll(e.problems());
        }
        listener.fileRead(scenarioFile, 0);
        if (scenario == null || catalog == null) {
            throw new InputException(problems);
        }
        return new Inputs(scenario, catalog);
    }

    /** Prints every problem as {@code file:line:column: field: message}, errors last; returns status 2. */
    static int report(InputException e, PrintWriter err) {
        for (Problem p : e.problems()) {
            if (p.warning()) {
                err.println(p);
            }
        }
        for (Problem p : e.errors()) {
            err.println(p);
        }
        int n = e.errors().size();
        err.println(n + (n == 1 ? " error" : " errors") + "; nothing evaluated");
        err.flush();
        return YokeCommand.BAD_INPUT;
    }

    /** What an export needs to be reproduced. */
    Meta meta(List<String> command, Map<String, String> options) {
        return Meta.of(VersionProvider.version(), scenario.file(), catalog.files(), command, options);
    }
}
