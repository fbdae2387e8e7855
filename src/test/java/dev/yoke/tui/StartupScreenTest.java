package dev.yoke.tui;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.googlecode.lanterna.TerminalSize;
import com.googlecode.lanterna.TextColor;
import com.googlecode.lanterna.gui2.DefaultWindowManager;
import com.googlecode.lanterna.gui2.EmptySpace;
import com.googlecode.lanterna.gui2.MultiWindowTextGUI;
import com.googlecode.lanterna.input.KeyStroke;
import com.googlecode.lanterna.input.KeyType;
import com.googlecode.lanterna.screen.TerminalScreen;
import com.googlecode.lanterna.terminal.virtual.DefaultVirtualTerminal;
import dev.yoke.catalog.InputException;
import dev.yoke.catalog.Problem;
import dev.yoke.model.Catalog;
import dev.yoke.model.Scenario;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The screen opens before the inputs are read: a reading view (files, parts so far, time), Esc,
 * q or Ctrl+C to leave, then the shortlist once the reading ends. The reader is held on a latch,
 * so each screen is checked at a known point of the reading, never after a sleep.
 */
class StartupScreenTest {

    /** What the test reader produces. */
    private record Read(Scenario scenario, Catalog catalog) {
    }

    @TempDir
    Path dir;

    private DefaultVirtualTerminal terminal;
    private TerminalScreen screen;
    private MultiWindowTextGUI gui;
    private final CountDownLatch reached = new CountDownLatch(1);
    private final CountDownLatch release = new CountDownLatch(1);
    private final Fixtures.TestBackend backend = new Fixtures.TestBackend(6, 5);

    @BeforeEach
    void openVirtualTerminal() throws Exception {
        terminal = new DefaultVirtualTerminal(new TerminalSize(100, 30));
        screen = new TerminalScreen(terminal);
        screen.startScreen();
        gui = new MultiWindowTextGUI(screen, new DefaultWindowManager(), new EmptySpace(TextColor.ANSI.DEFAULT));
    }

    @AfterEach
    void closeVirtualTerminal() throws Exception {
        release.countDown();
        screen.stopScreen();
    }

