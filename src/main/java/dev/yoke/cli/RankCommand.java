package dev.yoke.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import dev.yoke.catalog.AtomicFile;
import dev.yoke.catalog.InputException;
import dev.yoke.engine.Column;
import dev.yoke.engine.DriveEvaluator;
import dev.yoke.engine.PairingEvaluator;
import dev.yoke.engine.Ranking;
import dev.yoke.engine.RowFilter;
import dev.yoke.engine.Shortlist;
import dev.yoke.engine.SortKey;
import dev.yoke.engine.Sweep;
import dev.yoke.engine.SweepOptions;
import dev.yoke.model.Scenario;
import dev.yoke.report.Cautions;
import dev.yoke.report.Meta;
import dev.yoke.report.PairingJson;
import dev.yoke.report.ShortlistCsvWriter;
import dev.yoke.report.ShortlistTable;
import dev.yoke.units.Dimension;
import dev.yoke.units.UnitException;
import dev.yoke.units.Units;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code yoke rank}: evaluates every pairing of the catalog against a scenario, sorts and filters
 * them, prints the head of the list and optionally exports CSV or JSON. Exit status 0 when at
 * least one pairing is feasible, 1 when none is, 2 for bad input.
 */
@Command(name = "rank", mixinStandardHelpOptions = true,
        description = {"Evaluate every motor x switch x PWM frequency x gear ratio against a scenario and rank them.",
                "Default order: feasible first, then least total loss over the cycle, then cost, then ids."})
public final class RankCommand implements Callable<Integer> {

    /** Rows printed in the terminal when --top is not given. */
    static final int DEFAULT_SHOWN = 20;

    @Mixin
    ScenarioArgument scenarioArgument;

    @Mixin
    CatalogOption catalogOption;

    @Option(names = "--sort", paramLabel = "KEY[,KEY...]",
            description = "Sort keys, most important first; KEY:desc sorts descending (KEY or KEY:asc ascending). "
                    + "Keys: motor, switch, pwm_frequency, gear_ratio, pareto and every metric, e.g. cost, total_loss, "
                    + "efficiency, junction_temp_max, binding_margin, margin_junction. Missing values sort last. "
                    + "Default: feasible:desc,total_loss,cost.")
    String sort;

    @Option(names = "--feasible-only", description = "Only pairings with no negative margin.")
    boolean feasibleOnly;

    @Option(names = "--pareto-only", description = "Only pairings on the cost-loss front of feasible pairings.")
    boolean paretoOnly;

    @Option(names = "--max-cost", paramLabel = "X", description = "Only pairings costing at most X (motor + 4 switches).")
    Double maxCost;

    @Option(names = "--match", paramLabel = "TEXT",
            description = "Only pairings whose motor or switch id or label contains every word of TEXT.")
    String match;

    @Option(names = "--at-least", paramLabel = "KEY=X",
            description = "Only pairings whose metric KEY is at least X, e.g. margin_junction=0.1 or margin_headroom=10%%;"
                    + " repeatable.")
    Map<String, String> atLeast = new LinkedHashMap<>();

    @Option(names = "--top", paramLabel = "N",
            description = "Keep only the first N pairings (bounded memory for large catalogs); prints N rows.")
    Integer top;

    @Option(names = "--csv", paramLabel = "FILE|-",
            description = "Write the listed pairings as CSV (with FILE's NAME.meta.json); '-' for standard output.")
    String csv;

    @Option(names = "--json", paramLabel = "FILE|-",
            description = "Write the listed pairings as a JSON array (docs/json-report.md); '-' for standard output.")
    String json;

    @Option(names = "--segments", description = "Include each pairing's segments in the JSON.")
    boolean segments;

    @Option(names = "--threads", paramLabel = "T", description = "Worker threads; 0 = one per core (default).")
    int threads;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        List<SortKey> keys;
        try {
            keys = sort == null ? SortKey.DEFAULT : SortKey.parseList(sort);
        } catch (IllegalArgumentException e) {
            return usage(err, "--sort: " + e.getMessage());
        }
        if (top != null && top < 1) {
            return usage(err, "--top: must be at least 1, was " + top);
        }
        if (maxCost != null && !(maxCost >= 0 && Double.isFinite(maxCost))) {
            return usage(err, "--max-cost: must be a number of at least 0, was " + maxCost);
        }
        if ("-".equals(csv) && "-".equals(json)) {
            return usage(err, "--csv - and --json - cannot both use standard output");
        }
        RowFilter filter = RowFilter.ALL.withFeasibleOnly(feasibleOnly).withParetoOnly(paretoOnly)
                .withMaxCost(maxCost == null ? Double.POSITIVE_INFINITY : maxCost).withText(match == null ? "" : match);
        for (Map.Entry<String, String> e : atLeast.entrySet()) {
            try {
                Column column = Column.parse(e.getKey());
                if (column.kind() != Column.Kind.METRIC) {
                    return usage(err, "--at-least: '" + e.getKey() + "' is not a metric");
                }
                filter = filter.withAtLeast(column.metric(), Units.parse(e.getValue(), Dimension.DIMENSIONLESS));
            } catch (IllegalArgumentException | UnitException ex) {
                return usage(err, "--at-least " + e.getKey() + "=" + e.getValue() + ": " + ex.getMessage());
            }
        }

