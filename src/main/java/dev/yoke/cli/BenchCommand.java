package dev.yoke.cli;

import dev.yoke.engine.DriveEvaluator;
import dev.yoke.engine.PairingEvaluator;
import dev.yoke.engine.Ranking;
import dev.yoke.engine.RowFilter;
import dev.yoke.engine.Shortlist;
import dev.yoke.engine.SortKey;
import dev.yoke.engine.Sweep;
import dev.yoke.engine.SweepOptions;
import dev.yoke.engine.SyntheticParts;
import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * Measures the engine and the ranking on synthetic catalogs ({@link SyntheticParts}): (a) pairings
 * evaluated per second with the full model, (b) the time to re-evaluate and re-sort 100,000
 * pairings after one bench value changes, (c) the heap needed to keep and rank 1,000,000
 * pairings. Wall-clock rates depend on what else the machine runs, so CPU time is reported too.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = {"Measure evaluation speed, re-ranking time and memory on synthetic parts.",
                "Check the memory claim under a small heap:", "  YOKE_JAVA_OPTS=-Xmx512m ./yoke bench"})
public final class BenchCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = "--motors", paramLabel = "N", description = "Synthetic motors for the throughput run (default: ${DEFAULT-VALUE}).")
    int motors = 200;

    @Option(names = "--switches", paramLabel = "N", description = "Synthetic switches for the throughput run (default: ${DEFAULT-VALUE}).")
    int switches = 2000;

    @Option(names = "--segments", paramLabel = "N", description = "Segments of the repeating profile (default: ${DEFAULT-VALUE}).")
    int segments = 10;

    @Option(names = "--frequencies", paramLabel = "K", description = "PWM frequencies on the bench (default: ${DEFAULT-VALUE}).")
    int frequencies = 3;

    @Option(names = "--ratios", paramLabel = "K", description = "Gear ratios on the bench (default: ${DEFAULT-VALUE}).")
    int ratios = 3;

    @Option(names = "--seconds", paramLabel = "S", description = "Measuring time of the throughput run, s (default: ${DEFAULT-VALUE}).")
    double seconds = 5;

    @Option(names = "--threads", paramLabel = "T", description = "Worker threads; 0 = one per core (default: ${DEFAULT-VALUE}).")
    int threads = 0;

    @Option(names = "--seed", paramLabel = "SEED", description = "Seed of the synthetic parts (default: ${DEFAULT-VALUE}).")
    long seed = 1;

    @Option(names = "--skip", paramLabel = "PART", split = ",", description = "Parts to skip: throughput, rerank, memory.")
    List<String> skip = new ArrayList<>();

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        if (motors < 1 || switches < 1 || segments < 1 || frequencies < 1 || ratios < 1 || seconds <= 0) {
            spec.commandLine().getErr().println("yoke bench: counts must be at least 1 and --seconds positive");
            return YokeCommand.BAD_INPUT;
        }
        for (String part : skip) {
            if (!List.of("throughput", "rerank", "memory").contains(part)) {
                spec.commandLine().getErr().println("yoke bench: --skip: unknown part '" + part
                        + "'; the parts are throughput, rerank, memory");
                return YokeCommand.BAD_INPUT;
            }
        }
        int cores = Runtime.getRuntime().availableProcessors();
        out.printf(Locale.ROOT, "yoke %s bench: %d cores, heap limit %d MB, %d worker threads, load average %.1f%n",
                VersionProvider.version(), cores, Runtime.getRuntime().maxMemory() >> 20,
                threads > 0 ? threads : cores, ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        if (!skip.contains("throughput")) {
            throughput(out);
        }
        if (!skip.contains("rerank")) {
            rerank(out);
        }
        if (!skip.contains("memory")) {
            memory(out);
        }
        out.flush();
        return YokeCommand.OK;
    }

    /** (a) Streaming sweep keeping the top 20, repeated for the measuring time after a warm-up. */
    private void throughput(PrintWriter out) {
        Catalog catalog = SyntheticParts.catalog(motors, switches, seed);
        Scenario scenario = SyntheticParts.scenario(segments, frequencies, ratios, seed);
        PairingEvaluator evaluator = DriveEvaluator.of(scenario, catalog);
        SweepOptions options = SweepOptions.DEFAULT.withThreads(threads).withTop(20, SortKey.DEFAULT, RowFilter.ALL);
        long pairings = (long) motors * switches * frequencies * ratios;
        out.printf(Locale.ROOT, "(a) throughput: %d motors x %d switches x %d frequencies x %d ratios = %,d pairings,"
                + " %d segments, keeping the top 20%n", motors, switches, frequencies, ratios, pairings, segments);
        long warmEnd = System.nanoTime() + (long) (Math.min(2.0, seconds / 2) * 1e9);
        while (System.nanoTime() < warmEnd) {
            Sweep.run(evaluator, options);
        }
        List<Double> wallRates = new ArrayList<>();
        List<Double> cpuRates = new ArrayList<>();
        long end = System.nanoTime() + (long) (seconds * 1e9);
        Shortlist last = null;
        do {
            long cpu0 = processCpuNanos();
            long t0 = System.nanoTime();
            last = Sweep.run(evaluator, options);
            long wall = System.nanoTime() - t0;
            long cpu = processCpuNanos() - cpu0;
            wallRates.add(pairings / (wall / 1e9));
            if (cpu > 0) {
                cpuRates.add(pairings / (cpu / 1e9));
            }
        } while (System.nanoTime() < end);
        Collections.sort(wallRates);
        Collections.sort(cpuRates);
        out.printf(Locale.ROOT, "    %d runs; pairings per second (wall clock): median %,.0f, best %,.0f%n",
                wallRates.size(), median(wallRates), wallRates.get(wallRates.size() - 1));
        if (!cpuRates.isEmpty()) {
            out.printf(Locale.ROOT, "    per CPU-second of the whole process: median %,.0f (x %d cores = %,.0f if the cores are free)%n",
                    median(cpuRates), effectiveThreads(), median(cpuRates) * effectiveThreads());
        }
        Catalog head = SyntheticParts.catalog(Math.min(motors, 50), switches, seed);
        PairingEvaluator small = DriveEvaluator.of(scenario, head);
        out.printf(Locale.ROOT, "    one thread, per CPU-second of that thread: the evaluator in a bare loop %,.0f;"
                + " the sweep (top 20) %,.0f%n", bareEvaluatorRate(small), oneThreadSweepRate(small, options));
        out.printf(Locale.ROOT, "    %,d feasible; best: %s + %s%n", last.feasibleCount(),
                last.size() > 0 ? last.motorId(0) : "-", last.size() > 0 ? last.switchId(0) : "-");
    }

    /**
     * Pairings per CPU-second of the evaluator called in a plain loop on this thread: the ceiling
     * the sweep can reach per core, so the sweep's own overhead is the gap to the figure above.
     */
    private double bareEvaluatorRate(PairingEvaluator evaluator) {
        java.lang.management.ThreadMXBean threadsBean = ManagementFactory.getThreadMXBean();
        double[] row = new double[dev.yoke.engine.Metric.COUNT];
        double best = 0;
        for (int rep = 0; rep < 3; rep++) {
            long n = 0;
            long c0 = threadsBean.getCurrentThreadCpuTime();
            for (int m = 0; m < evaluator.catalog().motors().size(); m++) {
                for (int f = 0; f < frequencies; f++) {
                    for (int r = 0; r < ratios; r++) {
                        PairingEvaluator.MotorSide side = evaluator.prepare(m, f, r);
                        for (int s = 0; s < switches; s++) {
                            evaluator.summarize(side, s, row);
                            n++;
                        }
                    }
                }
            }
            long cpu = threadsBean.getCurrentThreadCpuTime() - c0;
            if (cpu > 0) {
                best = Math.max(best, n / (cpu / 1e9));
            }
        }
        return best;
    }

    /** Pairings per CPU-second of a one-thread sweep (the calling thread does all the work). */
    private static double oneThreadSweepRate(PairingEvaluator evaluator, SweepOptions options) {
        java.lang.management.ThreadMXBean threadsBean = ManagementFactory.getThreadMXBean();
        double best = 0;
        for (int rep = 0; rep < 3; rep++) {
            long c0 = threadsBean.getCurrentThreadCpuTime();
            Shortlist s = Sweep.run(evaluator, options.withThreads(1));
            long cpu = threadsBean.getCurrentThreadCpuTime() - c0;
            if (cpu > 0) {
                best = Math.max(best, s.evaluatedCount() / (cpu / 1e9));
            }
        }
        return best;
    }

    /** (b) 100,000 pairings kept in full; the ambient temperature changes; re-evaluate and re-sort. */
    private void rerank(PrintWriter out) {
        int m = 50;
        int s = 2000;
        Catalog catalog = SyntheticParts.catalog(m, s, seed);
        Scenario scenario = SyntheticParts.scenario(segments, 1, 1, seed);
        out.printf(Locale.ROOT, "(b) re-rank: %d motors x %d switches = %,d pairings kept in full;"
                + " ambient temperature raised by 1 K each time; re-evaluate and sort (default order)%n", m, s, m * s);
        SweepOptions options = SweepOptions.DEFAULT.withThreads(threads);
        List<Double> times = new ArrayList<>();
        List<Double> cpuTimes = new ArrayList<>();
        for (int i = 0; i < 25; i++) {
            Bench b = scenario.bench();
            Bench changed = new Bench(b.busVoltage(), b.busVoltageMin(), b.busVoltageMax(), b.pwmFrequencies(),
                    b.modulation(), b.deadTime(), b.gateDriveVoltage(), b.gateResistance(), b.maxDuty(),
                    b.ambientTemp() + 1, b.switchRthCaseAmbient(), b.gearRatios(), b.gearEfficiency(), b.limits());
            scenario = new Scenario(scenario.name(), changed, scenario.profile());
            long cpu0 = processCpuNanos();
            long t0 = System.nanoTime();
            Shortlist shortlist = Sweep.run(DriveEvaluator.of(scenario, catalog), options);
            int[] order = Ranking.view(shortlist, SortKey.DEFAULT, RowFilter.ALL);
            long t = System.nanoTime() - t0;
            long cpu = processCpuNanos() - cpu0;
            if (order.length != m * s) {
                throw new IllegalStateException("lost rows");
            }
            if (i >= 5) {
                times.add(t / 1e6); // the first runs warm the compiler up
                cpuTimes.add(cpu / 1e6);
            }
        }
        Collections.sort(times);
        Collections.sort(cpuTimes);
        out.printf(Locale.ROOT, "    re-evaluate + sort 100,000 pairings: median %.1f ms, best %.1f ms, worst %.1f ms (%d runs)%n",
                median(times), times.get(0), times.get(times.size() - 1), times.size());
        out.printf(Locale.ROOT, "    CPU time of the whole process per re-rank: median %.1f ms (spread over %d threads)%n",
                median(cpuTimes), effectiveThreads());
    }

    /** (c) 1,000,000 pairings kept in full and sorted: heap in use afterwards. */
    private void memory(PrintWriter out) {
        int m = 250;
        int s = 1000;
        Catalog catalog = SyntheticParts.catalog(m, s, seed);
        Scenario scenario = SyntheticParts.scenario(segments, 2, 2, seed);
        System.gc(); // leave the garbage of the earlier parts out of the peak
        resetPeaks();
        long t0 = System.nanoTime();
        Shortlist shortlist = Sweep.run(DriveEvaluator.of(scenario, catalog), SweepOptions.DEFAULT.withThreads(threads));
        int[] order = Ranking.view(shortlist, SortKey.DEFAULT, RowFilter.ALL);
        int[] byCost = Ranking.view(shortlist, SortKey.parseList("cost,total_loss"), RowFilter.ALL.withFeasibleOnly(true));
        long t = System.nanoTime() - t0;
        System.gc();
        long used = ManagementFactory.getMemoryMXBean().getHeapMemoryUsage().getUsed();
        out.printf(Locale.ROOT, "(c) memory: %,d pairings (%d motors x %d switches x 2 x 2) evaluated, kept and sorted twice"
                + " in %.2f s%n", shortlist.size(), m, s, t / 1e9);
        out.printf(Locale.ROOT, "    heap in use with the shortlist and two orders: %d MB; peak heap %d MB; heap limit %d MB;"
                + " %,d feasible, %,d on the front%n", used >> 20, peakHeap() >> 20,
                Runtime.getRuntime().maxMemory() >> 20, shortlist.feasibleCount(), shortlist.paretoCount());
        if (order.length + byCost.length == 0) {
            out.println("    (nothing kept)");
        }
    }

    private int effectiveThreads() {
        return threads > 0 ? threads : Runtime.getRuntime().availableProcessors();
    }

    private static double median(List<Double> sorted) {
        int n = sorted.size();
        return n % 2 == 1 ? sorted.get(n / 2) : (sorted.get(n / 2 - 1) + sorted.get(n / 2)) / 2;
    }

    private static long processCpuNanos() {
        if (ManagementFactory.getOperatingSystemMXBean() instanceof com.sun.management.OperatingSystemMXBean os) {
            return os.getProcessCpuTime();
        }
        return -1;
    }

    private static void resetPeaks() {
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                pool.resetPeakUsage();
            }
        }
    }

    private static long peakHeap() {
        long sum = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                sum += pool.getPeakUsage().getUsed();
            }
        }
        return sum;
    }
}
