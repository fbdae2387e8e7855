package dev.yoke.cli;

import com.googlecode.lanterna.gui2.WindowBasedTextGUI;
import dev.yoke.catalog.CatalogFile;
import dev.yoke.catalog.LoadedCatalog;
import dev.yoke.catalog.Problem;
import dev.yoke.model.Scenario;
import dev.yoke.tui.BackgroundLoad;
import dev.yoke.tui.ColorDepth;
import dev.yoke.tui.EditorHooks;
import dev.yoke.tui.EngineBackend;
import dev.yoke.tui.StartupScreen;
import dev.yoke.tui.TerminalSession;
import dev.yoke.tui.TerminalTraits;
import dev.yoke.tui.Workbench;
import dev.yoke.tui.edit.WorkbenchEditors;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.function.Function;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code yoke open}: the full-screen workbench on a scenario and a catalog. Refuses to start
 * (exit 2, one line pointing to the batch command) where there is no interactive terminal.
 */
@Command(name = "open",
        mixinStandardHelpOptions = true,
        description = "Open the terminal workbench: the ranked shortlist, pairing details, export.")
public final class OpenCommand implements Callable<Integer> {

    /** The scenario opened when none is named. */
    public static final String DEMO = "demo-data/rover-wheel.yaml";

    /** Colour choices for {@code --colors}. */
    enum Colors { auto, mono, basic, full }

    @Parameters(paramLabel = "SCENARIO", arity = "0..1", defaultValue = DEMO,
            description = "Scenario file (default: ${DEFAULT-VALUE}).")
    Path scenarioFile;

    @Mixin
    CatalogOption catalogOption;

    @Option(names = "--colors", paramLabel = "MODE", defaultValue = "auto",
            description = "auto (from TERM, COLORTERM, NO_COLOR), mono, basic (16) or full (256). Default: ${DEFAULT-VALUE}.")
    Colors colors;

    @Option(names = "--ascii", description = "Draw lines and marks in ASCII even when the locale says UTF-8.")
    boolean ascii;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Runs a screen loop on a terminal: the user's own, or a virtual one in tests. */
    @FunctionalInterface
    interface ScreenRunner {
        StartupScreen<Inputs> run(Function<WindowBasedTextGUI, StartupScreen<Inputs>> factory)
                throws IOException, InterruptedException;
    }

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        Map<String, String> env = System.getenv();
        String why = TerminalSession.whyNotInteractive(System.console() != null, env);
        if (why != null) {
            err.println("yoke open: " + why + "; the workbench needs a terminal. For scripts use 'yoke rank'.");
            return YokeCommand.BAD_INPUT;
        }
        TerminalTraits traits = TerminalTraits.fromEnvironment(env);
        switch (colors) {
            case mono -> traits = traits.withColorDepth(ColorDepth.MONOCHROME);
            case basic -> traits = traits.withColorDepth(ColorDepth.SIXTEEN);
            case full -> traits = traits.withColorDepth(ColorDepth.INDEXED_256);
            default -> { }
        }
        if (ascii) {
            traits = traits.withUnicode(false);
        }
        TerminalTraits chosen = traits;
        return open(chosen, factory -> TerminalSession.run(chosen, factory), err);
    }

    /**
     * Opens the screen at once and reads the catalog and scenario behind it (a large catalog takes
     * seconds: the screen shows each file as it is read, and Esc or q leaves). Once both are read
     * the workbench takes over. Problems in the files close the screen and are printed as
     * {@code file:line:column: field: message}, exit status 2, as before the screen existed.
     */
    int open(TerminalTraits traits, ScreenRunner runner, PrintWriter err) {
        Path catalogDir = catalogOption.catalogDir;
        BackgroundLoad<Inputs> load = BackgroundLoad.of(listener -> Inputs.read(scenarioFile, catalogDir, listener));
        String subject = catalogDir + " and " + scenarioFile;
        StartupScreen<Inputs> startup;
        try {
            startup = runner.run(gui -> new StartupScreen<>(gui, traits, subject, load,
                    (opened, inputs) -> workbench(opened, traits, inputs)));
        } catch (IOException e) {
            err.println("yoke open: could not use the terminal: " + e.getMessage() + ". For scripts use 'yoke rank'.");
            return YokeCommand.BAD_INPUT;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return YokeCommand.OK;
        }
        if (!startup.problems().isEmpty()) {
            for (Problem p : startup.problems()) {
                err.println(p);
            }
            err.flush();
            return YokeCommand.BAD_INPUT;
        }
        Throwable crash = startup.crash();
        if (crash instanceof RuntimeException e) {
            throw e;
        }
        if (crash instanceof Error e) {
            throw e;
        }
        return YokeCommand.OK;
    }

    private Workbench workbench(WindowBasedTextGUI gui, TerminalTraits traits, Inputs inputs) {
        LoadedCatalog catalog = inputs.catalog();
        List<Path> files = new ArrayList<>();
        for (CatalogFile f : catalog.files()) {
            files.add(f.path());
        }
        EngineBackend backend = new EngineBackend(VersionProvider.version(), scenarioFile, files);
        Scenario start = inputs.scenario().scenario();
        Workbench workbench = new Workbench(gui, traits, backend, start, catalog.catalog(), catalog.implausibleIds(),
                Path.of("").toAbsolutePath());
        workbench.setEditors(editors());
        return workbench;
    }

    /** The editors behind the workbench's edit keys: they save through the catalog package's stores. */
    private EditorHooks editors() {
        return WorkbenchEditors.forFiles(catalogOption.catalogDir, scenarioFile);
    }
}
