package dev.yoke.tui.edit;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.gui2.MultiWindowTextGUI;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;

import java.io.IOException;
import java.io.UncheckedIOException;

/** A window manager on Lanterna's virtual terminal: feeds keys and reads the screen as text. */
final class TerminalDriver implements AutoCloseable {

    final DefaultVirtualTerminal terminal;
    final TerminalScreen screen;
    final MultiWindowTextGUI gui;

    TerminalDriver(int columns, int rows) {
        try {
            terminal = new DefaultVirtualTerminal(new TerminalSize(columns, rows));
            screen = new TerminalScreen(terminal);
            screen.startScreen();
            gui = new MultiWindowTextGUI(screen);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Draws pending changes. */
    TerminalDriver update() {
        try {
            gui.getGUIThread().processEventsAndUpdate();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return this;
    }

    /** Types each character as a key press. */
    TerminalDriver type(String text) {
        for (char c : text.toCharArray()) {
            terminal.addInput(new KeyStroke(c, false, false));
        }
        return update();
    }

    TerminalDriver press(KeyType key) {
        terminal.addInput(new KeyStroke(key));
        return update();
    }

    TerminalDriver press(KeyType key, int times) {
        for (int i = 0; i < times; i++) {
            terminal.addInput(new KeyStroke(key));
        }
        return update();
    }

    /** Empties the field under the cursor (End, then Backspace over every character). */
    TerminalDriver clearField(int length) {
        terminal.addInput(new KeyStroke(KeyType.End));
        return press(KeyType.Backspace, length);
    }

    /** The screen as lines of text. */
    String text() {
        update();
        return terminal.toString();
    }

    /** The first screen line containing {@code needle} and the line below it (where a long message goes). */
    String lineWithNext(String needle) {
        String[] lines = text().split("\n");
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].contains(needle)) {
                return lines[i] + "\n" + (i + 1 < lines.length ? lines[i + 1] : "");
            }
        }
        throw new AssertionError("'" + needle + "' is not on screen:\n" + String.join("\n", lines));
    }

    @Override
    public void close() throws IOException {
        screen.stopScreen();
    }
}
