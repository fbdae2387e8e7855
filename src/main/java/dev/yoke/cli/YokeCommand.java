package dev.yoke.cli;

import java.io.PrintWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Supplier;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The top-level {@code yoke} command: the sub-commands, or the workbench on the demo when none is given. */
@Command(name = "yoke",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Choose a brushed DC motor and the four switches of its PWM H-bridge for a duty profile.")
public final class YokeCommand implements Callable<Integer> {

    /** Exit status: results found. */
    public static final int OK = 0;
    /** Exit status: the run worked but no pairing is feasible. */
    public static final int NONE_FEASIBLE = 1;
    /** Exit status: bad input (files, options). */
    public static final int BAD_INPUT = 2;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** The sub-commands, by name, in the order help lists them. */
    private static final Map<String, Supplier<Object>> SUBCOMMANDS = subcommands();

    private static Map<String, Supplier<Object>> subcommands() {
        Map<String, Supplier<Object>> all = new LinkedHashMap<>();
        all.put("check", CheckCommand::new);
        all.put("rank", RankCommand::new);
        all.put("explain", ExplainCommand::new);
        all.put("bench", BenchCommand::new);
        all.put("open", OpenCommand::new);
        return all;
    }

    /** A configured command line with every sub-command; exit codes follow the constants above. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        return commandLine(out, err, new String[0], true);
    }

    /**
     * A configured command line for these arguments. Only the sub-command the arguments name is
     * built (or {@code open} when none is given): picocli reflects over every option of every
     * registered command at start-up, which cost about a third of a short run's wall time.
     * Anything else (help, a misspelt command) gets all of them, so usage and suggestions stay whole.
     */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err, String... args) {
        return commandLine(out, err, args, false);
    }

    private static CommandLine commandLine(PrintWriter out, PrintWriter err, String[] args, boolean all) {
        CommandLine cli = new CommandLine(new YokeCommand());
        String wanted = all ? null : args.length == 0 ? "open" : args[0];
        if (wanted != null && SUBCOMMANDS.containsKey(wanted)) {
            cli.addSubcommand(wanted, SUBCOMMANDS.get(wanted).get());
        } else {
            SUBCOMMANDS.forEach((name, make) -> cli.addSubcommand(name, make.get()));
        }
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
