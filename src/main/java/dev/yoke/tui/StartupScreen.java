package dev.yoke.tui;

import com.googlecode.lanterna.gui2.WindowBasedTextGUI;
import dev.yoke.catalog.Problem;
import java.util.List;
import java.util.function.BiFunction;

/**
 * The workbench's first minutes: the screen opens at once on a view of the catalog and scenario
 * being read (a large catalog takes seconds), Esc or q leaves, and once both are read the loaded
 * inputs become the workbench proper, which takes over the screen. When the files have problems
 * the screen closes and the owner prints them ({@link #problems()}): in the user's terminal
 * they stay readable after the program ends, with the file, line and column to go to.
 *
 * @param <T> what the reading produces
 */
public final class StartupScreen<T> implements ScreenLoop {

    /** How often the progress view is redrawn while reading, in nanoseconds. */
    private static final long REDRAW_NANOS = 100_000_000L;

    private final WindowBasedTextGUI gui;
    private final BackgroundLoad<T> load;
    private final BiFunction<WindowBasedTextGUI, T, ? extends ScreenLoop> opener;
    private final PageWindow window;
    private ScreenLoop opened;
    private boolean left;
    private long lastDraw;
    private int drawnChanges = -1;

    /**
     * @param subject what is read, for the title line (e.g. the catalog folder and scenario file)
     * @param load    the reading; started on the first tick, once the screen has drawn (on a
     *                busy machine a reading started earlier takes the processor from the first paint)
     * @param opener  makes the workbench from what was read (not yet opened)
     */
    public StartupScreen(WindowBasedTextGUI gui, TerminalTraits traits, String subject, BackgroundLoad<T> load,
            BiFunction<WindowBasedTextGUI, T, ? extends ScreenLoop> opener) {
        this.gui = gui;
        this.load = load;
        this.opener = opener;
        this.window = new PageWindow("Yoke: reading " + subject, w -> LoadingReport.lines(load, traits, w),
                KeyMap.View.LOADING, traits);
        window.page().setKeyHandler(key -> {
            if (KeyMap.actionFor(KeyMap.View.LOADING, key).orElse(null) == KeyMap.Action.LEAVE_WHILE_READING) {
                left = true;
                return true;
            }
            return false;
        });
    }

    @Override
    public void open() {
        gui.addWindow(window);
        gui.setActiveWindow(window);
    }

    @Override
    public boolean tick() {
        if (opened != null) {
            return opened.tick();
        }
        if (left) {
            return false;
        }
        load.start();
        switch (load.state()) {
            case DONE -> {
                window.close();
                opened = opener.apply(gui, load.result());
                opened.open();
                return true;
            }
            case FAILED -> {
                return false;
            }
            default -> {
                // Redrawn when a file was reported, and every tenth of a second for the clock.
                long now = System.nanoTime();
                int changes = load.changes();
                if (changes != drawnChanges || now - lastDraw >= REDRAW_NANOS) {
                    lastDraw = now;
                    drawnChanges = changes;
                    window.page().relayout();
                    return true;
                }
                return false;
            }
        }
    }

    @Override
    public boolean isFinished() {
        if (opened != null) {
            return opened.isFinished();
        }
        return left || load.state() == BackgroundLoad.State.FAILED;
    }

    /** True when the user left before the reading ended. */
    public boolean leftWhileReading() {
        return left && opened == null;
    }

    /** The problems that stopped the reading (print them once the screen is closed); empty otherwise. */
    public List<Problem> problems() {
        return opened == null ? load.problems() : List.of();
    }

    /** An unexpected failure of the reader, or null. */
    public Throwable crash() {
        return opened == null ? load.crash() : null;
    }

    /** The workbench, once the inputs are read; null before. */
    public ScreenLoop opened() {
        return opened;
    }

    /** The reading view (tests). */
    PageWindow readingWindow() {
        return window;
    }
}