    /** A reader that reads the motors file, starts on the switches file, and waits there for the test. */
    private BackgroundLoad<Read> heldLoad() throws Exception {
        Path motors = Files.writeString(dir.resolve("motors.yaml"), "x".repeat(3000));
        Path switches = Files.writeString(dir.resolve("switches.yaml"), "x".repeat(1000));
        return BackgroundLoad.of(listener -> {
            listener.filesFound(List.of(motors, switches));
            listener.fileStarted(motors);
            listener.fileRead(motors, 6);
            listener.fileStarted(switches);
            reached.countDown();
            try {
                release.await();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            listener.fileRead(switches, 5);
            return new Read(Fixtures.scenario(), Fixtures.catalog(6, 5));
        });
    }

    private StartupScreen<Read> startup(BackgroundLoad<Read> load) {
        return new StartupScreen<>(gui, TerminalTraits.PLAIN, "the test catalog", load,
                (g, read) -> new Workbench(g, TerminalTraits.PLAIN, backend, read.scenario(), read.catalog(), Set.of(), dir));
    }

    private void update(StartupScreen<?> s) throws Exception {
        s.tick();
        gui.getGUIThread().processEventsAndUpdate();
    }

    private void press(StartupScreen<?> s, KeyStroke key) throws Exception {
        terminal.addInput(key);
        update(s);
    }

    private String line(int row) {
        StringBuilder b = new StringBuilder();
        for (int x = 0; x < terminal.getTerminalSize().getColumns(); x++) {
            b.append(terminal.getCharacter(x, row).getCharacterString());
        }
        return b.toString();
    }

    @Test
    void readingViewShowsEachFileThenTheShortlistTakesOver() throws Exception {
        BackgroundLoad<Read> load = heldLoad();
        StartupScreen<Read> startup = startup(load);
        startup.open();
        gui.getGUIThread().processEventsAndUpdate();
        assertTrue(line(0).contains("Yoke: reading"), "the screen draws before the reading starts: " + line(0));
        assertEquals(BackgroundLoad.State.RUNNING, load.state());
        update(startup);
        assertTrue(reached.await(10, TimeUnit.SECONDS), "the reader reached its hold point");
        update(startup);
        String reading = terminal.toString();
        String motorsLine = reading.lines().filter(l -> l.contains("motors.yaml")).findFirst().orElse("");
        String switchesLine = reading.lines().filter(l -> l.contains("switches.yaml")).findFirst().orElse("");
        assertAll(
                () -> assertTrue(line(0).contains("Yoke: reading the test catalog"), line(0)),
                () -> assertTrue(motorsLine.contains("3.00 kB") && motorsLine.contains("read, 6 parts"), motorsLine),
                () -> assertTrue(switchesLine.contains("1.00 kB") && switchesLine.contains("reading"), switchesLine),
                // 3000 of 4000 bytes are in files read.
                () -> assertTrue(reading.contains("75%") && reading.contains("6 parts so far, 1 of 2 files"), reading),
                () -> assertTrue(line(29).contains("Esc quit"), "the way out is in the footer: " + line(29)),
                () -> assertFalse(startup.isFinished()),
                () -> assertNull(startup.opened(), "no workbench before the inputs are read"));

        release.countDown();
        load.await(10_000);
        update(startup);
        Workbench workbench = (Workbench) startup.opened();
        assertTrue(workbench != null, "the workbench opened once the reading ended");
        workbench.ranking().await(10_000);
        update(startup);
        gui.getGUIThread().processEventsAndUpdate();
        assertAll(
                () -> assertTrue(line(0).contains("test-bench") && line(0).contains("180 shown / 180 total"), line(0)),
                () -> assertTrue(line(1).contains("motor") && line(1).contains("verdict"), line(1)),
                () -> assertTrue(line(2).contains("mo-"), line(2)),
                () -> assertFalse(terminal.toString().contains("Reading the parts catalog"), "the reading view is gone"),
                () -> assertEquals(1, backend.rankings, "ranked once, as when the inputs were read first"));
        press(startup, new KeyStroke('q', false, false));
        assertTrue(startup.isFinished(), "q on the shortlist leaves as before");
    }

    @Test
    void escQAndCtrlCLeaveWhileReading() throws Exception {
        for (KeyStroke key : List.of(new KeyStroke(KeyType.Escape), new KeyStroke('q', false, false),
                new KeyStroke('c', true, false))) {
            BackgroundLoad<Read> load = heldLoad();
            StartupScreen<Read> startup = startup(load);
            startup.open();
            update(startup);
            assertFalse(startup.isFinished());
            press(startup, key);
            assertAll(
                    () -> assertTrue(startup.isFinished(), "left with " + key),
                    () -> assertTrue(startup.leftWhileReading()),
                    () -> assertTrue(startup.problems().isEmpty(), "nothing to report"),
                    () -> assertNull(startup.opened()));
            startup.readingWindow().close();
        }
    }

    @Test
    void problemsInTheFilesEndTheScreenAndAreKeptForPrinting() throws Exception {
        Path file = dir.resolve("parts.yaml");
        Problem problem = Problem.error(file, 12, 5, "r_ds_on", "must be above zero");
        BackgroundLoad<Read> load = BackgroundLoad.of(listener -> {
            throw new InputException(List.of(problem));
        });
        StartupScreen<Read> startup = startup(load);
        startup.open();
        update(startup);
        load.await(10_000);
        update(startup);
        assertAll(
                () -> assertTrue(startup.isFinished(), "nothing to show: the screen ends"),
                () -> assertEquals(List.of(problem), startup.problems()),
                () -> assertEquals(file + ":12:5: r_ds_on: must be above zero", startup.problems().get(0).toString()),
                () -> assertNull(startup.opened()),
                () -> assertNull(startup.crash()));
    }

    @Test
    void manyFilesAreSummarizedToTheOnesBeingRead() throws Exception {
        List<Path> files = new java.util.ArrayList<>();
        for (int i = 0; i < 40; i++) {
            files.add(Files.writeString(dir.resolve(String.format("part-%02d.yaml", i)), "x"));
        }
        BackgroundLoad<Read> load = BackgroundLoad.of(listener -> {
            listener.filesFound(files);
            for (int i = 0; i < 30; i++) {
                listener.fileStarted(files.get(i));
                listener.fileRead(files.get(i), 10);
            }
            listener.fileStarted(files.get(30));
            reached.countDown();
            try {
                release.await();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            throw new InputException(List.of());
        });
        StartupScreen<Read> startup = startup(load);
        startup.open();
        update(startup);
        assertTrue(reached.await(10, TimeUnit.SECONDS));
        update(startup);
        String text = terminal.toString();
        assertAll(
                () -> assertTrue(text.contains("part-30.yaml") && text.contains("reading"), text),
                () -> assertFalse(text.contains("part-29.yaml"), "files read are counted, not listed"),
                () -> assertTrue(text.contains("30 files read, 9 waiting"), text),
                () -> assertTrue(text.contains("300 parts so far, 30 of 40 files"), text));
        assertSame(BackgroundLoad.State.RUNNING, load.state());
    }
}
