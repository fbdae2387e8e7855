package dev.yoke.engine;

import dev.yoke.model.Catalog;
import dev.yoke.model.Modulation;
import dev.yoke.model.Motor;
import dev.yoke.model.PowerSwitch;
import dev.yoke.model.Profile;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.concurrent.atomic.DoubleAdder;

/**
 * Throughput harness for the fast path (run by hand, not a test): prepares every motor × frequency × ratio
 * once, then calls {@code summarize} for every switch on {@code threads} threads for a few seconds.
 * Usage: {@code java -cp target/classes:target/test-classes dev.yoke.engine.SummarizeThroughput [threads] [seconds]
 * [bipolar|unipolar|sign-magnitude]}.
 */
public final class SummarizeThroughput {

    private SummarizeThroughput() {
    }

    public static void main(String[] args) throws Exception {
        int threads = args.length > 0 ? Integer.parseInt(args[0]) : 2;
        double seconds = args.length > 1 ? Double.parseDouble(args[1]) : 5;
        Modulation modulation = args.length > 2 ? Modulation.fromFileName(args[2]) : Modulation.UNIPOLAR;
        Random random = new Random(1);
        List<Motor> motors = new ArrayList<>();
        for (int i = 0; i < 20; i++) {
            Motor m = TestParts.motor();
            double s = 0.5 + random.nextDouble();
            motors.add(new Motor("m" + i, "", 24, m.resistance() / s, 20, m.inductance() / s, m.torqueConstant() * s,
                    0.2, 6 * s, 30 * s, 600, 2e-5 * s, 2, 6, 30, 900, 155, 0, 0.5, 80));
        }
        List<PowerSwitch> switches = new ArrayList<>();
        for (int i = 0; i < 200; i++) {
            PowerSwitch q = TestParts.powerSwitch();
            double s = 0.3 + 2 * random.nextDouble();
            switches.add(new PowerSwitch("q" + i, "", "pkg", 40 + random.nextInt(60), 50 * s, 200 * s,
                    q.rdsOn() / s, q.rdsOnHot() / s, 150, 40e-9 * s, 10e-9 * s, 12e-9 * s, 4.5, 1, 500e-12 * s, 0.9,
                    50e-9 * s, 1.0 / s, 175, s));
        }
        List<Segment> segments = new ArrayList<>();
        double[] speeds = {0, 20, 30, 30, 10, 0, -15, -30, -30, -10, 0};
        for (int i = 0; i < 10; i++) {
            segments.add(new Segment("s" + i, 0.1 + 0.05 * i, speeds[i], speeds[i + 1], (i % 3) * 0.4 - 0.3));
        }
        Scenario scenario = new Scenario("bench", TestParts.bench(modulation),
                new Profile(0.01, true, segments));
        PairingEvaluator e = DriveEvaluator.of(scenario, new Catalog(motors, switches));
        int nf = scenario.bench().pwmFrequencies().size();
        int nr = scenario.bench().gearRatios().size();
        List<PairingEvaluator.MotorSide> sides = new ArrayList<>();
        long t0 = 0;
        long prepareBest = Long.MAX_VALUE;
        int rounds = 40;
        for (int round = 0; round < rounds; round++) {
            if (round == rounds / 2) {
                t0 = ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime();
            }
            sides.clear();
            for (int m = 0; m < motors.size(); m++) {
                for (int f = 0; f < nf; f++) {
                    for (int r = 0; r < nr; r++) {
                        long p0 = System.nanoTime();
                        sides.add(e.prepare(m, f, r));
                        prepareBest = Math.min(prepareBest, System.nanoTime() - p0);
                    }
                }
            }
        }
        double prepareMicros = (ManagementFactory.getThreadMXBean().getCurrentThreadCpuTime() - t0) / 1e3 / ((rounds - rounds / 2) * (double) sides.size());
        DoubleAdder sink = new DoubleAdder();
        long[] counts = new long[threads];
        Thread[] workers = new Thread[threads];
        long deadline = System.nanoTime() + (long) (seconds * 1e9);
        long warm = System.nanoTime() + (long) 1e9;
        long[] startAt = new long[threads];
        long[] cpuAt = new long[threads];
        long[] cpuUsed = new long[threads];
        long[] bestBatch = new long[threads];
        ThreadMXBean mx = ManagementFactory.getThreadMXBean();
        for (int t = 0; t < threads; t++) {
            int id = t;
            workers[t] = new Thread(() -> {
                double[] row = new double[Metric.COUNT];
                double acc = 0;
                long best = Long.MAX_VALUE;
                long n = 0;
                boolean counting = false;
                int side = id;
                while (true) {
                    PairingEvaluator.MotorSide ms = sides.get(side % sides.size());
                    long batchStart = System.nanoTime();
                    for (int q = 0; q < switches.size(); q++) {
                        e.summarize(ms, q, row);
                        acc += row[Metric.BINDING_MARGIN.ordinal()];
                    }
                    if (counting) {
                        best = Math.min(best, System.nanoTime() - batchStart);
                    }
                    side += threads;
                    long now = System.nanoTime();
                    if (!counting && now > warm) {
                        counting = true;
                        startAt[id] = now;
                        cpuAt[id] = mx.getCurrentThreadCpuTime();
                        n = 0;
                    } else if (counting) {
                        n += switches.size();
                    }
                    if (now > deadline) {
                        break;
                    }
                }
                counts[id] = n;
                bestBatch[id] = best;
                cpuUsed[id] = mx.getCurrentThreadCpuTime() - cpuAt[id];
                sink.add(acc);
            });
            workers[t].start();
        }
        double rate = 0;
        double cpuRate = 0;
        for (int t = 0; t < threads; t++) {
            workers[t].join();
            rate += counts[t] / ((deadline - startAt[t]) / 1e9);
            cpuRate += counts[t] / (cpuUsed[t] / 1e9);
        }
        System.out.printf("%s, %d segments, %d switches: prepare %.1f µs CPU per motor side on average, fastest %.1f µs"
                + " (%d sides)%n", modulation.fileName(), segments.size(), switches.size(), prepareMicros,
                prepareBest / 1e3, sides.size());
        long best = Long.MAX_VALUE;
        for (long b : bestBatch) {
            best = Math.min(best, b);
        }
        System.out.printf("summarize, fastest batch of %d switches: %.0f ns per pairing = %.2f million pairings/s per"
                + " core when not preempted%n", switches.size(), best / (double) switches.size(),
                switches.size() / (best / 1e3));
        System.out.printf("summarize: %.2f million pairings/s wall on %d threads; %.2f million per CPU-second per thread"
                + " (sum over threads %.2f; checksum %.3g)%n", rate / 1e6, threads, cpuRate / threads / 1e6,
                cpuRate / 1e6, sink.sum());
    }
}
