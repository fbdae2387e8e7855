package dev.yoke.cli;

import dev.yoke.catalog.CatalogLoader;
import dev.yoke.catalog.InputException;
import dev.yoke.catalog.LoadedCatalog;
import dev.yoke.catalog.LoadedScenario;
import dev.yoke.catalog.Problem;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code yoke check}: validates a catalog and scenarios without evaluating anything. Prints every
 * error as {@code file:line:column: field: message} and exits 2, or a short summary.
 */
@Command(name = "check",
        mixinStandardHelpOptions = true,
        description = "Validate the parts catalog and scenario files; report every problem with its file and line.")
public final class CheckCommand implements Callable<Integer> {

    @Mixin
    CatalogOption catalogOption;

    @Parameters(paramLabel = "SCENARIO", arity = "0..*", description = "Scenario files to check against the catalog.")
    List<Path> scenarios = new ArrayList<>();

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        List<Problem> errors = new ArrayList<>();
        List<Problem> warnings = new ArrayList<>();
        LoadedCatalog catalog = null;
        try {
            catalog = CatalogLoader.load(catalogOption.catalogDir);
            warnings.addAll(catalog.warnings());
        } catch (InputException e) {
            split(e.problems(), errors, warnings);
        }
        List<LoadedScenario> loaded = new ArrayList<>();
        for (Path scenario : scenarios) {
            try {
                LoadedScenario s = ScenarioLoader.load(scenario);
                loaded.add(s);
                warnings.addAll(s.warnings());
            } catch (InputException e) {
                split(e.problems(), errors, warnings);
            }
        }
        for (Problem w : warnings) {
            err.println(w);
        }
        for (Problem e : errors) {
            err.println(e);
        }
        if (!errors.isEmpty()) {
            err.println(errors.size() + (errors.size() == 1 ? " error" : " errors") + ", " + warnings.size()
                    + (warnings.size() == 1 ? " warning" : " warnings"));
            err.flush();
            return YokeCommand.BAD_INPUT;
        }
        Catalog parts = catalog.catalog();
        out.printf("catalog %s: %d motors, %d switches in %d files%n", catalogOption.catalogDir, parts.motors().size(),
                parts.switches().size(), catalog.files().size());
        for (LoadedScenario s : loaded) {
            Bench b = s.scenario().bench();
            long pairings = (long) parts.motors().size() * parts.switches().size() * b.pwmFrequencies().size()
                    * b.gearRatios().size();
            out.printf("scenario %s (%s): %d segments, %d pairings to evaluate (%d motors x %d switches x %d"
                            + " frequencies x %d gear ratios)%n",
                    s.file().path(), s.scenario().name(), s.scenario().profile().segments().size(), pairings,
                    parts.motors().size(), parts.switches().size(), b.pwmFrequencies().size(), b.gearRatios().size());
        }
        out.printf("%d %s; %d implausible parts marked%n", warnings.size(), warnings.size() == 1 ? "warning" : "warnings",
                catalog.implausibleIds().size());
        out.flush();
        err.flush();
        return YokeCommand.OK;
    }

    private static void split(List<Problem> problems, List<Problem> errors, List<Problem> warnings) {
        for (Problem p : problems) {
            (p.warning() ? warnings : errors).add(p);
        }
    }
}
