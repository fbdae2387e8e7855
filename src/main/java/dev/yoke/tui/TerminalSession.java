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
     * Runs a workbench on the user's terminal until the user leaves.
     *
     * @param traits  colours and character set to use
     * @param factory makes the workbench for the opened screen
     * @throws IOException when the terminal cannot be opened or written
     */
    public static void run(TerminalTraits traits, Function<WindowBasedTextGUI, Workbench> factory)
            throws IOException, InterruptedException {
        Charset charset = traits.unicode() ? StandardCharsets.UTF_8 : StandardCharsets.US_ASCII;
        DefaultTerminalFactory terminalFactory = new DefaultTerminalFactory(System.out, System.in, charset)
                .setForceTextTerminal(true)
                // Lets "ESC [ A" split across packets (SSH, tmux) still decode as one arrow key.
                .setInputTimeout(1)
                .setUnixTerminalCtrlCBehaviour(UnixLikeTerminal.CtrlCBehaviour.TRAP);
        TerminalScreen screen = null;
        try {
            Terminal terminal = terminalFactory.createTerminal();
            screen = new TerminalScreen(terminal);
            screen.startScreen();
            screen.setCursorPosition(null);
            MultiWindowTextGUI gui = new MultiWindowTextGUI(screen, new DefaultWindowManager(),
                    new EmptySpace(TextColor.ANSI.DEFAULT));
            Workbench workbench = factory.apply(gui);
            workbench.open();
            while (!workbench.isFinished()) {
                boolean busy = gui.getGUIThread().processEventsAndUpdate();
                workbench.tick();
                if (!busy) {
                    Thread.sleep(15);
                }
            }
        } finally {
            if (screen != null) {
                screen.stopScreen();
            }
        }
    }
}
