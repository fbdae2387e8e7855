package dev.yoke.tui;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.TextCharacter;
import com.googlecode.lanterna.gui2.DefaultWindowManager;
import com.googlecode.lanterna.gui2.EmptySpace;
import com.googlecode.lanterna.gui2.MultiWindowTextGUI;
import com.googlecode.lanterna.TextColor;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Set;

/** A workbench on Lanterna's virtual terminal: feed keys, read the screen. */
final class ScreenHarness implements AutoCloseable {

    final DefaultVirtualTerminal terminal;
    final TerminalScreen screen;
    final MultiWindowTextGUI gui;
    final Workbench workbench;
    final Fixtures.TestBackend backend;

    ScreenHarness(int columns, int rows, TerminalTraits traits, Path exportFolder) throws IOException {
        this(columns, rows, traits, exportFolder, new Fixtures.TestBackend(6, 5), Set.of());
    }

    ScreenHarness(int columns, int rows, TerminalTraits traits, Path exportFolder, Fixtures.TestBackend backend,
            Set<String> suspects) throws IOException {
        this(columns, rows, traits, exportFolder, backend, Fixtures.scenario(),
                Fixtures.catalog(backend.motors, backend.switches), suspects);
    }

    /** A workbench on any scenario and catalog (the demo, for layouts that depend on real labels). */
    ScreenHarness(int columns, int rows, TerminalTraits traits, Path exportFolder, Fixtures.TestBackend backend,
            Scenario scenario, Catalog catalog, Set<String> suspects) throws IOException {
        terminal = new DefaultVirtualTerminal(new TerminalSize(columns, rows));
        screen = new TerminalScreen(terminal);
        screen.startScreen();
        gui = new MultiWindowTextGUI(screen, new DefaultWindowManager(), new EmptySpace(TextColor.ANSI.DEFAULT));
        this.backend = backend;
        workbench = new Workbench(gui, traits, backend, scenario, catalog, suspects, exportFolder);
        workbench.open();
    }

    /** Waits for the background ranking to finish and draws. */
    ScreenHarness ranked() throws Exception {
        BackgroundRanking run = workbench.ranking();
        if (run != null) {
            run.await(10_000);
        }
        workbench.tick();
        update();
        return this;
    }

    ScreenHarness update() throws IOException {
        gui.getGUIThread().processEventsAndUpdate();
        return this;
    }

    ScreenHarness press(KeyStroke... keys) throws IOException {
        for (KeyStroke k : keys) {
            terminal.addInput(k);
            update();
        }
        workbench.tick();
        return update();
    }

    ScreenHarness press(KeyType type) throws IOException {
        return press(new KeyStroke(type));
    }

    ScreenHarness press(KeyType type, int times) throws IOException {
        for (int i = 0; i < times; i++) {
            terminal.addInput(new KeyStroke(type));
        }
        return update();
    }

    ScreenHarness type(String text) throws IOException {
        for (char c : text.toCharArray()) {
            terminal.addInput(new KeyStroke(c, false, false));
        }
        return update();
    }

    ScreenHarness resize(int columns, int rows) throws IOException {
        terminal.setTerminalSize(new TerminalSize(columns, rows));
        return update().update();
    }

    /** The screen as text, one line per row. */
    String text() {
        return terminal.toString();
    }

    /** One screen row. */
    String line(int row) {
        StringBuilder s = new StringBuilder();
        int width = terminal.getTerminalSize().getColumns();
        for (int x = 0; x < width; x++) {
            s.append(terminal.getCharacter(x, row).getCharacterString());
        }
        return s.toString();
    }

    TextCharacter at(int column, int row) {
        return terminal.getCharacter(column, row);
    }

    int rows() {
        return terminal.getTerminalSize().getRows();
    }

    @Override
    public void close() throws IOException {
        screen.stopScreen();
    }
}
