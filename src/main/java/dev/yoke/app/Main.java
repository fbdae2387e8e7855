package dev.yoke.app;

import dev.yoke.cli.YokeCommand;
import java.io.PrintWriter;
import picocli.CommandLine;

/** Entry point: the only place that calls {@link System#exit}. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true);
        PrintWriter err = new PrintWriter(System.err, true);
        System.exit(run(out, err, args));
    }

    /** Runs Yoke with the given arguments and returns the exit status (testable without a process). */
    public static int run(PrintWriter out, PrintWriter err, String... args) {
        CommandLine cli = YokeCommand.commandLine(out, err, args);
        int status = cli.execute(args);
        out.flush();
        err.flush();
        return status;
    }
}
