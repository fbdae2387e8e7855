package dev.yoke.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.TextColor;
import com.googlecode.lanterna.gui2.DefaultWindowManager;
import com.googlecode.lanterna.gui2.EmptySpace;
import com.googlecode.lanterna.gui2.MultiWindowTextGUI;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import dev.yoke.catalog.CatalogLoader;
import dev.yoke.catalog.LoadedCatalog;
import dev.yoke.catalog.ScenarioLoader;
import dev.yoke.engine.DriveEvaluator;
import dev.yoke.engine.Shortlist;
import dev.yoke.engine.Sweep;
import dev.yoke.engine.SweepOptions;
import dev.yoke.model.Bench;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Measures how the shortlist grid responds at 1k, 100k and 1M rows: the time to handle one key
 * and redraw a 120×40 virtual terminal (cursor down, page down, end, sideways), and the time to
 * sort and filter. A measurement, not a test: run it by hand (see docs/screens.md for the command).
 *
 * <p>The rows are real sweeps of the bundled catalog on the demo scenario, with the scenario's
 * PWM frequencies and gear ratios multiplied out to reach each size.
 */
public final class GridScrollHarness {

    private GridScrollHarness() {
    }

    public static void main(String[] args) throws Exception {
        Path project = Path.of(args.length > 0 ? args[0] : ".");
        LoadedCatalog catalog = CatalogLoader.load(project.resolve("catalog"));
        Scenario demo = ScenarioLoader.load(project.resolve("demo-data/rover-wheel.yaml")).scenario();
        int parts = catalog.catalog().motors().size() * catalog.catalog().switches().size();
        System.out.printf(Locale.ROOT, "catalog: %d motors x %d switches; terminal 120x40; %d cores%n",
                catalog.catalog().motors().size(), catalog.catalog().switches().size(),
                Runtime.getRuntime().availableProcessors());
        System.out.println("(ms unless marked; 'screen' = time the screen thread was busy, 'shown' = until the new view is drawn)");
        System.out.println("rows      sweep s  swap:screen shown  sort:screen shown  filter:shown  key: median    p95     max  (keys)");
        for (int target : new int[] {1_000, 100_000, 1_000_000}) {
            int settings = Math.max(1, (int) Math.round((double) target / parts));
            int frequencies = (int) Math.ceil(Math.sqrt(settings));
            int ratios = (int) Math.ceil((double) settings / frequencies);
            Scenario scenario = expanded(demo, frequencies, ratios);
            long t0 = System.nanoTime();
            Shortlist shortlist = Sweep.run(DriveEvaluator.of(scenario, catalog.catalog()), SweepOptions.DEFAULT);
            double sweepSeconds = (System.nanoTime() - t0) / 1e9;
            measure(shortlist, scenario, catalog.catalog(), sweepSeconds);
        }
    }

    private static Scenario expanded(Scenario demo, int frequencies, int ratios) {
        Bench b = demo.bench();
        List<Double> f = new ArrayList<>();
        for (int i = 0; i < frequencies; i++) {
            f.add(16e3 + i * (64e3 / Math.max(1, frequencies - 1)));
        }
        List<Double> r = new ArrayList<>();
        double r0 = b.gearRatios().get(0);
        for (int i = 0; i < ratios; i++) {
            r.add(r0 * (0.5 + i * (1.5 / Math.max(1, ratios - 1))));
        }
        Bench bench = new Bench(b.busVoltage(), b.busVoltageMin(), b.busVoltageMax(), f, b.modulation(), b.deadTime(),
                b.gateDriveVoltage(), b.gateResistance(), b.maxDuty(), b.ambientTemp(), b.switchRthCaseAmbient(), r,
                b.gearEfficiency(), b.limits());
        return new Scenario(demo.name(), bench, demo.profile());
    }

