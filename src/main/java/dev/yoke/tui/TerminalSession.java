package dev.yoke.tui;

import com.googlecode.lanterna.TextColor;
import com.googlecode.lanterna.gui2.DefaultWindowManager;
import com.googlecode.lanterna.gui2.EmptySpace;
import com.googlecode.lanterna.gui2.MultiWindowTextGUI;
import com.googlecode.lanterna.gui2.WindowBasedTextGUI;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.DefaultTerminalFactory;
import com.googlecode.lanterna.terminal.Terminal;
import com.googlecode.lanterna.terminal.ansi.UnixLikeTerminal;
import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.Map;
import java.util.function.Function;

/**
 * Opens the user's terminal for the workbench and runs it until the user leaves, restoring the
 * terminal whatever happens. Always a text terminal (never a desktop window, even where a display
 * is set), Ctrl+C trapped as a key, escape sequences given time to arrive over slow links.
 */
public final class TerminalSession {

    private TerminalSession() {
    }

    /**
     * Why the workbench cannot run here, or null when it can: it needs a terminal on both standard
     * input and output, and a {@code TERM} other than {@code dumb}. Decided before the terminal is
     * opened because opening one without a TTY fails or writes escape codes into a file.
     */
    public static String whyNotInteractive(boolean hasConsole, Map<String, String> env) {
        String term = env.get("TERM");
        if (!hasConsole) {
            return "no interactive terminal (input or output is redirected)";
        }
        if (term == null || term.isBlank()) {
            return "TERM is not set";
        }
        if (term.equals("dumb")) {
            return "TERM=dumb cannot show a full-screen screen";
        }
        return null;
    }

    /**
     * Runs a screen loop (the workbench, or the reading view that becomes it) on the user's
     * terminal until the user leaves; returns it, so the owner can ask how it ended.
     *
     * @param traits  colours and character set to use
     * @param factory makes the loop for the opened screen
     * @throws IOException when the terminal cannot be opened or written
     */
    public static <T extends ScreenLoop> T run(TerminalTraits traits, Function<WindowBasedTextGUI, T> factory)
            throws IOException, InterruptedException {
        Charset charset = traits.unicode() ? StandardCharsets.UTF_8 : StandardCharsets.US_ASCII;
        DefaultTerminalFactory terminalFactory = new DefaultTerminalFactory(System.out, System.in, charset)
                .setForceTextTerminal(true)
                // Lets "ESC [ A" split across packets (SSH, tmux) still decode as one arrow key.
                .setInputTimeout(1)
                .setUnixTerminalCtrlCBehaviour(UnixLikeTerminal.CtrlCBehaviour.TRAP);
        Terminal terminal = terminalFactory.createTerminal();
        return runOn(new TerminalScreen(terminal), factory);
    }

    /**
     * Runs a screen loop on a screen until it is finished: starts the screen, draws, answers keys,
     * ticks the loop between them, and stops the screen whatever happens (the user's terminal
     * must never be left in raw mode). Tests pass a screen on a virtual terminal.
     */
    public static <T extends ScreenLoop> T runOn(TerminalScreen screen, Function<WindowBasedTextGUI, T> factory)
            throws IOException, InterruptedException {
        try {
            screen.startScreen();
            screen.setCursorPosition(null);
            MultiWindowTextGUI gui = new MultiWindowTextGUI(screen, new DefaultWindowManager(),
                    new EmptySpace(TextColor.ANSI.DEFAULT));
            T loop = factory.apply(gui);
            loop.open();
            while (!loop.isFinished()) {
                boolean busy = gui.getGUIThread().processEventsAndUpdate();
                busy |= loop.tick();
                if (!busy) {
                    Thread.sleep(15);
                }
            }
            return loop;
        } finally {
            screen.stopScreen();
        }
    }
}
