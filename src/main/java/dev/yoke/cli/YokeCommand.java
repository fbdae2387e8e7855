package dev.yoke.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The top-level {@code yoke} command: the sub-commands, or the workbench on the demo when none is given. */
@Command(name = "yoke",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Choose a brushed DC motor and the four switches of its PWM H-bridge for a duty profile.",
        subcommands = {CheckCommand.class, RankCommand.class, ExplainCommand.class, BenchCommand.class, OpenCommand.class})
public final class YokeCommand implements Callable<Integer> {

    /** Exit status: results found. */
    public static final int OK = 0;
    /** Exit status: the run worked but no pairing is feasible. */
    public static final int NONE_FEASIBLE = 1;
    /** Exit status: bad input (files, options). */
    public static final int BAD_INPUT = 2;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** A configured command line writing to the given streams; exit codes follow the constants above. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cli = new CommandLine(new YokeCommand());
        cli.setOut(out);
        cli.setErr(err);
        // picocli already answers invalid options with ExitCode.USAGE, which is 2 = BAD_INPUT.
        return cli;
    }

    /** With no sub-command: the workbench on the demo scenario ({@code yoke open}). */
    @Override
    public Integer call() {
        return spec.commandLine().getSubcommands().get("open").execute();
    }
}