        Inputs inputs;
        try {
            inputs = Inputs.load(scenarioArgument.scenarioFile, catalogOption.catalogDir, err);
        } catch (InputException e) {
            return Inputs.report(e, err);
        }
        Scenario scenario = inputs.scenario().scenario();
        PairingEvaluator evaluator = DriveEvaluator.of(scenario, inputs.catalog().catalog());
        long t0 = System.nanoTime();
        SweepOptions options = SweepOptions.DEFAULT.withThreads(threads);
        if (top != null) {
            options = options.withTop(top, keys, filter);
        }
        Shortlist shortlist = Sweep.run(evaluator, options);
        int[] view = Ranking.view(shortlist, keys, filter);
        double seconds = (System.nanoTime() - t0) / 1e9;

        boolean dataOnStdout = "-".equals(csv) || "-".equals(json);
        PrintWriter words = dataOnStdout ? err : out;
        try {
            if (csv != null) {
                if (csv.equals("-")) {
                    ShortlistCsvWriter.write(shortlist, view, out);
                } else {
                    ShortlistCsvWriter.write(shortlist, view, Path.of(csv), inputs.meta(originalArgs(), describe(keys, filter)));
                }
            }
            if (json != null) {
                if (json.equals("-")) {
                    writeJson(shortlist, view, out);
                    out.println();
                } else {
                    AtomicFile.write(Path.of(json), stream -> {
                        Writer w = new OutputStreamWriter(stream, StandardCharsets.UTF_8);
                        writeJson(shortlist, view, w);
                        w.write('\n');
                        w.flush();
                    });
                }
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            err.println("yoke rank: cannot write the export: " + e.getMessage());
            err.flush();
            return YokeCommand.BAD_INPUT;
        }
        if (!dataOnStdout) {
            out.print(ShortlistTable.render(shortlist, view, top != null ? top : DEFAULT_SHOWN));
        }
        int shown = Math.min(view.length, top != null ? top : DEFAULT_SHOWN);
        // With --top only the kept rows are held, so the front is counted among them and says so.
        String frontScope = shortlist.size() < shortlist.evaluatedCount() ? " among those kept" : "";
        words.printf(Locale.ROOT, "%,d pairings, %,d feasible, %d on the cost-loss front%s; %d of %,d listed shown (%.2f s)%s%n",
                shortlist.evaluatedCount(), shortlist.feasibleCount(), shortlist.paretoCount(), frontScope,
                dataOnStdout ? 0 : shown, view.length, seconds,
                csv != null && !csv.equals("-") ? "; CSV: " + csv : "");
        words.println(Cautions.LINE);
        out.flush();
        err.flush();
        return shortlist.feasibleCount() > 0 ? YokeCommand.OK : YokeCommand.NONE_FEASIBLE;
    }

    private void writeJson(Shortlist shortlist, int[] view, Writer w) throws IOException {
        JsonGenerator g = PairingJson.mapper().getFactory().createGenerator(w);
        g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
        g.useDefaultPrettyPrinter();
        g.writeStartArray();
        for (int row : view) {
            PairingJson.mapper().writeTree(g, PairingJson.of(shortlist.explain(row), segments, shortlist.isPareto(row)));
        }
        g.writeEndArray();
        g.flush();
    }

    private List<String> originalArgs() {
        List<String> args = new java.util.ArrayList<>();
        args.add("rank");
        if (spec.commandLine().getParseResult() != null) {
            args.addAll(spec.commandLine().getParseResult().originalArgs());
        }
        return args;
    }

    private Map<String, String> describe(List<SortKey> keys, RowFilter filter) {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("catalog", catalogOption.catalogDir.toString());
        m.putAll(Meta.viewOptions(keys, filter));
        m.put("top", top == null ? "" : top.toString());
        return m;
    }

    private static int usage(PrintWriter err, String message) {
        err.println("yoke rank: " + message);
        err.flush();
        return YokeCommand.BAD_INPUT;
    }
}
