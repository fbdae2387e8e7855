package dev.yoke.tui;

import com.googlecode.lanterna.gui2.BasicWindow;
import com.googlecode.lanterna.gui2.BorderLayout;
import com.googlecode.lanterna.gui2.Panel;
import com.googlecode.lanterna.gui2.Window;
import com.googlecode.lanterna.gui2.WindowBasedTextGUI;
import com.googlecode.lanterna.gui2.WindowListenerAdapter;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import dev.yoke.engine.PairingResult;
import dev.yoke.engine.Shortlist;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * The terminal workbench: the shortlist screen and the screens it opens (pairing detail, help,
 * cautions), the prompts (find, margin threshold, export) and the background ranking.
 *
 * <p>Everything here runs on the user-interface thread; the ranking runs on its own thread and
 * is only read through {@link BackgroundRanking}. The owner calls {@link #tick()} between input
 * events to pick up progress and finished rankings.
 */
public final class Workbench implements ScreenLoop {

    private final WindowBasedTextGUI gui;
    private final TerminalTraits traits;
    private final WorkbenchBackend backend;
    private final Path exportFolder;
    private EditorHooks editors = EditorHooks.NONE;

    private Scenario scenario;
    private Catalog catalog;
    private Set<String> suspectIds;
    private Shortlist shortlist;
    private ViewSettings view = ViewSettings.DEFAULT;
    private ShortlistGridModel gridModel;

    /** Above this many rows a new sort or filter runs on the worker thread. */
    private int sortOnScreenThreadLimit = 50_000;

    private final ExecutorService viewWorker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "yoke-view");
        t.setDaemon(true);
        return t;
    });
    private Future<ShortlistGridModel> pendingView;
    private Future<String> pendingExport;
    private int pendingKeepRow;
    private long lastProgressDraw;
    private BackgroundRanking ranking;
    private String message = "";
    private Prompt prompt;
    private boolean finished;

    private final BasicWindow shortlistWindow;
    private final GridComponent grid;
    private final Bar statusBar;
    private final Bar messageBar;

    /** A one-line question on the message line; {@code accept} returns an error to show, or null when done. */
    private static final class Prompt {
        final String label;
        final LineEditor editor;
        final Function<String, String> accept;
        String error = "";

        Prompt(String label, String initial, Function<String, String> accept) {
            this.label = label;
            this.editor = new LineEditor(initial);
            this.accept = accept;
        }
    }

    public Workbench(WindowBasedTextGUI gui, TerminalTraits traits, WorkbenchBackend backend,
            Scenario scenario, Catalog catalog, Set<String> suspectIds, Path exportFolder) {
        this.gui = gui;
        this.traits = traits;
        this.backend = backend;
        this.scenario = scenario;
        this.catalog = catalog;
        this.suspectIds = Set.copyOf(suspectIds);
        this.exportFolder = exportFolder;
        this.gridModel = ShortlistGridModel.of(null, view, traits.glyphs(), this.suspectIds);

        grid = new GridComponent(gridModel, traits);
        grid.setSelectedColumn(ShortlistGridModel.indexOf(ShortlistColumn.BINDING_MARGIN));
        grid.setKeyHandler(this::onShortlistKey);
        grid.setEmptyMessage("ranking...");
        statusBar = new Bar(traits, Tone.BAR, this::statusText);
        messageBar = new Bar(traits, Tone.NORMAL, this::messageText);
        Bar footer = new Bar(traits, Tone.BAR, w -> " " + KeyMap.footer(KeyMap.View.SHORTLIST, w - 1));

        Panel bottom = new Panel(new BorderLayout());
        bottom.addComponent(messageBar, BorderLayout.Location.TOP);
        bottom.addComponent(footer, BorderLayout.Location.BOTTOM);
        Panel panel = new Panel(new BorderLayout());
        panel.addComponent(statusBar, BorderLayout.Location.TOP);
        panel.addComponent(grid, BorderLayout.Location.CENTER);
        panel.addComponent(bottom, BorderLayout.Location.BOTTOM);

        shortlistWindow = new BasicWindow("Shortlist");
        shortlistWindow.setHints(List.of(Window.Hint.FULL_SCREEN, Window.Hint.NO_DECORATIONS));
        shortlistWindow.setComponent(panel);
        shortlistWindow.setFocusedInteractable(grid);
        shortlistWindow.addWindowListener(new WindowListenerAdapter() {
            @Override
            public void onInput(Window window, KeyStroke key, AtomicBoolean deliverEvent) {
                if (KeyMap.isInterrupt(key)) {
                    quit();
                    deliverEvent.set(false);
                } else if (prompt != null) {
                    promptKey(key);
                    deliverEvent.set(false);
                }
            }
        });
    }

    /** Shows the shortlist and starts the first ranking. */
    @Override
    public void open() {
        gui.addWindow(shortlistWindow);
        gui.setActiveWindow(shortlistWindow);
        startRanking();
    }

    /** Shortlists larger than this are sorted and filtered on the worker thread (tests lower it). */
    void setSortOnScreenThreadLimit(int rows) {
        this.sortOnScreenThreadLimit = rows;
    }

    /** True while a sort or filter runs on the worker thread. */
    public boolean isSorting() {
        return pendingView != null;
    }

    /** Where the edit keys go. */
    public void setEditors(EditorHooks hooks) {
        this.editors = hooks;
    }

    public WindowBasedTextGUI gui() {
        return gui;
    }

    public TerminalTraits traits() {
        return traits;
    }

    public Scenario scenario() {
        return scenario;
    }

    public Catalog catalog() {
        return catalog;
    }

    /** For the editors: the scenario changed; rank again. */
    public void scenarioChanged(Scenario changed) {
        this.scenario = changed;
        startRanking();
    }

    /** For the editors: the catalog changed (with the ids its check finds implausible); rank again. */
    public void catalogChanged(Catalog changed, Set<String> suspects) {
        this.catalog = changed;
        this.suspectIds = Set.copyOf(suspects);
        startRanking();
    }

    /** Shows a line of text on the message line until the next message. */
    public void showMessage(String text) {
        message = text;
        messageBar.invalidate();
    }

    /** True once the user asked to leave. */
    @Override
    public boolean isFinished() {
        return finished;
    }

    public GridComponent grid() {
        return grid;
    }

    public ShortlistGridModel gridModel() {
        return gridModel;
    }

    public ViewSettings view() {
        return view;
    }

    /** The running or last ranking (null before the first). */
    public BackgroundRanking ranking() {
        return ranking;
    }

    /** Rank again in the background; a run still going is stopped first. */
    public void startRanking() {
        if (ranking != null && ranking.state() == BackgroundRanking.State.RUNNING) {
            ranking.cancel();
        }
        ranking = BackgroundRanking.start(backend, scenario, catalog);
        statusBar.invalidate();
        messageBar.invalidate();
    }

    /**
     * Picks up the ranking's progress, or its finished table. Call between input events.
     *
     * @return true when something on screen changed
     */
    @Override
    public boolean tick() {
        boolean viewChanged = takeFinishedView() | takeFinishedExport();
        if (ranking == null) {
            return viewChanged;
        }
        switch (ranking.state()) {
            case RUNNING -> {
                long now = System.nanoTime();
                if (now - lastProgressDraw > 100_000_000L) {
                    lastProgressDraw = now;
                    messageBar.invalidate();
                    return true;
                }
                return viewChanged;
            }
            case DONE -> {
                Shortlist result = ranking.result();
                if (result != null && result != shortlist) {
                    shortlist = result;
                    applyView(view, -1);
                    grid.setEmptyMessage("no pairing passes the filters (z clears them)");
                    if (pendingView == null) {
                        showMessage(String.format(Locale.ROOT, "ranked %,d pairings in %.1f s", shortlist.evaluatedCount(),
                                ranking.seconds()));
                    }
                    return true;
                }
                return viewChanged;
            }
            case CANCELLED, FAILED -> {
                String text = ranking.state() == BackgroundRanking.State.CANCELLED
                        ? "ranking stopped" + (shortlist != null ? "; showing the previous results" : "")
                        : "ranking failed: " + ranking.failure();
                if (shortlist == null) {
                    grid.setEmptyMessage(text + " (r ranks again)");
                }
                showMessage(text);
                BackgroundRanking ended = ranking;
                ranking = null;
                return ended != null;
            }
            default -> {
                return false;
            }
        }
    }

    /**
     * Re-sorts and re-filters; keeps the cursor on the same pairing when it stays visible. Large
     * shortlists are sorted on a worker thread (about a second at a million rows) while the
     * screen keeps answering; the finished view is swapped in by {@link #tick()}.
     */
    private void applyView(ViewSettings newView, int keepRow) {
        view = newView;
        if (pendingView != null) {
            pendingView.cancel(true);
            pendingView = null;
        }
        Shortlist s = shortlist;
        if (s == null || s.size() <= sortOnScreenThreadLimit) {
            showView(ShortlistGridModel.of(s, view, traits.glyphs(), suspectIds), keepRow);
            return;
        }
        ViewSettings v = view;
        Set<String> suspects = suspectIds;
        pendingView = viewWorker.submit(() -> ShortlistGridModel.of(s, v, traits.glyphs(), suspects));
        pendingKeepRow = keepRow;
        showMessage(String.format(Locale.ROOT, "sorting and filtering %d rows...", s.size()));
        statusBar.invalidate();
    }

    private void showView(ShortlistGridModel model, int keepRow) {
        gridModel = model;
        int cursor = keepRow >= 0 ? gridModel.gridRowOf(keepRow) : -1;
        grid.setModel(gridModel);
        grid.setCursorRow(Math.max(0, cursor));
        statusBar.invalidate();
    }

    /** Reports an export written on the worker thread, once it is done. */
    private boolean takeFinishedExport() {
        Future<String> f = pendingExport;
        if (f == null || !f.isDone()) {
            return false;
        }
        pendingExport = null;
        deliver(f, this::showMessage, why -> showMessage("could not write the CSV: " + why));
        return true;
    }

    /** True while an export is being written. */
    public boolean isExporting() {
        return pendingExport != null;
    }

    /** Swaps in a view sorted on the worker thread, once it is ready. */
    private boolean takeFinishedView() {
        Future<ShortlistGridModel> f = pendingView;
        if (f == null || !f.isDone()) {
            return false;
        }
        pendingView = null;
        deliver(f, view -> {
            showView(view, pendingKeepRow);
            if (message.startsWith("sorting and filtering")) {
                showMessage("");
            }
        }, why -> showMessage("could not sort: " + why));
        return true;
    }

    /** Hands a finished background task's value on, or the message of what stopped it. */
    private static <T> void deliver(Future<T> done, Consumer<T> onValue, Consumer<String> onFailure) {
        T value;
        try {
            value = done.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return;
        } catch (CancellationException | ExecutionException e) {
            Throwable cause = e.getCause() == null ? e : e.getCause();
            onFailure.accept(cause.getMessage());
            return;
        }
        onValue.accept(value);
    }

    private int cursorRow() {
        return gridModel.rowCount() == 0 ? -1 : gridModel.shortlistRow(grid.getCursorRow());
    }

    private ShortlistColumn selectedColumn() {
        return ShortlistGridModel.columnAt(grid.getSelectedColumn());
    }

    private boolean onShortlistKey(KeyStroke key) {
        KeyMap.Action action = KeyMap.actionFor(KeyMap.View.SHORTLIST, key).orElse(null);
        if (action == null) {
            return false;
        }
        switch (action) {
            case OPEN_DETAIL -> openDetail();
            case SORT -> applyView(view.sortedBy(selectedColumn()), cursorRow());
            case SORT_SECOND -> applyView(view.thenSortedBy(selectedColumn()), cursorRow());
            case FEASIBLE_ONLY -> applyView(view.withFilter(view.filter().withFeasibleOnly(!view.filter().feasibleOnly())),
                    cursorRow());
            case PARETO_ONLY -> applyView(view.withFilter(view.filter().withParetoOnly(!view.filter().paretoOnly())),
                    cursorRow());
            case CLEAR_FILTERS -> applyView(view.withoutFilters(), cursorRow());
            case FIND -> ask("find in part ids and labels: ", view.filter().text(), text -> {
                applyView(view.withFilter(view.filter().withText(text)), cursorRow());
                return null;
            });
            case THRESHOLD -> askThreshold();
            case EXPORT -> askExport();
            case RERANK -> startRanking();
            case CANCEL_RANKING -> {
                if (ranking != null && ranking.state() == BackgroundRanking.State.RUNNING) {
                    ranking.cancel();
                    showMessage("stopping the ranking...");
                }
            }
            case EDIT_PARTS -> editors.openParts(this);
            case EDIT_BENCH -> editors.openBench(this);
            case HELP -> openHelp();
            case CAUTIONS -> openCautions();
            case QUIT -> quit();
            default -> {
                return false;
            }
        }
        return true;
    }

    private void quit() {
        finished = true;
        viewWorker.shutdownNow();
        if (ranking != null) {
            ranking.cancel();
        }
    }

    private void ask(String label, String initial, Function<String, String> accept) {
        prompt = new Prompt(label, initial, accept);
        messageBar.invalidate();
    }

    private void promptKey(KeyStroke key) {
        Prompt p = prompt;
        if (key.getKeyType() == KeyType.Escape) {
            prompt = null;
            showMessage("");
        } else if (key.getKeyType() == KeyType.Enter) {
            String error = p.accept.apply(p.editor.text());
            if (error == null) {
                if (prompt == p) {
                    prompt = null;
                }
            } else {
                p.error = error;
            }
        } else {
            p.editor.edit(key);
        }
        messageBar.invalidate();
        statusBar.invalidate();
    }

    private void askThreshold() {
        ShortlistColumn column = selectedColumn().isMargin() ? selectedColumn() : ShortlistColumn.BINDING_MARGIN;
        Double current = view.threshold(column);
        String initial = current == null ? "" : Cells.fixed(current * 100, 1);
        ask("keep " + column.title() + " >= (percent, empty removes): ", initial, text -> {
            String t = text.strip();
            if (t.endsWith("%")) {
                t = t.substring(0, t.length() - 1).strip();
            }
            if (t.isEmpty()) {
                applyView(view.withThreshold(column, Double.NaN), cursorRow());
                return null;
            }
            try {
                double percent = Double.parseDouble(t);
                applyView(view.withThreshold(column, percent / 100.0), cursorRow());
                return null;
            } catch (NumberFormatException e) {
                return "expected a percentage such as 5 or -10, got '" + text + "'";
            }
        });
    }

    private void askExport() {
        if (gridModel.rowCount() == 0) {
            showMessage("nothing to export: no rows shown");
            return;
        }
        Path[] confirmed = new Path[1];
        ask("export to CSV file: ", ExportTarget.DEFAULT_NAME, text -> {
            Path file;
            try {
                file = ExportTarget.resolve(exportFolder, text);
            } catch (IllegalArgumentException e) {
                return e.getMessage();
            }
            if (Files.exists(file) && !file.equals(confirmed[0])) {
                confirmed[0] = file;
                return file.getFileName() + " exists: Enter again replaces it, Esc keeps it";
            }
            if (pendingExport != null) {
                return "still writing the previous export";
            }
            // Written on the worker thread: a million rows take seconds, the screen keeps answering.
            Shortlist s = shortlist;
            int[] order = gridModel.order();
            ViewSettings v = view;
            pendingExport = viewWorker.submit(() -> {
                backend.writeCsv(file, s, order, v);
                return String.format(Locale.ROOT, "wrote %,d rows to %s", order.length, file);
            });
            showMessage("writing " + order.length + " rows to " + file + "...");
            return null;
        });
    }

    private void openDetail() {
        int row = cursorRow();
        if (row < 0) {
            return;
        }
        PairingResult result;
        try {
            result = shortlist.explain(row);
        } catch (RuntimeException e) {
            showMessage("could not explain this pairing: " + e.getMessage());
            return;
        }
        Scenario shown = shortlist.evaluator().scenario();
        String title = "Pairing detail: " + result.motor().id() + " with " + result.powerSwitch().id()
                + " at " + Cells.engineering(result.pwmFrequency(), "Hz") + ", gear " + Cells.number(result.gearRatio());
        openPage(title, w -> DetailReport.lines(result, shown, traits, w), KeyMap.View.DETAIL);
    }

    private void openHelp() {
        openPage("Help: keys", this::helpLines, KeyMap.View.PAGE);
    }

    private void openCautions() {
        openPage("Cautions", Cautions::lines, KeyMap.View.PAGE);
    }

    /** Adds a help line, wrapping its text under the description column (column 14) when too wide. */
    private static void addWrapped(List<Line> lines, String text, int width) {
        int indent = 14;
        if (text.length() <= width - 1 || width <= indent + 20) {
            lines.add(Line.of(text));
            return;
        }
        int split = Math.min(text.length(), indent);
        String head = text.substring(0, split);
        List<String> parts = Cautions.wrap(text.substring(split).strip(), width - 1 - indent);
        for (int i = 0; i < parts.size(); i++) {
            lines.add(Line.of((i == 0 ? String.format("%-" + indent + "s", head) : " ".repeat(indent)) + parts.get(i)));
        }
    }

    /** The help page laid out for a width: long descriptions wrap under themselves, never cut. */
    private List<Line> helpLines(int width) {
        Glyphs g = traits.glyphs();
        List<Line> lines = new ArrayList<>();
        for (String s : KeyMap.helpLines()) {
            boolean heading = !s.isEmpty() && !s.startsWith(" ");
            if (heading) {
                lines.add(Line.of(Tone.HEADING, s));
            } else {
                addWrapped(lines, s, width);
            }
        }
        lines.add(Line.blank());
        lines.add(Line.of(Tone.HEADING, "Marks"));
        addWrapped(lines, "  " + g.paretoMark() + "        on the cost-loss front of feasible pairings: no other feasible pairing is both cheaper and less lossy", width);
        addWrapped(lines, "  " + g.suspectMark() + "id      a part the catalog check found implausible", width);
        addWrapped(lines, "  ok FAIL  verdict: FAIL when any margin is negative", width);
        addWrapped(lines, "  " + g.descending() + " " + g.ascending() + " " + g.descending() + "2   sort direction on a heading; 2 marks the second key", width);
        lines.add(Line.of("  m:...    margin columns, (limit - value) / limit: negative fails"));
        lines.add(Line.blank());
        lines.add(Line.of(Tone.WARN, "Screening estimates only; press c for the safety cautions."));
        return lines;
    }

    private void openPage(String title, java.util.function.IntFunction<List<Line>> layout, KeyMap.View pageView) {
        PageWindow window = new PageWindow(title, layout, pageView, traits);
        window.page().setKeyHandler(key -> {
            if (KeyMap.isInterrupt(key)) {
                quit();
                return true;
            }
            KeyMap.Action action = KeyMap.actionFor(pageView, key).orElse(null);
            if (action == null) {
                return false;
            }
            switch (action) {
                case BACK, PAGE_BACK -> window.close();
                case HELP -> openHelp();
                case CAUTIONS -> openCautions();
                default -> {
                    return false;
                }
            }
            return true;
        });
        gui.addWindow(window);
        gui.setActiveWindow(window);
    }

    private String statusText(int width) {
        String counts = shortlist == null
                ? "ranking"
                : shortlist.size() < shortlist.evaluatedCount()
                        ? String.format(Locale.ROOT, "%,d shown / best %,d kept of %,d / %,d feasible", gridModel.rowCount(),
                                shortlist.size(), shortlist.evaluatedCount(), shortlist.feasibleCount())
                        : String.format(Locale.ROOT, "%,d shown / %,d total / %,d feasible", gridModel.rowCount(),
                                shortlist.size(), shortlist.feasibleCount());
        String filters = view.describeFilters();
        return " " + scenario.name() + " | " + counts + (filters.isEmpty() ? "" : " | only " + filters)
                + " | sort " + view.describeSort();
    }

    private String messageText(int width) {
        Prompt p = prompt;
        if (p != null) {
            String field = p.editor.text();
            int fieldWidth = Math.max(field.length() + 1, 16);
            int from = 1 + p.label.length();
            messageBar.setHighlightQuietly(from, from + fieldWidth, from + p.editor.caret());
            return " " + p.label + KeyMap.pad(field, fieldWidth) + (p.error.isEmpty() ? "" : "  " + p.error);
        }
        messageBar.setHighlightQuietly(-1, -1, -1);
        if (ranking != null && ranking.state() == BackgroundRanking.State.RUNNING) {
            double f = ranking.fraction();
            String percent = Double.isNaN(f) ? "" : String.format(Locale.ROOT, " %.0f%%", 100 * f);
            String bar = Double.isNaN(f) ? "" : " " + DetailReport.bar(f, 20, traits.glyphs());
            return String.format(Locale.ROOT, " ranking%s%s  %,d pairings, %.1f s  (Esc stops)",
                    percent, bar, pairingCount(), ranking.seconds());
        }
        return " " + message;
    }

    /** Pairings a ranking of the current scenario and catalog evaluates. */
    private long pairingCount() {
        return (long) catalog.motors().size() * catalog.switches().size()
                * scenario.bench().pwmFrequencies().size() * scenario.bench().gearRatios().size();
    }
}
