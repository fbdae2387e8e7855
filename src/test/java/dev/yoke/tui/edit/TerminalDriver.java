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
            update();
        }
        return this;
    }

    TerminalDriver press(KeyType key) {
        terminal.addInput(new KeyStroke(key));
        return update();
    }

    TerminalDriver press(KeyType key, int times) {
        for (int i = 0; i < times; i++) {
            press(key);
        }
        return this;
    }

    /** Empties the field under the cursor (End, then Backspace over every character). */
    TerminalDriver clearField(int length) {
        press(KeyType.End);
        return press(KeyType.Backspace, length);
    }

    /** The screen as lines of text. */
    String text() {
        update();
        return terminal.toString();
    }

    @Override
    public void close() throws IOException {
        screen.stopScreen();
    }
}
