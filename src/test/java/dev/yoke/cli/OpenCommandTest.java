package dev.yoke.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import dev.yoke.tui.TerminalSession;
import dev.yoke.tui.TerminalTraits;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code yoke open} with inputs that fail to load: the screen opens, closes once the reading
 * fails, and the problems are printed as {@code file:line:column: field: message} with exit
 * status 2 and no stack trace, as when the inputs were read before the screen opened. Driven on
 * Lanterna's virtual terminal through the same loop as the real terminal.
 */
class OpenCommandTest {

    @Test
    void loadErrorsCloseTheScreenAndArePrintedWithStatus2(@TempDir Path dir) throws Exception {
        Path bad = Files.writeString(dir.resolve("bad.yaml"), """
                name: x
                bench:
                  bus_voltage: 24 mH
                profile: 3
                """);
        OpenCommand open = new OpenCommand();
        open.scenarioFile = bad;
        open.catalogOption = new CatalogOption();
        open.catalogOption.catalogDir = Path.of("catalog");
        StringWriter err = new StringWriter();
        DefaultVirtualTerminal terminal = new DefaultVirtualTerminal(new TerminalSize(100, 30));
        int status = open.open(TerminalTraits.PLAIN,
                factory -> TerminalSession.runOn(new TerminalScreen(terminal), factory), new PrintWriter(err));
        String text = err.toString();
        assertAll(
                () -> assertEquals(YokeCommand.BAD_INPUT, status),
                // The same messages 'yoke check' gives for this file (CheckCommandTest).
                () -> assertTrue(text.contains(bad + ":3:16: bus_voltage: expected volts (V), got '24 mH' (an inductance)"), text),
                () -> assertTrue(text.contains(bad + ":4:10: profile: expected a section"), text),
                () -> assertFalse(text.contains("Exception"), text),
                () -> assertFalse(text.contains("\tat "), text));
    }

    @Test
    void aMissingCatalogFolderIsReportedTheSameWay(@TempDir Path dir) throws Exception {
        OpenCommand open = new OpenCommand();
        open.scenarioFile = Path.of(OpenCommand.DEMO);
        open.catalogOption = new CatalogOption();
        open.catalogOption.catalogDir = dir.resolve("no-such-folder");
        StringWriter err = new StringWriter();
        DefaultVirtualTerminal terminal = new DefaultVirtualTerminal(new TerminalSize(80, 24));
        int status = open.open(TerminalTraits.PLAIN,
                factory -> TerminalSession.runOn(new TerminalScreen(terminal), factory), new PrintWriter(err));
        assertEquals(YokeCommand.BAD_INPUT, status);
        assertTrue(err.toString().contains(dir.resolve("no-such-folder") + ": no such catalog folder"), err.toString());
    }
}
