package dev.yoke.tui;

/**
 * What {@link TerminalSession} drives on an open screen: opened once, then ticked between input
 * events (to pick up work finished on other threads) until it says it is finished.
 */
public interface ScreenLoop {

    /** Shows the first window. */
    void open();

    /**
     * Picks up what background threads finished. Called between input events.
     *
     * @return true when something on screen changed
     */
    boolean tick();

    /** True once the user asked to leave (or there is nothing more to show). */
    boolean isFinished();
}