    private static void measure(Shortlist shortlist, Scenario scenario, Catalog catalog, double sweepSeconds)
            throws Exception {
        DefaultVirtualTerminal vt = new DefaultVirtualTerminal(new TerminalSize(120, 40));
        TerminalScreen screen = new TerminalScreen(vt);
        screen.startScreen();
        MultiWindowTextGUI gui = new MultiWindowTextGUI(screen, new DefaultWindowManager(), new EmptySpace(TextColor.ANSI.DEFAULT));
        WorkbenchBackend ready = new WorkbenchBackend() {
            @Override
            public Shortlist rank(Scenario s, Catalog c, RankProgress progress) {
                return shortlist;
            }

            @Override
            public void writeCsv(Path file, Shortlist s, int[] order, ViewSettings view) {
                throw new UnsupportedOperationException();
            }
        };
        Workbench workbench = new Workbench(gui, new TerminalTraits(ColorDepth.INDEXED_256, true), ready, scenario, catalog,
                Set.of(), Path.of("."));
        workbench.open();
        workbench.ranking().await(60_000);
        long t = System.nanoTime();
        workbench.tick();
        gui.getGUIThread().processEventsAndUpdate();
        double swapKeyMs = (System.nanoTime() - t) / 1e6;
        while (workbench.isSorting()) {
            workbench.tick();
            Thread.sleep(1);
        }
        gui.getGUIThread().processEventsAndUpdate();
        double firstViewMs = (System.nanoTime() - t) / 1e6;

        // Warm up the drawing code, then time single keys, each followed by a full redraw.
        KeyType[] pattern = {KeyType.ArrowDown, KeyType.ArrowDown, KeyType.PageDown, KeyType.ArrowRight, KeyType.ArrowDown,
                KeyType.PageDown, KeyType.ArrowLeft, KeyType.ArrowUp};
        for (int i = 0; i < 400; i++) {
            press(gui, vt, pattern[i % pattern.length]);
        }
        press(gui, vt, KeyType.Home);
        int n = 800;
        double[] ms = new double[n + 2];
        for (int i = 0; i < n; i++) {
            ms[i] = press(gui, vt, pattern[i % pattern.length]);
        }
        ms[n] = press(gui, vt, KeyType.End);
        ms[n + 1] = press(gui, vt, KeyType.Home);
        Arrays.sort(ms);

        // A sort by cost: the key itself, then until the sorted view is on screen.
        workbench.grid().setSelectedColumn(ShortlistGridModel.indexOf(ShortlistColumn.COST));
        vt.addInput(new KeyStroke('s', false, false));
        t = System.nanoTime();
        gui.getGUIThread().processEventsAndUpdate();
        double sortKeyMs = (System.nanoTime() - t) / 1e6;
        while (workbench.isSorting()) {
            workbench.tick();
            Thread.sleep(1);
        }
        gui.getGUIThread().processEventsAndUpdate();
        double sortMs = (System.nanoTime() - t) / 1e6;
        vt.addInput(new KeyStroke('f', false, false));
        t = System.nanoTime();
        gui.getGUIThread().processEventsAndUpdate();
        while (workbench.isSorting()) {
            workbench.tick();
            Thread.sleep(1);
        }
        gui.getGUIThread().processEventsAndUpdate();
        double filterMs = (System.nanoTime() - t) / 1e6;

        System.out.printf(Locale.ROOT, "%-9d %7.2f %9.1f %9.1f %9.1f %9.1f %9.1f %9.2f %7.2f %7.2f  (%d)%n", shortlist.size(),
                sweepSeconds, swapKeyMs, firstViewMs, sortKeyMs, sortMs, filterMs, ms[ms.length / 2],
                ms[(int) (ms.length * 0.95)], ms[ms.length - 1], ms.length);
        screen.stopScreen();
    }

    private static double press(MultiWindowTextGUI gui, DefaultVirtualTerminal vt, KeyType key) throws Exception {
        vt.addInput(new KeyStroke(key));
        long t = System.nanoTime();
        gui.getGUIThread().processEventsAndUpdate();
        return (System.nanoTime() - t) / 1e6;
    }
}
