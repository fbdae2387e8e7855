package dev.yoke.tui.edit;

import com.googlecode.lanterna.input.KeyType;
import dev.yoke.model.Modulation;
import dev.yoke.model.Scenario;
import dev.yoke.model.Segment;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class ScenarioEditorTest {

    private static final Path FILE = Path.of("conveyor.yaml");

    private final List<Scenario> passed = new ArrayList<>();
    private final List<Scenario> saved = new ArrayList<>();

    private ScenarioEditor open(TerminalDriver t) {
        ScenarioEditor editor = ScenarioEditor.open(t.gui, DemoScenario.conveyor(), FILE, passed::add,
                new RecordingSaver(saved, null));
        t.update();
        return editor;
    }

    private static List<String> labels(Scenario s) {
        return s.profile().segments().stream().map(Segment::label).toList();
    }

    private static Scenario last(List<Scenario> list) {
        return list.get(list.size() - 1);
    }

    @Test
    void addingASegmentPassesTheLongerProfileOn() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t);
            t.press(KeyType.Tab).press(KeyType.ArrowDown).type("a");
            assertEquals(List.of("start", "run", "run", "stop"), labels(last(passed)));
            assertTrue(t.text().contains("4 segments"));
        }
    }

    @Test
    void removingASegmentPassesTheShorterProfileOn() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t);
            t.press(KeyType.Tab).press(KeyType.ArrowDown).type("x");
            assertEquals(List.of("start", "stop"), labels(last(passed)));
            // cycle time is the sum of the remaining durations: 0.5 s + 0.5 s (Profile.cycleTime)
            assertEquals(1.0, last(passed).profile().cycleTime(), 1e-12);
        }
    }

    @Test
    void movingASegmentDownAndUpReordersTheProfile() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t);
            t.press(KeyType.Tab).type("]");
            assertEquals(List.of("run", "start", "stop"), labels(last(passed)));
            t.type("]");
            assertEquals(List.of("run", "stop", "start"), labels(last(passed)));
            t.type("[[");
            assertEquals(List.of("start", "run", "stop"), labels(last(passed)));
            assertEquals(4, passed.size(), "one scenario per move");
        }
    }

    @Test
    void editedCellWithUnitsPassesTheSiValueOn() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t);
            // second segment, torque column
            t.press(KeyType.Tab).press(KeyType.ArrowDown).press(KeyType.End).press(KeyType.Enter)
                    .clearField(12).type("-250 mN*m");
            assertTrue(passed.isEmpty(), "nothing passed on while the cell is being typed");
            t.press(KeyType.Enter);
            Segment run = last(passed).profile().segments().get(1);
            assertEquals(-0.25, run.torque(), 0.0);
            t.press(KeyType.ArrowLeft, 2).press(KeyType.Enter).clearField(12).type("3000 rpm").press(KeyType.Enter);
            // 3000 rpm = 3000 · 2π/60 rad/s = 100π rad/s (definition of the revolution per minute)
            assertEquals(100 * Math.PI, last(passed).profile().segments().get(1).speedStart(), 1e-9);
        }
    }

    @Test
    void badCellIsShownAndNotPassedOn() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            ScenarioEditor editor = open(t);
            t.press(KeyType.Tab).press(KeyType.ArrowRight).press(KeyType.Enter).clearField(10).type("2 V");
            String screen = t.text();
            assertTrue(screen.contains("segment 1 duration: expected seconds"), screen);
            t.press(KeyType.Enter);
            assertTrue(passed.isEmpty(), "an invalid duration is never passed on");
            assertTrue(t.text().contains("NOT passed on: 1 problem: segment 1 duration"), t.text());
            assertTrue(editor.current().isEmpty());
        }
    }

    @Test
    void escapeWhileEditingACellPutsTheOldTextBack() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            ScenarioEditor editor = open(t);
            t.press(KeyType.Tab).press(KeyType.Enter).clearField(10).type("sprint").press(KeyType.Escape);
            assertEquals(DemoScenario.conveyor(), editor.current().orElseThrow());
            assertTrue(passed.isEmpty());
            assertTrue(t.gui.getWindows().contains(editor), "Esc in a cell does not close the editor");
        }
    }

    @Test
    void badBenchValueIsShownBesideItsFieldAndNotPassedOn() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t);
            t.press(KeyType.ArrowDown).clearField(10).type("24 A");
            String line = t.lineWithNext("bus_voltage ");
            assertTrue(line.contains("! expected volts"), line);
            t.press(KeyType.ArrowDown);
            assertTrue(passed.isEmpty(), "an invalid bus voltage is never passed on");
            t.press(KeyType.ArrowUp).clearField(10).type("26 V").press(KeyType.ArrowDown);
            assertEquals(26.0, last(passed).bench().busVoltage(), 0.0);
        }
    }

    @Test
    void busVoltageOutsideItsRangeNamesTheBound() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t);
            t.press(KeyType.ArrowDown).clearField(10).type("30 V").press(KeyType.ArrowDown);
            // the loader's rule marks the maximum, the field a user would most likely correct
            assertTrue(t.lineWithNext("bus_voltage_max").contains("is below bus_voltage 30.0 V"), t.text());
            assertTrue(passed.isEmpty());
        }
    }

    @Test
    void frequencyListAndModulationAreEditable() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t);
            t.press(KeyType.ArrowDown, 4).clearField(30).type("18 kHz, 25kHz").press(KeyType.ArrowDown);
            assertEquals(List.of(18000.0, 25000.0), last(passed).bench().pwmFrequencies());
            t.type(" ").press(KeyType.ArrowDown);
            assertEquals(Modulation.SIGN_MAGNITUDE, last(passed).bench().modulation());
        }
    }

    @Test
    void saveWritesOnlyAValidScenario() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t);
            t.press(KeyType.ArrowDown).clearField(10).type("oops").press(KeyType.F2);
            assertTrue(saved.isEmpty());
            assertTrue(t.text().contains("Not saved"), t.text());
            t.clearField(10).type("25 V").press(KeyType.F2);
            assertEquals(1, saved.size());
            assertEquals(25.0, saved.get(0).bench().busVoltage(), 0.0);
            assertEquals(saved.get(0), last(passed), "what is saved is what the ranking sees");
        }
    }

    @Test
    void saveFailureIsReportedAndTheEditorStays() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            ScenarioEditor editor = ScenarioEditor.open(t.gui, DemoScenario.conveyor(), FILE, passed::add,
                    new RecordingSaver(saved, new IOException("disk full")));
            t.press(KeyType.F2);
            assertTrue(t.text().contains("Not saved: conveyor.yaml: disk full"), t.text());
            assertTrue(t.gui.getWindows().contains(editor));
        }
    }

    @Test
    void closingWithUnsavedChangesAsksFirst() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            ScenarioEditor editor = open(t);
            t.press(KeyType.ArrowDown).clearField(10).type("25 V").press(KeyType.Escape);
            assertTrue(t.text().contains("Save it?"), t.text());
            t.press(KeyType.Enter); // first answer: Save
            assertEquals(1, saved.size());
            assertTrue(!t.gui.getWindows().contains(editor), "closed after saving");
        }
    }

    @Test
    void fitsAnEightyByTwentyFourTerminal() throws Exception {
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            open(t);
            String screen = t.text();
            assertTrue(screen.contains("PROFILE SEGMENTS"));
            assertTrue(screen.contains("F2 save"), "the key line is on screen");
            assertTrue(screen.contains("stop"), "every demo segment is on screen");
        }
    }

    /**
     * A save that wrote the file's body anew without the editor having asked (the file changed to
     * such a layout after the check) is reported in a notice that names the backup.
     */
    @Test
    void bodyWrittenAnewUnannouncedIsReportedAfterTheSave() throws Exception {
        ScenarioSaver rewriting = new ScenarioSaver() {
            @Override
            public Optional<String> save(Scenario scenario, Path file) {
                return overwrite(scenario, file);
            }

            @Override
            public Optional<String> overwrite(Scenario scenario, Path file) {
                saved.add(scenario);
                return Optional.of("profile.segments is written in flow style [...]");
            }
        };
        try (TerminalDriver t = new TerminalDriver(80, 24)) {
            ScenarioEditor.open(t.gui, DemoScenario.conveyor(), FILE, passed::add, rewriting);
            t.update().press(KeyType.F2);
            String notice = t.text();
            assertTrue(notice.contains("Saved; comments dropped"), notice);
            assertTrue(notice.contains("conveyor.yaml.bak"), notice);
            assertEquals(1, saved.size());
            t.press(KeyType.Enter); // OK
            assertTrue(t.text().contains("body written anew"), t.text());
        }
    }
}
